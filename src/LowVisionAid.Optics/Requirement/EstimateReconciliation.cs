using System.Collections.Immutable;
using System.Globalization;
using System.Runtime.InteropServices;

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

    // More estimates than this are compared with their log units on the heap instead of the stack.
    private const int StackLimit = 32;

    /// <summary>Compares the estimates pairwise.</summary>
    /// <param name="estimates">Any number of estimates (none or one gives no disagreements).</param>
    /// <exception cref="ArgumentNullException"><paramref name="estimates"/> or one of its items is null.</exception>
    public static EstimateComparison Compare(IEnumerable<PowerEstimate> estimates)
    {
        ArgumentNullException.ThrowIfNull(estimates);
        PowerEstimate[] copy;
        if (estimates is ICollection<PowerEstimate> collection)
        {
            copy = collection.Count == 0 ? [] : new PowerEstimate[collection.Count];
            collection.CopyTo(copy, 0);
        }
        else
        {
            copy = [.. estimates];
        }

        return CompareOwned(copy);
    }

    /// <summary>Compares the estimates in an array the caller hands over and no longer changes (no copy is made).</summary>
    /// <exception cref="ArgumentNullException">An item is null.</exception>
    internal static EstimateComparison CompareOwned(PowerEstimate[] estimates)
    {
        var n = estimates.Length;
        Span<double> logUnits = n <= StackLimit ? stackalloc double[n] : new double[n];
        for (var i = 0; i < n; i++)
        {
            logUnits[i] = (estimates[i] ?? throw new ArgumentNullException(nameof(estimates), "Leave out an estimate that is not available instead of passing null.")).LogUnits;
        }

        // Two passes over the pairs, so that the list of disagreements is made at its exact size (often none).
        var flagged = 0;
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                flagged += IsFlagged(Math.Abs(logUnits[i] - logUnits[j])) ? 1 : 0;
            }
        }

        var disagreements = flagged == 0 ? [] : new EstimateDisagreement[flagged];
        var k = 0;
        for (var i = 0; k < flagged && i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                var difference = Math.Abs(logUnits[i] - logUnits[j]);
                if (IsFlagged(difference))
                {
                    disagreements[k++] = logUnits[i] <= logUnits[j]
                        ? new EstimateDisagreement(estimates[i], estimates[j], difference)
                        : new EstimateDisagreement(estimates[j], estimates[i], difference);
                }
            }
        }

        return new EstimateComparison(
            ImmutableCollectionsMarshal.AsImmutableArray(estimates),
            ImmutableCollectionsMarshal.AsImmutableArray(disagreements));
    }

    private static bool IsFlagged(double difference) => difference > FlagThresholdLogUnits + RoundingTolerance;

    /// <summary>The usual reasons for a gap between two estimates, formatted for <paramref name="provider"/>.</summary>
    internal static ImmutableArray<string> ReasonsFor(PowerEstimate lower, PowerEstimate higher, IFormatProvider provider)
    {
        var lowerIsDistance = IsFromDistanceAcuity(lower.Method);
        var higherIsDistance = IsFromDistanceAcuity(higher.Method);
        var distanceLow = lowerIsDistance && !higherIsDistance;
        var distanceHigh = higherIsDistance && !lowerIsDistance;
        var nearTest = !lowerIsDistance || !higherIsDistance;
        var reserves = lower.Reserve is { } a && higher.Reserve is { } b && a != b;
        var curve = lower.Method == PowerMethod.CriticalPrintSize || higher.Method == PowerMethod.CriticalPrintSize;
        var targets = !SameTarget(lower, higher);
        var reasons = new string[1 + Count(distanceLow) + Count(distanceHigh) + Count(nearTest) + Count(reserves) + Count(curve) + Count(targets)];
        var n = 0;
        if (distanceLow)
        {
            reasons[n++] = "Distance acuity often under-estimates the magnification needed for reading, especially with a central scotoma, posterior subcapsular cataract or small pupils (Cheong, Lovie-Kitchin and Bowers 2002).";
        }

        if (distanceHigh)
        {
            reasons[n++] = "Near vision was better than distance acuity predicts: check that the distance acuity was measured with the full distance correction, and that the near test distance was recorded correctly.";
        }

        if (nearTest)
        {
            reasons[n++] = "A near test done at a distance the reader was not focused for (no add, or the wrong add) measures near vision too poor and gives too high an estimate.";
        }

        if (reserves)
        {
            reasons[n++] = string.Create(provider,
                $"The two estimates use different acuity reserves ({lower.Reserve} and {higher.Reserve}); a larger reserve asks for more power.");
        }

        if (curve)
        {
            reasons[n++] = "The reading curve measures the reserve this reader needs, while the other method assumes a fixed reserve that may be too small or too large for them (Latham and Tabrett 2012: a third of readers with aided acuity better than 1.2M needed more than 2:1).";
        }

        if (targets)
        {
            reasons[n++] = "The two estimates are for different target print sizes.";
        }

        reasons[n] = HarderThanLettersReason;
        return ImmutableCollectionsMarshal.AsImmutableArray(reasons);
    }

    /// <summary>The reason that applies to every gap; listed last.</summary>
    internal const string HarderThanLettersReason =
        "Reading can be much harder than single letters suggest when a central scotoma or unsteady fixation breaks up words; a reading test with text shows this best.";

    /// <summary>The reasons for every flagged pair, each listed once, the general reason last.</summary>
    internal static ImmutableArray<string> ReasonsOnce(ImmutableArray<EstimateDisagreement> disagreements, IFormatProvider provider)
    {
        if (disagreements.IsDefaultOrEmpty)
        {
            return [];
        }

        var seen = new HashSet<string>(StringComparer.Ordinal) { HarderThanLettersReason };
        var reasons = new List<string>();
        foreach (var d in disagreements)
        {
            foreach (var reason in ReasonsFor(d.Lower, d.Higher, provider))
            {
                if (seen.Add(reason))
                {
                    reasons.Add(reason);
                }
            }
        }

        reasons.Add(HarderThanLettersReason);
        return [.. reasons];
    }

    private static int Count(bool condition) => condition ? 1 : 0;

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
    public bool HasDisagreement => !Disagreements.IsDefaultOrEmpty;

    /// <summary>
    /// Estimates shown for reference only, outside the comparison because they are for another target or reserve
    /// (Kestenbaum's rule as published: 1M at threshold, 1:1). Methods §2.6: compare like with like only.
    /// </summary>
    public ImmutableArray<PowerEstimate> ForReference { get; init; } = [];

    /// <summary>
    /// The possible reasons for the flagged gaps, each listed once (the general reason last); empty when nothing
    /// is flagged. Numbers in the current culture: use <see cref="FormatPossibleReasons"/> to choose.
    /// </summary>
    public ImmutableArray<string> PossibleReasons => FormatPossibleReasons(CultureInfo.CurrentCulture);

    /// <summary>The possible reasons for the flagged gaps, each listed once, with numbers formatted for <paramref name="provider"/>.</summary>
    public ImmutableArray<string> FormatPossibleReasons(IFormatProvider? provider) =>
        EstimateReconciliation.ReasonsOnce(Disagreements, provider ?? CultureInfo.CurrentCulture);

    /// <summary>The spread between the lowest and highest estimate, in log units of Feq (0 with fewer than two).</summary>
    public double SpreadLogUnits
    {
        get
        {
            if (Estimates.IsDefault || Estimates.Length < 2)
            {
                return 0;
            }

            var lowest = double.PositiveInfinity;
            var highest = double.NegativeInfinity;
            foreach (var estimate in Estimates)
            {
                var log = estimate.LogUnits;
                lowest = Math.Min(lowest, log);
                highest = Math.Max(highest, log);
            }

            return highest - lowest;
        }
    }
}

