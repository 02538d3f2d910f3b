using System.Globalization;
namespace LowVisionAid.Reports.Handouts;

/// <summary>
/// The fixed words of the client handout: the cautions every handout prints and the check-line sentence.
/// Public so that the browser print view shows exactly the same wording as the PDF.
/// </summary>
public static class HandoutWording
{
    /// <summary>The handout's title.</summary>
    public const string Title = "Your magnifier plan";

    /// <summary>The heading of the safety lines.</summary>
    public const string StaySafe = "Stay safe";

    /// <summary>The heading of the clinic's contact.</summary>
    public const string ContactUs = "Questions? Contact us";

    /// <summary>Burning-glass risk (methods.md §7.1).</summary>
    public const string SunlightFire =
        "A magnifier left in sunlight can focus the sun and start a fire. Keep it covered, or in a drawer, away from windows, curtains and bedding.";

    /// <summary>Never view the sun through an optical aid (methods.md §7.2).</summary>
    public const string NoSunViewing = "Never look at the sun through a magnifier or a telescope.";

    /// <summary>No walking, stairs or driving while looking through the aid (methods.md §7.3, §7.4).</summary>
    public const string DoNotMove =
        "Do not walk, use stairs or drive while you are looking through it. Sit down to use it, and put it down before you get up.";

    /// <summary>
    /// Spectacle-mounted telescope: never while walking or driving; driving with one only where licensed practice
    /// and the licensing rules allow it (methods.md §7.3, §7.4).
    /// </summary>
    public const string TelescopeGlassesMoving =
        "Never walk or drive while you look through the telescope glasses. Some places let a few people drive with them after special training, but only when the licensing authority and your eye-care practitioner say so.";

    /// <summary>Driving rules differ by place (methods.md §7.4).</summary>
    public const string DrivingRules =
        "The rules on driving with sight loss differ from place to place. Ask your licensing authority and your eye-care practitioner.";

    /// <summary>The plan supports, and does not replace, the practitioner's advice (SAFETY.md).</summary>
    public const string SupportsPractitioner =
        "This plan supports the advice of your eye-care practitioner. It does not replace it.";

    /// <summary>Prompt referral on sudden change (methods.md §7.5).</summary>
    public const string SuddenChange =
        "See an eye-care practitioner promptly if your sight changes suddenly. Signs to act on: straight lines look bent, or you see a new dark patch. Flashes, new floaters, or a shadow like a curtain. An eye that is painful or red. Seeing double.";

    /// <summary>Visual hallucinations with sight loss (NICE NG82, methods.md §7.5).</summary>
    public const string SeeingThingsNotThere =
        "Some people with sight loss see things that are not there, such as patterns or faces. This is common and is not a sign of mental illness. Tell your practitioner if it happens to you.";

    /// <summary>Charging and water, for devices with a light or battery (methods.md §7.8).</summary>
    public const string LightOrBattery =
        "If your magnifier has a light or a battery, charge it as its instructions say, and keep plugs and chargers away from water.";

    /// <summary>The line printed at the client's target print size.</summary>
    public const string TargetSizeLine = "Can you read this line? It is the size of text you want to read.";

    /// <summary>Every caution, in order: what a handout for an optical magnifier prints.</summary>
    public static IReadOnlyList<string> Cautions { get; } =
        [SunlightFire, NoSunViewing, DoNotMove, DrivingRules, SupportsPractitioner, SuddenChange, SeeingThingsNotThere];

    /// <summary>
    /// The cautions for these devices, in the order of <see cref="Cautions"/>: the sunlight, sun-viewing and
    /// do-not-walk cautions only when a device has a lens (not for a video magnifier or large print alone), the
    /// charging caution when one has a light or battery (a video magnifier always has).
    /// </summary>
    /// <param name="devices">The devices the handout describes.</param>
    public static IReadOnlyList<string> CautionsFor(IEnumerable<HandoutDevice> devices)
    {
        ArgumentNullException.ThrowIfNull(devices);
        var list = devices.ToList();
        bool lens = list.Exists(d => DeviceWording.HasLens(d.Kind));
        bool power = list.Exists(d => d.HasLightOrBattery || d.Kind == Optics.Options.OptionKind.VideoMagnifier);
        bool telescopeGlasses = list.Exists(d => d.Kind == Optics.Options.OptionKind.SpectacleTelescope);
        return
        [
            .. lens ? new[] { SunlightFire, NoSunViewing, DoNotMove } : [],
            .. telescopeGlasses ? new[] { TelescopeGlassesMoving } : [],
            DrivingRules, SupportsPractitioner, SuddenChange, SeeingThingsNotThere,
            .. power ? new[] { LightOrBattery } : [],
        ];
    }

