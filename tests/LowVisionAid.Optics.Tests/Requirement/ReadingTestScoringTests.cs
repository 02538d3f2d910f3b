using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class ReadingTestScoringTests
{
    [Fact]
    public void Ten_words_in_4_seconds_is_150_words_per_minute()
    {
        // CV-26: MNREAD manual, wpm = 600 / t. Exact (±1e-9).
        Tolerance.Within(150.0, ReadingTestScoring.WordsPerMinute(4.0), 1e-9);
    }

    [Fact]
    public void Two_errors_in_5_seconds_is_96_words_per_minute()
    {
        // CV-26: MNREAD manual, wpm = 60 × (10 − errors) / t. Exact (±1e-9).
        Tolerance.Within(96.0, ReadingTestScoring.WordsPerMinute(2, 5.0), 1e-9);
    }

    [Theory]
    // MNREAD manual: reading acuity = 1.4 − 0.1 × sentences + 0.01 × errors (logMAR at 40 cm); derived values. Exact (±1e-9).
    [InlineData(1, 0, 1.3)]
    [InlineData(14, 3, 0.03)]
    [InlineData(10, 14, 0.54)]
    public void Reading_acuity_counts_sentences_and_word_errors(int sentences, int errors, double logMar) =>
        Tolerance.Within(logMar, ReadingTestScoring.ChartReadingAcuityLogMar(sentences, errors), 1e-9);

    [Fact]
    public void At_32_cm_the_distance_correction_is_about_plus_0_1()
    {
        // MNREAD manual example: at 32 cm the correction log10(0.40/d) is +0.097 ≈ +0.1. Tolerance ±0.001.
        Tolerance.Within(0.097, ReadingTestScoring.DistanceCorrection(Distance.FromCentimetres(32)), 0.001);
    }

    [Fact]
    public void Reading_acuity_at_20_cm_adds_the_distance_correction()
    {
        // MNREAD: 1.4 − 0.1 × 10 + 0.01 × 0 = 0.40 at 40 cm; at 20 cm + log10(2) = 0.701 (derived). Tolerance ±0.001.
        Tolerance.Within(0.701, ReadingTestScoring.ReadingAcuity(10, 0, Distance.FromCentimetres(20)).LogMar, 0.001);
    }

    [Theory]
    // Physical size of a chart line: M = 0.40 × 10^logMAR (Colenbrander logMAR = log10(M/d), at 40 cm; derived). ±0.001 M.
    [InlineData(1.0, 4.0)]
    [InlineData(0.0, 0.4)]
    [InlineData(0.4, 1.005)]
    public void Chart_labels_convert_to_M_sizes(double logMar, double m) =>
        Tolerance.Within(m, ReadingTestScoring.ChartPrintSize(logMar).M, 0.001);

    [Fact]
    public void A_zero_reading_time_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => ReadingTestScoring.WordsPerMinute(0.0));

        Assert.StartsWith("Enter the reading time in seconds, greater than zero, such as 4.5.", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void More_than_ten_errors_in_a_sentence_is_refused_with_the_range()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => ReadingTestScoring.WordsPerMinute(11, 5.0));

        Assert.StartsWith("Enter the number of words missed or read wrongly in the sentence: a whole number from 0 to 10", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Zero_sentences_is_refused_with_the_range()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => ReadingTestScoring.ChartReadingAcuityLogMar(0, 0));

        Assert.Contains("a whole number from 1 to 19", error.Message, StringComparison.Ordinal);
    }
}
