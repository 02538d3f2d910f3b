using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class CriticalPrintSizeMethodTests
{
    [Fact]
    public void Critical_print_size_4M_at_40_cm_for_1M_needs_10_D_and_no_second_reserve()
    {
        // CV-12 (derived from the MNREAD CPS definition, methods §2.5): EVD 10 cm, Feq 10 D. Exact (±1e-9).
        var estimate = CriticalPrintSizeMethod.Estimate(PrintSize.FromM(4), Distance.FromCentimetres(40), PrintSize.FromM(1));

        Tolerance.Within(10.0, estimate.EquivalentPower.Dioptres, 1e-9);
        Tolerance.Within(10.0, estimate.EquivalentViewingDistance.Centimetres, 1e-9);
        Tolerance.Within(4.0, estimate.Magnification, 1e-9);
        Assert.Null(estimate.Reserve);
        Assert.Equal(PowerMethod.CriticalPrintSize, estimate.Method);
        Assert.Contains(estimate.Assumptions, a => a.Contains("no extra acuity reserve", StringComparison.Ordinal));
    }

    [Fact]
    public void A_missing_critical_print_size_is_refused_with_an_example()
    {
        var error = Assert.Throws<ArgumentOutOfRangeException>(() =>
            CriticalPrintSizeMethod.Estimate(default(PrintSize), Distance.FromCentimetres(40), PrintSize.FromM(1)));

        Assert.StartsWith("Enter the critical print size as a print size greater than zero, such as 1.0M.", error.Message, StringComparison.Ordinal);
    }
}
