namespace LowVisionAid.Optics.Planning;

/// <summary>A caution shown with a plan. The set is fixed; each has a stable identifier for storage.</summary>
public sealed class Caution
{
    private Caution(string id, string text)
    {
        Id = id;
        Text = text;
    }

    /// <summary>Stable identifier, e.g. "starting-point".</summary>
    public string Id { get; }

    /// <summary>The plain-language caution.</summary>
    public string Text { get; }

    /// <summary>Results are a starting point.</summary>
    public static Caution StartingPoint { get; } = new("starting-point", "These figures are a starting point for the licensed practitioner: confirm the choice with a trial using the client's own reading material, and follow local rules.");

    /// <summary>The need is beyond every optical class (methods §11).</summary>
    public static Caution BeyondOptical { get; } = new("beyond-optical", "The magnification needed is beyond every optical aid that is usually made (spectacles, hand and stand magnifiers, telescopes): offer electronic magnification (a video magnifier, or zoom and speech on a phone, tablet or computer) and non-visual means (audio books, talking devices such as watches, scales and label readers, speech output, tactile marking), and refer to low-vision rehabilitation.");

    /// <summary>The need is beyond every optical class and beyond a video magnifier's useful enlargement (methods §11).</summary>
    public static Caution BeyondEveryDevice { get; } = new("beyond-every-device", "The magnification needed is beyond every optical aid and beyond what a video magnifier shows usefully (fewer than 4 letters a line): rely on non-visual means (audio books, talking devices such as watches, scales and label readers, speech output on phones and computers, tactile marking) and refer to low-vision rehabilitation and sight-loss services.");

    /// <summary>Sunlight and lenses.</summary>
    public static Caution SunlightFire { get; } = new("sunlight-fire", "A magnifying lens left in sunlight can focus it and start a fire: store lenses covered or in a drawer, away from windows.");

    /// <summary>Never look at the sun.</summary>
    public static Caution NeverAtTheSun { get; } = new("never-sun", "Never look at the sun through any magnifier or telescope.");

    /// <summary>Do not walk with strong aids.</summary>
    public static Caution NoWalking { get; } = new("no-walking", "Do not stand, walk or use stairs while looking through strong reading spectacles, a magnifier or a telescope.");

    /// <summary>Driving rules.</summary>
    public static Caution Driving { get; } = new("driving", "Never drive while looking through a magnifier or hand-held telescope. Rules on driving with visual aids differ by jurisdiction and change: check with the licensing authority and the eye-care practitioner.");

    /// <summary>Short working distances.</summary>
    public static Caution ShortSessions { get; } = new("short-sessions", "Short working distances are tiring: use a reading stand, start with short sessions and take breaks.");

    /// <summary>Poor contrast sensitivity (threshold above 9 %).</summary>
    public static Caution LightingAssessment { get; } = new("lighting", "Contrast sensitivity is reduced: assess lighting, and consider extra magnification, an illuminated magnifier or a video magnifier.");

    /// <summary>Very poor contrast sensitivity (threshold above 25 %).</summary>
    public static Caution VideoOrNonVisual { get; } = new("very-low-contrast", "Contrast sensitivity is very low: a video magnifier or non-visual methods (audio, speech) are likely to work better than lenses.");

    /// <summary>Electronic and illuminated devices.</summary>
    public static Caution ChargeDevices { get; } = new("charging", "Illuminated and electronic aids: charge them as the maker instructs and keep mains units away from water.");

    /// <summary>When to seek prompt care.</summary>
    public static Caution Referral { get; } = new("referral", "See an eye-care practitioner promptly for any sudden change or loss of vision, new distortion or blank patch, flashes, floaters, a painful red eye or new double vision.");

    /// <summary>Accommodation estimated from age.</summary>
    public static Caution AccommodationEstimated { get; } = new("accommodation-estimated", "The client's focusing (accommodation) was estimated from age, which varies widely between people: measure it if the plan relies on it.");

    /// <summary>Required-power estimates disagree.</summary>
    public static Caution EstimatesDisagree { get; } = new("estimates-disagree", "The required-power estimates disagree by more than 0.2 log units: look at the possible reasons, and let a trial with the client's own reading material decide.");

    /// <inheritdoc/>
    public override string ToString() => Text;
}
