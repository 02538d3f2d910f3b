using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 4: a hand magnifier, used with the distance correction (page at the focal point, image at infinity), and
/// the same lens with the reading add at the stated eye distance (Gullstrand), with where the page must then be.
/// </summary>
public sealed record HandMagnifierOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.HandMagnifier;

    /// <summary>The clear aperture used for the field.</summary>
    public required Distance Aperture { get; init; }

    /// <summary>Use with the distance correction (the figures of this option).</summary>
    public required HandMagnifierView WithDistanceCorrection { get; init; }

    /// <summary>Use with the reading add at the same eye distance, or null when no real page position gives a clear image.</summary>
    public HandMagnifierView? WithReadingAdd { get; init; }

    /// <summary>True when the device is illuminated (kit devices).</summary>
    public bool Illuminated { get; init; }

    /// <summary>
    /// Builds the option for a context: lens F = required power (rounded up to 0.25 D) with the aperture usually made at
    /// that power (<see cref="DeviceRanges.ApertureFor"/>), illuminated when contrast or light is poor; or a kit lens.
    /// </summary>
    public static HandMagnifierOption Create(OptionContext context, Power? kitLens = null, Distance? kitAperture = null, bool illuminated = false, string? kitId = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        var s = context.Settings;
        var lens = kitLens ?? OptionContext.Dioptres(OptionContext.RoundUpToQuarter(context.Required));
        var aperture = kitAperture ?? context.Ranges.ApertureFor(lens);
        illuminated |= kitLens is null && context.WantsLight;
        var beyond = kitLens is null ? DeviceRanges.Beyond("A hand magnifier", lens.Dioptres, context.Ranges.StrongestHandMagnifier.Dioptres, " D") : null;
        var z = s.HandMagnifierEyeDistance;
        var distance = HandMagnifier.WithDistanceCorrection(lens, z);
        HandMagnifierView? withAdd = null;
        var a = context.Add;
        var denominator = 1.0 - (z.Metres * a);
        // A real page exists when L = −A/(1 − zA) − F < 0 (methods §3.3)
        if (denominator != 0 && ((-a / denominator) - lens.Dioptres) < 0)
        {
            withAdd = HandMagnifier.WithAdd(lens, OptionContext.Dioptres(a), z);
        }

        var field = FieldOfView.LinearField(aperture, z + FieldOfView.EntrancePupilBehindSpectacles, lens);
        var characters = context.Characters(field);
        // Image at infinity (distance correction worn): the lines of sight are PD apart at the lens (methods §11).
        var binocular = context.BothEyesThroughOneLens(aperture, z + FieldOfView.EntrancePupilBehindSpectacles, null, lens);
        return new HandMagnifierOption
        {
            KitDeviceId = kitId,
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = distance.EquivalentPower,
            MeetsRequiredPower = context.Meets(distance.EquivalentPower.Dioptres),
            LensPower = lens,
            Labels = MagnifierLabel.Readings(lens),
            WorkingDistance = distance.LensToPage,
            EyeToLens = z,
            LinearField = field,
            CharactersInView = characters,
            DepthOfField = context.DepthOfField(lens.Dioptres),
            // Image at infinity: the light leaves the lens parallel, so the eyes need not converge (derived).
            Binocular = new BinocularUse(binocular, 0, null),
            IsPractical = beyond is null,
            PracticalNote = beyond,
            BeyondRange = beyond is not null,
            Cost = context.Ranges.CostOf(OptionKind.HandMagnifier),
            AccommodationOrAddNeeded = Power.Zero,
            LightAndContrast = OptionNotes.LightHandMagnifier,
            HandsFree = false,
            SuitsTremor = false,
            Posture = OptionNotes.PostureHandMagnifier,
            Fluency = context.Fluency(characters),
            Aberrations = AberrationNotes.For(lens),
            Aperture = aperture,
            WithDistanceCorrection = distance,
            WithReadingAdd = withAdd,
            Illuminated = illuminated,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "{0}and magnifier {1:+0.00} D, {2:0} mm across ({3:0.#}× nominal, {4:0.#}× trade, re 25 cm) held {5:0.0} cm above the page, distance glasses on: {6} in view.",
        Illuminated ? "Illuminated h" : "H",
        LensPower!.Value.Dioptres,
        Aperture.Millimetres,
        Labels!.Value.Nominal,
        Labels!.Value.Trade,
        WorkingDistance.Centimetres,
        LettersText(LettersInView ?? 0, provider));
}
