using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

public class EstimateReconciliationTests
{
    private static readonly Distance At40Cm = Distance.FromCentimetres(40);

    [Fact]
    public void Kestenbaum_10_D_and_near_method_20_D_differ_by_0_3_log_units_and_are_flagged()
    {
        // CV-06 (6/60 → 10 D) against CV-08 (4M at 40 cm, 1M, 2:1 → 20 D): log10(2) = 0.301 > 0.2, the
        // common-practice flag threshold (methods §2.6). Tolerance ±0.001 log units.
        var kestenbaum = KestenbaumRule.Classic(Acuity.FromSnellen(6, 60));
        var near = NearAcuityMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1), AcuityReserve.Fluent);

        var comparison = EstimateReconciliation.Compare([kestenbaum, near]);

        Assert.True(comparison.HasDisagreement);
        var flagged = Assert.Single(comparison.Disagreements);
        Assert.Same(kestenbaum, flagged.Lower);
        Assert.Same(near, flagged.Higher);
        Tolerance.Within(0.301, flagged.DifferenceLogUnits, 0.001);
        Tolerance.Within(2.0, flagged.PowerRatio, 1e-9);
        Assert.Contains(flagged.PossibleReasons, r => r.Contains("Distance acuity often under-estimates", StringComparison.Ordinal));
        Assert.Contains(flagged.PossibleReasons, r => r.Contains("different acuity reserves (1:1 and 2:1)", StringComparison.Ordinal));
        Assert.Contains(flagged.PossibleReasons, r => r.Contains("not focused for", StringComparison.Ordinal));
    }

    [Fact]
    public void Estimates_within_0_2_log_units_are_shown_but_not_flagged()
    {
        // CV-12 (CPS 4M at 40 cm → 10 D), CV-06 (20/200 → 10 D) and near 5M at 40 cm 1:1 for 1M → 12.5 D (derived): no pair flagged.
        var estimates = new[]
        {
            CriticalPrintSizeMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1)),
            KestenbaumRule.Classic(Acuity.FromSnellen(20, 200)),
            NearAcuityMethod.Estimate(PrintSize.FromM(5), At40Cm, PrintSize.FromM(1), AcuityReserve.Spot),
        };

        var comparison = EstimateReconciliation.Compare(estimates);

        Assert.False(comparison.HasDisagreement);
        Assert.Equal(3, comparison.Estimates.Length);
        // 12.5 D against 10 D: log10(1.25) = 0.097 log units (derived). Tolerance ±0.001.
        Tolerance.Within(0.097, comparison.SpreadLogUnits, 0.001);
    }

    [Fact]
    public void A_gap_of_exactly_0_2_log_units_is_not_flagged_and_just_over_it_is()
    {
        // The flag is "more than 0.2 log units" (methods §2.6). 10 D against 10 × 10^0.2 D is exactly 0.2.
        var low = NearAcuityMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1), AcuityReserve.Spot);
        var atLimit = NearAcuityMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1), AcuityReserve.FromRatio(Math.Pow(10, 0.2)));
        var beyond = NearAcuityMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1), AcuityReserve.FromRatio(Math.Pow(10, 0.201)));

        Assert.False(EstimateReconciliation.Compare([low, atLimit]).HasDisagreement);
        Assert.True(EstimateReconciliation.Compare([low, beyond]).HasDisagreement);
    }

    [Fact]
    public void A_reading_curve_gap_names_the_fixed_reserve_as_a_possible_reason()
    {
        // CPS 4M at 40 cm (10 D) against near 4M at 40 cm with 3:1 (30 D): log10(3) = 0.477 (derived).
        var cps = CriticalPrintSizeMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1));
        var near = NearAcuityMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1), AcuityReserve.Sustained);

        var flagged = Assert.Single(EstimateReconciliation.Compare([near, cps]).Disagreements);

        Assert.Same(cps, flagged.Lower);
        Tolerance.Within(0.477, flagged.DifferenceLogUnits, 0.001);
        Assert.Contains(flagged.PossibleReasons, r => r.Contains("Latham and Tabrett 2012", StringComparison.Ordinal));
        Assert.DoesNotContain(flagged.PossibleReasons, r => r.Contains("Distance acuity", StringComparison.Ordinal));
    }

    [Fact]
    public void Every_flagged_pair_is_listed_once()
    {
        // 10 D, 20 D, 40 D: each pair is ≥ 0.3 log units apart (derived), so three pairs are flagged.
        var estimates = new[] { 1.0, 2.0, 4.0 }.Select(r =>
            NearAcuityMethod.Estimate(PrintSize.FromM(4), At40Cm, PrintSize.FromM(1), AcuityReserve.FromRatio(r)));

        var comparison = EstimateReconciliation.Compare(estimates);

        Assert.Equal(3, comparison.Disagreements.Length);
        Tolerance.Within(Math.Log10(4), comparison.SpreadLogUnits, 1e-9);
    }
}
