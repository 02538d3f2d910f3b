using System.Collections.Immutable;
using System.Globalization;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Puts every available estimate side by side in log units of Feq and flags any pair that differs by more than
/// 0.2 log units, with the usual reasons in plain words (methods §2.1, §2.6). It does not assume any ordering of
/// the methods: which one comes out higher differs from reader to reader.
/// </summary>
public static class EstimateReconciliation
{
    /// <summary>
    /// Pairs further apart than this, in log units of Feq, are flagged: 0.2 (common practice; one 0.1 line is
    /// within test–retest noise, DICOM PS3.17 RR.2.4).
    /// </summary>
    public const double FlagThresholdLogUnits = 0.2;

    /// <summary>The caution shown with every comparison.</summary>
    public const string StartingPointCaution =
        "These are starting points. The methods often disagree by 0.2 to 0.5 log units; confirm the choice with a trial of the device, using the reader's own material, under the licensed practitioner's care.";

    // A tolerance so that a difference of exactly 0.2 (e.g. 10^0.2 apart) is not flagged by rounding.
    private const double RoundingTolerance = 1e-9;

    /// <summary>Compares the estimates pairwise.</summary>
    /// <param name="estimates">Any number of estimates (none or one gives no disagreements).</param>
    /// <exception cref="ArgumentNullException"><paramref name="estimates"/> or one of its items is null.</exception>
    public static EstimateComparison Compare(IEnumerable<PowerEstimate> estimates)
    {
        ArgumentNullException.ThrowIfNull(estimates);
        var list = estimates.Select(e => e ?? throw new ArgumentNullException(nameof(estimates), "Leave out an estimate that is not available instead of passing null."))
            .ToImmutableArray();
        var disagreements = ImmutableArray.CreateBuilder<EstimateDisagreement>();
        for (var i = 0; i < list.Length; i++)
        {
            for (var j = i + 1; j < list.Length; j++)
            {
                var (lower, higher) = list[i].LogUnits <= list[j].LogUnits ? (list[i], list[j]) : (list[j], list[i]);
                var difference = higher.LogUnits - lower.LogUnits;
                if (difference > FlagThresholdLogUnits + RoundingTolerance)
                {
                    disagreements.Add(new EstimateDisagreement(lower, higher, difference, ReasonsFor(lower, higher)));
                }
            }
        }

        return new EstimateComparison(list, disagreements.ToImmutable());
    }

    private static ImmutableArray<string> ReasonsFor(PowerEstimate lower, PowerEstimate higher)
    {
        var reasons = ImmutableArray.CreateBuilder<string>();
        var lowerIsDistance = IsFromDistanceAcuity(lower.Method);
        var higherIsDistance = IsFromDistanceAcuity(higher.Method);
        if (lowerIsDistance && !higherIsDistance)
        {
            reasons.Add("Distance acuity often under-estimates the magnification needed for reading, especially with a central scotoma, posterior subcapsular cataract or small pupils (Cheong, Lovie-Kitchin and Bowers 2002).");
        }

        if (higherIsDistance && !lowerIsDistance)
        {
            reasons.Add("Near vision was better than distance acuity predicts: check that the distance acuity was measured with the full distance correction, and that the near test distance was recorded correctly.");
        }

        if (!lowerIsDistance || !higherIsDistance)
        {
            reasons.Add("A near test done at a distance the reader was not focused for (no add, or the wrong add) measures near vision too poor and gives too high an estimate.");
        }

        if (lower.Reserve is { } a && higher.Reserve is { } b && a != b)
        {
            reasons.Add(string.Create(CultureInfo.InvariantCulture,
                $"The two estimates use different acuity reserves ({a} and {b}); a larger reserve asks for more power."));
        }

        if (lower.Method == PowerMethod.CriticalPrintSize || higher.Method == PowerMethod.CriticalPrintSize)
        {
            reasons.Add("The reading curve measures the reserve this reader needs, while the other method assumes a fixed reserve that may be too small or too large for them (Latham and Tabrett 2012: a third of readers with aided acuity better than 1.2M needed more than 2:1).");
        }

        if (!SameTarget(lower, higher))
        {
            reasons.Add("The two estimates are for different target print sizes.");
        }

        reasons.Add("Reading can be much harder than single letters suggest when a central scotoma or unsteady fixation breaks up words; a reading test with text shows this best.");
        return reasons.ToImmutable();
    }

    private static bool IsFromDistanceAcuity(PowerMethod method) =>
        method is PowerMethod.KestenbaumClassic or PowerMethod.KestenbaumWithReserve;

    private static bool SameTarget(PowerEstimate a, PowerEstimate b) =>
        Math.Abs(a.TargetPrint.M - b.TargetPrint.M) <= 1e-9 * Math.Max(a.TargetPrint.M, b.TargetPrint.M);
}

/// <summary>All the estimates side by side, with the pairs that disagree by more than 0.2 log units.</summary>
/// <param name="Estimates">The estimates compared, in the order given.</param>
/// <param name="Disagreements">Every pair further apart than <see cref="EstimateReconciliation.FlagThresholdLogUnits"/>.</param>
public sealed record EstimateComparison(ImmutableArray<PowerEstimate> Estimates, ImmutableArray<EstimateDisagreement> Disagreements)
{
    /// <summary>True when at least one pair is flagged.</summary>
    public bool HasDisagreement => !Disagreements.IsEmpty;

    /// <summary>The spread between the lowest and highest estimate, in log units of Feq (0 with fewer than two).</summary>
    public double SpreadLogUnits => Estimates.Length < 2 ? 0 : Estimates.Max(e => e.LogUnits) - Estimates.Min(e => e.LogUnits);
}

/// <summary>A pair of estimates that differ by more than 0.2 log units.</summary>
/// <param name="Lower">The estimate asking for less power.</param>
/// <param name="Higher">The estimate asking for more power.</param>
/// <param name="DifferenceLogUnits">log₁₀(Feq_higher / Feq_lower).</param>
/// <param name="PossibleReasons">The usual reasons for such a gap, in plain words (methods §2.1, §2.6).</param>
public sealed record EstimateDisagreement(
    PowerEstimate Lower,
    PowerEstimate Higher,
    double DifferenceLogUnits,
    ImmutableArray<string> PossibleReasons)
{
    /// <summary>The ratio of the two powers, Feq_higher / Feq_lower = 10^difference.</summary>
    public double PowerRatio => Higher.EquivalentPower / Lower.EquivalentPower;
}
