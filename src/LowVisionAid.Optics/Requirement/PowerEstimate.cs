using System.Collections.Immutable;
using System.Globalization;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// One method's estimate of the equivalent power a reader needs for a target print size: the power, the
/// equivalent viewing distance, the magnification relative to a stated reference distance, and the assumptions
/// the method made, in plain words. Immutable; made by the method classes (<see cref="KestenbaumRule"/>,
/// <see cref="NearAcuityMethod"/>, <see cref="CriticalPrintSizeMethod"/>).
/// An estimate is a starting point for the practitioner, to be confirmed by a trial with the reader's own material.
/// </summary>
/// <remarks>
/// Implementation note: an estimate keeps the numbers its texts are made from and formats the texts only when they
/// are asked for, in the caller's culture, so that building a plan does not pay for text nobody reads.
/// </remarks>
public sealed record PowerEstimate
{
    private PowerEstimate(
        PowerMethod method,
        Power equivalentPower,
        Distance referenceDistance,
        PrintSize targetPrint,
        AcuityReserve? reserve,
        AssumptionFacts facts)
    {
        Method = method;
        EquivalentPower = equivalentPower;
        ReferenceDistance = referenceDistance;
        TargetPrint = targetPrint;
        Reserve = reserve;
        Facts = facts;
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

    /// <summary>
    /// A plain-words note of the reference in the current culture, e.g. "Magnification is stated relative to 25 cm
    /// (M = Feq × 25 cm)." Use <see cref="FormatReferenceNote"/> to choose the culture.
    /// </summary>
    public string ReferenceNote => FormatReferenceNote(CultureInfo.CurrentCulture);

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

    /// <summary>
    /// The assumptions the method made, in plain words, for showing beside the result; numbers are in the current
    /// culture. Formatted on each call: use <see cref="FormatAssumptions"/> to choose the culture.
    /// </summary>
    public ImmutableArray<string> Assumptions => FormatAssumptions(CultureInfo.CurrentCulture);

    /// <summary>The numbers the assumption texts are made from (the measurements, not the result).</summary>
    internal AssumptionFacts Facts { get; }

    /// <summary>The assumptions the method made, in plain words, with numbers formatted for <paramref name="provider"/>.</summary>
    /// <param name="provider">The culture for numbers; null for the current culture.</param>
    public ImmutableArray<string> FormatAssumptions(IFormatProvider? provider)
    {
        provider ??= CultureInfo.CurrentCulture;
        return Method switch
        {
            PowerMethod.KestenbaumClassic => KestenbaumRule.ClassicAssumptions,
            PowerMethod.KestenbaumWithReserve => KestenbaumRule.AssumptionsWithReserve(this, provider),
            PowerMethod.NearAcuity => NearAcuityMethod.Assumptions(this, provider),
            _ => CriticalPrintSizeMethod.Assumptions(this, provider),
        };
    }

    /// <summary>The note of the reference distance, with numbers formatted for <paramref name="provider"/>.</summary>
    /// <param name="provider">The culture for numbers; null for the current culture.</param>
    public string FormatReferenceNote(IFormatProvider? provider)
    {
        var cm = ReferenceDistance.Centimetres;
        return string.Create(provider ?? CultureInfo.CurrentCulture,
            $"Magnification is stated relative to {cm:0.#} cm (M = Feq × {cm:0.#} cm).");
    }

    /// <summary>Magnification relative to another reference distance: M = Feq × d_ref (Bailey 2004 notes).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The reference distance is not greater than zero.</exception>
    public double MagnificationRelativeTo(Distance reference) =>
        EquivalentPower.MagnificationRelativeTo(MethodInputGuards.ReferenceDistance(reference, nameof(reference)));

    /// <summary>The same estimate with its magnification stated relative to another reference distance.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The reference distance is not greater than zero.</exception>
    public PowerEstimate WithReference(Distance reference) =>
        new(Method, EquivalentPower, MethodInputGuards.ReferenceDistance(reference, nameof(reference)), TargetPrint, Reserve, Facts);

    internal static PowerEstimate Create(
        PowerMethod method,
        double equivalentPowerDioptres,
        Distance referenceDistance,
        PrintSize targetPrint,
        AcuityReserve? reserve,
        AssumptionFacts facts = default)
    {
        return new(method, Power.FromDioptres(equivalentPowerDioptres), referenceDistance, targetPrint, reserve, facts);
    }
}

/// <summary>
/// The measurements behind an estimate's assumption texts: the print measured (the near threshold or the critical
/// print size) and its test distance, and for a reading curve its maximum reading speed and whether reading had
/// slowed at the smallest print tested.
/// </summary>
internal readonly record struct AssumptionFacts(
    PrintSize MeasuredPrint,
    Distance TestDistance,
    double? MaximumReadingSpeed = null,
    bool SpeedFellBelowCriticalPrintSize = true);
