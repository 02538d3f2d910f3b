using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Tests.Notation;

public class NearAcuityNotationTests
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    private static NearAcuity Read(string text) => NearAcuityNotation.Parse(text, Invariant).Value;

    [Fact]
    public void One_M_at_40_cm_is_V_0_4_or_20_50_and_logMAR_0_398()
    {
        // CV-04 (methods §6): 1/V = 2.5; V = 0.4 (20/50); logMAR 0.398; x-height 12.5′ = 0.208°.
        // Source: Colenbrander 1/V = M × D; Legge & Bigelow ≈ 0.2° at 40 cm. Tolerance ±0.005.
        var near = Read("1M at 40 cm");
        Tolerance.Within(2.5, 1 / near.SnellenValue, 0.005, "1/V");
        Tolerance.Within(0.4, near.SnellenValue, 0.005, "V");
        Tolerance.Within(0.398, near.Acuity.LogMar, 0.005, "logMAR");
        Tolerance.Within(12.5, near.Threshold.AngleAt(near.TestDistance).Arcminutes, 0.005, "angle");
        Tolerance.Within(0.208, near.Threshold.AngleAt(near.TestDistance).Degrees, 0.005, "degrees");
        Assert.Equal("20/50", DistanceAcuityNotation.Format(near.Acuity, AcuityNotation.SnellenFeet, Invariant));
        Assert.Equal("0.40/1.0M", NearAcuityNotation.FormatMetresOverM(near, Invariant));
    }

    [Fact]
    public void Four_M_at_40_cm_is_1_over_V_of_10_and_logMAR_1()
    {
        // CV-05 (methods §6): 1/V = 10; logMAR 1.0 (20/200 equivalent). Source: Colenbrander. Exact (±0.001).
        var near = Read("4M at 40 cm");
        Tolerance.Within(10, 1 / near.SnellenValue, 0.001, "1/V");
        Tolerance.Within(1.0, near.Acuity.LogMar, 0.001, "logMAR");
        Assert.Equal("20/200", DistanceAcuityNotation.Format(near.Acuity, AcuityNotation.SnellenFeet, Invariant));
    }

    [Fact]
    public void Six_24_at_25_cm_is_a_1M_threshold_about_N8()
    {
        // CV-31 (methods §6, "divide by three"): 6/24 at 25 cm → threshold letter 1.454 mm = 1M ≈ N8.
        // Source: derived; UK optometry rule. Exact: ±0.001 mm and ±0.001 M; N8 under the 1M ≈ 8 pt rule
        // (methods §1.3: 1M = 8.25 pt at r_x 0.50, ±0.05).
        // The rule is about a distance acuity of 6/24 taken to 25 cm. (Before, "6/24 at 25 cm" typed as a near
        // acuity was read this way; a near card's Snellen label names a print size for the card's design distance
        // instead (Colenbrander 2001), so the check now uses the distance acuity directly, as the rule does.)
        var threshold = Acuity.FromSnellen(6, 24).ThresholdPrintAt(Distance.FromCentimetres(25));
        Tolerance.Within(1.454, threshold.XHeightMillimetres, 0.001, "x-height mm");
        Tolerance.Within(1.0, threshold.M, 0.001, "M");
        Tolerance.Within(8.25, threshold.ToPoints(XHeightRatio.Conventional), 0.05, "points");
        // N8 at r_x 0.50 is 8 × 0.35278 × 0.50 / 1.4544 = 0.970M (methods §1.3, derived; ±0.001), so 1M ≈ N8 within 3 %.
        Tolerance.Within(0.970, PrintSizeNotation.Parse("N8", Invariant).Value.M, 0.001, "N8 in M");
    }

    [Fact]
    public void A_near_card_Snellen_label_names_a_print_size_for_the_card_design_distance()
    {
        // Colenbrander 2001 (methods §1.2, §11): on a near card designed for 40 cm, "20/50" labels the print whose
        // letters subtend 5′ × 2.5 at 40 cm: M = 0.40 × 50/20 = 1.0M (derived, exact). Held at 25 cm it is still
        // 1.0M, so the near acuity is 1.0M at 25 cm (logMAR log₁₀(1.0/0.25) = 0.602), not 0.625M at 25 cm.
        var result = NearAcuityNotation.Parse("20/50 at 25 cm", Invariant);
        Assert.True(result.Success, result.Error);
        Tolerance.Within(1.0, result.Value.Threshold.M, 1e-9, "M");
        Tolerance.Within(0.25, result.Value.TestDistance.Metres, 1e-12, "test distance");
        Tolerance.Within(0.602, result.Value.Acuity.LogMar, 0.0005, "logMAR");
        // The reader is asked to confirm: M units, or the card's design distance.
        Assert.Equal(ParseMessages.NearSnellenIsAPrintSize("20/50", "1.0M", "40 cm", "25 cm"), result.Warning);
    }

    [Fact]
    public void A_near_card_designed_for_14_inches_converts_by_its_own_design_distance()
    {
        // Colenbrander 2001: 20/50 on a 14 in (35.56 cm) card is M = 0.3556 × 2.5 = 0.889M (derived).
        var result = NearAcuityNotation.Parse("20/50 at 25 cm", Invariant, XHeightRatio.Conventional, Distance.FromInches(14));
        Assert.True(result.Success, result.Error);
        Tolerance.Within(0.889, result.Value.Threshold.M, 0.001, "M");
    }

    [Fact]
    public void A_near_card_read_at_its_design_distance_gives_no_warning()
    {
        // Colenbrander 2001: 20/50 at 40 cm on a 40 cm card is 1.0M at 40 cm (derived, exact); nothing to question.
        var result = NearAcuityNotation.Parse("20/50 at 40 cm", Invariant);
        Tolerance.Within(1.0, result.Value.Threshold.M, 1e-9, "M");
        Assert.Null(result.Warning);
    }

    [Theory]
    // logMAR = log₁₀(M / d) with d in metres (Colenbrander 2001; methods §1.2). Derived; tolerance ±0.0005.
    [InlineData("4M at 40 cm", 4.0, 0.40)]
    [InlineData("1.6M @ 25cm", 1.6, 0.25)]
    [InlineData("1M 40cm", 1.0, 0.40)]
    [InlineData("1m40cm", 1.0, 0.40)]
    [InlineData("1.0 M at 0.4 m", 1.0, 0.40)]
    [InlineData("2,5M at 33 cm", 2.5, 0.33)]
    [InlineData("1M at 16 in", 1.0, 0.4064)]
    [InlineData("0.40/1.0M", 1.0, 0.40)]
    [InlineData("0.25 m/2M", 2.0, 0.25)]
    [InlineData("20/50 at 40 cm", 1.0, 0.40)]
    [InlineData("6/15 at 40 cm", 1.0, 0.40)]
    [InlineData("1.5 mm at 40 cm", 1.0313, 0.40)]
    public void Reads_each_near_form(string text, double m, double metres)
    {
        var near = Read(text);
        Tolerance.Within(m, near.Threshold.M, 0.0005, "M");
        Tolerance.Within(metres, near.TestDistance.Metres, 1e-9, "distance");
        Tolerance.Within(Math.Log10(m / metres), near.Acuity.LogMar, 0.0005, "logMAR");
    }

    [Fact]
    public void N_at_a_distance_is_converted_through_the_x_height_ratio_with_a_warning()
    {
        // M = N × 0.35278 × r_x / 1.4544 (methods §1.3, derived): N8 at r_x 0.50 → 0.970M. Tolerance ±0.001.
        var result = NearAcuityNotation.Parse("N8 at 25 cm", Invariant);
        Tolerance.Within(0.970, result.Value.Threshold.M, 0.001);
        Assert.Equal(ParseMessages.ApproximateFromPoints("N8", "0.97M", "0.50"), result.Warning);
    }

    [Fact]
    public void N_uses_the_typeface_ratio_when_given()
    {
        // CV-30 (methods §6): N8 in a face with r_x 0.447 (Times New Roman, from memory) ≈ 0.87M. Tolerance ±0.05.
        var result = NearAcuityNotation.Parse("N8 at 40 cm", Invariant, XHeightRatio.FromRatio(0.447));
        Tolerance.Within(0.87, result.Value.Threshold.M, 0.05);
    }

    [Fact]
    public void M_sizes_carry_no_warning()
    {
        Assert.Null(NearAcuityNotation.Parse("1M at 40 cm", Invariant).Warning);
    }

    [Theory]
    [InlineData(null, ParseMessages.NearAcuityExpected)]
    [InlineData("", ParseMessages.NearAcuityExpected)]
    [InlineData("small print", ParseMessages.NearAcuityExpected)]
    [InlineData("4M at 500 m", ParseMessages.DistanceOutOfRange)]
    [InlineData("4M at 0 cm", ParseMessages.DistanceOutOfRange)]
    [InlineData("500M at 40 cm", ParseMessages.PrintSizeOutOfRange)]
    [InlineData("0.05M at 1 m", ParseMessages.NearAcuityOutOfRange)]
    [InlineData("100M at 2 cm", ParseMessages.NearAcuityOutOfRange)]
    [InlineData("4 at 40 cm", "“4” needs a unit: type it as 4M, N4, 4 pt or 4 mm (x-height).")]
    [InlineData("6/0 at 40 cm", ParseMessages.SnellenZero)]
    public void Refuses_each_invalid_near_entry_with_its_message(string? text, string message) =>
        Assert.Equal(message, NearAcuityNotation.Parse(text, Invariant).Error);

    [Theory]
    [InlineData("4M")]
    [InlineData("N8")]
    [InlineData("20/50")]
    [InlineData("1.5 mm")]
    public void A_print_size_without_its_distance_asks_for_the_distance(string text) =>
        Assert.Equal(ParseMessages.NearNeedsDistance(text), NearAcuityNotation.Parse(text, Invariant).Error);

    [Fact]
    public void A_distance_without_its_unit_asks_for_the_unit()
    {
        Assert.Equal(ParseMessages.DistanceNeedsUnit("40"), NearAcuityNotation.Parse("4M at 40", Invariant).Error);
    }

    [Fact]
    public void Formats_for_display_and_canonically()
    {
        var near = Read("1.6M @ 25cm");
        Assert.Equal("1.6M at 25 cm", NearAcuityNotation.Format(near, Invariant));
        Assert.Equal("1,6M at 25 cm", NearAcuityNotation.Format(near, CultureInfo.GetCultureInfo("de-DE")));
        Assert.Equal("1.6M at 0.25 m", NearAcuityNotation.FormatCanonical(near));
        Assert.Equal(near, NearAcuityNotation.Parse(NearAcuityNotation.FormatCanonical(near), CultureInfo.GetCultureInfo("de-DE")).Value);
    }

    [Fact]
    public void A_measurement_entered_as_numbers_is_checked_with_the_same_messages()
    {
        var ok = NearAcuityNotation.FromMeasurement(PrintSize.FromM(4), Distance.FromCentimetres(40));
        Tolerance.Within(1.0, ok.Value.Acuity.LogMar, 1e-12);
        Assert.Equal(ParseMessages.DistanceOutOfRange, NearAcuityNotation.FromMeasurement(PrintSize.FromM(4), Distance.Zero).Error);
        Assert.Equal(ParseMessages.PrintSizeOutOfRange, NearAcuityNotation.FromMeasurement(default, Distance.FromCentimetres(40)).Error);
    }

    [Fact]
    public void A_measurement_typed_in_two_fields_is_read_and_checked_together()
    {
        // CV-04 (methods §6): 1M at 40 cm is logMAR 0.398 (Colenbrander 1/V = M × D). Tolerance ±0.005.
        var near = NearAcuityNotation.FromParts("1M", "40 cm", Invariant);
        Tolerance.Within(0.398, near.Value.Acuity.LogMar, 0.005, "logMAR");
        Tolerance.Within(0.40, near.Value.TestDistance.Metres, 1e-12, "distance");

        // Each part fails with its own message: the print size's first, then the distance's.
        Assert.Equal(ParseMessages.PrintSizeExpected, NearAcuityNotation.FromParts("small", "near", Invariant).Error);
        Assert.Equal(ParseMessages.DistanceNeedsUnit("40"), NearAcuityNotation.FromParts("1M", "40", Invariant).Error);
        Assert.Equal(ParseMessages.NearAcuityOutOfRange, NearAcuityNotation.FromParts("100M", "1 cm", Invariant).Error);
    }

    [Fact]
    public void Creating_a_record_from_invalid_numbers_throws_for_the_programmer()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => NearAcuity.Create(default, Distance.FromCentimetres(40)));
        Assert.Throws<ArgumentOutOfRangeException>(() => NearAcuity.Create(PrintSize.FromM(1), Distance.FromCentimetres(-40)));
    }

    [Fact]
    public void TryParse_gives_the_value_or_false()
    {
        Assert.True(NearAcuityNotation.TryParse("4M at 40 cm", Invariant, out var near, out var none));
        Tolerance.Within(4.0, near.Threshold.M, 1e-12);
        Assert.Null(none);
        Assert.False(NearAcuityNotation.TryParse("4M", Invariant, out _, out _));
        Assert.True(NearAcuityNotation.TryParse("J5", Invariant, out _, out var jaeger));
        Assert.Equal(ParseMessages.JaegerApproximate("J5", "1.0M", "20/50", assumedDistance: true), jaeger);
    }
}
