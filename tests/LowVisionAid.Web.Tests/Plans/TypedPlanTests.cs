using System.Text.Json;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Plans;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;
using LabelConvention = LowVisionAid.Optics.Devices.LabelConvention;

namespace LowVisionAid.Web.Tests.Plans;

public class TypedPlanTests
{
    /// <summary>
    /// Invented client: 6/60 (logMAR 1.0), 4M read at 40 cm, 25 cm preferred, reading speeds, two goals (newspaper 1M and
    /// television to 6/12), and a kit with a device of every kind, so that every class of option is planned.
    /// </summary>
    internal static PlanInputs Inputs() => new()
    {
        VisitId = 1,
        AgeYears = 78,
        DistanceLogMar = 1.0,
        NearThresholdM = 4,
        NearTestDistanceMetres = 0.4,
        ReadingSpeeds = [new SpeedPoint(8, 80), new SpeedPoint(6.3, 78), new SpeedPoint(5, 74), new SpeedPoint(4, 40)],
        LogContrastSensitivity = 1.2,
        WorkingDistanceMetres = 0.25,
        UsefulEyes = 2,
        SpotReserve = 1,
        FluentReserve = 2,
        SustainedReserve = 3,
        CharacterPitch = 1.1,
        Goals =
        [
            new GoalPoint(GoalTask.Newspaper, null, "1M", 1.0, null),
            new GoalPoint(GoalTask.Television, "news", "6/12", null, 0.3),
        ],
        Kit =
        [
            new KitPoint { Code = "HM-20", Name = "Hand magnifier +20 D", Kind = DeviceKind.HandMagnifier, PowerDioptres = 20, ApertureMetres = 0.045 },
            new KitPoint { Code = "SM-24", Name = "Stand magnifier +24 D", Kind = DeviceKind.StandMagnifier, PowerDioptres = 24, StandHeightMetres = 0.03, ApertureMetres = 0.05, Illuminated = true },
            new KitPoint { Code = "SP-20", Name = "Reading spectacles +20 D", Kind = DeviceKind.SpectacleAdd, PowerDioptres = 20 },
            new KitPoint { Code = "VM", Name = "Desktop video magnifier", Kind = DeviceKind.VideoMagnifier },
            new KitPoint { Code = "NT-4", Name = "Near telescope 4×", Kind = DeviceKind.NearTelescope, Magnification = 4, ReadingCapDioptres = 5 },
            new KitPoint { Code = "DT-4", Name = "Distance telescope 4×", Kind = DeviceKind.DistanceTelescope, Magnification = 4, FieldArcminutes = 600 },
            new KitPoint { Code = "HM-10L", Name = "Hand magnifier 10×", Kind = DeviceKind.HandMagnifier, LabelTimes = 10, LabelConvention = LabelConvention.Trade, ApertureMetres = 0.05 },
        ],
    };

    [Fact]
    public void A_plan_read_back_from_its_json_has_the_same_figures_reasons_and_cautions()
    {
        // Arrange
        var made = PlanBuilder.Build(Inputs());

        // Act
        var read = PlanJson.Read<TypedPlan>(PlanJson.Write(made));

        // Assert
        Assert.Equal(TypedPlan.CurrentSchema, read.SchemaVersion);
        Assert.Equal(made.MethodVersion, read.MethodVersion);
        Assert.Equal(made.Goals.Length, read.Goals.Length);
        for (var g = 0; g < made.Goals.Length; g++)
        {
            var (before, after) = (made.Goals[g], read.Goals[g]);
            Assert.Equal(before.RequiredPower, after.RequiredPower);
            Assert.Equal(before.Reserve, after.Reserve);
            Assert.Equal(before.Estimates.Select(e => (e.Method, e.EquivalentPower, e.Reserve)), after.Estimates.Select(e => (e.Method, e.EquivalentPower, e.Reserve)));
            Assert.Equal(before.Cautions.Select(c => c.Id), after.Cautions.Select(c => c.Id));
            Assert.Equal(before.NotConsidered.ToArray(), after.NotConsidered.ToArray());
            var options = before.Options.Concat(before.KitDevices).Zip(after.Options.Concat(after.KitDevices)).ToList();
            Assert.Equal(before.Options.Length + before.KitDevices.Length, options.Count);
            foreach (var (x, y) in options)
            {
                Assert.Equal(x.Option.GetType(), y.Option.GetType());
                Assert.Equal(x.Position, y.Position);
                Assert.Equal(x.Reasons.ToArray(), y.Reasons.ToArray());
                Assert.Equal(PlanText.Figures(x.Option, imperial: false), PlanText.Figures(y.Option, imperial: false));
                Assert.Equal(x.Option.Summary(System.Globalization.CultureInfo.InvariantCulture), y.Option.Summary(System.Globalization.CultureInfo.InvariantCulture));
                Assert.Equal(x.Option.DeliveredPower.Dioptres, y.Option.DeliveredPower.Dioptres, 12);
            }
        }
    }

