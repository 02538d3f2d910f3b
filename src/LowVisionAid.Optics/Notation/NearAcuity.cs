using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// A near-acuity measurement: the smallest print read (threshold) and the distance it was read at, with the
/// equivalent acuity logMAR = log₁₀(M / d) (Colenbrander 2001: 1/V = M × D). Record near acuity as M size with the
/// measured distance (ICO; Colenbrander, Duane's ch. 51). The default value is not a valid measurement
/// (its print size is not valid); create one with <see cref="Create"/>.
/// </summary>
public readonly record struct NearAcuity
{
    private NearAcuity(PrintSize threshold, Distance testDistance, Acuity acuity)
    {
        Threshold = threshold;
        TestDistance = testDistance;
        Acuity = acuity;
    }

    /// <summary>The smallest print read, in M units of x-height.</summary>
    public PrintSize Threshold { get; }

    /// <summary>The distance the print was read at.</summary>
    public Distance TestDistance { get; }

    /// <summary>The equivalent acuity: logMAR = log₁₀(M / d), d in metres (Colenbrander 2001).</summary>
    public Acuity Acuity { get; }

    /// <summary>The Snellen-type near acuity V = d / M (d in metres), e.g. 0.4 for 0.40/1.0M.</summary>
    public double SnellenValue =>
        // V = d / M with d in metres (Colenbrander 2001).
        TestDistance.Metres / Threshold.M;

    /// <summary>
    /// A near-acuity record. The distance must be greater than zero and the equivalent acuity within
    /// logMAR −0.5 to 3.0.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The print size or distance is not valid, or the acuity is out of range.</exception>
    public static NearAcuity Create(PrintSize threshold, Distance testDistance)
    {
        if (!threshold.IsValid)
        {
            throw new ArgumentOutOfRangeException(nameof(threshold), threshold, "The threshold print size must be greater than zero; enter the smallest print read, such as 1.0M.");
        }

        if (!(testDistance.Metres > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(testDistance), testDistance, "The test distance must be greater than zero; enter the distance the print was read at, such as 40 cm.");
        }

        return new NearAcuity(threshold, testDistance, Acuity.FromNearThreshold(threshold, testDistance));
    }

    /// <summary>True when <see cref="Create"/> would accept these values.</summary>
    public static bool IsInRange(PrintSize threshold, Distance testDistance) =>
        threshold.IsValid && testDistance.Metres > 0
        && threshold.LogMarAt(testDistance) is >= Acuity.BestLogMar and <= Acuity.WorstLogMar;
}
