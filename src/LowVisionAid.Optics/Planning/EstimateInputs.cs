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
    /// The acuity reserve for the Kestenbaum and near-acuity estimates, or null for the task's default: spot reading
    /// 1:1, sustained reading 3:1, writing and screens 2:1 (methods §2.3).
    /// </summary>
    public AcuityReserve? Reserve { get; init; }

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
    public bool CanEstimate(Acuity? distanceAcuity) =>
        distanceAcuity is not null
        || (NearThresholdPrint is not null && NearTestDistance is not null)
        || (ReadingTestDistance is not null && (CriticalPrintSize is not null || !ReadingPoints.IsDefaultOrEmpty));

    /// <summary>The reserve used for a task when <see cref="Reserve"/> is not given.</summary>
    public static AcuityReserve DefaultReserveFor(ReadingTask task) => task switch
    {
        ReadingTask.SpotReading => AcuityReserve.Spot,
        ReadingTask.SustainedReading => AcuityReserve.Sustained,
        _ => AcuityReserve.Fluent,
    };
}
