using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

/// <summary>How chart results are written down in practice: letters missed or gained on a line, and floor scores.</summary>
public class ChartRecordingTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Theory]
    // Methods §1.1: 0.02 logMAR a letter on a 5-letter line; missed letters add, gained letters subtract (derived).
    [InlineData("6/60 -2", 1.04)]
    [InlineData("6/60-2", 1.04)]
    [InlineData("6/60+1", 0.98)]
    [InlineData("6/60 + 1", 0.98)]
    [InlineData("20/200 -1", 1.02)]
    // 20/70 is logMAR log₁₀ 3.5 = 0.5441; −2 letters → 0.5841 (derived).
    [InlineData("20/70-2", 0.5841)]
    public void Letters_missed_or_gained_on_a_line_are_read(string typed, double logMar)
    {
        var result = DistanceAcuityNotation.Parse(typed, Invariant);
        Assert.True(result.Success, result.Error);
        Tolerance.Within(logMar, result.Value.LogMar, 0.0001, typed);
    }

    [Fact]
    public void Five_or_more_letters_on_a_5_letter_line_ask_for_the_next_line()
    {
        // A 5-letter line (methods §1.1): 5 letters missed is the line above, so the fraction should be typed instead.
        Assert.Equal(ParseMessages.LettersOnLineOutOfRange, DistanceAcuityNotation.Parse("6/60 -5", Invariant).Error);
    }

    [Fact]
    public void An_ETDRS_score_of_0_letters_is_a_floor_not_logMAR_1_7()
    {
        // Gregori, Feuer and Rosenfeld 2010 (Retina 30:1046): letters = 85 − 50 × logMAR; 0 letters means worse than
        // the top line, so it is refused as a value to calculate with; 35 letters is logMAR 1.0 (derived, exact).
        Assert.Equal(ParseMessages.EtdrsZeroIsAFloor, DistanceAcuityNotation.Parse("0 letters", Invariant).Error);
        Tolerance.Within(1.0, DistanceAcuityNotation.Parse("35 letters", Invariant).Value.LogMar, 1e-9);
    }

    [Fact]
    public void Counting_fingers_is_recognised_for_the_record_and_refused_only_as_an_acuity()
    {
        // Common practice: CF is recorded, but it has no logMAR for a calculation.
        Assert.True(NonChartVisionNotation.Parse("CF at 1 m", Invariant).Success);
        Assert.False(DistanceAcuityNotation.Parse("CF at 1 m", Invariant).Success);
    }

    [Fact]
    public void A_contrast_reserve_from_large_letters_is_labelled_an_upper_bound()
    {
        // Whittaker and Lovie-Kitchin 1993: reserve = print contrast ÷ threshold; with logCS 1.05 (threshold 8.9 %) and
        // 0.9 contrast print, 10.1:1 (derived). Measured with large letters, the reading-size threshold is higher, so
        // the figure is an upper bound; measured at reading size it is the reserve itself.
        var large = ContrastReserve.Assess(1.05);
        Assert.True(large.IsUpperBound);
        Assert.Contains(ContrastReserve.UpperBoundNote, large.Advice);
        Tolerance.Within(10.1, large.Reserve, 0.05);
        var readingSize = ContrastReserve.Assess(1.05, ContrastReserve.TypicalPrintContrast, ContrastMeasuredAt.ReadingSize);
        Assert.False(readingSize.IsUpperBound);
        Assert.DoesNotContain(ContrastReserve.UpperBoundNote, readingSize.Advice);
    }
}
