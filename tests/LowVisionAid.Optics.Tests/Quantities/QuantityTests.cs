using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Quantities;

public class QuantityTests
{
    [Fact]
    public void One_M_is_1_4544_mm_high()
    {
        // CV-03: 1M = 1000 mm × tan(5′) = 1.4544 mm (Sloan 1959; derived). Tolerance ±0.001 mm.
        Tolerance.Within(1.4544, PrintSize.FromM(1).XHeightMillimetres, 0.001);
    }

    [Fact]
    public void One_M_at_40_cm_subtends_12_5_arcminutes_or_0_208_degrees()
    {
        // CV-04: x-height angle 12.5′ = 0.208° (Colenbrander 2001; Legge and Bigelow 2011 ≈ 0.2°). Tolerance ±0.005.
        var angle = PrintSize.FromM(1).AngleAt(Distance.FromCentimetres(40));
        Tolerance.Within(12.5, angle.Arcminutes, 0.005);
        Tolerance.Within(0.208, angle.Degrees, 0.005);
    }

    [Theory]
    // CV-30: M ↔ points, derived from M = pt × 0.35278 × r_x / 1.4544 (methods §1.3); r_x 0.447 for Times New Roman is from memory. Tolerance ±0.05.
    [InlineData(0.50, 1.0, 8.25)]
    [InlineData(0.447, 1.0, 9.22)]
    public void One_M_in_points_depends_on_the_x_height_ratio(double ratio, double m, double points) =>
        Tolerance.Within(points, PrintSize.FromM(m).ToPoints(XHeightRatio.FromRatio(ratio)), 0.05);

    [Fact]
    public void N8_in_a_face_with_x_height_ratio_0_447_is_0_87_M()
    {
        // CV-30: N8 Times New Roman ≈ 0.87M (derived; r_x from memory). Tolerance ±0.05.
        Tolerance.Within(0.87, PrintSize.FromN(8, XHeightRatio.FromRatio(0.447)).M, 0.05);
    }

    [Fact]
    public void One_millimetre_of_letter_height_is_about_0_7_M()
    {
        // Jose and Atcherson 1977 (methods §1.2): 1 mm of letter height ≈ 0.7M; exactly 1 / 1.4544 = 0.688M (derived).
        // Tolerance ±0.05M for the published rounding, ±0.001M for the derived value.
        Tolerance.Within(0.7, PrintSize.FromXHeightMillimetres(1).M, 0.05);
        Tolerance.Within(0.688, PrintSize.FromXHeightMillimetres(1).M, 0.001);
    }

    [Theory]
    // Legge and Bigelow 2011 (methods §1.3): the fluent range is x-height 0.2° to 2°, which is 1.4 to 14 mm at 40 cm
    // (≈ 1M to 10M). Derived check of the angle formula 5′ × M / d; tolerance ±0.01° (the source rounds to 1.4 and 14 mm).
    [InlineData(1.4, 0.2)]
    [InlineData(14.0, 2.0)]
    public void The_fluent_print_range_at_40_cm_is_0_2_to_2_degrees(double xHeightMillimetres, double degrees) =>
        Tolerance.Within(degrees, PrintSize.FromXHeightMillimetres(xHeightMillimetres).AngleAt(Distance.FromCentimetres(40)).Degrees, 0.01);

    [Fact]
    public void A_letter_1_4544_mm_high_at_1_m_subtends_5_arcminutes_by_the_exact_angle_formula()
    {
        // Sloan 1959: 1M subtends 5′ at 1 m (CV-03); θ = 2·atan(h / 2d) agrees with the small-angle M form to ±0.001′.
        Tolerance.Within(5.0, VisualAngle.Subtended(PrintSize.FromM(1).XHeight, Distance.FromMetres(1)).Arcminutes, 0.001);
    }

    [Fact]
    public void Default_x_height_ratio_is_the_conventional_half()
    {
        // Methods §1.3: r_x = 0.50 is the "1M ≈ 8 pt" convention (common practice).
        Assert.Equal(0.5, XHeightRatio.Conventional.Value);
        Assert.Equal(0.5, default(XHeightRatio).Value);
    }

