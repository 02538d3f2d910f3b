using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class NearAcuityMethodTests
{
    [Fact]
    public void Four_M_at_40_cm_for_1M_with_2_to_1_reserve_needs_20_D_at_5_cm()
    {
        // CV-08 (derived; Bailey / Lovie-Kitchin near method, methods §2.2): EVD 5.0 cm, Feq 20 D. Exact (±1e-9).
        var estimate = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.Fluent);

        Tolerance.Within(20.0, estimate.EquivalentPower.Dioptres, 1e-9);
        Tolerance.Within(5.0, estimate.EquivalentViewingDistance.Centimetres, 1e-9);
        Assert.Equal(PowerMethod.NearAcuity, estimate.Method);
    }

    [Theory]
    // CV-11: ABDO CPD article: threshold N12 read at 25 cm, target N6 → spot (1:1) 2×, sustained (3:1) 6× relative
    // to the test distance; at 25 cm 8 D and 24 D (D values derived). Exact (±1e-9).
    [InlineData(1.0, 2.0, 8.0)]
    [InlineData(3.0, 6.0, 24.0)]
    public void Abdo_example_N12_at_25_cm_for_N6(double reserve, double times, double dioptres)
    {
        var estimate = NearAcuityMethod.Estimate(
            PrintSize.FromN(12, XHeightRatio.Conventional), Distance.FromCentimetres(25),
            PrintSize.FromN(6, XHeightRatio.Conventional), AcuityReserve.FromRatio(reserve));

        Tolerance.Within(times, estimate.Magnification, 1e-9);
        Tolerance.Within(25.0, estimate.ReferenceDistance.Centimetres, 1e-9);
        Tolerance.Within(dioptres, estimate.EquivalentPower.Dioptres, 1e-9);
    }

    [Fact]
    public void Bailey_example_4M_at_32_cm_for_0_8M_gives_an_EVD_of_6_4_cm()
    {
        // Bailey, "Prescribing magnification" (methods §2.2): 4M at 32 cm, target 0.8M → 5× closer, EVD ≈ 6.3 cm
        // (6.4 cm exactly), about a +20 D lens. Tolerance ±0.1 cm (clinical rule), ±0.5 D.
        var estimate = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(32), PrintSize.FromM(0.8), AcuityReserve.Spot);

        Tolerance.Within(6.4, estimate.EquivalentViewingDistance.Centimetres, 0.1);
        Tolerance.Within(5.0, estimate.Magnification, 1e-9);
        // Feq = 1 / 0.064 m = 15.6 D (derived); the +20 D options Bailey names give an EVD of 5 cm, within the 6.4 cm needed.
        Tolerance.Within(15.6, estimate.EquivalentPower.Dioptres, 0.1);
    }

    [Fact]
    public void Siemsen_example_2M_at_40_cm_for_1M_needs_5_D_at_20_cm()
    {
        // Siemsen 2012 (Primary Care Optometry News): reads 2M with +2.50 at 40 cm; for 1M double to +5.00 D at 20 cm.
        // Tolerance ±0.1 D, ±0.1 cm (clinical rule).
        var estimate = NearAcuityMethod.Estimate(PrintSize.FromM(2), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.Spot);

        Tolerance.Within(5.0, estimate.EquivalentPower.Dioptres, 0.1);
        Tolerance.Within(20.0, estimate.EquivalentViewingDistance.Centimetres, 0.1);
    }

    [Fact]
    public void Rebasing_the_reference_changes_the_magnification_but_not_the_power()
    {
        // Methods §2: M = Feq × d_ref; 20 D is 8× re 40 cm and 5× re 25 cm (derived). Exact (±1e-9).
        var atTest = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.Fluent);
        var at25 = atTest.WithReference(Distance.FromCentimetres(25));

        Tolerance.Within(8.0, atTest.Magnification, 1e-9);
        Tolerance.Within(5.0, at25.Magnification, 1e-9);
        Assert.Equal(atTest.EquivalentPower, at25.EquivalentPower);
        Assert.Equal("Magnification is stated relative to 25 cm (M = Feq × 25 cm).", at25.ReferenceNote);
    }

    [Fact]
    public void A_zero_test_distance_is_refused_with_an_example_to_enter()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() =>
            NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.Zero, PrintSize.FromM(1), AcuityReserve.Fluent));

        Assert.StartsWith("Enter a test distance greater than zero, such as 40 cm.", error.Message, StringComparison.Ordinal);
        Assert.Equal("testDistance", error.ParamName);
    }

    [Fact]
    public void A_negative_reference_distance_is_refused_with_an_example_to_enter()
    {
        var estimate = NearAcuityMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1), AcuityReserve.Fluent);

        var error = Assert.Throws<ArgumentOutOfRangeException>(() => estimate.WithReference(Distance.FromCentimetres(-25)));

        Assert.StartsWith("Enter a reference distance greater than zero, such as 25 cm or the test distance.", error.Message, StringComparison.Ordinal);
    }
}
