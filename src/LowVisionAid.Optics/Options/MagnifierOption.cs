using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>The classes of option a plan considers.</summary>
public enum OptionKind
{
    /// <summary>Moving closer (relative distance magnification) with accommodation or a modest add.</summary>
    MovingCloser = 1,

    /// <summary>Large print (relative size magnification) at the preferred distance.</summary>
    LargePrint = 2,

    /// <summary>Spectacle-mounted high add, one eye or both.</summary>
    SpectacleAdd = 3,

    /// <summary>Hand magnifier.</summary>
    HandMagnifier = 4,

    /// <summary>Stand magnifier.</summary>
    StandMagnifier = 5,

    /// <summary>Telemicroscope (near telescope with a reading cap).</summary>
    NearTelescope = 6,

    /// <summary>Video magnifier or screen enlargement.</summary>
    VideoMagnifier = 7,

    /// <summary>Hand-held telescope for distance tasks (television, faces, signs).</summary>
    DistanceTelescope = 8,

    /// <summary>Spectacle-mounted (hands-free) telescope for distance tasks.</summary>
    SpectacleTelescope = 9,

    /// <summary>The text size or zoom built into a phone, tablet or computer (screen tasks).</summary>
    ScreenMagnification = 10,
}

/// <summary>How many characters of the target print are in view, judged against reading fluency (methods §4.3).</summary>
public enum FluencyWarning
{
    /// <summary>Enough characters in view, or the field is not limited by a lens.</summary>
    None = 0,

    /// <summary>Fewer than 10 characters in view for sustained reading: reading may be slow and tiring (common practice).</summary>
    FewerThanTenForSustainedReading = 1,

    /// <summary>Fewer than 4 characters in view: fluent reading is unlikely (Whittaker and Lovie-Kitchin 1993; Legge et al. 1985).</summary>
    FewerThanFour = 2,
}

/// <summary>Whether both eyes can be used, and what that asks of them.</summary>
/// <param name="Feasible">True when binocular use is usually possible for this client and option.</param>
/// <param name="ConvergenceDemand">
/// Total convergence demand in prism dioptres when used with both eyes (0 for one eye), by the one rule
/// <see cref="Devices.Convergence.AtSpectaclePlane"/>.
/// </param>
/// <param name="BaseInPrismEachEye">
/// Base-in prism in each lens in the dispensing form, add + 2 Δ base-in each eye (methods §3.2, §11; Siemsen 2012),
/// when it applies.
/// </param>
public readonly record struct BinocularUse(bool Feasible, double ConvergenceDemand, double? BaseInPrismEachEye)
{
    /// <summary>One eye: no convergence, no prism.</summary>
    public static BinocularUse OneEye { get; } = new(false, 0, null);

    /// <summary>
    /// The convergence left for the eyes after the prism: demand − 2 × prism each eye (methods §11), never below 0;
    /// the whole demand when there is no prism.
    /// </summary>
    public double ResidualConvergence => Math.Max(0, ConvergenceDemand - (2 * (BaseInPrismEachEye ?? 0)));
}

/// <summary>
/// Aberration figures for a strong lens: prismatic effect 1 cm from the centre (Prentice's rule) and the colour fringe
/// it brings in crown glass and polycarbonate (P/V; methods §10.2).
/// </summary>
/// <param name="PrismAtOneCentimetre">Prismatic effect 1 cm from the optical centre, Δ.</param>
/// <param name="FringeCrownGlass">Transverse chromatic aberration there in crown glass (V ≈ 58), Δ.</param>
/// <param name="FringePolycarbonate">The same in polycarbonate (V ≈ 30), Δ.</param>
public readonly record struct AberrationNotes(double PrismAtOneCentimetre, double FringeCrownGlass, double FringePolycarbonate)
{
    /// <summary>Lens powers from which aberration notes are given: +10 D.</summary>
    public static Power HighPowerFrom { get; } = Power.FromDioptres(10);

    /// <summary>The advice that goes with the figures.</summary>
    public const string Advice =
        "A strong lens is sharpest in its centre: the usable field is smaller than calculated, colour fringes grow towards the edge, and an aspheric or doublet design and a low-dispersion material help. Look through the middle of the lens.";

    /// <summary>The notes for a lens, or null below <see cref="HighPowerFrom"/>.</summary>
    public static AberrationNotes? For(Power lens)
    {
        if (lens < HighPowerFrom)
        {
            return null;
        }

        var prism = Prentice.PrismaticEffect(Distance.FromCentimetres(1), lens);
        return new AberrationNotes(prism, Prentice.ColourFringe(prism, Prentice.CrownGlassAbbe), Prentice.ColourFringe(prism, Prentice.PolycarbonateAbbe));
    }
}

/// <summary>
/// One way of giving the client the magnification they need, with every figure the practitioner needs to judge it.
/// Immutable. Distances shown to users are magnitudes. Each class adds its own device settings.
/// </summary>
public abstract record MagnifierOption
{
    /// <summary>The class of option.</summary>
    public abstract OptionKind Kind { get; }

    /// <summary>The kit device these figures were computed for, or null for a generic option.</summary>
    public string? KitDeviceId { get; init; }

    /// <summary>False when the option cannot be built for this client; <see cref="NotApplicableBecause"/> says why.</summary>
    public bool IsApplicable { get; init; } = true;

    /// <summary>Why the option does not apply, or null.</summary>
    public string? NotApplicableBecause { get; init; }