    [Fact]
    public void Every_class_of_option_the_core_defines_is_stored_and_read_back()
    {
        // A phone goal as well: screen zoom is planned for screen tasks only.
        var inputs = Inputs() with { Goals = [.. Inputs().Goals, new GoalPoint(GoalTask.Phone, null, "1M", 1.0, null)] };
        var read = PlanJson.Read<TypedPlan>(PlanJson.Write(PlanBuilder.Build(inputs)));

        var kinds = read.Goals.SelectMany(g => g.Options.Concat(g.KitDevices)).Select(o => o.Option.Kind).Distinct().ToHashSet();

        Assert.Equal(Enum.GetValues<OptionKind>().ToHashSet(), kinds);
    }

    [Fact]
    public void Figures_are_stored_as_numbers_in_invariant_units_never_as_display_text()
    {
        var json = PlanJson.Write(PlanBuilder.Build(Inputs()));
        using var document = JsonDocument.Parse(json);
        var goal = document.RootElement.GetProperty("Goals")[0];

        // 6/60 is logMAR 1.0, decimal 0.1: Kestenbaum gives 1/0.1 = +10 D for 1M (Kestenbaum and Sturman 1956);
        // the near threshold 4M at 40 cm for 1M at the fluent 2:1 reserve gives (4/1 × 2)/0.40 = +20 D (derived,
        // Bailey's equivalent viewing distance method). Reading curve aside, the required power is a plain number.
        Assert.Equal(JsonValueKind.Number, goal.GetProperty("RequiredPower").ValueKind);
        // The reserve is stored as the core's decision: the ratio as a number, its level and source by name.
        var reserve = goal.GetProperty("Reserve");
        Assert.Equal(2.0, reserve.GetProperty("Reserve").GetDouble());
        Assert.Equal("Fluent", reserve.GetProperty("Level").GetString());
        Assert.Equal("TaskDefault", reserve.GetProperty("Source").GetString());
        Assert.False(reserve.TryGetProperty("Why", out _));
        Assert.Equal(1.0, goal.GetProperty("TargetPrint").GetDouble());
        var near = goal.GetProperty("Estimates").EnumerateArray().Single(e => e.GetProperty("Method").GetString() == "NearAcuity");
        Assert.Equal(20.0, near.GetProperty("EquivalentPower").GetDouble(), 9);
        Assert.Equal(2.0, near.GetProperty("Reserve").GetDouble());
        Assert.DoesNotContain(" D (enough)", json, StringComparison.Ordinal);
        Assert.DoesNotContain("\"Figures\"", json, StringComparison.Ordinal);
        Assert.DoesNotContain("Hand magnifier\"", json, StringComparison.Ordinal);
    }

    [Fact]
    public void A_plan_with_an_unknown_caution_is_refused_rather_than_shown_without_it()
    {
        var json = PlanJson.Write(PlanBuilder.Build(Inputs())).Replace("\"starting-point\"", "\"no-such-caution\"", StringComparison.Ordinal);

        Assert.Throws<JsonException>(() => PlanJson.Read<TypedPlan>(json));
    }
}
