using System.Collections.Immutable;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Planning;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Options;

public class OptionRulesTests
{
    private const double Rel = 0.005;

    private static PlanRequest Base(ClientConstraints? constraints = null, double required = 10, ReadingTask task = ReadingTask.SustainedReading, ImmutableArray<KitDevice> kit = default) =>
        InventedClinic.SustainedReadingRequest(kit.IsDefault ? [] : kit) with
        {
            RequiredPower = Power.FromDioptres(required),
            Task = task,
            Constraints = constraints ?? InventedClinic.SustainedReadingRequest([]).Constraints,
        };

    private static ClientConstraints Client => InventedClinic.SustainedReadingRequest([]).Constraints;

    private static T Find<T>(PlanResult plan) where T : MagnifierOption => plan.Options.Select(r => r.Option).OfType<T>().Single();

    private static int PositionOf(PlanResult plan, OptionKind kind) => plan.Options.Single(r => r.Option.Kind == kind).Position;

    [Fact]
    public void A_distance_plan_picks_a_6x_Keplerian_for_6_60_to_6_12_at_3_m()
    {
        // Derived: M needed = MAR 10′ / 2′ = 5 → stock 6× → Keplerian (above 4×, methods §3.5).
        // Length with F_o +10: F_e = +60, d = 0.100 + 0.0167 = 11.67 cm. Field 40°/6 = 6.67°.
        // Focus at 3 m: L = −1/3, M = −6: L′ = 36(−1/3)/(1 − (−6)(0.11667)(−1/3)) = −12/0.76667 = −15.652 D;
        // at the eye (e = 10 mm): 15.652/(1 + 0.15652) = 13.53 D. Moving closer: F_eq = 5/3 D, w = 60 cm, 5×.
        var plan = Planner.Build(new PlanRequest
        {
            TargetPrint = PrintSize.FromM(1),
            PreferredDistance = Distance.FromMetres(3),
            Task = ReadingTask.DistanceViewing,
            DistanceAcuity = Acuity.FromSnellen(6, 60),
            GoalDistanceAcuity = Acuity.FromSnellen(6, 12),
        });
        var t = plan.Options.Select(r => r.Option).OfType<DistanceTelescopeOption>().Single(o => !o.SpectacleMounted);
        Tolerance.WithinRelative(5.0, t.MagnificationNeeded, Rel);
        Tolerance.WithinRelative(6.0, t.Magnification, Rel);
        Assert.Equal(TelescopeDesign.Keplerian, t.Design);
        Tolerance.WithinRelative(11.667, t.Length.Centimetres, Rel);
        Tolerance.WithinRelative(6.667, t.RealField.Degrees, Rel);
        Tolerance.WithinRelative(13.53, t.FocusForObject.Dioptres, Rel);
        var closer = Find<MovingCloserOption>(plan);
        Tolerance.WithinRelative(60.0, closer.WorkingDistance.Centimetres, Rel);
        Tolerance.WithinRelative(5.0, closer.RelativeMagnification, Rel);
        Assert.True(closer.MeetsRequiredPower);
        // Sitting closer first where it meets the goal (methods §11; Ryan and Margrain 2006; changed with issue 10, which
        // declares a hand-held telescope above sitting closer wrong). At 60 cm a presbyope needs 1/0.6 = 1.67 D: +1.75 D add.
        Assert.Equal(OptionKind.MovingCloser, plan.Options[0].Option.Kind);
        Tolerance.WithinRelative(1.667, closer.FocusNeeded.Dioptres, Rel);
        Tolerance.Within(1.75, closer.AddNeeded.Dioptres, 1e-9);
        Assert.Equal(7, plan.NotConsidered.Length);
        Assert.Contains(Caution.Driving, plan.Cautions);
        Assert.Contains("walking", t.Summary(CultureInfo.InvariantCulture), StringComparison.Ordinal);
        // The focusing is the telescope's to supply, turned for 3 m; the 13.53 D is what the eye would need with it left
        // set for far (derived above), not an add.
        Assert.Contains("focus it for 3 m (+13.53 D from its far setting)", t.Summary(CultureInfo.InvariantCulture), StringComparison.Ordinal);
        Assert.Equal("Focusing from its far setting", OptionNotes.FocusingLabel(t.Kind));
        Assert.Equal("Field at the viewing distance", OptionNotes.FieldLabel(t.Kind));
        // A hand-held telescope is one eye (methods §11); a spectacle-mounted one stops at 4×, short of the 5× needed.
        Assert.False(t.Binocular.Feasible);
        var mounted = plan.Options.Select(r => r.Option).OfType<DistanceTelescopeOption>().Single(o => o.SpectacleMounted);
        Assert.Equal(OptionKind.SpectacleTelescope, mounted.Kind);
        Assert.False(mounted.IsPractical);
    }

