using System.Collections.Immutable;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Requirement;

namespace LowVisionAid.Optics.Planning;

/// <summary>
/// The measurements the required-power estimates are made from (numbers only). Each estimate is made when its
/// measurements are present; the distance acuity is <see cref="PlanRequest.DistanceAcuity"/>. Immutable.
/// </summary>
public sealed record EstimateInputs
{
    /// <summary>No measurements.</summary>
    public static EstimateInputs None { get; } = new();

    /// <summary>
    /// A reserve ratio the practitioner entered for the Kestenbaum and near-acuity estimates (for example one measured
    /// for this reader); null to use <see cref="ReserveChoice"/> or the task's usual level (<see cref="TaskRules"/>).
    /// </summary>
    public AcuityReserve? Reserve { get; init; }

    /// <summary>
    /// A reserve level the practitioner chose (e.g. <see cref="ReserveLevel.Sustained"/> for long or high-speed
    /// reading), its ratio taken from <see cref="PlanSettings.Reserves"/>; null for the task's usual level.
    /// </summary>
    public ReserveLevel? ReserveChoice { get; init; }

    /// <summary>The smallest print read at the near test (threshold), with the add for that distance worn.</summary>
    public PrintSize? NearThresholdPrint { get; init; }

    /// <summary>The distance of the near test.</summary>
    public Distance? NearTestDistance { get; init; }

    /// <summary>A critical print size already read off a reading curve, at <see cref="ReadingTestDistance"/>.</summary>
    public PrintSize? CriticalPrintSize { get; init; }

    /// <summary>Reading speeds at several print sizes, analysed into a critical print size when no CPS is given.</summary>
    public ImmutableArray<ReadingPoint> ReadingPoints { get; init; } = [];

    /// <summary>The distance of the reading-speed test.</summary>
    public Distance? ReadingTestDistance { get; init; }

    /// <summary>True when any estimate can be made from these inputs together with a distance acuity, if given.</summary>
    public bool CanEstimate(Acuity? distanceAcuity) => CanEstimate(distanceAcuity, ReadingTask.SustainedReading);

    /// <summary>
    /// True when any estimate can be made for the task from these inputs together with a distance acuity, if given.
    /// Spot tasks use threshold acuity only: a reading curve does not count for them (methods §11).
    /// </summary>
    public bool CanEstimate(Acuity? distanceAcuity, ReadingTask task) =>
        distanceAcuity is not null
        || (NearThresholdPrint is not null && NearTestDistance is not null)
        || (task != ReadingTask.SpotReading && ReadingTestDistance is not null && (CriticalPrintSize is not null || !ReadingPoints.IsDefaultOrEmpty));
}
