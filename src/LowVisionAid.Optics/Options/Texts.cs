namespace LowVisionAid.Optics.Options;

/// <summary>The plain-language notes options carry. One home for the wording.</summary>
public static class Texts
{
    /// <summary>Moving closer needs more than a modest add.</summary>
    public const string MoreThanModestAdd = "Getting this close needs more than a modest add: see the spectacle high add.";

    /// <summary>Large print beyond usual sizes.</summary>
    public const string BeyondUsualLargePrint = "This is larger than usual large print (about 2 to 2.5 times the original is the practical limit).";

    /// <summary>Stand design not needed.</summary>
    public const string AddAloneIsEnough = "The client's add alone gives nearly this power; a stand magnifier adds little.";

    /// <summary>Spectacle add not needed.</summary>
    public const string AccommodationAloneIsEnough = "The client's own focusing gives this power: see moving closer.";

    /// <summary>Telescope beyond the practical range.</summary>
    public const string TelescopeBeyondRange = "This needs more than the strongest telescope considered (10× for distance; for near, 8× at a working distance shorter than the preferred one).";

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
}
