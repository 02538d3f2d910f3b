using System.Collections.Immutable;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;

namespace LowVisionAid.Web.Plans;

/// <summary>
/// A saved plan's outputs as the planner made them: numbers in their invariant units (dioptres, metres, M, logMAR,
/// ratios) and the core's own option records, never display text. Serialised into <c>Plan.OutputsJson</c> by
/// <see cref="PlanJson"/>; turned into words only at render time by <see cref="PlanText"/>. A saved plan shows as it
/// was made because the figures are stored and the <see cref="MethodVersion"/> and <see cref="SchemaVersion"/> say
/// which rules made them.
/// </summary>
public sealed record TypedPlan
{
    /// <summary>The schema written today. Version 1 was the display-text snapshot (read by <see cref="LegacyPlanReader"/>).</summary>
    public const int CurrentSchema = 2;

    public int SchemaVersion { get; init; } = CurrentSchema;

    /// <summary>The planner's method version that made the figures.</summary>
    public required string MethodVersion { get; init; }

    /// <summary>True when the clinic showed lengths in inches when the plan was made.</summary>
    public bool Imperial { get; init; }

    /// <summary>True when reading speeds were given (they are taken as measured at the near test distance).</summary>
    public bool HasReadingSpeeds { get; init; }

    /// <summary>The kit devices' names as they were when the plan was made, by code.</summary>
    public ImmutableDictionary<string, string> KitNames { get; init; } = ImmutableDictionary<string, string>.Empty;

    public ImmutableArray<PlannedGoal> Goals { get; init; } = [];

    /// <summary>
    /// Set only when an older saved plan (schema 1) was rebuilt from its stored inputs with a different method version
    /// than the one it was made with: the version it was made with. Never stored.
    /// </summary>
    [System.Text.Json.Serialization.JsonIgnore]
    public string? RebuiltFromMethodVersion { get; init; }
}

/// <summary>One goal's plan. <see cref="Problems"/> is non-empty when the goal could not be planned.</summary>
public sealed record PlannedGoal
{
    public required GoalTask Task { get; init; }

    public string? Detail { get; init; }

    /// <summary>The target as the clinician typed it (their words, not a figure of the plan).</summary>
    public required string TargetText { get; init; }

    public PrintSize? TargetPrint { get; init; }

    public Acuity? GoalAcuity { get; init; }

    public required ReadingTask PlannedAs { get; init; }

    /// <summary>
    /// The viewing distance a distance goal is planned at when none was recorded for it (the task's typical distance,
    /// <see cref="TaskRules"/>): an assumption the plan states. Null for near goals and for a recorded distance.
    /// </summary>
    public Distance? AssumedViewingDistance { get; init; }

    /// <summary>The viewing distance recorded for a distance goal (whiteboard at 8 m), which the plan is made for; null otherwise.</summary>
    public Distance? ViewingDistance { get; init; }

    /// <summary>The acuity reserve the plan used for this goal, and why (the core's task rule); null for distance viewing.</summary>
    public ReserveDecision? Reserve { get; init; }

    public ImmutableArray<string> Problems { get; init; } = [];

    public Power? RequiredPower { get; init; }

    public PowerMethod? RequiredPowerFrom { get; init; }

    public ImmutableArray<PlannedEstimate> Estimates { get; init; } = [];

    /// <summary>Estimates shown for reference only, outside the comparison (Kestenbaum at threshold, 1M at 1:1; methods §2.6).</summary>
    public ImmutableArray<PlannedEstimate> ReferenceEstimates { get; init; } = [];

    /// <summary>The like-for-like pairs of <see cref="Estimates"/> that disagree by more than 0.2 log units.</summary>
    public ImmutableArray<PlannedDisagreement> Disagreements { get; init; } = [];

    /// <summary>The possible reasons for the disagreements, each once (the core's sentences, invariant culture); empty when they agree.</summary>
    public ImmutableArray<string> PossibleReasons { get; init; } = [];

    public PlannedReadingCurve? ReadingCurve { get; init; }

    public ImmutableArray<RankedOption> Options { get; init; } = [];

    public ImmutableArray<RankedOption> KitDevices { get; init; } = [];

    public ImmutableArray<NotConsidered> NotConsidered { get; init; } = [];

    public ImmutableArray<Caution> Cautions { get; init; } = [];

    public bool IsPlanned => Problems.IsDefaultOrEmpty;

    /// <summary>The options of one list (the generic options or the kit devices).</summary>
    public ImmutableArray<RankedOption> List(PlanOptionList list) => list == PlanOptionList.KitDevices ? KitDevices : Options;
}

/// <summary>One method's estimate as numbers; <see cref="Assumptions"/> are the core's own sentences (invariant culture).</summary>
public sealed record PlannedEstimate(
    PowerMethod Method,
    Power EquivalentPower,
    Distance ReferenceDistance,
    PrintSize TargetPrint,
    AcuityReserve? Reserve,
    ImmutableArray<string> Assumptions)
{
    public Distance EquivalentViewingDistance => EquivalentPower.FocalLength;

    public double Magnification => EquivalentPower.MagnificationRelativeTo(ReferenceDistance);

    public double LogUnits => Math.Log10(EquivalentPower.Dioptres);

    public static PlannedEstimate From(PowerEstimate e)
    {
        ArgumentNullException.ThrowIfNull(e);
        return new(e.Method, e.EquivalentPower, e.ReferenceDistance, e.TargetPrint, e.Reserve, e.FormatAssumptions(System.Globalization.CultureInfo.InvariantCulture));
    }
}

/// <summary>A pair of estimates (by their index in the goal's estimates) that disagree by more than 0.2 log units.</summary>
public sealed record PlannedDisagreement(int Lower, int Higher, double DifferenceLogUnits)
{
    public double PowerRatio => Math.Pow(10, DifferenceLogUnits);
}

/// <summary>The reading-curve result: the critical print size and maximum reading speed, or why the curve was refused.</summary>
public sealed record PlannedReadingCurve(Distance TestDistance, string? Refusal, PrintSize? CriticalPrintSize, double? MaximumReadingSpeed)
{
    public static PlannedReadingCurve From(ReadingCurveAnalysis curve)
    {
        ArgumentNullException.ThrowIfNull(curve);
        return curve.IsUsable
            ? new(curve.TestDistance, null, curve.CriticalPrintSize, curve.MaximumReadingSpeed)
            : new(curve.TestDistance, curve.Refusal, null, null);
    }
}