    /// <summary>The equivalent power this option has to give.</summary>
    public required Power RequiredPower { get; init; }

    /// <summary>The equivalent power it actually gives.</summary>
    public required Power DeliveredPower { get; init; }

    /// <summary>True when the delivered power meets the required one within the plan's tolerance.</summary>
    public required bool MeetsRequiredPower { get; init; }

    /// <summary>False when the power is met only in an impractical form; <see cref="PracticalNote"/> says why.</summary>
    public bool IsPractical { get; init; } = true;

    /// <summary>True when the option can be built, gives the required power and does so in a practical form.</summary>
    public bool IsUsable => IsApplicable && MeetsRequiredPower && IsPractical;

    /// <summary>True for a device that needs a battery or the mains: a video magnifier or an illuminated magnifier.</summary>
    public bool IsPowered => Kind == OptionKind.VideoMagnifier || this is HandMagnifierOption { Illuminated: true } or StandMagnifierOption { Illuminated: true };

    /// <summary>Why the option is impractical, or null.</summary>
    public string? PracticalNote { get; init; }

    /// <summary>The lens (or add) power in dioptres, when the option has a lens.</summary>
    public Power? LensPower { get; init; }

    /// <summary>The "×" the lens would carry under both conventions against 25 cm, when it has a lens.</summary>
    public LabelReadings? Labels { get; init; }

    /// <summary>Working distance: lens (or eye, without a lens) to page.</summary>
    public required Distance WorkingDistance { get; init; }

    /// <summary>The assumed distance from the eye (spectacle plane) to the lens, or null without a separate lens.</summary>
    public Distance? EyeToLens { get; init; }

    /// <summary>Linear field on the page, or null when no lens limits it.</summary>
    public Distance? LinearField { get; init; }

    /// <summary>Characters of the target print in view (k × x-height pitch), or null when no lens limits them.</summary>
    public double? CharactersInView { get; init; }

    /// <summary>
    /// Depth of field (exact vergence form at the option's focusing power and the plan's blur tolerance), or null when
    /// it reaches to infinity.
    /// </summary>
    public required Distance? DepthOfField { get; init; }

    /// <summary>Binocular use and its demands.</summary>
    public required BinocularUse Binocular { get; init; }

    /// <summary>Accommodation or reading add the client needs with this option (0 D when none).</summary>
    public required Power AccommodationOrAddNeeded { get; init; }

    /// <summary>Light and contrast advice.</summary>
    public required string LightAndContrast { get; init; }

    /// <summary>True when the client's hands are free while using it.</summary>
    public required bool HandsFree { get; init; }

    /// <summary>True when it does not need a steady hand (suits a tremor).</summary>
    public required bool SuitsTremor { get; init; }

    /// <summary>Posture notes.</summary>
    public required string Posture { get; init; }

    /// <summary>The fluency warning from the characters in view.</summary>
    public FluencyWarning Fluency { get; init; }

    /// <summary>Aberration notes for strong lenses (see <see cref="AberrationNotes.Advice"/>), or null.</summary>
    public AberrationNotes? Aberrations { get; init; }

    /// <summary>The cost class of this option (from <see cref="DeviceRanges.Costs"/>).</summary>
    public CostClass Cost { get; init; } = CostClass.Medium;

    /// <summary>
    /// Whole letters of the target print in view: ⌊characters⌋, the one rounding rule for letters (summary, table and
    /// figures all use it); null when no lens limits them.
    /// </summary>
    public int? LettersInView => CharactersInView is { } c ? (int)Math.Floor(c + 1e-9) : null;

    /// <summary>Distance from the eye (spectacle plane) to the page: eye-to-lens plus lens-to-page.</summary>
    public Distance EyeToPage => (EyeToLens ?? Distance.Zero).Abs() + WorkingDistance.Abs();

    /// <summary>
    /// A one-line plain-language summary, formatted with <paramref name="provider"/>. An option beyond its class's
    /// realistic range says so rather than describing a device that cannot be made.
    /// </summary>
    public string Summary(IFormatProvider provider) => !IsApplicable && NotApplicableBecause is { } why
        ? OptionNotes.NotNeededPrefix + why
        : BeyondRange && PracticalNote is { } note
            ? OptionNotes.NotPracticalPrefix + note
            : Describe(provider);

    /// <summary>True when the device this option needs is beyond its class's realistic range (<see cref="DeviceRanges"/>).</summary>
    public bool BeyondRange { get; init; }

    /// <summary>The summary of an option within its class's range.</summary>
    protected abstract string Describe(IFormatProvider provider);

    /// <summary>"1 letter", "12 letters", or "less than one letter" for a whole count (see <see cref="LettersInView"/>).</summary>
    public static string LettersText(int letters, IFormatProvider provider) => letters switch
    {
        <= 0 => "less than one letter",
        1 => "1 letter",
        _ => string.Format(provider, "{0} letters", letters),
    };

    /// <summary>The text of a fluency warning, or null for none.</summary>
    public static string? FluencyText(FluencyWarning warning) => warning switch
    {
        FluencyWarning.FewerThanFour => "Fewer than 4 letters in view: fluent reading is unlikely; use it for short spot tasks.",
        FluencyWarning.FewerThanTenForSustainedReading => "Fewer than 10 letters in view: long reading may be slow and tiring.",
        _ => null,
    };
}
