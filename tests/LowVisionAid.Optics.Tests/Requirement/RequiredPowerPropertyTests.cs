using CsCheck;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Requirement;

/// <summary>Laws that follow from the formulas of methods §2 (derived), checked over wide input ranges.</summary>
public class RequiredPowerPropertyTests
{
    // CsCheck_Iter (10,000 in the full run, scripts/test.sh); CsCheck's default of 100 in the fast loop.
    private static long Many => Check.Iter;

    private static readonly Gen<double> ThresholdM = Gen.Double[0.4, 20.0];
    private static readonly Gen<double> TargetM = Gen.Double[0.4, 10.0];
    private static readonly Gen<double> TestCm = Gen.Double[5.0, 100.0];
    private static readonly Gen<double> Reserve = Gen.Double[1.0, 10.0];
    private static readonly Gen<double> LogMar = Gen.Double[-0.3, 2.0];

    [Fact]
    public void Near_method_power_is_proportional_to_the_reserve() =>
        // Feq = (M_th × R) / (d × M_t): linear in R (derived). Relative tolerance 1e-12.
        Gen.Select(ThresholdM, TestCm, TargetM, Reserve).Sample((th, cm, target, r) =>
        {
            var withReserve = NearAcuityMethod.Estimate(PrintSize.FromM(th), Distance.FromCentimetres(cm), PrintSize.FromM(target), AcuityReserve.FromRatio(r));
            var atThreshold = NearAcuityMethod.Estimate(PrintSize.FromM(th), Distance.FromCentimetres(cm), PrintSize.FromM(target), AcuityReserve.Spot);
            Tolerance.WithinRelative(r, withReserve.EquivalentPower / atThreshold.EquivalentPower, 1e-12);
        }, iter: Many);

    [Fact]
    public void Near_method_power_is_inversely_proportional_to_the_target_size() =>
        // Feq × M_t is constant for fixed threshold, distance and reserve (derived). Relative tolerance 1e-12.
        Gen.Select(ThresholdM, TestCm, TargetM, Reserve).Sample((th, cm, target, r) =>
        {
            var a = NearAcuityMethod.Estimate(PrintSize.FromM(th), Distance.FromCentimetres(cm), PrintSize.FromM(target), AcuityReserve.FromRatio(r));
            var b = NearAcuityMethod.Estimate(PrintSize.FromM(th), Distance.FromCentimetres(cm), PrintSize.FromM(target * 2), AcuityReserve.FromRatio(r));
            Tolerance.WithinRelative(2.0, a.EquivalentPower / b.EquivalentPower, 1e-12);
        }, iter: Many);

    [Fact]
    public void Equivalent_viewing_distance_and_power_are_reciprocal() =>
        // EVD = 1 / Feq (Bailey 2004 notes). Relative tolerance 1e-12.
        Gen.Select(ThresholdM, TestCm, TargetM, Reserve).Sample((th, cm, target, r) =>
        {
            var estimate = NearAcuityMethod.Estimate(PrintSize.FromM(th), Distance.FromCentimetres(cm), PrintSize.FromM(target), AcuityReserve.FromRatio(r));
            Tolerance.WithinRelative(1.0, estimate.EquivalentViewingDistance.Metres * estimate.EquivalentPower.Dioptres, 1e-12);
            // EVD_req = d × M_t / (M_th × R) (methods §2.2).
            Tolerance.WithinRelative(cm / 100.0 * target / (th * r), estimate.EquivalentViewingDistance.Metres, 1e-12);
        }, iter: Many);

    [Fact]
    public void Kestenbaum_general_form_with_1_to_1_and_1M_equals_the_classic_rule() =>
        // Feq = R / (V_dec × M_t) with R = 1, M_t = 1 is 1 / V_dec (methods §2.1, derived). Relative tolerance 1e-12.
        LogMar.Sample(logMar =>
        {
            var acuity = Acuity.FromLogMar(logMar);
            var general = KestenbaumRule.WithReserve(acuity, PrintSize.FromM(1), AcuityReserve.Spot);
            // Both equal 1 / V_dec = 10^logMAR (Kestenbaum and Sturman 1956).
            var expected = Math.Pow(10, logMar);
            Tolerance.WithinRelative(expected, KestenbaumRule.Classic(acuity).EquivalentPower.Dioptres, 1e-12);
            Tolerance.WithinRelative(expected, general.EquivalentPower.Dioptres, 1e-12);
        }, iter: Many);

