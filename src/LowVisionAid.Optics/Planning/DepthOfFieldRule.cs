using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Planning;

/// <summary>
/// The default blur tolerance ΔF for depth of field, from the client's distance acuity. A normal eye tolerates about
/// 0.59 D in total with a 4 mm pupil (Atchison, Charman and Woods 1997); tolerance to defocus grows as acuity falls
/// (Legge, Mullen, Woo and Campbell 1987, JOSA A 4:851), so a normal-eye value understates a low-vision reader's.
/// </summary>
/// <remarks>
/// The rule, ΔF = 0.59 D × √(MAR in minutes of arc), capped at <see cref="MaximumDioptres"/>, is an engineering
/// choice labelled "from memory": Legge et al. show the growth but no formula is taken from them. Geometric optics
/// makes the defocus that blurs by one MAR proportional to the MAR (derived: blur angle = pupil diameter × defocus);
/// the square root lies between no growth and that proportional growth, because reading still needs detail finer
/// than the letter as a whole. 6/60 (MAR 10′) gives 1.87 D; 6/24 gives 1.18 D; 6/6 gives 0.59 D. The clinician can
/// set a measured or preferred value instead (<see cref="PlanSettings.BlurToleranceFollowsAcuity"/> = false).
/// </remarks>
public static class DepthOfFieldRule
{
    /// <summary>The normal-eye total depth of focus for a 4 mm pupil: 0.59 D (Atchison, Charman and Woods 1997).</summary>
    public const double NormalEyeDioptres = 0.59;

    /// <summary>The largest default tolerance: 2.5 D (from memory; beyond it the figure means little).</summary>
    public const double MaximumDioptres = 2.5;

    /// <summary>The default blur tolerance for a distance acuity; the normal-eye value when the acuity is unknown or better than 6/6.</summary>
    public static Power BlurToleranceFor(Acuity? distanceAcuity)
    {
        var mar = distanceAcuity is { } a ? Math.Max(1.0, a.MarArcminutes) : 1.0;
        // ΔF = 0.59 D × √MAR, capped (from memory; growth with falling acuity after Legge, Mullen, Woo and Campbell 1987).
        return Power.FromDioptres(Math.Min(MaximumDioptres, NormalEyeDioptres * Math.Sqrt(mar)));
    }
}
