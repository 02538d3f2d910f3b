using System.Collections.Immutable;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// The result of <see cref="ReadingCurve.Analyse"/>: the maximum reading speed and the critical print size, or
/// the reason the curve cannot give them (<see cref="Refusal"/>). Immutable.
/// </summary>
public sealed record ReadingCurveAnalysis
{
    private readonly double _maximumReadingSpeed;
    private readonly PrintSize _criticalPrintSize;

    private ReadingCurveAnalysis(
        Distance testDistance,
        ImmutableArray<ReadingPoint> points,
        string? refusal,
        double maximumReadingSpeed,
        PrintSize criticalPrintSize,
        int plateauPointCount,
        bool speedFellBelowCriticalPrintSize)
    {
        TestDistance = testDistance;
        Points = points;
        Refusal = refusal;
        _maximumReadingSpeed = maximumReadingSpeed;
        _criticalPrintSize = criticalPrintSize;
        PlateauPointCount = plateauPointCount;
        SpeedFellBelowCriticalPrintSize = speedFellBelowCriticalPrintSize;
    }

    /// <summary>The distance at which every sentence was read.</summary>
    public Distance TestDistance { get; }

    /// <summary>The points analysed, largest print first.</summary>
    public ImmutableArray<ReadingPoint> Points { get; }

    /// <summary>True when the curve gave a maximum reading speed and a critical print size.</summary>
    public bool IsUsable => Refusal is null;

    /// <summary>Why the curve cannot be used, and what to do instead; null when <see cref="IsUsable"/>.</summary>
    public string? Refusal { get; }

    /// <summary>The maximum reading speed (MRS) in words per minute: the mean speed at print sizes larger than the critical print size.</summary>
    /// <exception cref="InvalidOperationException">The curve was refused; read <see cref="Refusal"/>.</exception>
    public double MaximumReadingSpeed => IsUsable ? _maximumReadingSpeed : throw Refused();

    /// <summary>The critical print size (CPS): the smallest print that still supports the maximum reading speed.</summary>
    /// <exception cref="InvalidOperationException">The curve was refused; read <see cref="Refusal"/>.</exception>
    public PrintSize CriticalPrintSize => IsUsable ? _criticalPrintSize : throw Refused();

    /// <summary>The critical print size as logMAR at the test distance: log₁₀(M / d) (Colenbrander 2001; MNREAD distance correction).</summary>
    /// <exception cref="InvalidOperationException">The curve was refused; read <see cref="Refusal"/>.</exception>
    public double CriticalPrintSizeLogMar => CriticalPrintSize.LogMarAt(TestDistance);

    /// <summary>How many points lie on the plateau (the critical print size and every larger size).</summary>
    public int PlateauPointCount { get; }

    /// <summary>
    /// True when some smaller print was read below the plateau. When false, the speed had not yet fallen at the
    /// smallest print tested, so the true critical print size may be smaller and the power estimate too high.
    /// </summary>
    public bool SpeedFellBelowCriticalPrintSize { get; }

    internal static ReadingCurveAnalysis Refuse(Distance testDistance, ImmutableArray<ReadingPoint> points, string refusal) =>
        new(testDistance, points, refusal, 0, default, 0, false);

    internal static ReadingCurveAnalysis Usable(
        Distance testDistance, ImmutableArray<ReadingPoint> points, double maximumReadingSpeed, PrintSize criticalPrintSize,
        int plateauPointCount, bool speedFell) =>
        new(testDistance, points, null, maximumReadingSpeed, criticalPrintSize, plateauPointCount, speedFell);

    private InvalidOperationException Refused() => new("The reading curve could not be used: " + Refusal);
}