    [Fact]
    public void Kestenbaum_matches_the_near_method_when_near_threshold_equals_the_distance_acuity() =>
        // If the near threshold M_th = d × MAR (Colenbrander), Feq_near = MAR × R / M_t = Feq_Kestenbaum (derived).
        Gen.Select(LogMar, TestCm, TargetM, Reserve).Sample((logMar, cm, target, r) =>
        {
            var acuity = Acuity.FromLogMar(logMar);
            var distance = Distance.FromCentimetres(cm);
            var kestenbaum = KestenbaumRule.WithReserve(acuity, PrintSize.FromM(target), AcuityReserve.FromRatio(r));
            var threshold = PrintSize.FromM(cm / 100.0 * Math.Pow(10, logMar));
            var near = NearAcuityMethod.Estimate(threshold, distance, PrintSize.FromM(target), AcuityReserve.FromRatio(r));
            // Both equal MAR × R / M_t = 10^logMAR × R / M_t (methods §2.1 and §2.2, derived).
            var expected = Math.Pow(10, logMar) * r / target;
            Tolerance.WithinRelative(expected, kestenbaum.EquivalentPower.Dioptres, 1e-9);
            Tolerance.WithinRelative(expected, near.EquivalentPower.Dioptres, 1e-9);
        }, iter: Many);

    [Fact]
    public void A_critical_print_size_of_R_times_threshold_gives_the_near_method_with_reserve_R() =>
        // Feq_CPS = M_CPS / (d × M_t); with M_CPS = R × M_th it equals (M_th × R)/(d × M_t) (derived). Rel. tol. 1e-12.
        Gen.Select(ThresholdM, TestCm, TargetM, Reserve).Sample((th, cm, target, r) =>
        {
            var distance = Distance.FromCentimetres(cm);
            var cps = CriticalPrintSizeMethod.Estimate(PrintSize.FromM(th * r), distance, PrintSize.FromM(target));
            var near = NearAcuityMethod.Estimate(PrintSize.FromM(th), distance, PrintSize.FromM(target), AcuityReserve.FromRatio(r));
            var expected = th * r / (cm / 100.0 * target);
            Tolerance.WithinRelative(expected, cps.EquivalentPower.Dioptres, 1e-12);
            Tolerance.WithinRelative(expected, near.EquivalentPower.Dioptres, 1e-12);
        }, iter: Many);

    [Fact]
    public void Magnification_is_power_times_the_reference_distance() =>
        // M = Feq × d_ref (Bailey 2004 notes). Relative tolerance 1e-12.
        Gen.Select(ThresholdM, TestCm, Gen.Double[10.0, 100.0]).Sample((th, cm, referenceCm) =>
        {
            var estimate = NearAcuityMethod.Estimate(PrintSize.FromM(th), Distance.FromCentimetres(cm), PrintSize.FromM(1), AcuityReserve.Fluent)
                .WithReference(Distance.FromCentimetres(referenceCm));
            Tolerance.WithinRelative(estimate.EquivalentPower.Dioptres * referenceCm / 100.0, estimate.Magnification, 1e-12);
        }, iter: Many);

    [Fact]
    public void A_pair_is_flagged_exactly_when_its_powers_differ_by_more_than_0_2_log_units_in_either_order() =>
        // Methods §2.6 (common practice threshold 0.2 log units). Ratios within 1e-6 of the limit are skipped.
        Gen.Select(ThresholdM, Reserve, Reserve).Sample((th, r1, r2) =>
        {
            var distance = Distance.FromCentimetres(40);
            var a = NearAcuityMethod.Estimate(PrintSize.FromM(th), distance, PrintSize.FromM(1), AcuityReserve.FromRatio(r1));
            var b = NearAcuityMethod.Estimate(PrintSize.FromM(th), distance, PrintSize.FromM(1), AcuityReserve.FromRatio(r2));
            var gap = Math.Abs(Math.Log10(r1 / r2));
            if (Math.Abs(gap - 0.2) < 1e-6)
            {
                return;
            }

            Assert.Equal(gap > 0.2, EstimateReconciliation.Compare([a, b]).HasDisagreement);
            Assert.Equal(gap > 0.2, EstimateReconciliation.Compare([b, a]).HasDisagreement);
        }, iter: Many);
}
