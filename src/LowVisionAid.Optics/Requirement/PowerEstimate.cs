using System.Collections.Immutable;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// One method's estimate of the equivalent power a reader needs for a target print size: the power, the
/// equivalent viewing distance, the magnification relative to a stated reference distance, and the assumptions
/// the method made, in plain words. Immutable; made by the method classes (<see cref="KestenbaumRule"/>,
/// <see cref="NearAcuityMethod"/>, <see cref="CriticalPrintSizeMethod"/>).
/// An estimate is a starting point for the practitioner, to be confirmed by a trial with the reader's own material.
/// </summary>
public sealed record PowerEstimate
{
    private PowerEstimate(
        PowerMethod method,
        Power equivalentPower,
        Distance referenceDistance,
        PrintSize targetPrint,
        AcuityReserve? reserve,
        ImmutableArray<string> assumptions)
    {
        Method = method;
        EquivalentPower = equivalentPower;
        ReferenceDistance = referenceDistance;
        TargetPrint = targetPrint;
        Reserve = reserve;
        Assumptions = assumptions;
    }

    /// <summary>The method that made this estimate.</summary>
    public PowerMethod Method { get; }

    /// <summary>The required equivalent power Feq (always greater than zero).</summary>
    public Power EquivalentPower { get; }

    /// <summary>The required equivalent viewing distance: EVD = 1 / Feq (Bailey 2004 notes).</summary>
    public Distance EquivalentViewingDistance => EquivalentPower.FocalLength;

    /// <summary>The reference distance <see cref="Magnification"/> is stated against (25 cm, or the test distance).</summary>
    public Distance ReferenceDistance { get; }

    /// <summary>Magnification relative to <see cref="ReferenceDistance"/>: M = Feq × d_ref (Bailey 2004 notes).</summary>
    public double Magnification => EquivalentPower.MagnificationRelativeTo(ReferenceDistance);

    /// <summary>A plain-words note of the reference, e.g. "Magnification is stated relative to 25 cm (M = Feq × 25 cm)."</summary>
    public string ReferenceNote =>
        $"Magnification is stated relative to {Inputs.Number(ReferenceDistance.Centimetres, "0.#")} cm (M = Feq × {Inputs.Number(ReferenceDistance.Centimetres, "0.#")} cm).";

    /// <summary>The print size the reader wants to read.</summary>
    public PrintSize TargetPrint { get; }

    /// <summary>
    /// The acuity reserve applied, or null when the method has the reserve built in (the critical print size
    /// already includes it, so no second reserve is applied).
    /// </summary>
    public AcuityReserve? Reserve { get; }

    /// <summary>
    /// The estimate in log units, log₁₀(Feq in D). Differences between estimates in these units are
    /// comparable to logMAR lines (0.1 = one line; 0.3 = a factor of 2).
    /// </summary>
    public double LogUnits => Math.Log10(EquivalentPower.Dioptres);

    /// <summary>The assumptions the method made, in plain words, for showing beside the result.</summary>
    public ImmutableArray<string> Assumptions { get; }

    /// <summary>Magnification relative to another reference distance: M = Feq × d_ref (Bailey 2004 notes).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The reference distance is not greater than zero.</exception>
    public double MagnificationRelativeTo(Distance reference) =>
        EquivalentPower.MagnificationRelativeTo(Inputs.ReferenceDistance(reference, nameof(reference)));

    /// <summary>The same estimate with its magnification stated relative to another reference distance.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The reference distance is not greater than zero.</exception>
    public PowerEstimate WithReference(Distance reference) =>
        new(Method, EquivalentPower, Inputs.ReferenceDistance(reference, nameof(reference)), TargetPrint, Reserve, Assumptions);

    internal static PowerEstimate Create(
        PowerMethod method,
        double equivalentPowerDioptres,
        Distance referenceDistance,
        PrintSize targetPrint,
        AcuityReserve? reserve,
        IEnumerable<string> assumptions)
    {
        return new(method, Power.FromDioptres(equivalentPowerDioptres), referenceDistance, targetPrint, reserve,
            assumptions.ToImmutableArray());
    }

    internal PowerEstimate WithAssumptions(ImmutableArray<string> assumptions) =>
        new(Method, EquivalentPower, ReferenceDistance, TargetPrint, Reserve, assumptions);
}
