using System.Collections.Immutable;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Kestenbaum's rule: the required add or equivalent power from distance acuity (Kestenbaum and Sturman 1956,
/// AMA Arch Ophthalmol 56:451–470). Magnification is stated relative to 25 cm unless re-based with
/// <see cref="PowerEstimate.WithReference"/>.
/// </summary>
public static class KestenbaumRule
{
    /// <summary>The reference distance for the magnification of a Kestenbaum estimate: 25 cm (the F/4 convention).</summary>
    public static Distance DefaultReference => Distance.FromCentimetres(25);

    /// <summary>
    /// The classic rule: add (D) = 1 / V_dec = Snellen denominator ÷ numerator. It brings 1M print to the
    /// reader's threshold, with no acuity reserve (6/60 or 20/200 → +10 D).
    /// </summary>
    /// <param name="distanceAcuity">The distance visual acuity with the distance correction.</param>
    public static PowerEstimate Classic(Acuity distanceAcuity)
    {
        // Kestenbaum: add = 1 / V_dec (Kestenbaum and Sturman 1956).
        var dioptres = 1.0 / distanceAcuity.DecimalValue;
        return PowerEstimate.Create(PowerMethod.KestenbaumClassic, dioptres, DefaultReference, PrintSize.FromM(1), AcuityReserve.Spot);
    }

    /// <summary>
    /// The general form for a target print size and an acuity reserve: Feq = R / (V_dec × M_t). With R = 1:1 and
    /// M_t = 1M it equals <see cref="Classic"/>.
    /// </summary>
    /// <param name="distanceAcuity">The distance visual acuity with the distance correction.</param>
    /// <param name="target">The print size the reader wants to read (x-height in M units).</param>
    /// <param name="reserve">The acuity reserve wanted (spot 1:1, fluent 2:1, sustained 3:1).</param>
    /// <exception cref="ArgumentOutOfRangeException">The target print size is not greater than zero.</exception>
    public static PowerEstimate WithReserve(Acuity distanceAcuity, PrintSize target, AcuityReserve reserve)
    {
        MethodInputGuards.Print(target, nameof(target), "target print size");
        // Kestenbaum general form: Feq = R / (V_dec × M_t) (derived from the rule's 1M-at-threshold basis; methods §2.1).
        var dioptres = reserve.Ratio / (distanceAcuity.DecimalValue * target.M);
        return PowerEstimate.Create(PowerMethod.KestenbaumWithReserve, dioptres, DefaultReference, target, reserve);
    }

    private const string NearAsDistancePredicts =
        "It assumes near vision is as good as distance acuity predicts; distance acuity often under-estimates the near need (for example with a central scotoma, cataract or small pupils).";

    /// <summary>The classic rule's assumptions: no numbers in them, so one copy serves every culture.</summary>
    internal static readonly ImmutableArray<string> ClassicAssumptions =
    [
        "Kestenbaum's rule: the add is the reciprocal of the decimal distance acuity (Kestenbaum and Sturman 1956).",
        "It brings 1M print (about newsprint) just to the reader's threshold, with no acuity reserve: expect slow, effortful reading at best.",
        NearAsDistancePredicts,
    ];

    /// <summary>The general form's assumptions, with the target and reserve formatted for <paramref name="provider"/>.</summary>
    internal static ImmutableArray<string> AssumptionsWithReserve(PowerEstimate estimate, IFormatProvider provider) =>
    [
        "Kestenbaum's rule extended to the target print size and an acuity reserve: Feq = reserve ÷ (decimal distance acuity × target M size).",
        string.Create(provider, $"Target print {estimate.TargetPrint} with an acuity reserve of {estimate.Reserve}."),
        NearAsDistancePredicts,
    ];
}
