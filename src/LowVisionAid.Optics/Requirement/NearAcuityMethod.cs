using System.Collections.Immutable;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// The near-acuity (equivalent viewing distance) method (Bailey, "Prescribing magnification"; Lovie-Kitchin):
/// from the smallest print read at a known, focused test distance, the viewing distance at which the target
/// print is the reserve times larger than threshold. Magnification is stated relative to the test distance.
/// </summary>
public static class NearAcuityMethod
{
    /// <summary>
    /// EVD_req = d × M_t / (M_th × R) and Feq = (M_th × R) / (d × M_t).
    /// Bailey's example: 4M read at 32 cm, target 0.8M, no reserve → EVD 6.4 cm.
    /// </summary>
    /// <param name="thresholdPrint">The smallest print read at the test distance.</param>
    /// <param name="testDistance">The test distance, at which the reader was focused (wearing the add for it).</param>
    /// <param name="target">The print size the reader wants to read.</param>
    /// <param name="reserve">The acuity reserve wanted (spot 1:1, fluent 2:1, sustained 3:1).</param>
    /// <exception cref="ArgumentOutOfRangeException">A print size or the test distance is not greater than zero.</exception>
    public static PowerEstimate Estimate(PrintSize thresholdPrint, Distance testDistance, PrintSize target, AcuityReserve reserve)
    {
        MethodInputGuards.Print(thresholdPrint, nameof(thresholdPrint), "smallest print read");
        MethodInputGuards.TestDistance(testDistance, nameof(testDistance));
        MethodInputGuards.Print(target, nameof(target), "target print size");
        // Near-acuity method: Feq = (M_th × R) / (d × M_t), EVD = d × M_t / (M_th × R) (Bailey; Lovie-Kitchin; methods §2.2).
        var dioptres = thresholdPrint.M * reserve.Ratio / (testDistance.Metres * target.M);
        return PowerEstimate.Create(PowerMethod.NearAcuity, dioptres, testDistance, target, reserve,
            new AssumptionFacts(thresholdPrint, testDistance));
    }

    /// <summary>The method's assumptions, with the measurements formatted for <paramref name="provider"/>.</summary>
    internal static ImmutableArray<string> Assumptions(PowerEstimate estimate, IFormatProvider provider) =>
    [
        string.Create(provider, $"Near acuity: smallest print read {estimate.Facts.MeasuredPrint} at {estimate.Facts.TestDistance.Centimetres:0.#} cm."),
        string.Create(provider, $"Target print {estimate.TargetPrint} with an acuity reserve of {estimate.Reserve}: the target is made that many times larger than threshold."),
        "It assumes the reader was focused at the test distance (wearing the add for it); if not, near acuity was measured too poor and this estimate is too high.",
    ];
}
