using System.Collections.Immutable;
using System.Runtime.InteropServices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// The reading-curve method: the equivalent power that makes the target print subtend the angle of the critical
/// print size (MNREAD; Legge, Mansfield). The critical print size already includes the reserve this reader
/// needs, so no second reserve is applied. Magnification is stated relative to the test distance.
/// </summary>
public static class CriticalPrintSizeMethod
{
    /// <summary>
    /// EVD_req = d × M_t / M_CPS and Feq = M_CPS / (d × M_t). CV-12: CPS 4M at 40 cm, target 1M → EVD 10 cm, 10 D.
    /// </summary>
    /// <param name="criticalPrintSize">The critical print size, measured at the test distance.</param>
    /// <param name="testDistance">The distance at which the reading curve was measured.</param>
    /// <param name="target">The print size the reader wants to read.</param>
    /// <exception cref="ArgumentOutOfRangeException">A print size or the test distance is not greater than zero.</exception>
    public static PowerEstimate Estimate(PrintSize criticalPrintSize, Distance testDistance, PrintSize target)
    {
        MethodInputGuards.Print(criticalPrintSize, nameof(criticalPrintSize), "critical print size");
        MethodInputGuards.TestDistance(testDistance, nameof(testDistance));
        MethodInputGuards.Print(target, nameof(target), "target print size");
        return Estimate(criticalPrintSize, testDistance, target, new AssumptionFacts(criticalPrintSize, testDistance));
    }

    private static PowerEstimate Estimate(PrintSize criticalPrintSize, Distance testDistance, PrintSize target, AssumptionFacts facts)
    {
        // Reading-curve method: Feq = M_CPS / (d × M_t), no second reserve (MNREAD CPS definition; methods §2.5).
        var dioptres = criticalPrintSize.M / (testDistance.Metres * target.M);
        return PowerEstimate.Create(PowerMethod.CriticalPrintSize, dioptres, testDistance, target, reserve: null, facts);
    }

    /// <summary>The estimate from an analysed reading curve (see <see cref="ReadingCurve.Analyse"/>).</summary>
    /// <param name="curve">A usable reading-curve analysis.</param>
    /// <param name="target">The print size the reader wants to read.</param>
    /// <exception cref="ArgumentNullException"><paramref name="curve"/> is null.</exception>
    /// <exception cref="ArgumentException">The curve was refused; its <see cref="ReadingCurveAnalysis.Refusal"/> says why.</exception>
    public static PowerEstimate Estimate(ReadingCurveAnalysis curve, PrintSize target)
    {
        ArgumentNullException.ThrowIfNull(curve);
        if (!curve.IsUsable)
        {
            throw new ArgumentException("The reading curve could not be used: " + curve.Refusal, nameof(curve));
        }

        MethodInputGuards.Print(curve.CriticalPrintSize, nameof(curve), "critical print size");
        MethodInputGuards.TestDistance(curve.TestDistance, nameof(curve));
        MethodInputGuards.Print(target, nameof(target), "target print size");
        return Estimate(curve.CriticalPrintSize, curve.TestDistance, target,
            new AssumptionFacts(curve.CriticalPrintSize, curve.TestDistance, curve.MaximumReadingSpeed, curve.SpeedFellBelowCriticalPrintSize));
    }

    /// <summary>
    /// The method's assumptions, with the measurements formatted for <paramref name="provider"/>; from a reading
    /// curve, also its maximum reading speed and, when reading had not slowed, that the CPS may be smaller.
    /// </summary>
    internal static ImmutableArray<string> Assumptions(PowerEstimate estimate, IFormatProvider provider)
    {
        var facts = estimate.Facts;
        var fromCurve = facts.MaximumReadingSpeed is not null;
        var notSlowed = fromCurve && !facts.SpeedFellBelowCriticalPrintSize;
        var notes = new string[3 + (fromCurve ? 1 : 0) + (notSlowed ? 1 : 0)];
        var n = 0;
        notes[n++] = string.Create(provider,
            $"Reading curve: critical print size {facts.MeasuredPrint} at {facts.TestDistance.Centimetres:0.#} cm, the smallest print read at the reader's best speed.");
        if (facts.MaximumReadingSpeed is { } mrs)
        {
            notes[n++] = string.Create(provider,
                $"Maximum reading speed {mrs:0} words per minute; critical print size = the smallest print read at 90 % or more of the mean speed at larger sizes.");
        }

        if (notSlowed)
        {
            notes[n++] = "Reading had not slowed at the smallest print tested, so the true critical print size may be smaller and this estimate too high; test smaller print to find it.";
        }

        notes[n++] = string.Create(provider,
            $"Target print {estimate.TargetPrint} is made to look as large as the critical print size; no extra acuity reserve is added, because the critical print size already includes it.");
        notes[n] = "It assumes the reader was focused at the test distance throughout the reading test.";
        return ImmutableCollectionsMarshal.AsImmutableArray(notes);
    }
}