    [Fact]
    public void A_point_is_a_seventy_second_of_an_inch()
    {
        // Kuhn, "Metric typographic units": the DTP point is 0.35278 mm. Tolerance ±0.00001 mm.
        Tolerance.Within(0.35278, UnitFactors.MillimetresPerPoint, 0.00001);
    }

    [Theory]
    // Exact unit definitions (international inch and foot, 1959).
    [InlineData(1.0, 39.37007874)]
    [InlineData(0.254, 10.0)]
    public void Metres_convert_to_inches(double metres, double inches) =>
        Tolerance.Within(inches, Distance.FromMetres(metres).Inches, 1e-6);

    [Fact]
    public void Twenty_feet_is_6_096_metres()
    {
        // Exact by definition of the international foot.
        Tolerance.Within(6.096, Distance.FromFeet(20).Metres, 1e-12);
    }

    [Fact]
    public void Power_and_focal_length_are_reciprocal()
    {
        // F = 1/f (definition of the dioptre).
        Assert.Equal(0.25, Power.FromDioptres(4).FocalLength.Metres, 12);
        Assert.Equal(10.0, Power.FromFocalLength(Distance.FromCentimetres(10)).Dioptres, 12);
    }

    [Theory]
    // Methods §2: M = Feq × d_ref; F/4 re 25 cm and F/2.5 re 40 cm (Bailey 2004 notes). CV-14: +12 D → 3× re 25 cm, 4.8× re 40 cm.
    [InlineData(12, 25, 3.0)]
    [InlineData(12, 40, 4.8)]
    public void Magnification_is_power_times_the_reference_distance(double dioptres, double referenceCm, double times) =>
        Tolerance.Within(times, Power.FromDioptres(dioptres).MagnificationRelativeTo(Distance.FromCentimetres(referenceCm)), 1e-9);

    [Fact]
    public void Reserve_defaults_are_1_2_and_3_to_1_with_their_log_units()
    {
        // Methods §2.3: spot 1:1, fluent 2:1 (+0.30), sustained 3:1 (+0.48) (Cheong et al. 2002; ABDO CPD article).
        Assert.Equal(1.0, AcuityReserve.Spot.Ratio);
        Assert.Equal(2.0, AcuityReserve.Fluent.Ratio);
        Assert.Equal(3.0, AcuityReserve.Sustained.Ratio);
        Tolerance.Within(0.30, AcuityReserve.Fluent.LogUnits, 0.005);
        Tolerance.Within(0.48, AcuityReserve.Sustained.LogUnits, 0.005);
    }

    [Fact]
    public void Non_finite_values_are_refused_with_a_message()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Power.FromDioptres(double.NaN));
        Assert.Contains("finite", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => PrintSize.FromM(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => Distance.FromMetres(double.PositiveInfinity));
    }

    [Fact]
    public void Formatting_uses_the_given_culture()
    {
        Assert.Equal("+4.00 D", Power.FromDioptres(4).ToString(null, CultureInfo.InvariantCulture));
        Assert.Equal("+4,00 D", Power.FromDioptres(4).ToString(null, CultureInfo.GetCultureInfo("de-DE")));
        Assert.Equal("25.0 cm", Distance.FromCentimetres(25).ToString());
    }

    [Fact]
    public void A_power_shows_its_published_rounding_whatever_the_order_of_the_arithmetic()
    {
        // Bailey's example (methods §2.2): 4M read at 32 cm, target 0.8M, no reserve → F_eq = 15.625 D, shown 15.63 D
        // (published). The method's floating-point result lies a hair either side of 15.625; it must show as 15.63 D.
        var estimate = LowVisionAid.Optics.Requirement.NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(32), PrintSize.FromM(0.8), AcuityReserve.Spot);
        Assert.Equal("+15.63 D", estimate.EquivalentPower.ToString());
        Assert.Equal("+15.63 D", Power.FromDioptres(15.624999999999996).ToString());
        Assert.Equal("0.00 D", Power.FromDioptres(-0.001).ToString());
    }
}
