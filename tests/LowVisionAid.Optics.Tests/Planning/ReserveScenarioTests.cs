using System.Globalization;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Planning;

/// <summary>
/// Clinical case notes for the acuity reserve, the estimate chosen and the cautions. Every client is invented; each
/// expected value names its source, and powers are derived by hand from the cited formulas (methods §2.1, §2.2, §2.5).
/// </summary>
public class ReserveScenarioTests
{
    private static readonly Acuity SixSixty = Acuity.FromSnellen(6, 60);

    private static PlanRequest Case(ReadingTask task, double targetM, double workingCm, EstimateInputs estimates, Acuity? distance = null) => new()
    {
        Task = task,
        TargetPrint = PrintSize.FromM(targetM),
        PreferredDistance = Distance.FromCentimetres(workingCm),
        DistanceAcuity = distance,
        Estimates = estimates,
        Constraints = new ClientConstraints { AgeYears = 82, UsableAccommodation = Power.Zero },
    };

    [Fact]
    public void Older_reader_with_macular_degeneration_at_6_60_wanting_a_book_gets_2_to_1_and_no_disagreement_caution()
    {
        // Case: Mrs A, 82, macular degeneration. Distance 6/60 both eyes; reads 4M at 40 cm with her +2.50 add.
        // Goal: a paperback, 1M, at 25 cm.
        var plan = Planner.Build(Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(40),
        }, SixSixty));

        // Reserve: 2:1 by default for fluent reading (Cheong, Lovie-Kitchin and Bowers 2002; Latham and Tabrett 2012).
        var reserve = plan.Reserve!;
        Assert.Equal(AcuityReserve.Fluent, reserve.Reserve);
        Assert.Equal(ReserveSource.TaskDefault, reserve.Source);
        Assert.Contains("Cheong, Lovie-Kitchin and Bowers 2002", reserve.Why, StringComparison.Ordinal);
        // Estimates (derived): Kestenbaum with reserve 2 / (0.1 × 1) = 20 D; near acuity 4 × 2 / (0.40 × 1) = 20 D.
        Assert.All(plan.Estimates!.Estimates, e => Tolerance.Within(20.0, e.EquivalentPower.Dioptres, 1e-9));
        // The near-acuity estimate is chosen over distance acuity (Cheong et al. 2002; methods §2.6).
        Assert.Equal(PowerMethod.NearAcuity, plan.RequiredPowerFrom);
        Tolerance.Within(20.0, plan.RequiredPower.Dioptres, 1e-9);
        // Like for like they agree: no "estimates disagree" caution (methods §2.6 as corrected 2026-12-03).
        Assert.False(plan.Estimates.HasDisagreement);
        Assert.DoesNotContain(Caution.EstimatesDisagree, plan.Cautions);
        // Kestenbaum at threshold, 1/0.1 = +10 D (Kestenbaum and Sturman 1956), is shown for reference only.
        var reference = Assert.Single(plan.Estimates.ForReference);
        Assert.Equal(PowerMethod.KestenbaumClassic, reference.Method);
        Tolerance.Within(10.0, reference.EquivalentPower.Dioptres, 1e-9);
    }

    [Fact]
    public void Spot_reading_of_medication_labels_uses_threshold_acuity_at_1_to_1_and_never_the_critical_print_size()
    {
        // Case: Mr B, 77, reads 4M at 25 cm (threshold) and has a reading curve with its critical print size at 8M at
        // 25 cm. Goal: his medication labels, 0.8M, glanced at for a few seconds.
        var plan = Planner.Build(Case(ReadingTask.SpotReading, 0.8, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(25),
            CriticalPrintSize = PrintSize.FromM(8),
            ReadingTestDistance = Distance.FromCentimetres(25),
        }));

        // Spot tasks: 1:1 on threshold acuity (common practice; methods §2.3, §11).
        Assert.Equal(AcuityReserve.Spot, plan.Reserve!.Reserve);
        Assert.Equal(ReserveLevel.Spot, plan.Reserve.Level);
        // Near acuity at 1:1 (derived, methods §2.2): 4 × 1 / (0.25 × 0.8) = +20 D, not the reading curve's
        // 8 / (0.25 × 0.8) = +40 D: the critical print size is a fluent-reading measure (methods §11).
        Assert.Equal(PowerMethod.NearAcuity, plan.RequiredPowerFrom);
        Tolerance.Within(20.0, plan.RequiredPower.Dioptres, 1e-9);
        Assert.DoesNotContain(plan.Estimates!.Estimates, e => e.Method == PowerMethod.CriticalPrintSize);
        Assert.Null(plan.ReadingCurve);
        Assert.DoesNotContain(Caution.EstimatesDisagree, plan.Cautions);
    }

    [Fact]
    public void A_reader_of_long_novels_gets_3_to_1_only_when_the_practitioner_chooses_it()
    {
        // Case: Ms C, 68, reads novels for hours at a time. 6/60; reads 4M at 40 cm. The practitioner chooses the
        // long-reading reserve. Goal: 1M at 25 cm.
        var plan = Planner.Build(Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(40),
            ReserveChoice = ReserveLevel.Sustained,
        }, SixSixty));

        // 3:1 for long or high-speed reading (Whittaker and Lovie-Kitchin 1993), as an explicit choice.
        Assert.Equal(AcuityReserve.Sustained, plan.Reserve!.Reserve);
        Assert.Equal(ReserveSource.Chosen, plan.Reserve.Source);
        Assert.Contains("Whittaker and Lovie-Kitchin 1993", plan.Reserve.Why, StringComparison.Ordinal);
        // Derived: near acuity 4 × 3 / (0.40 × 1) = +30 D; Kestenbaum 3 / (0.1 × 1) = +30 D: they agree.
        Tolerance.Within(30.0, plan.RequiredPower.Dioptres, 1e-9);
        Assert.All(plan.Estimates!.Estimates, e => Tolerance.Within(30.0, e.EquivalentPower.Dioptres, 1e-9));
        Assert.DoesNotContain(Caution.EstimatesDisagree, plan.Cautions);

        // Without the choice the same reader gets 2:1 and +20 D (Cheong et al. 2002; Latham and Tabrett 2012).
        var usual = Planner.Build(Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(40),
        }, SixSixty));
        Tolerance.Within(20.0, usual.RequiredPower.Dioptres, 1e-9);
    }

    [Fact]
    public void Like_for_like_estimates_that_truly_disagree_raise_the_caution_with_each_reason_listed_once()
    {
        // Case: Mr D, 74, 6/60 on the chart but reads only 8M at 40 cm (a central scotoma breaks up words); his reading
        // curve gives a critical print size of 6M at 40 cm. Goal: letters, 1M, at 25 cm.
        var plan = Planner.Build(Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(8),
            NearTestDistance = Distance.FromCentimetres(40),
            CriticalPrintSize = PrintSize.FromM(6),
            ReadingTestDistance = Distance.FromCentimetres(40),
        }, SixSixty));

        // Derived at 2:1: Kestenbaum 20 D, near acuity 8 × 2 / 0.40 = 40 D, reading curve 6 / 0.40 = 15 D.
        // Flagged pairs (> 0.2 log units, methods §2.6): 20 vs 40 (0.30) and 15 vs 40 (0.43); 15 vs 20 (0.12) is not.
        var comparison = plan.Estimates!;
        Assert.Equal(2, comparison.Disagreements.Length);
        Assert.Contains(Caution.EstimatesDisagree, plan.Cautions);
        // The threshold figure stays outside the comparison (methods §2.6): it is in no flagged pair.
        Assert.DoesNotContain(comparison.Disagreements, d => d.Lower.Method == PowerMethod.KestenbaumClassic || d.Higher.Method == PowerMethod.KestenbaumClassic);
        // The reasons are listed once for the plan, not once per pair (issue 10, item 4).
        var reasons = comparison.FormatPossibleReasons(CultureInfo.InvariantCulture);
        Assert.Equal(reasons.Length, reasons.Distinct(StringComparer.Ordinal).Count());
        Assert.Single(reasons, r => r.StartsWith("Reading can be much harder", StringComparison.Ordinal));
        Assert.Single(reasons, r => r.Contains("not focused for", StringComparison.Ordinal));
        // Distance acuity under-estimates the near need here (Cheong, Lovie-Kitchin and Bowers 2002).
        Assert.Contains(reasons, r => r.Contains("Cheong, Lovie-Kitchin and Bowers 2002", StringComparison.Ordinal));
        // The reading curve is preferred (methods §2.5): 15 D.
        Assert.Equal(PowerMethod.CriticalPrintSize, plan.RequiredPowerFrom);
        Tolerance.Within(15.0, plan.RequiredPower.Dioptres, 1e-9);
    }

    [Fact]
    public void The_clinic_fluent_reserve_setting_is_the_one_reading_uses()
    {
        // Case: a clinic that sets its fluent reserve to 2.5:1. Mrs E reads 4M at 40 cm and wants newsprint, 1M.
        // Derived (methods §2.2): 4 × 2.5 / (0.40 × 1) = +25 D.
        var request = Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(40),
        }) with { Settings = PlanSettings.Default with { Reserves = ReserveRatios.Default with { Fluent = AcuityReserve.FromRatio(2.5) } } };
        var plan = Planner.Build(request);
        Tolerance.Within(25.0, plan.RequiredPower.Dioptres, 1e-9);
        Assert.Equal(ReserveLevel.Fluent, plan.Reserve!.Level);
    }

    [Theory]
    // Common practice: a page is not read 2 mm from the eye, nor 25 m away; the message says what to type.
    [InlineData(0.2)]
    [InlineData(2500)]
    public void A_reading_distance_outside_the_sane_range_is_refused_with_what_to_type(double workingCm)
    {
        var problems = Planner.Check(Case(ReadingTask.SustainedReading, 1.0, workingCm, EstimateInputs.None, SixSixty));
        Assert.Contains(problems, p => p.StartsWith("For sustained reading, enter a working distance between 5 cm and 1 m, e.g. 40 cm", StringComparison.Ordinal));
    }

    [Fact]
    public void A_6_60_reader_depth_of_focus_uses_a_blur_tolerance_that_grows_as_acuity_falls()
    {
        // Rule (from memory, growth after Legge, Mullen, Woo and Campbell 1987): ΔF = 0.59 D × √MAR, capped at 2.5 D.
        // 6/60 (MAR 10′): 0.59 × √10 = 1.866 D (derived); 6/6 stays at the normal-eye 0.59 D (Atchison, Charman and
        // Woods 1997).
        var plan = Planner.Build(Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(40),
        }, SixSixty));
        Tolerance.Within(1.866, plan.BlurTolerance.Dioptres, 0.001, "ΔF for 6/60");
        Tolerance.Within(0.59, DepthOfFieldRule.BlurToleranceFor(Acuity.FromSnellen(6, 6)).Dioptres, 1e-9, "ΔF for 6/6");
        // The clinician can set a value instead.
        var set = Planner.Build(Case(ReadingTask.SustainedReading, 1.0, 25, new EstimateInputs
        {
            NearThresholdPrint = PrintSize.FromM(4),
            NearTestDistance = Distance.FromCentimetres(40),
        }, SixSixty) with { Settings = PlanSettings.Default with { BlurTolerance = Power.FromDioptres(1.0), BlurToleranceFollowsAcuity = false } });
        Tolerance.Within(1.0, set.BlurTolerance.Dioptres, 1e-9, "ΔF as set");
    }
}
