using LowVisionAid.Optics.Devices;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Options;

/// <summary>
/// Option 5: a stand magnifier, from lens power and stand height or from the image position and enlargement ratio,
/// viewed with the reading add from the eye distance that focuses its image (methods §3.4). Its "×" label is never used.
/// </summary>
public sealed record StandMagnifierOption : MagnifierOption
{
    /// <inheritdoc/>
    public override OptionKind Kind => OptionKind.StandMagnifier;

    /// <summary>The stand magnifier's geometry (lens power, stand height, image position, enlargement ratio).</summary>
    public required StandMagnifier Stand { get; init; }

    /// <summary>The view from the eye distance used: add needed, EVD and equivalent power.</summary>
    public required StandMagnifierView View { get; init; }

    /// <summary>The clear aperture used for the field.</summary>
    public required Distance Aperture { get; init; }

    /// <summary>True when the device is illuminated (kit devices).</summary>
    public bool Illuminated { get; init; }

    /// <summary>Why the "×" label is not used.</summary>
    public static string LabelWarning => OptionNotes.StandLabelsUnreliable;

    /// <summary>
    /// Designs a stand for a context: with add A at eye distance z, F = (F_eq − A)/(1 − zA) and |l′| = 1/A − z
    /// (Gullstrand solved for F₁; methods §3.4). Null when the add alone nearly gives the power (F &lt; +1 D).
    /// </summary>
    public static StandMagnifierOption? Create(OptionContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var a = context.Add;
        var z = context.Settings.StandMagnifierEyeDistance.Metres;
        if (z * a >= 1.0)
        {
            z = 0.5 / a;
        }

        // Gullstrand solved for the lens: F = (Feq − A)/(1 − zA) (derived from methods §3.1)
        var lens = (context.Required - a) / (1.0 - (z * a));
        if (lens < 1.0)
        {
            return null;
        }

        var image = (1.0 / a) - z;
        var stand = StandMagnifier.FromImagePosition(OptionContext.Metres(image), 1.0 + (lens * image));
        var option = FromStand(context, stand, OptionContext.Metres(z), context.Ranges.ApertureFor(stand.LensPower), context.WantsLight, null);
        var beyond = DeviceRanges.Beyond("A stand magnifier lens", lens, context.Ranges.StrongestStandMagnifier.Dioptres, " D");
        return beyond is null ? option : option with { IsPractical = false, PracticalNote = beyond, BeyondRange = true };
    }

    /// <summary>
    /// The figures for a given stand (a kit device): viewed from the eye distance where the client's add focuses the
    /// image (z = 1/A − |l′|), or from the plan's assumed eye distance when no such distance exists.
    /// </summary>
    public static StandMagnifierOption ForStand(OptionContext context, StandMagnifier stand, Distance aperture, bool illuminated, string? kitId)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(stand);
        var z = stand.EyeDistanceForAdd(OptionContext.Dioptres(context.Add)) ?? context.Settings.StandMagnifierEyeDistance;
        return FromStand(context, stand, z, aperture, illuminated, kitId);
    }

    private static StandMagnifierOption FromStand(OptionContext context, StandMagnifier stand, Distance eyeToLens, Distance aperture, bool illuminated, string? kitId)
    {
        var view = stand.ViewFrom(eyeToLens);
        var feq = view.EquivalentPower;
        var field = FieldOfView.LinearField(aperture, eyeToLens + FieldOfView.EntrancePupilBehindSpectacles, feq);
        var characters = context.Characters(field);
        // The image lies |l′| below the lens: the lines of sight are PD·|l′|/(z + |l′|) apart at the lens (methods §11).
        var pupil = eyeToLens + FieldOfView.EntrancePupilBehindSpectacles;
        var binocular = context.BothEyesThroughOneLens(aperture, pupil, stand.ImageBelowLens, feq);
        var imageToEye = eyeToLens + stand.ImageBelowLens;
        return new StandMagnifierOption
        {
            KitDeviceId = kitId,
            RequiredPower = OptionContext.Dioptres(context.Required),
            DeliveredPower = feq,
            MeetsRequiredPower = context.Meets(feq.Dioptres),
            LensPower = stand.LensPower,
            Labels = MagnifierLabel.Readings(stand.LensPower),
            WorkingDistance = stand.StandHeight,
            EyeToLens = eyeToLens,
            LinearField = field,
            CharactersInView = characters,
            DepthOfField = context.DepthOfField(feq.Dioptres),
            Binocular = binocular ? context.BothEyesAt(imageToEye) : BinocularUse.OneEye,
            Cost = context.Ranges.CostOf(OptionKind.StandMagnifier),
            AccommodationOrAddNeeded = view.AddNeeded,
            LightAndContrast = OptionNotes.LightStandMagnifier,
            HandsFree = false,
            SuitsTremor = true,
            Posture = OptionNotes.PostureStandMagnifier,
            Fluency = context.Fluency(characters),
            Aberrations = AberrationNotes.For(stand.LensPower),
            Stand = stand,
            View = view,
            Aperture = aperture,
            Illuminated = illuminated,
        };
    }

    /// <inheritdoc/>
    protected override string Describe(IFormatProvider provider) => string.Format(
        provider,
        "{0}tand magnifier {1:+0.00} D, {6:0} mm across, image {2:0.0} cm below the lens, enlargement {3:0.0}×: look from {4:0.0} cm with a {5:+0.00} D add, {7} in view.",
        Illuminated ? "Illuminated s" : "S",
        Stand.LensPower.Dioptres,
        Stand.ImageBelowLens.Centimetres,
        Stand.EnlargementRatio,
        View.EyeToLens.Centimetres,
        View.AddNeeded.Dioptres,
        Aperture.Millimetres,
        LettersText(LettersInView ?? 0, provider));
}
