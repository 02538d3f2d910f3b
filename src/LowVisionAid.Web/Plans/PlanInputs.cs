using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Accommodation;
using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;
using CoreKitDevice = LowVisionAid.Optics.Kit.KitDevice;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;
using KitLabel = LowVisionAid.Optics.Kit.KitLabel;

namespace LowVisionAid.Web.Plans;

/// <summary>
/// Everything a saved plan was made from, in plain numbers (metres, dioptres, logMAR, M), so it serialises exactly
/// and the same inputs always rebuild the same requests. Taken from the visit, the client, the settings and the kit
/// at the moment the plan was made.
/// </summary>
public sealed record PlanInputs
{
    public int VisitId { get; init; }

    public int? AgeYears { get; init; }

    public double? DistanceLogMar { get; init; }

    public double? NearThresholdM { get; init; }

    public double? NearTestDistanceMetres { get; init; }

    public IReadOnlyList<SpeedPoint> ReadingSpeeds { get; init; } = [];

    public double? LogContrastSensitivity { get; init; }

    /// <summary>Home lighting recorded as dim or poor at the visit: illuminated devices rank higher.</summary>
    public bool DimLighting { get; init; }

    public double? AddWornDioptres { get; init; }

    public double? MeasuredAmplitudeDioptres { get; init; }

    public double WorkingDistanceMetres { get; init; }

    public bool HandsFree { get; init; }

    public bool Tremor { get; init; }

    public int UsefulEyes { get; init; } = 2;

    public double SpotReserve { get; init; }

    public double FluentReserve { get; init; }

    public double SustainedReserve { get; init; }

    public double CharacterPitch { get; init; }

    public bool Imperial { get; init; }

    /// <summary>The clinic's cost classes where they differ from the core's defaults; null or empty keeps the defaults.</summary>
    public IReadOnlyDictionary<OptionKind, CostClass>? CostClasses { get; init; }

    public IReadOnlyList<GoalPoint> Goals { get; init; } = [];

    public IReadOnlyList<KitPoint> Kit { get; init; } = [];

    /// <summary>The plan request for one goal; every figure comes from these inputs alone.</summary>
    public PlanRequest RequestFor(GoalPoint goal)
    {
        ArgumentNullException.ThrowIfNull(goal);
        var rule = TaskRules.For(goal.Task);
        var distanceTask = rule.Kind == ReadingTask.DistanceViewing;
        Distance? nearDistance = NearTestDistanceMetres is { } nd ? Distance.FromMetres(nd) : null;
        return new PlanRequest
        {
            Task = rule.Kind,
            Goal = goal.Task,
            TargetPrint = PrintSize.FromM(goal.TargetM ?? 1.0),
            PreferredDistance = distanceTask ? AssumedViewingDistance(goal) : Distance.FromMetres(WorkingDistanceMetres),
            DistanceAcuity = DistanceLogMar is { } d ? Acuity.FromLogMar(d) : null,
            GoalDistanceAcuity = goal.GoalLogMar is { } g ? Acuity.FromLogMar(g) : null,
            Estimates = new EstimateInputs
            {
                NearThresholdPrint = NearThresholdM is { } m ? PrintSize.FromM(m) : null,
                NearTestDistance = nearDistance,
                ReadingPoints = [.. ReadingSpeeds.Select(s => new ReadingPoint(PrintSize.FromM(s.PrintM), s.WordsPerMinute))],
                ReadingTestDistance = ReadingSpeeds.Count > 0 ? nearDistance : null,
            },
            Constraints = new ClientConstraints
            {
                HandsFreeWanted = HandsFree,
                Tremor = Tremor,
                UsefulEyes = UsefulEyes,
                AgeYears = AgeYears,
                UsableAccommodation = MeasuredAmplitudeDioptres is { } a
                    ? AccommodationProfile.FromMeasuredAmplitude(Power.FromDioptres(a)).UsableSustained
                    : null,
                AddWorn = AddWornDioptres is { } add ? Power.FromDioptres(add) : null,
                LogContrastSensitivity = LogContrastSensitivity,
                DimLighting = DimLighting,
            },
            Kit = [.. Kit.Select(k => k.ToCore())],
            Settings = PlanSettings.Default with
            {
                CharacterPitch = CharacterPitch,
                Reserves = new ReserveRatios
                {
                    Spot = Ratio(SpotReserve, AcuityReserve.Spot),
                    Fluent = FluentReserveUsed(),
                    Sustained = Ratio(SustainedReserve, AcuityReserve.Sustained),
                },
                Ranges = CostClasses is { Count: > 0 } costs ? PlanSettings.Default.Ranges.WithCosts(costs) : PlanSettings.Default.Ranges,
            },
        };
    }

