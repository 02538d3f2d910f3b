using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Tests.Support;

namespace LowVisionAid.Optics.Tests.Options;

public class DeviceRangesTests
{
    private const double Rel = 0.005;

    private static PlanRequest Request(double required, ReadingTask task = ReadingTask.SpotReading, double cm = 25) => new()
    {
        RequiredPower = Power.FromDioptres(required),
        TargetPrint = PrintSize.FromM(1),
        PreferredDistance = Distance.FromCentimetres(cm),
        Task = task,
        Constraints = new ClientConstraints { AddWorn = Power.FromDioptres(2.5) },
    };

    private static T Find<T>(PlanResult plan) where T : MagnifierOption => plan.Options.Select(r => r.Option).OfType<T>().Single();

    [Fact]
    public void The_aperture_made_shrinks_as_the_power_rises()
    {
        // Methods §10.2 and §11 (common practice): usable lens diameter falls as power rises; no fixed 50 mm at every power.
        var ranges = DeviceRanges.Default;
        var previous = double.MaxValue;
        foreach (var dioptres in new[] { 4.0, 8, 12, 16, 20, 28, 40, 60 })
        {
            var aperture = ranges.ApertureFor(Power.FromDioptres(dioptres)).Millimetres;
            Assert.True(aperture <= previous);
            previous = aperture;
        }

        Assert.True(ranges.ApertureFor(Power.FromDioptres(40)).Millimetres < ranges.ApertureFor(Power.FromDioptres(4)).Millimetres);
    }

    [Fact]
    public void Beyond_each_class_range_the_option_is_not_practical_and_says_why()
    {
        // Common practice (DeviceRanges): spectacles to +20 D, hand and stand lenses to +40 D, near telescopes 4× with a
        // +10 D cap. A need of +60 D is beyond every one of them (methods §11).
        var plan = Planner.Build(Request(60));
        foreach (var kind in new[] { OptionKind.SpectacleAdd, OptionKind.HandMagnifier, OptionKind.StandMagnifier, OptionKind.NearTelescope })
        {
            var o = plan.Options.Single(r => r.Option.Kind == kind).Option;
            Assert.False(o.IsPractical);
            Assert.True(o.BeyondRange);
            Assert.Contains("the strongest usually made", o.PracticalNote, StringComparison.Ordinal);
        }

        // +18 D is within the spectacle range.
        Assert.True(Find<SpectacleAddOption>(Planner.Build(Request(18))).IsPractical);
    }

    [Fact]
    public void A_50_mm_lens_with_the_image_at_infinity_gives_no_binocular_field()
    {
        // Methods §11 (Blommaert and Neve 1987): the lines of sight are PD apart at the lens when the image is at infinity;
        // a 50 mm lens with a 64 mm PD leaves no shared field.
        var shared = BinocularLens.SharedField(Distance.FromMillimetres(50), Distance.FromMillimetres(64), Distance.FromCentimetres(25), null, Power.FromDioptres(4));
        Assert.Equal(0, shared.Millimetres);
        Tolerance.WithinRelative(64, BinocularLens.LineOfSightSeparation(Distance.FromMillimetres(64), Distance.FromCentimetres(25), null).Millimetres, Rel);
    }

    [Fact]
    public void Lines_of_sight_to_an_image_20_cm_below_a_lens_20_cm_away_are_half_the_PD_apart()
    {
        // Derived from PD·|l′|/(z + |l′|) (methods §11): 64 × 0.2/0.4 = 32 mm. A 60 mm lens leaves 28 mm shared, which at
        // F_eq 10 D and z 0.2 m is 0.028/(0.2 × 10) = 14 mm of page (methods §4.1 field formula).
        var pd = Distance.FromMillimetres(64);
        var z = Distance.FromCentimetres(20);
        var image = Distance.FromCentimetres(20);
        Tolerance.WithinRelative(32, BinocularLens.LineOfSightSeparation(pd, z, image).Millimetres, Rel);
        Tolerance.WithinRelative(14, BinocularLens.SharedField(Distance.FromMillimetres(60), pd, z, image, Power.FromDioptres(10)).Millimetres, Rel);
    }

    [Fact]
    public void A_hand_held_telescope_is_never_binocular_and_a_spectacle_pair_only_up_to_3x()
    {
        // Methods §11: binocular telescopes are spectacle-mounted, low power (about 2–3×) and converged.
        var request = new PlanRequest
        {
            TargetPrint = PrintSize.FromM(1),
            PreferredDistance = Distance.FromMetres(3),
            Task = ReadingTask.DistanceViewing,
            DistanceAcuity = Acuity.FromSnellen(6, 24),
            GoalDistanceAcuity = Acuity.FromSnellen(6, 12),
        };
        var plan = Planner.Build(request);
        var telescopes = plan.Options.Select(r => r.Option).OfType<DistanceTelescopeOption>().ToList();
        Assert.False(telescopes.Single(t => !t.SpectacleMounted).Binocular.Feasible);
        Assert.True(telescopes.Single(t => t.SpectacleMounted).Binocular.Feasible); // 2×
        var strong = Planner.Build(request with { DistanceAcuity = Acuity.FromSnellen(6, 48) }); // 4×
        Assert.False(strong.Options.Select(r => r.Option).OfType<DistanceTelescopeOption>().Single(t => t.SpectacleMounted).Binocular.Feasible);
    }