/// <summary>A pair of estimates that differ by more than 0.2 log units.</summary>
/// <param name="Lower">The estimate asking for less power.</param>
/// <param name="Higher">The estimate asking for more power.</param>
/// <param name="DifferenceLogUnits">log₁₀(Feq_higher / Feq_lower).</param>
public sealed record EstimateDisagreement(
    PowerEstimate Lower,
    PowerEstimate Higher,
    double DifferenceLogUnits)
{
    /// <summary>The ratio of the two powers, Feq_higher / Feq_lower = 10^difference.</summary>
    public double PowerRatio => Higher.EquivalentPower / Lower.EquivalentPower;

    /// <summary>
    /// The usual reasons for such a gap, in plain words (methods §2.1, §2.6), with numbers in the current culture.
    /// Formatted on each call: use <see cref="FormatPossibleReasons"/> to choose the culture.
    /// </summary>
    public ImmutableArray<string> PossibleReasons => FormatPossibleReasons(CultureInfo.CurrentCulture);

    /// <summary>The usual reasons for such a gap, in plain words, with numbers formatted for <paramref name="provider"/>.</summary>
    /// <param name="provider">The culture for numbers; null for the current culture.</param>
    public ImmutableArray<string> FormatPossibleReasons(IFormatProvider? provider) =>
        EstimateReconciliation.ReasonsFor(Lower, Higher, provider ?? CultureInfo.CurrentCulture);
}
