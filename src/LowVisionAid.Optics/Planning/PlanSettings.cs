using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Planning;

/// <summary>
/// Settings and stated assumptions of a plan. Every assumption the figures rest on is here, named, so that the
/// practitioner can see and change it. Immutable; <see cref="Default"/> holds the documented defaults.
/// </summary>
public sealed record PlanSettings
{
    /// <summary>The documented defaults.</summary>
    public static PlanSettings Default { get; } = new();

    /// <summary>Mean character pitch as a multiple of x-height, k. Default 1.1 (methods §4.2; approximate, from memory).</summary>
    public double CharacterPitch { get; init; } = 1.1;

    /// <summary>
    /// Total dioptric blur tolerance ΔF for depth of field (not ±), as set by the clinician. Default 0.59 D, the total
    /// subjective depth of focus of a normal eye with a 4 mm pupil (Atchison, Charman and Woods 1997). While
    /// <see cref="BlurToleranceFollowsAcuity"/> is true the planner uses <see cref="DepthOfFieldRule.BlurToleranceFor"/>
    /// the client's distance acuity instead, since tolerance grows as acuity falls (Legge, Mullen, Woo and Campbell 1987).
    /// </summary>
    public Power BlurTolerance { get; init; } = Power.FromDioptres(DepthOfFieldRule.NormalEyeDioptres);

    /// <summary>
    /// True (the default) to take the blur tolerance from the client's distance acuity
    /// (<see cref="DepthOfFieldRule"/>); false to use <see cref="BlurTolerance"/> as set.
    /// </summary>
    public bool BlurToleranceFollowsAcuity { get; init; } = true;

    /// <summary>The ratio of each acuity-reserve level. Default spot 1:1, fluent 2:1, sustained 3:1 (methods §2.3).</summary>
    public ReserveRatios Reserves { get; init; } = ReserveRatios.Default;

    /// <summary>
    /// The fraction of the required equivalent power an option must deliver to count as meeting it.
    /// Default 10^−0.02 ≈ 0.955: within one letter (0.02 log units) of a logMAR chart (methods §1.1).
    /// </summary>
    public double PowerTolerance { get; init; } = Math.Pow(10, -0.02);

    /// <summary>Assumed spectacle-plane-to-lens distance for a hand magnifier. Default 25 cm (assumption).</summary>
    public Distance HandMagnifierEyeDistance { get; init; } = Distance.FromCentimetres(25);

    /// <summary>Assumed spectacle-plane-to-lens distance for a stand magnifier. Default 15 cm (assumption).</summary>
    public Distance StandMagnifierEyeDistance { get; init; } = Distance.FromCentimetres(15);

    /// <summary>
    /// The realistic range of each device class, the aperture made at each power and the cost classes, in one table
    /// (<see cref="DeviceRanges"/>; the clinic may edit it). Default <see cref="DeviceRanges.Default"/>.
    /// </summary>
    public DeviceRanges Ranges { get; init; } = DeviceRanges.Default;

    /// <summary>Clear aperture assumed for a spectacle lens. Default 40 mm (assumption).</summary>
    public Distance SpectacleLensAperture { get; init; } = Distance.FromMillimetres(40);

    /// <summary>Reading add assumed when the client wears none and an add is needed. Default +2.50 D (common practice).</summary>
    public Power TypicalReadingAdd { get; init; } = Power.FromDioptres(2.5);

    /// <summary>The largest add counted as "modest" for moving closer. Default +4.00 D (common practice; ready readers).</summary>
    public Power ModestAddLimit { get; init; } = Power.FromDioptres(4);

    /// <summary>Screen width assumed for a video magnifier or a computer. Default 40 cm (assumption; a 19–20 inch monitor).</summary>
    public Distance ScreenWidth { get; init; } = Distance.FromCentimetres(40);

    /// <summary>Apparent (eyepiece) field assumed for telescopes. Default 40° (assumption, from memory).</summary>
    public VisualAngle TelescopeApparentField { get; init; } = VisualAngle.FromDegrees(40);

    /// <summary>Objective power assumed for telescope length. Default +10 D (as in CV-21; assumption).</summary>
    public Power TelescopeObjective { get; init; } = Power.FromDioptres(10);

    /// <summary>Eye relief assumed for telescopes. Default 10 mm (assumption).</summary>
    public Distance TelescopeEyeRelief { get; init; } = Distance.FromMillimetres(10);
}
