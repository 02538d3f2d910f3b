using System.Collections.Immutable;
using LowVisionAid.Optics.Kit;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Planning;

/// <summary>
/// Everything a plan is built from: numbers and the shared value types only (no text to parse). Immutable; the web
/// app may store it as it is. <see cref="Planner.Check"/> lists what is missing or out of range.
/// </summary>
public sealed record PlanRequest
{
    /// <summary>
    /// The required equivalent power for the near task, as the practitioner decided it. When null, the plan uses the
    /// estimate from <see cref="Estimates"/> (reading curve, else near acuity, else Kestenbaum with reserve).
    /// Not used for <see cref="ReadingTask.DistanceViewing"/>, whose requirement comes from the distance acuities.
    /// </summary>
    public Power? RequiredPower { get; init; }

    /// <summary>The measurements for the required-power estimates, shown side by side in the result. Default: none.</summary>
    public EstimateInputs Estimates { get; init; } = EstimateInputs.None;

    /// <summary>The print the client wants to read (x-height in M units).</summary>
    public required PrintSize TargetPrint { get; init; }

    /// <summary>The preferred working distance (for distance viewing, the distance to the television or sign).</summary>
    public required Distance PreferredDistance { get; init; }

    /// <summary>The task.</summary>
    public required ReadingTask Task { get; init; }

    /// <summary>
    /// The everyday task the plan is for, when known; its <see cref="TaskRules.For(GoalTask)"/> rule gives the sane
    /// distance range (its kind must be <see cref="Task"/>). Null: the range of <see cref="Task"/>.
    /// </summary>
    public GoalTask? Goal { get; init; }

    /// <summary>The rule the request is planned by: the goal's when given, else the task kind's.</summary>
    public TaskRule Rule => Goal is { } goal ? TaskRules.For(goal) : TaskRules.For(Task);

    /// <summary>The client's constraints. Default: <see cref="ClientConstraints.None"/>.</summary>
    public ClientConstraints Constraints { get; init; } = ClientConstraints.None;

    /// <summary>Current distance acuity (needed for distance viewing; for near tasks it gives the Kestenbaum estimates).</summary>
    public Acuity? DistanceAcuity { get; init; }

    /// <summary>Goal distance acuity for the distance task (e.g. 6/12 for television).</summary>
    public Acuity? GoalDistanceAcuity { get; init; }

    /// <summary>The clinic's devices to match against the plan. Default: none.</summary>
    public ImmutableArray<KitDevice> Kit { get; init; } = [];

    /// <summary>Settings and assumptions. Default: <see cref="PlanSettings.Default"/>.</summary>
    public PlanSettings Settings { get; init; } = PlanSettings.Default;
}
