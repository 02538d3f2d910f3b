using System.Collections.Immutable;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Requirement;

namespace LowVisionAid.Optics.Planning;

/// <summary>A class of option the plan did not consider, and why.</summary>
/// <param name="Kind">The class.</param>
/// <param name="Reason">Why, in plain language.</param>
public readonly record struct NotConsidered(OptionKind Kind, string Reason);

/// <summary>
/// A finished plan: the options ranked with every figure and the reasons for each position, the clinic's devices that
/// meet it (ranked by the same rules), and the cautions. Immutable; the web app may store and display it as it is.
/// </summary>
public sealed record PlanResult
{
    /// <summary>The <see cref="Planner.MethodVersion"/> that produced this result.</summary>
    public required string MethodVersion { get; init; }

    /// <summary>The request the plan was built from.</summary>
    public required PlanRequest Request { get; init; }

    /// <summary>The required equivalent power the options were built for.</summary>
    public required Quantities.Power RequiredPower { get; init; }

    /// <summary>The estimate the required power was taken from, or null when the practitioner entered it (or for distance viewing).</summary>
    public PowerMethod? RequiredPowerFrom { get; init; }

    /// <summary>
    /// The acuity reserve the estimates used, and why (<see cref="TaskRules.ReserveFor"/>); null for distance viewing,
    /// whose requirement comes from the acuity wanted.
    /// </summary>
    public ReserveDecision? Reserve { get; init; }

    /// <summary>The blur tolerance the depths of field were worked out with (<see cref="DepthOfFieldRule"/> unless the clinician set one).</summary>
    public Quantities.Power BlurTolerance { get; init; } = Quantities.Power.FromDioptres(DepthOfFieldRule.NormalEyeDioptres);

    /// <summary>
    /// Every required-power estimate the inputs allowed, side by side, with the pairs that disagree by more than
    /// 0.2 log units (<see cref="EstimateComparison.HasDisagreement"/>); null when no estimate inputs were given.
    /// </summary>
    public EstimateComparison? Estimates { get; init; }

    /// <summary>The reading-curve analysis when reading points were given (its Refusal says why a curve could not be used).</summary>
    public ReadingCurveAnalysis? ReadingCurve { get; init; }

    /// <summary>The options, first choice first.</summary>
    public required ImmutableArray<RankedOption> Options { get; init; }

    /// <summary>The clinic's devices that meet the plan, first choice first; each option's KitDeviceId names its device.</summary>
    public required ImmutableArray<RankedOption> KitDevices { get; init; }

    /// <summary>Classes of option not considered for this task, with the reason.</summary>
    public required ImmutableArray<NotConsidered> NotConsidered { get; init; }

    /// <summary>Cautions to show with the plan.</summary>
    public required ImmutableArray<Caution> Cautions { get; init; }
}