    [Theory]
    [InlineData(OptionKind.DistanceTelescope, "Field at the viewing distance", "Focusing from its far setting")]
    [InlineData(OptionKind.SpectacleTelescope, "Field at the viewing distance", "Focusing from its far setting")]
    [InlineData(OptionKind.NearTelescope, "Field on the page", "Focusing or add needed")]
    [InlineData(OptionKind.HandMagnifier, "Field on the page", "Focusing or add needed")]
    [InlineData(OptionKind.VideoMagnifier, "Field on the page", "Focusing or add needed")]
    public void A_distance_telescope_s_field_is_at_what_is_viewed_and_its_focusing_is_its_own(OptionKind kind, string field, string focusing)
    {
        // Common practice: a distance telescope's field is measured at the object (a television 3 m away), not on a page,
        // and the focusing for a near object is turned on the telescope (methods §3.5), not worn as an add.
        Assert.Equal(field, OptionNotes.FieldLabel(kind));
        Assert.Equal(focusing, OptionNotes.FocusingLabel(kind));
    }

    [Fact]
    public void A_tremor_puts_the_stand_magnifier_above_the_hand_magnifier()
    {
        // Spot reading with one useful eye, so neither the long-reading rule nor binocular geometry decides: the hand lens
        // (eye to page 35 cm) is nearer the preferred 40 cm than the stand (21 cm) until a tremor is entered.
        var steady = Planner.Build(Base(Client with { UsefulEyes = 1 }, task: ReadingTask.SpotReading));
        var shaky = Planner.Build(Base(Client with { UsefulEyes = 1, Tremor = true }, task: ReadingTask.SpotReading));
        Assert.True(PositionOf(steady, OptionKind.HandMagnifier) < PositionOf(steady, OptionKind.StandMagnifier));
        Assert.True(PositionOf(shaky, OptionKind.StandMagnifier) < PositionOf(shaky, OptionKind.HandMagnifier));
        Assert.Contains(new RankingReason(RankingRule.NoSteadyHand, false), shaky.Options.Single(r => r.Option.Kind == OptionKind.HandMagnifier).Reasons);
    }

    [Fact]
    public void With_one_useful_eye_the_high_add_is_for_that_eye_without_prism_and_the_binocular_rule_is_not_used()
    {
        var plan = Planner.Build(Base(Client with { UsefulEyes = 1 }));
        var add = Find<SpectacleAddOption>(plan);
        Assert.True(add.OneEyeOnly);
        Assert.Null(add.Binocular.BaseInPrismEachEye);
        Assert.Equal(0, add.Binocular.ConvergenceDemand);
        Assert.All(plan.Options, r => Assert.DoesNotContain(r.Reasons, x => x.Rule == RankingRule.BothEyes));
    }

    [Fact]
    public void Above_the_binocular_limit_the_high_add_is_fitted_to_one_eye()
    {
        // Methods §3.2: above about +10 to +12 D binocular use usually fails (common practice; +10 D used).
        var plan = Planner.Build(Base(required: 16));
        var add = Find<SpectacleAddOption>(plan);
        Assert.False(add.Binocular.Feasible);
        Assert.Contains("better eye", add.Summary(CultureInfo.InvariantCulture), StringComparison.Ordinal);
        Assert.Contains(new RankingReason(RankingRule.BothEyes, false), plan.Options.Single(r => r.Option.Kind == OptionKind.SpectacleAdd).Reasons);
    }

    [Fact]
    public void An_uncorrected_myope_uses_the_myopia_as_a_built_in_add()
    {
        // Ryan and Margrain 2006 (methods §2.7): −5 D myope, no accommodation, F_eq 5 D → no add, w = 1/5 = 20 cm.
        var plan = Planner.Build(Base(Client with { DistanceRefraction = Power.FromDioptres(-5), AddWorn = null }, required: 5));
        var closer = Find<MovingCloserOption>(plan);
        Assert.True(closer.UsesMyopia);
        Assert.Null(closer.LensPower);
        Assert.True(closer.MeetsRequiredPower);
        Tolerance.WithinRelative(20.0, closer.WorkingDistance.Centimetres, Rel);
    }

