using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class JaegerTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    // Methods §1.4 table (from memory; card-dependent, ±1–2 lines): Jaeger label, Snellen equivalent at 40 cm (20/x),
    // ≈ M, ≈ N under the 1M ≈ N8 rule (J7 is N10–N12 on the table; 11 is its middle).
    public static TheoryData<string, int, double, double> Table => new()
    {
        { "J1+", 20, 0.4, 3 },
        { "J1", 25, 0.5, 4 },
        { "J2", 30, 0.6, 5 },
        { "J3", 40, 0.8, 6 },
        { "J5", 50, 1.0, 8 },
        { "J7", 70, 1.4, 11 },
        { "J10", 100, 2.0, 16 },
        { "J16", 200, 4.0, 32 },
    };

    [Theory]
    [MemberData(nameof(Table))]
    public void Each_Jaeger_row_reads_as_its_M_size_with_a_warning(string label, int feet, double m, double n)
    {
        // M column (methods §1.4): M = 0.4 × x / 20 for 20/x at 40 cm, derived and exact (±0.0005). Only the
        // J-to-Snellen pairing is from memory, which is why every result carries the warning.
        _ = n;
        var result = PrintSizeNotation.Parse(label, Invariant);
        Tolerance.Within(m, result.Value.M, 0.0005);
        Tolerance.Within(0.4 * feet / 20.0, result.Value.M, 0.0005);
        var mText = PrintSizeNotation.Format(result.Value, PrintSizeUnit.MUnits, Invariant);
        Assert.Equal(ParseMessages.JaegerApproximate(label, mText, "20/" + feet.ToString(Invariant), assumedDistance: false), result.Warning);
    }

    [Theory]
    [MemberData(nameof(Table))]
    public void Each_Jaeger_row_read_as_near_acuity_at_40_cm_has_its_Snellen_equivalent(string label, int feet, double m, double n)
    {
        // Snellen column at 40 cm: logMAR = log₁₀(M / 0.4) = log₁₀(x / 20) (Colenbrander 2001; derived, ±0.0005).
        // N column: M × 8.25 pt at r_x 0.50 (methods §1.3); the table rounds to whole N sizes, so ±1 pt (from memory).
        var result = NearAcuityNotation.Parse(label.ToLowerInvariant(), Invariant);
        Tolerance.Within(Math.Log10(feet / 20.0), result.Value.Acuity.LogMar, 0.0005, label);
        Tolerance.Within(0.40, result.Value.TestDistance.Metres, 1e-12, "assumed card distance");
        Tolerance.Within(n, result.Value.Threshold.ToPoints(default), 1.0, "N");
        var mText = PrintSizeNotation.Format(PrintSizeNotation.Parse(label, Invariant).Value, PrintSizeUnit.MUnits, Invariant);
        Assert.Equal(ParseMessages.JaegerApproximate(label, mText, "20/" + feet.ToString(Invariant), assumedDistance: true), result.Warning);
        _ = m;
    }

    [Fact]
    public void A_Jaeger_value_with_a_distance_uses_that_distance_and_still_warns()
    {
        var result = NearAcuityNotation.Parse("J5 at 33 cm", Invariant);
        Tolerance.Within(0.33, result.Value.TestDistance.Metres, 1e-12);
        Assert.Equal(ParseMessages.JaegerApproximate("J5", "1.0M", "20/50", assumedDistance: false), result.Warning);
    }

    [Theory]
    [InlineData("J4", "J4")]
    [InlineData("j 6", "J6")]
    [InlineData("J2+", "J2+")]
    [InlineData("J99", "J99")]
    public void A_Jaeger_number_not_on_the_table_is_refused_with_the_table_listed(string text, string label) =>
        Assert.Equal(ParseMessages.JaegerNotInTable(label, "J1+, J1, J2, J3, J5, J7, J10, J16"), PrintSizeNotation.Parse(text, Invariant).Error);

    [Fact]
    public void A_Jaeger_value_is_never_read_silently()
    {
        foreach (var text in new[] { "J1+", "j5", "J16", "J5 at 40 cm" })
        {
            Assert.False(string.IsNullOrEmpty(NearAcuityNotation.Parse(text, Invariant).Warning), text);
        }
    }
}
