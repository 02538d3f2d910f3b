using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class ReadingCurveTests
{
    private static readonly Distance At40Cm = Distance.FromCentimetres(40);

    /// <summary>
    /// Reading speeds at chart sizes 1.3 down to 0.0 logMAR (40 cm), shaped by the published exponential model
    /// R = R_max (1 − exp[−2.3 (P − P₀)/(P_c − P₀)]), P in MAR units, which puts P_c at 90 % of R_max
    /// (ARVO/IOVS abstract, 50 low-vision patients; methods §2.5). Speeds below P₀ are 0 (not read).
    /// </summary>
    private static IEnumerable<ReadingPoint> ModelCurve(double maximumSpeed, double logMarZero, double logMarCritical)
    {
        var p0 = Math.Pow(10, logMarZero);
        var pc = Math.Pow(10, logMarCritical);
        for (var step = 0; step <= 13; step++)
        {
            var logMar = 1.3 - 0.1 * step;
            var p = Math.Pow(10, logMar);
            var speed = p > p0 ? maximumSpeed * (1 - Math.Exp(-2.3 * (p - p0) / (pc - p0))) : 0.0;
            yield return new ReadingPoint(ReadingTestScoring.ChartPrintSize(logMar), speed);
        }
    }

    [Theory]
    // Model parameters (R_max wpm, logMAR of P₀, logMAR of P_c). The check values are the model's own P_c and
    // R_max (derived from the model definition): CPS within one 0.1 log step of P_c, MRS within 5 % of R_max.
    [InlineData(80.0, 0.5, 1.0)]
    [InlineData(120.0, 0.3, 0.7)]
    [InlineData(150.0, 0.1, 0.6)]
    public void Plateau_rule_recovers_the_critical_size_and_speed_of_the_exponential_model(double maximumSpeed, double logMarZero, double logMarCritical)
    {
        var analysis = ReadingCurve.Analyse(At40Cm, ModelCurve(maximumSpeed, logMarZero, logMarCritical));

        Assert.True(analysis.IsUsable, analysis.Refusal);
        Tolerance.Within(logMarCritical, analysis.CriticalPrintSizeLogMar, 0.1 + 1e-9, "CPS logMAR");
        Tolerance.WithinRelative(maximumSpeed, analysis.MaximumReadingSpeed, 0.05, "MRS");
        Assert.True(analysis.SpeedFellBelowCriticalPrintSize);
    }

    [Fact]
    public void Critical_size_of_4M_at_40_cm_gives_10_D_for_1M()
    {
        // Model curve with P_c at 1.0 logMAR (4M at 40 cm), then CV-12 (derived from the MNREAD CPS definition):
        // CPS 4M at 40 cm, target 1M → EVD 10 cm, Feq 10 D, no extra reserve. Tolerance ±1e-9 given the CPS.
        var analysis = ReadingCurve.Analyse(At40Cm, ModelCurve(80.0, 0.5, 1.0));
        Tolerance.Within(4.0, analysis.CriticalPrintSize.M, 1e-9, "CPS in M");

        var estimate = CriticalPrintSizeMethod.Estimate(analysis, PrintSize.FromM(1));

        Tolerance.Within(10.0, estimate.EquivalentPower.Dioptres, 1e-9);
        Tolerance.Within(10.0, estimate.EquivalentViewingDistance.Centimetres, 1e-9);
        Assert.Null(estimate.Reserve);
        // The MRS stated is the mean model speed at the sizes above P_c (1.3, 1.2 and 1.1 logMAR; the rule's definition).
        var mrs = ModelCurve(80.0, 0.5, 1.0).Where(p => p.PrintSize.M > 4.0 + 1e-9).Average(p => p.WordsPerMinute);
        var stated = "Maximum reading speed " + mrs.ToString("0", CultureInfo.InvariantCulture) + " words per minute";
        Assert.Contains(estimate.Assumptions, a => a.Contains(stated, StringComparison.Ordinal));
    }

    [Fact]
    public void Mrs_is_the_mean_speed_above_the_critical_size_and_the_cps_the_smallest_within_90_percent()
    {
        // The stated rule (ReadingCurve remarks; criterion from the ARVO/IOVS exponential-fit definition of P_c):
        // speeds 100, 104, 96, 92, 60 wpm at 8, 6.3, 5, 4, 3.2M. 92 ≥ 0.9 × mean(100, 104, 96) = 90, 60 < 0.9 × 98:
        // CPS 4M, MRS = 100 (derived arithmetic). Exact (±1e-9).
        var points = new[] { 8.0, 6.3, 5.0, 4.0, 3.2 }.Zip(new[] { 100.0, 104.0, 96.0, 92.0, 60.0 },
            (m, wpm) => new ReadingPoint(PrintSize.FromM(m), wpm));

        var analysis = ReadingCurve.Analyse(At40Cm, points.Reverse());

        Assert.Equal(4.0, analysis.CriticalPrintSize.M);
        Tolerance.Within(100.0, analysis.MaximumReadingSpeed, 1e-9);
        Assert.Equal(4, analysis.PlateauPointCount);
        Assert.Equal(8.0, analysis.Points[0].PrintSize.M);
    }

    [Fact]
    public void A_curve_still_rising_at_the_largest_print_is_refused_as_having_no_plateau()
    {
        var points = new[] { new ReadingPoint(PrintSize.FromM(8), 100), new ReadingPoint(PrintSize.FromM(6.3), 80), new ReadingPoint(PrintSize.FromM(5), 60) };

        var analysis = ReadingCurve.Analyse(At40Cm, points);

        Assert.False(analysis.IsUsable);
        Assert.StartsWith("No plateau:", analysis.Refusal, StringComparison.Ordinal);
        Assert.Contains("Test larger print sizes", analysis.Refusal, StringComparison.Ordinal);
        Assert.Throws<InvalidOperationException>(() => analysis.CriticalPrintSize);
        var error = Assert.Throws<ArgumentException>(() => CriticalPrintSizeMethod.Estimate(analysis, PrintSize.FromM(1)));
        Assert.Contains("No plateau:", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_points_are_too_few_and_the_refusal_says_how_many_to_enter()
    {
        var points = new[] { new ReadingPoint(PrintSize.FromM(8), 100), new ReadingPoint(PrintSize.FromM(6.3), 98) };

        var analysis = ReadingCurve.Analyse(At40Cm, points);

        Assert.False(analysis.IsUsable);
        Assert.StartsWith("Too few points: 2 print size(s) given. Enter reading speeds for at least 3 print sizes", analysis.Refusal, StringComparison.Ordinal);
    }

    [Fact]
    public void The_same_print_size_twice_is_refused()
    {
        var points = new[] { new ReadingPoint(PrintSize.FromM(8), 100), new ReadingPoint(PrintSize.FromM(8), 98), new ReadingPoint(PrintSize.FromM(4), 50) };

        var analysis = ReadingCurve.Analyse(At40Cm, points);

        Assert.False(analysis.IsUsable);
        Assert.Contains("appears more than once", analysis.Refusal, StringComparison.Ordinal);
    }

    [Fact]
    public void A_curve_that_never_slows_is_used_but_marked_as_an_upper_bound()
    {
        var points = new[] { new ReadingPoint(PrintSize.FromM(4), 100), new ReadingPoint(PrintSize.FromM(3.2), 99), new ReadingPoint(PrintSize.FromM(2.5), 97) };

        var analysis = ReadingCurve.Analyse(At40Cm, points);
        var estimate = CriticalPrintSizeMethod.Estimate(analysis, PrintSize.FromM(1));

        Assert.True(analysis.IsUsable);
        Assert.False(analysis.SpeedFellBelowCriticalPrintSize);
        Assert.Equal(2.5, analysis.CriticalPrintSize.M);
        Assert.Contains(estimate.Assumptions, a => a.Contains("true critical print size may be smaller", StringComparison.Ordinal));
    }

    [Fact]
    public void A_timed_sentence_becomes_a_point_at_the_error_corrected_speed()
    {
        // CV-26: MNREAD, 2 errors in 5.0 s → 96 wpm; 0 errors in 4.0 s → 150 wpm. Exact (±1e-9).
        Tolerance.Within(96.0, ReadingPoint.FromTimedSentence(PrintSize.FromM(2), 5.0, 2).WordsPerMinute, 1e-9);
        Tolerance.Within(150.0, ReadingPoint.FromTimedSentence(PrintSize.FromM(2), 4.0, 0).WordsPerMinute, 1e-9);
    }

    [Fact]
    public void A_negative_speed_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() => new ReadingPoint(PrintSize.FromM(1), -5));

        Assert.StartsWith("Enter the reading speed in words per minute, zero or more, such as 85.", error.Message, StringComparison.Ordinal);
    }
}
