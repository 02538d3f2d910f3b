using System.Globalization;
namespace LowVisionAid.Reports.Handouts;

/// <summary>
/// The fixed words of the client handout: the cautions every handout prints and the check-line sentence.
/// Public so that the browser print view shows exactly the same wording as the PDF.
/// </summary>
public static class HandoutWording
{
    /// <summary>Burning-glass risk (methods.md §7.1).</summary>
    public const string SunlightFire =
        "A magnifier left in sunlight can focus the sun and start a fire. Keep it covered, or in a drawer, away from windows, curtains and bedding.";

    /// <summary>Never view the sun through an optical aid (methods.md §7.2).</summary>
    public const string NoSunViewing = "Never look at the sun through a magnifier or a telescope.";

    /// <summary>No walking, stairs or driving while looking through the aid (methods.md §7.3, §7.4).</summary>
    public const string DoNotMove =
        "Do not walk, use stairs or drive while you are looking through it. Sit down to use it, and put it down before you get up.";

    /// <summary>Driving rules differ by place (methods.md §7.4).</summary>
    public const string DrivingRules =
        "The rules on driving with sight loss differ from place to place. Ask your licensing authority and your eye-care practitioner.";

    /// <summary>The plan supports, and does not replace, the practitioner's advice (SAFETY.md).</summary>
    public const string SupportsPractitioner =
        "This plan supports the advice of your eye-care practitioner. It does not replace it.";

    /// <summary>Prompt referral on sudden change (methods.md §7.5).</summary>
    public const string SuddenChange =
        "See an eye-care practitioner promptly if your sight changes suddenly: for example if straight lines look bent, you see a new dark patch, flashes, floaters or a shadow like a curtain, your eye is painful or red, or you start to see double.";

    /// <summary>Visual hallucinations with sight loss (NICE NG82, methods.md §7.5).</summary>
    public const string SeeingThingsNotThere =
        "Some people with sight loss see things that are not there, such as patterns or faces. This is common and is not a sign of mental illness. Tell your practitioner if it happens to you.";

    /// <summary>Charging and water, for devices with a light or battery (methods.md §7.8).</summary>
    public const string LightOrBattery =
        "If your magnifier has a light or a battery, charge it as its instructions say, and keep plugs and chargers away from water.";

    /// <summary>The line printed at the client's target print size.</summary>
    public const string TargetSizeLine = "Can you read this line? It is the size of text you want to read.";

    /// <summary>The cautions every handout prints, in order.</summary>
    public static IReadOnlyList<string> Cautions { get; } =
        [SunlightFire, NoSunViewing, DoNotMove, DrivingRules, SupportsPractitioner, SuddenChange, SeeingThingsNotThere];

    /// <summary>The heading of the to-scale window of what the client sees at once.</summary>
    public const string ViewHeading = "What you see at once";

    /// <summary>
    /// The window's text equivalent: how many letters fit, across how much of the page, and what the box shows.
    /// </summary>
    /// <param name="letters">Letters of the client's print in view.</param>
    /// <param name="across">The width of the page seen, already formatted (e.g. "3.5 cm (1.4 inches)").</param>
    /// <param name="drawn">False when the width is too large to draw on the sheet.</param>
    public static string ViewText(int letters, string across, bool drawn) =>
        string.Create(CultureInfo.InvariantCulture, $"Through it you see about {letters} {(letters == 1 ? "letter" : "letters")} of your print at once, across {across} of the page.")
        + (drawn
            ? " The box below is that part of the page, drawn to size, with the letters at the size of your print."
            : " That is wider than this sheet, so it is not drawn here.");
}
