using System.Text;

namespace LowVisionAid.Optics.Options;

/// <summary>The plain-language notes options carry. One home for the wording.</summary>
public static class OptionNotes
{
    /// <summary>Moving closer needs more than a modest add.</summary>
    public const string MoreThanModestAdd = "Getting this close needs more than a modest add: see the spectacle high add.";

    /// <summary>Large print beyond usual sizes.</summary>
    public const string BeyondUsualLargePrint = "This is larger than usual large print (about 2 to 2.5 times the original is the practical limit).";

    /// <summary>Stand design not needed.</summary>
    public const string AddAloneIsEnough = "The client's add alone gives nearly this power; a stand magnifier adds little.";

    /// <summary>Spectacle add not needed.</summary>
    public const string AccommodationAloneIsEnough = "The client's own focusing gives this power: see moving closer.";

    /// <summary>The start of the summary of an option that does not apply.</summary>
    public const string NotNeededPrefix = "Not needed: ";

    /// <summary>The start of the summary of an option beyond its class's range.</summary>
    public const string NotPracticalPrefix = "Not practical: ";

    /// <summary>A device beyond its class's range: {0} the device, {1} the need, {2} its unit, {3} the strongest usually made.</summary>
    public static readonly CompositeFormat BeyondRangeFormat = CompositeFormat.Parse("{0} of {1:0.#}{2} would be needed; the strongest usually made is about {3:0.#}{2}.");

    /// <summary>A video magnifier beyond its useful enlargement: {0} the enlargement needed, {1} the largest useful one.</summary>
    public static readonly CompositeFormat VideoBeyondRangeFormat = CompositeFormat.Parse("An enlargement of {0:0}× would be needed, but fewer than 4 letters would fit on a screen line beyond about {1:0}×.");

    /// <summary>Screen magnification beyond the screen: {0} the zoom needed.</summary>
    public static readonly CompositeFormat ScreenBeyondRangeFormat = CompositeFormat.Parse("A zoom of {0:0} % would be needed, but fewer than 4 letters would then fit across this screen; use a larger screen or speech output.");

    /// <summary>Moving closer when the print is already large enough at the preferred distance.</summary>
    public const string AlreadyLargeEnough = "The print is already large enough at the preferred distance.";

    /// <summary>Light for built-in screen magnification.</summary>
    public const string LightScreen = "Turn the screen brightness up and reduce reflections; high-contrast text helps.";

    /// <summary>Light for built-in screen magnification when contrast sensitivity or lighting is poor.</summary>
    public const string LightScreenReversed = "Contrast is poor: turn on reversed polarity (light text on a dark background; the colour-inversion or dark setting) and high-contrast text, and keep the room light off the screen.";

    /// <summary>Posture: screens.</summary>
    public const string PostureScreen = "Hold or place the screen at the stated distance; a stand or arm for the screen saves the neck and arms.";

    /// <summary>Posture: spectacle-mounted telescopes.</summary>
    public const string PostureSpectacleTelescope = "Seated, for watching (television, a talk, a stage); take the spectacles off or look under the telescope to move about.";

    /// <summary>Light for close work without a lens.</summary>
    public const string LightCloseWork = "Light the page well from the side, shielded from the eyes; matt paper and dark, well-spaced print help.";

    /// <summary>Light for distance tasks.</summary>
    public const string LightDistance = "Reduce glare from windows and lamps behind the screen; good room light helps faces and signs.";

    /// <summary>Light for large print.</summary>
    public const string LightLargePrint = "Bold, high-contrast print on matt paper, with a task lamp on the page.";

    /// <summary>Light for spectacle adds.</summary>
    public const string LightSpectacleAdd = "The short working distance leaves little room for light: use a lamp beside the page, aimed at the page, not the eyes.";

    /// <summary>Light for hand magnifiers.</summary>
    public const string LightHandMagnifier = "Light the page from the side; an illuminated hand magnifier helps when contrast is poor.";

    /// <summary>Light for stand magnifiers.</summary>
    public const string LightStandMagnifier = "The stand can shade the page: an illuminated stand magnifier, or a lamp close to the page, helps.";