    /// <summary>
    /// The viewing distance a distance goal is planned at: the goal's own when recorded, else the typical distance of
    /// its task (<see cref="TaskRules"/>), an assumption shown on the plan.
    /// </summary>
    public static Distance AssumedViewingDistance(GoalPoint goal)
    {
        ArgumentNullException.ThrowIfNull(goal);
        return goal.ViewingDistanceMetres is { } m ? Distance.FromMetres(m) : TaskRules.For(goal.Task).Example;
    }

    // A clinic setting outside 1:1 to 10:1 cannot come from the settings form; the documented default stands in for it.
    /// <summary>The fluent reserve the clinic used (2:1 when none was stored), as the planner reads it.</summary>
    public AcuityReserve FluentReserveUsed() => Ratio(FluentReserve, AcuityReserve.Fluent);

    private static AcuityReserve Ratio(double ratio, AcuityReserve fallback) =>
        ratio is >= 1 and <= AcuityReserve.MaximumRatio ? AcuityReserve.FromRatio(ratio) : fallback;
}

public sealed record SpeedPoint(double PrintM, int WordsPerMinute);

public sealed record GoalPoint(GoalTask Task, string? Detail, string TargetText, double? TargetM, double? GoalLogMar, double? ViewingDistanceMetres = null);

/// <summary>One kit device as it was when the plan was made.</summary>
public sealed record KitPoint
{
    public required string Code { get; init; }

    public required string Name { get; init; }

    public DeviceKind Kind { get; init; }

    public double? PowerDioptres { get; init; }

    public double? LabelTimes { get; init; }

    public LabelConvention? LabelConvention { get; init; }

    public double? ApertureMetres { get; init; }

    public double? StandHeightMetres { get; init; }

    public double? ImageBelowLensMetres { get; init; }

    public double? EnlargementRatio { get; init; }

    public double? Magnification { get; init; }

    public double? ReadingCapDioptres { get; init; }

    public double? FieldArcminutes { get; init; }

    public double? FocusNearestMetres { get; init; }

    public bool Illuminated { get; init; }

    public static KitPoint From(KitDevice k)
    {
        ArgumentNullException.ThrowIfNull(k);
        return new()
        {
            Code = k.Code,
            Name = k.Name,
            Kind = k.Kind,
            PowerDioptres = k.Power?.Dioptres,
            LabelTimes = k.LabelTimes,
            LabelConvention = k.LabelConvention,
            ApertureMetres = k.Aperture?.Metres,
            StandHeightMetres = k.StandHeight?.Metres,
            ImageBelowLensMetres = k.ImageBelowLens?.Metres,
            EnlargementRatio = k.EnlargementRatio,
            Magnification = k.Magnification,
            ReadingCapDioptres = k.ReadingCap?.Dioptres,
            FieldArcminutes = k.Field?.Arcminutes,
            FocusNearestMetres = k.FocusNearest?.Metres,
            Illuminated = k.Illuminated,
        };
    }

    public CoreKitDevice ToCore() => new()
    {
        Id = Code,
        Name = Name,
        Kind = Kind,
        Power = PowerDioptres is { } p ? Power.FromDioptres(p) : null,
        Label = LabelTimes is { } t && LabelConvention is { } c ? new KitLabel(t, c) : null,
        Aperture = Metres(ApertureMetres),
        StandHeight = Metres(StandHeightMetres),
        ImageBelowLens = Metres(ImageBelowLensMetres),
        EnlargementRatio = EnlargementRatio,
        Magnification = Magnification,
        ReadingCap = ReadingCapDioptres is { } r ? Power.FromDioptres(r) : null,
        Field = FieldArcminutes is { } f ? VisualAngle.FromArcminutes(f) : null,
        FocusNearest = Metres(FocusNearestMetres),
        Illuminated = Illuminated,
    };

    private static Distance? Metres(double? metres) => metres is { } m ? Distance.FromMetres(m) : null;
}
