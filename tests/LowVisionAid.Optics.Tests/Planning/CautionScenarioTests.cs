using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Planning;

/// <summary>
/// Cautions a clinician would expect to read on the plan, and only those: a device caution belongs to a plan when a
/// device it concerns is usable and put forward (the first usable option, and any powered one ranked above the first
/// plain one), not when it is merely listed lower down (common practice). Every client is invented.
/// </summary>
public class CautionScenarioTests
{
    private const double Rel = 0.005;

    private static PlanRequest Reading(Acuity acuity, double targetM, double cm, ClientConstraints constraints) => new()
    {
        DistanceAcuity = acuity,
        TargetPrint = PrintSize.FromM(targetM),
        PreferredDistance = Distance.FromCentimetres(cm),
        Task = ReadingTask.SustainedReading,
        Constraints = constraints,
        Estimates = EstimateInputs.None with { Reserve = AcuityReserve.Fluent },
    };

    [Fact]
    public void An_older_reader_at_6_18_wanting_1M_at_40_cm_gets_no_charging_caution()
    {
        // Mr H. Albescu, 74, early AMD, 6/18, good light, no contrast loss measured; the newspaper (1M) at 40 cm, 2:1
        // (Cheong et al. 2002). Kestenbaum with reserve: 2 × 18/6 = +6 D (derived, methods §2.1). Dickinson (order of
        // trial) and common practice: a plain add or magnifier meets this; a video magnifier may be listed, but far down.
        var plan = Planner.Build(Reading(Acuity.FromSnellen(6, 18), 1, 40, new ClientConstraints { AgeYears = 74, AddWorn = Power.FromDioptres(2.5) }));

        Tolerance.WithinRelative(6, plan.RequiredPower.Dioptres, Rel);
        var first = plan.Options.First(r => r.Option.IsUsable).Option;
        Assert.False(first.IsPowered);
        Assert.Contains(plan.Options, r => r.Option.Kind == OptionKind.VideoMagnifier);
        Assert.DoesNotContain(Caution.ChargeDevices, plan.Cautions);
        Assert.Contains(Caution.StartingPoint, plan.Cautions);
        Assert.Contains(Caution.Referral, plan.Cautions);
    }

    [Fact]
    public void A_client_at_6_120_whose_first_option_is_a_video_magnifier_gets_the_charging_caution()
    {
        // Mrs P. Ruelle, 80, 6/120, logCS 0.5 (threshold above 25 %); letters (1M) at 25 cm, 2:1: Kestenbaum with
        // reserve 2 × 120/6 = +40 D (derived, methods §2.1). Whittaker and Lovie-Kitchin 1994 (methods §2.4, §7.6): with
        // contrast this low a video magnifier comes first.
        var plan = Planner.Build(Reading(Acuity.FromSnellen(6, 120), 1, 25, new ClientConstraints { AgeYears = 80, LogContrastSensitivity = 0.5 }));

        Tolerance.WithinRelative(40, plan.RequiredPower.Dioptres, Rel);
        Assert.Equal(OptionKind.VideoMagnifier, plan.Options[0].Option.Kind);
        Assert.True(plan.Options[0].Option.IsUsable);
        Assert.Contains(Caution.ChargeDevices, plan.Cautions);
        Assert.Contains(Caution.VideoOrNonVisual, plan.Cautions);
    }

    [Fact]
    public void Beyond_every_device_no_device_caution_is_shown()
    {
        // 6/6000 for labels (1M) at 25 cm, spot 1:1: 1000 D (derived, methods §2.1), beyond every device (methods §11):
        // nothing is put forward, so no caution about lenses, strong aids, short distances or charging (common practice).
        var plan = Planner.Build(Reading(Acuity.FromSnellen(6, 6000), 1, 25, new ClientConstraints { AgeYears = 88 }) with { Task = ReadingTask.SpotReading });

        Assert.Contains(Caution.BeyondEveryDevice, plan.Cautions);
        Assert.DoesNotContain(plan.Cautions, c => c == Caution.SunlightFire || c == Caution.NeverAtTheSun || c == Caution.NoWalking || c == Caution.ShortSessions || c == Caution.ChargeDevices);
        Assert.Contains(Caution.StartingPoint, plan.Cautions);
        Assert.Contains(Caution.Referral, plan.Cautions);
    }

    [Fact]
    public void Only_usable_options_up_to_the_first_plain_one_are_put_forward()
    {
        var plan = Planner.Build(Reading(Acuity.FromSnellen(6, 120), 1, 25, new ClientConstraints { AgeYears = 80, LogContrastSensitivity = 0.5 }));

        var forward = Planner.PutForward(plan.Options).ToList();

        Assert.All(forward, o => Assert.True(o.IsUsable));
        Assert.All(forward.SkipLast(1), o => Assert.True(o.IsPowered));
        // The video magnifier first, then the first plain usable option as the alternative, and nothing after it.
        Assert.Equal(OptionKind.VideoMagnifier, forward[0].Kind);
        var firstPlain = plan.Options.Select(r => r.Option).First(o => o.IsUsable && !o.IsPowered);
        Assert.Same(firstPlain, forward[^1]);
    }
}