    [Fact]
    public void A_video_magnifier_stops_where_fewer_than_4_letters_fit_a_line()
    {
        // Derived (methods §3.6, §4.2): a 40 cm screen holds 4 letters of 1M (pitch 1.1) up to 400/(4 × 1.1 × 1.4544) = 62.5×,
        // capped at the 60× of common desktop units. 300 D at 25 cm needs 75×: not practical.
        var plan = Planner.Build(Request(300));
        var video = Find<VideoMagnifierOption>(plan);
        Assert.False(video.IsPractical);
        Tolerance.WithinRelative(60, VideoMagnifierOption.LargestUsefulEnlargement(new OptionContext(Request(300)), Distance.FromCentimetres(40)), Rel);
        Assert.DoesNotContain("0 letters", video.Summary(CultureInfo.InvariantCulture), StringComparison.Ordinal);
    }

    [Fact]
    public void Letters_are_counted_whole_in_one_place_and_worded_in_the_singular()
    {
        // Issue 10 item 14: one rounding rule (whole letters that fit), "1 letter", never "0 letters".
        Assert.Equal("1 letter", MagnifierOption.LettersText(1, CultureInfo.InvariantCulture));
        Assert.Equal("less than one letter", MagnifierOption.LettersText(0, CultureInfo.InvariantCulture));
        Assert.Equal("13 letters", MagnifierOption.LettersText(13, CultureInfo.InvariantCulture));
        foreach (var r in Planner.Build(Request(10, ReadingTask.SustainedReading, 40)).Options)
        {
            if (r.Option.CharactersInView is { } n)
            {
                Assert.Equal((int)Math.Floor(n), r.Option.LettersInView);
            }
        }
    }

    [Fact]
    public void A_power_that_rounds_to_zero_is_never_shown_as_minus_zero()
    {
        Assert.Equal("0.00 D", Power.FromDioptres(-0.001).ToString(null, CultureInfo.InvariantCulture));
        Assert.Equal("-0.25 D", Power.FromDioptres(-0.25).ToString(null, CultureInfo.InvariantCulture));
    }

    [Fact]
    public void The_base_in_prism_is_per_eye_with_the_convergence_left_after_it()
    {
        // Methods §3.2 and §11: +6 add → 8 Δ base-in each eye; demand at 1/6 m with PD 64: 6.4 × 6 = 38.4 Δ; left
        // 38.4 − 16 = 22.4 Δ (derived).
        var add = Find<SpectacleAddOption>(Planner.Build(Request(6)));
        Tolerance.Within(8, add.Binocular.BaseInPrismEachEye!.Value, 1e-9);
        Tolerance.WithinRelative(38.4, add.Binocular.ConvergenceDemand, Rel);
        Tolerance.WithinRelative(22.4, add.Binocular.ResidualConvergence, Rel);
    }

    [Fact]
    public void Moving_closer_states_the_distance_and_never_a_times_nearer_figure()
    {
        // Issue 10 item 8: "1.0× nearer"/"0.8× nearer" was shown. 2 D needed at 25 cm: the print is already large enough
        // there (1/0.25 = 4 D of focusing).
        var closer = Find<MovingCloserOption>(Planner.Build(Request(2)));
        Assert.True(closer.AlreadyLargeEnough);
        var text = closer.Summary(CultureInfo.InvariantCulture);
        Assert.Contains("at 25 cm", text, StringComparison.Ordinal);
        Assert.DoesNotContain("nearer", text, StringComparison.Ordinal);
        Tolerance.WithinRelative(4, closer.FocusNeeded.Dioptres, Rel);
    }

    [Fact]
    public void Costs_are_low_for_plain_devices_and_high_for_video_by_default()
    {
        var ranges = DeviceRanges.Default;
        Assert.Equal(CostClass.Low, ranges.CostOf(OptionKind.StandMagnifier));
        Assert.Equal(CostClass.High, ranges.CostOf(OptionKind.VideoMagnifier));
        var edited = ranges with { Costs = ranges.Costs.SetItem(OptionKind.VideoMagnifier, CostClass.Low) };
        Assert.Equal(CostClass.Low, edited.CostOf(OptionKind.VideoMagnifier));
    }
}
