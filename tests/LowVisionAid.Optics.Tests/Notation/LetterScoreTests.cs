using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class LetterScoreTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // Methods §1.1 per-letter scoring: logMAR = top line attempted + 0.1 − 0.02 × letters correct
    // (Bailey–Lovie / ETDRS; ISO 8596:2017/Amd 1:2019 summary). Values derived from that formula; tolerance ±0.0005.
    [InlineData(1.0, 12, 0.86)]
    [InlineData(1.0, 5, 1.0)]
    [InlineData(0.3, 3, 0.34)]
    [InlineData(1.0, 1, 1.08)]
    public void Letter_by_letter_score_follows_the_published_formula(double top, int letters, double logMar) =>
        Tolerance.Within(logMar, DistanceAcuityNotation.FromLetterScore(top, letters).Value.LogMar, 0.0005);

    [Fact]
    public void Reading_whole_lines_gives_the_logMAR_of_the_last_line_read_completely()
    {
        // Methods §1.1 equivalent form: start from the last line read completely (derived check of the same rule).
        // Top line 1.0, lines 1.0 to 0.7 all read (4 lines × 5 = 20 letters) → 0.70. Tolerance ±0.0005.
        Tolerance.Within(0.70, DistanceAcuityNotation.FromLetterScore(1.0, 20).Value.LogMar, 0.0005);
    }

    [Fact]
    public void Each_letter_is_worth_a_tenth_of_a_line_divided_by_the_letters_on_a_line()
    {
        // Methods §1.1: in general 0.1/n per letter for n letters a line. 4 letters a line, top 1.0, 6 letters → 1.1 − 0.15 = 0.95.
        Tolerance.Within(0.95, DistanceAcuityNotation.FromLetterScore(1.0, 6, lettersPerLine: 4).Value.LogMar, 0.0005);
    }

    [Theory]
    [InlineData("top 1.0, 12 letters", 0.86)]
    [InlineData("Top line 1.0 logMAR; 12 letters", 0.86)]
    [InlineData("top 1,0 12 letters", 0.86)]
    [InlineData("TOP 0.3, 3 letters correct", 0.34)]
    [InlineData("top logMAR 1.0, 1 letter", 1.08)]
    public void Reads_the_typed_letter_score(string text, double logMar) =>
        Tolerance.Within(logMar, DistanceAcuityNotation.Parse(text, Invariant).Value.LogMar, 0.0005);

    [Fact]
    public void The_typed_form_uses_the_clinics_letters_a_line()
    {
        var options = new DistanceAcuityOptions { LettersPerLine = 4 };
        Tolerance.Within(0.95, DistanceAcuityNotation.Parse("top 1.0, 6 letters", Invariant, options).Value.LogMar, 0.0005);
    }

    [Theory]
    [InlineData(1.0, 12, 0, ParseMessages.LettersPerLineOutOfRange)]
    [InlineData(1.0, 12, 11, ParseMessages.LettersPerLineOutOfRange)]
    [InlineData(double.NaN, 12, 5, ParseMessages.TopLineOutOfRange)]
    [InlineData(3.5, 12, 5, ParseMessages.TopLineOutOfRange)]
    [InlineData(1.0, 0, 5, ParseMessages.LettersCorrectOutOfRange)]
    [InlineData(1.0, -3, 5, ParseMessages.LettersCorrectOutOfRange)]
    [InlineData(-0.5, 10, 5, ParseMessages.LetterScoreOutOfRange)]
    public void Refuses_numbers_out_of_range_with_a_message(double top, int letters, int perLine, string message) =>
        Assert.Equal(message, DistanceAcuityNotation.FromLetterScore(top, letters, perLine).Error);

    [Fact]
    public void A_letter_count_too_long_to_be_real_is_refused()
    {
        Assert.Equal(ParseMessages.LettersCorrectOutOfRange, DistanceAcuityNotation.Parse("top 1.0, 99999999999 letters", Invariant).Error);
    }
}