    /// <summary>Light for telemicroscopes.</summary>
    public const string LightNearTelescope = "The longer working distance leaves room for a task lamp; the view is dimmer than with a plain lens.";

    /// <summary>Light for video magnifiers.</summary>
    public const string LightVideo = "Contrast, brightness and reversed polarity (light text on dark) can be set on the screen: the first choice when contrast sensitivity is poor.";

    /// <summary>Posture: moving closer.</summary>
    public const string PostureCloser = "Bring the page up to the eyes rather than bending down: a reading stand or a sloping board helps.";

    /// <summary>Posture: sitting nearer a distant target.</summary>
    public const string PostureSitNearer = "Sit nearer the television or go closer to the sign; no device is needed.";

    /// <summary>Posture: large print.</summary>
    public const string PostureLargePrint = "Read at the usual distance, seated comfortably, with a reading stand for long sessions.";

    /// <summary>Posture: spectacle adds.</summary>
    public const string PostureSpectacleAdd = "Hold the page at the working distance, not the head to the page: a reading stand helps. Take off the spectacles before standing or walking.";

    /// <summary>Posture: hand magnifiers.</summary>
    public const string PostureHandMagnifier = "Wear distance glasses, rest the lens on the page and lift it slowly until the print is clear; bring the eye closer to see more.";

    /// <summary>Posture: stand magnifiers.</summary>
    public const string PostureStandMagnifier = "Keep the stand flat on the page and look from the stated eye distance with the reading add; a sloping board eases the neck.";

    /// <summary>Posture: telemicroscopes.</summary>
    public const string PostureNearTelescope = "Keep the page at the working distance and move it rather than the head; the field is small, so reading stands help.";

    /// <summary>Posture: video magnifiers.</summary>
    public const string PostureVideo = "Sit square to the screen at the viewing distance; move the page under the camera, not the head.";

    /// <summary>Posture: distance telescopes.</summary>
    public const string PostureDistanceTelescope = "Use it seated or standing still, braced if possible; never while walking.";

    /// <summary>Stand magnifier labels.</summary>
    public const string StandLabelsUnreliable = "The \"×\" printed on a stand magnifier is unreliable: judge it by its power, image position and enlargement ratio, never by the \"×\" alone.";

    /// <summary>The label of a near option's linear field.</summary>
    public const string FieldOnPage = "Field on the page";

    /// <summary>The label of a distance telescope's linear field, measured at the object.</summary>
    public const string FieldAtViewingDistance = "Field at the viewing distance";

    /// <summary>The label of a near option's focusing: the eye's own accommodation, or a reading add, beyond the distance correction.</summary>
    public const string FocusingOrAdd = "Focusing or add needed";

    /// <summary>
    /// The label of a distance telescope's focusing: what the eye would need if the telescope stayed set for far,
    /// supplied by turning its focus (or a cap) instead (methods §3.5).
    /// </summary>
    public const string FocusingFromFarSetting = "Focusing from its far setting";

    /// <summary>
    /// True for an option planned for distance viewing (a distance telescope, or sitting nearer the television): it has
    /// no page, so letters of print in view are not counted.
    /// </summary>
    public static bool ForDistanceViewing(MagnifierOption option)
    {
        ArgumentNullException.ThrowIfNull(option);
        return Ranking.IsDistanceKind(option.Kind) || option is MovingCloserOption { DistanceTask: true };
    }

    /// <summary>The label of an option's linear field: on the page, or at the viewing distance for a distance telescope.</summary>
    public static string FieldLabel(OptionKind kind) => Ranking.IsDistanceKind(kind) ? FieldAtViewingDistance : FieldOnPage;

    /// <summary>The label of the focusing an option asks beyond the distance correction (<see cref="MagnifierOption.AccommodationOrAddNeeded"/>).</summary>
    public static string FocusingLabel(OptionKind kind) => Ranking.IsDistanceKind(kind) ? FocusingFromFarSetting : FocusingOrAdd;
}