    [Fact]
    public void Without_a_measured_amplitude_the_age_gives_half_of_Hofstetter_minimum()
    {
        // Hofstetter 1950 (methods §10.1): age 30 → minimum 15 − 7.5 = 7.5 D; half in reserve → 3.75 D usable (common practice).
        // Spectacle add = 10 − 3.75 = +6.25 D (derived). Exact to 0.25 D steps.
        var plan = Planner.Build(Base(Client with { UsableAccommodation = null, AgeYears = 30 }));
        Tolerance.Within(6.25, Find<SpectacleAddOption>(plan).Add.Dioptres, 1e-9);
    }

    [Fact]
    public void Very_low_contrast_favours_the_video_magnifier_and_says_so()
    {
        // Whittaker and Lovie-Kitchin 1994: thresholds above 25 % (logCS below 0.6) call for a video magnifier.
        var plan = Planner.Build(Base(Client with { LogContrastSensitivity = 0.5 }));
        Assert.Equal(OptionKind.VideoMagnifier, plan.Options[0].Option.Kind);
        Assert.Contains(Caution.VideoOrNonVisual, plan.Cautions);
        Assert.Contains(new RankingReason(RankingRule.ContrastHelp, true), plan.Options[0].Reasons);
    }

    [Fact]
    public void Reduced_contrast_favours_illuminated_kit_devices()
    {
        // logCS 0.9: threshold 12.6 % > 9 % (Whittaker and Lovie-Kitchin 1994): illuminated S-12 passes the contrast rule.
        var plan = Planner.Build(Base(Client with { LogContrastSensitivity = 0.9 }, kit: InventedClinic.TenDevices));
        Assert.Contains(Caution.LightingAssessment, plan.Cautions);
        var s12 = plan.KitDevices.Single(r => r.Option.KitDeviceId == "S-12");
        var h12 = plan.KitDevices.Single(r => r.Option.KitDeviceId == "H-12");
        Assert.Contains(new RankingReason(RankingRule.ContrastHelp, true), s12.Reasons);
        Assert.Contains(new RankingReason(RankingRule.ContrastHelp, false), h12.Reasons);
    }

    [Fact]
    public void For_writing_a_hand_magnifier_does_not_suit_the_task_but_a_near_telescope_at_40_cm_does()
    {
        var plan = Planner.Build(Base(task: ReadingTask.Writing));
        Assert.Contains(new RankingReason(RankingRule.SuitsTask, false), plan.Options.Single(r => r.Option.Kind == OptionKind.HandMagnifier).Reasons);
        Assert.Contains(new RankingReason(RankingRule.SuitsTask, true), plan.Options.Single(r => r.Option.Kind == OptionKind.NearTelescope).Reasons);
    }

    [Fact]
    public void When_the_add_alone_nearly_gives_the_power_no_stand_magnifier_is_designed()
    {
        // F = (3 − 2.5)/(1 − 0.375) = 0.8 D < +1 D (derived from Gullstrand solved for the lens).
        var plan = Planner.Build(Base(required: 3));
        Assert.Contains(plan.NotConsidered, n => n.Kind == OptionKind.StandMagnifier);
    }

    [Fact]
    public void Fewer_than_four_letters_in_view_warns_that_fluent_reading_is_unlikely()
    {
        // Hand lens 40 D, 25 mm (DeviceRanges at +40 D) at 25 cm: y = 0.025/(0.265 × 40) = 2.36 mm → 1.47 letters of 1M < 4.
        var o = Find<HandMagnifierOption>(Planner.Build(Base(required: 40)));
        Tolerance.WithinRelative(1.47, o.CharactersInView!.Value, 0.01);
        Assert.Contains("1 letter in view", o.Summary(CultureInfo.InvariantCulture), StringComparison.Ordinal);
        Assert.Equal(FluencyWarning.FewerThanFour, o.Fluency);
        Assert.NotNull(MagnifierOption.FluencyText(o.Fluency));
    }

    [Fact]
    public void A_request_without_the_required_power_is_refused_with_what_to_enter()
    {
        var error = Assert.Throws<ArgumentException>(() => Planner.Build(Base() with { RequiredPower = null }));
        Assert.Contains("required equivalent power", error.Message, StringComparison.Ordinal);
        Assert.Contains(Planner.Check(Base() with { Task = ReadingTask.DistanceViewing }), m => m.Contains("goal acuity", StringComparison.Ordinal));
    }

    [Fact]
    public void Every_ranking_reason_has_its_own_text()
    {
        var texts = new HashSet<string>(StringComparer.Ordinal);
        foreach (var rule in Enum.GetValues<RankingRule>())
        {
            Assert.True(texts.Add(new RankingReason(rule, true).Text));
            Assert.True(texts.Add(new RankingReason(rule, false).Text));
        }
    }
}