    /// <summary>The short handout's sun and fire line, for devices with a lens (methods.md §7.1, §7.2).</summary>
    public const string ShortSun = "Keep it out of the sun: a lens in sunlight can start a fire. Never look at the sun through it.";

    /// <summary>The short handout's line on moving, for devices with a lens (methods.md §7.3, §7.4).</summary>
    public const string ShortDoNotMove = "Do not walk or drive while you look through it.";

    /// <summary>The short handout's line on moving with telescope glasses (methods.md §7.3, §7.4).</summary>
    public const string ShortTelescopeGlasses =
        "Never walk or drive while you look through the telescope glasses, unless your licensing authority and eye-care practitioner say you may.";

    /// <summary>The short handout's line on sudden change (methods.md §7.5).</summary>
    public const string ShortSuddenChange = "If your sight changes suddenly, see an eye-care practitioner promptly.";

    /// <summary>The short handout's line for a device with a light or battery (methods.md §7.8).</summary>
    public const string ShortLightOrBattery = "Keep its charger and plug away from water.";

    /// <summary>
    /// The one or two safety lines of the short handout for very large print (<see cref="HandoutPrint.ShortTextFrom"/>):
    /// with a lens, the sun and fire line and the line on moving (telescope glasses have their own); without one,
    /// sudden change, and the charger for a device with a light or battery. The rest is in the full text the
    /// clinic offers read aloud or recorded.
    /// </summary>
    /// <param name="devices">The devices the handout describes.</param>
    public static IReadOnlyList<string> ShortCautionsFor(IEnumerable<HandoutDevice> devices)
    {
        ArgumentNullException.ThrowIfNull(devices);
        var list = devices.ToList();
        if (list.Exists(d => DeviceWording.HasLens(d.Kind)))
            return [ShortSun, list.Exists(d => d.Kind == Optics.Options.OptionKind.SpectacleTelescope) ? ShortTelescopeGlasses : ShortDoNotMove];
        bool power = list.Exists(d => d.HasLightOrBattery || d.Kind == Optics.Options.OptionKind.VideoMagnifier);
        return power ? [ShortSuddenChange, ShortLightOrBattery] : [ShortSuddenChange];
    }

    /// <summary>Printed near the top of the short handout for very large print.</summary>
    public const string ShortOtherForm = "Ask the clinic for the full sheet, read aloud or recorded.";

    /// <summary>The heading of the to-scale window of what the client sees at once.</summary>
    public const string ViewHeading = "What you see at once";

    /// <summary>The words drawn in the to-scale window, with their spaces: the client sees words, not a run of letters.</summary>
    public const string ViewPhrase = "read your own post and the news at home with good light on the page and rest when your eyes feel tired ";

    /// <summary>
    /// The window's text equivalent in words a client can use: about how many letters of this size are seen at
    /// once, never a width across the page (with a blind patch in the middle of the sight the width misleads). A
    /// view of a whole line or more is said as such.
    /// </summary>
    /// <param name="letters">Letters of the client's print in view, as the plan counted them.</param>
    /// <param name="drawn">False when the view is too wide to draw on the sheet.</param>
    public static string ViewText(int letters, bool drawn) =>
        (letters >= WholeLine
            ? "Through it you see a whole line of print of this size or more at once."
            : string.Create(CultureInfo.InvariantCulture, $"Through it you see about {letters} {(letters == 1 ? "letter" : "letters")} of this size at once."))
        + (drawn
            ? " The box shows that part of the page at its real size, with letters as big as your print."
            : string.Empty);

    /// <summary>From this many letters in view the handout says "a whole line" (a newspaper column holds about 35; from memory).</summary>
    public const int WholeLine = 40;
}
