using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class KestenbaumRuleTests
{
    [Theory]
    // CV-06: Kestenbaum and Sturman 1956 (NBEO-style items): 20/200 → +10 D; 6/24 → +4 D; 20/400 → +20 D. Exact (±1e-9).
    [InlineData(20, 200, 10.0)]
    [InlineData(6, 24, 4.0)]
    [InlineData(20, 400, 20.0)]
    public void Classic_rule_gives_the_reciprocal_of_the_decimal_acuity(double numerator, double denominator, double dioptres)
    {
        var estimate = KestenbaumRule.Classic(Acuity.FromSnellen(numerator, denominator));

        Tolerance.Within(dioptres, estimate.EquivalentPower.Dioptres, 1e-9);
        Assert.Equal(PowerMethod.KestenbaumClassic, estimate.Method);
    }

    [Fact]
    public void Classic_rule_for_20_200_puts_1M_at_threshold_with_no_reserve_and_states_it()
    {
        // Methods §2.1 (derived): the Kestenbaum add puts 1M exactly at threshold, no acuity reserve.
        var estimate = KestenbaumRule.Classic(Acuity.FromSnellen(20, 200));

        Assert.Equal(1.0, estimate.TargetPrint.M);
        Assert.Equal(1.0, estimate.Reserve!.Value.Ratio);
        // At the 10 cm EVD the 50′ threshold letter is 1M: M = d × MAR = 0.10 × 10 (derived, methods §2.1). ±1e-9.
        Tolerance.Within(1.0, Acuity.FromSnellen(20, 200).ThresholdPrintAt(estimate.EquivalentViewingDistance).M, 1e-9);
        Assert.Contains(estimate.Assumptions, a => a.Contains("1M", StringComparison.Ordinal) && a.Contains("no acuity reserve", StringComparison.Ordinal));
        Assert.Contains(estimate.Assumptions, a => a.Contains("central scotoma", StringComparison.Ordinal));
    }

    [Fact]
    public void Classic_rule_states_magnification_relative_to_25_cm()
    {
        // Methods §2: M = Feq × d_ref; 10 D re 25 cm = 2.5× (derived, Bailey 2004 notes). Exact (±1e-9).
        var estimate = KestenbaumRule.Classic(Acuity.FromSnellen(6, 60));

        Tolerance.Within(0.25, estimate.ReferenceDistance.Metres, 1e-12);
        Tolerance.Within(2.5, estimate.Magnification, 1e-9);
        Tolerance.Within(4.0, estimate.MagnificationRelativeTo(Distance.FromCentimetres(40)), 1e-9);
        Assert.Equal("Magnification is stated relative to 25 cm (M = Feq × 25 cm).", estimate.ReferenceNote);
    }

    [Fact]
    public void General_form_for_6_60_target_1M_and_2_to_1_reserve_is_20_D_at_5_cm()
    {
        // CV-07 (derived from Feq = R / (V_dec × M_t), methods §2.1): 6/60, 1M, 2:1 → 20 D, EVD 5 cm. Exact (±1e-9).
        var estimate = KestenbaumRule.WithReserve(Acuity.FromSnellen(6, 60), PrintSize.FromM(1), AcuityReserve.Fluent);

        Tolerance.Within(20.0, estimate.EquivalentPower.Dioptres, 1e-9);
        Tolerance.Within(5.0, estimate.EquivalentViewingDistance.Centimetres, 1e-9);
        Assert.Equal(PowerMethod.KestenbaumWithReserve, estimate.Method);
        Assert.Contains(estimate.Assumptions, a => a.Contains("2:1", StringComparison.Ordinal));
    }

    [Fact]
    public void General_form_refuses_a_missing_target_and_says_what_to_enter()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() =>
            KestenbaumRule.WithReserve(Acuity.FromSnellen(6, 60), default, AcuityReserve.Fluent));

        Assert.StartsWith("Enter the target print size as a print size greater than zero, such as 1.0M.", error.Message, StringComparison.Ordinal);
    }
}
