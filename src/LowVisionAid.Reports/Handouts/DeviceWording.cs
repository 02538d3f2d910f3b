using System.Globalization;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Reports.Handouts;

/// <summary>
/// The handout's plain-language wording for each class of device: what it is, how to use it, which glasses to wear,
/// how to look after it and which distances to keep. One short instruction per line; nothing points "above" or
/// "below" on the page.
/// </summary>
public static class DeviceWording
{
    /// <summary>The label of the eye-to-lens distance.</summary>
    public const string EyeToLens = "Eye to lens";

    /// <summary>One or two sentences on what the device is.</summary>
    /// <param name="kind">The class of device.</param>
    public static string WhatItIs(OptionKind kind) => kind switch
    {
        OptionKind.HandMagnifier => "A lens you hold in your hand between your eye and the page. It makes print look bigger.",
        OptionKind.StandMagnifier => "A lens on legs that stands on the page, so the distance to the page is already set for you.",
        OptionKind.SpectacleAdd => "Strong reading glasses. You hold the page close to your face and keep both hands free.",
        OptionKind.NearTelescope => "A small telescope for reading, fitted to glasses. It lets you read from a little further away.",
        OptionKind.DistanceTelescope => "A small telescope for seeing things far away, such as a television or a sign.",
        OptionKind.VideoMagnifier => "A camera and screen that show the page bigger, brighter and with stronger contrast.",
        OptionKind.SpectacleTelescope => "A small telescope fitted to glasses, for seeing things far away, such as a television or a board. Your hands stay free.",
        OptionKind.ScreenMagnification => "The bigger-text and zoom settings already in your phone, tablet or computer. There is nothing to buy.",
        OptionKind.LargePrint => "Print made bigger: large-print books, bills and labels, or print enlarged on a copier or a screen.",
        _ => "Holding the print closer to your eyes, with the glasses the clinic gave you.",
    };

    /// <summary>The steps for holding or setting the device.</summary>
    /// <param name="kind">The class of device.</param>
    /// <param name="screen">For screen magnification, the setting the plan worked out; null when not known.</param>
    public static IReadOnlyList<string> HowToUse(OptionKind kind, HandoutScreen? screen = null) => kind switch
    {
        OptionKind.HandMagnifier =>
        [
            "Put the lens flat on the page, then lift it slowly until the print is clearest.",
            "Keep the lens at that height and move it along the line.",
            "Rest your elbow on a table to keep your hand steady.",
        ],
        OptionKind.StandMagnifier =>
        [
            "Stand the magnifier flat on the page.",
            "Keep your eye at the distance given under \u201cDistances to keep\u201d and slide the magnifier along the line.",
        ],
        OptionKind.SpectacleAdd or OptionKind.MovingCloser =>
        [
            "Put the glasses on and hold the page at the distance given under \u201cDistances to keep\u201d.",
            "Move the page nearer or further by a little until the print is clear.",
            "Keep the page there; a reading stand helps.",
        ],
        OptionKind.NearTelescope =>
        [
            "Put the glasses on and hold the page at the distance given under \u201cDistances to keep\u201d.",
            "Look straight through the telescope and keep the page still.",
        ],
        OptionKind.DistanceTelescope =>
        [
            "Sit down, then hold the telescope to your eye.",
            "Turn the focus until what you look at is clear.",
        ],
        OptionKind.SpectacleTelescope =>
        [
            "Learn to use it sitting down first, at the clinic and then at home.",
            "Sit down, put the glasses on and look through the telescope at what you want to see.",
            "Look under the telescope, or take the glasses off, before you move about.",
        ],
        OptionKind.ScreenMagnification =>
        [
            "Open the settings of your phone, tablet or computer and find Display or Accessibility.",
            screen is { ZoomPercent: > 100 } s
                ? "Turn the text size or zoom up to about " + Percent(s.ZoomPercent) + "."
                : "Turn the text size or zoom up until the text is comfortable to read.",
            .. screen is { ReversedPolarity: true } ? new[] { ReversedPolarity } : [],
        ],
        OptionKind.VideoMagnifier =>
        [
            "Switch it on and put the page under the camera.",
            "Turn the size up until the print is comfortable to read.",
            "Try the colour settings: light letters on dark are easier for many people.",
        ],
        _ =>
        [
            "Sit in good light with the print flat in front of you.",
            "Ask the clinic where to get large print for the things you read most.",
        ],
    };

    /// <summary>What the working distance is between, for this class of device.</summary>
    /// <param name="kind">The class of device.</param>
    public static string DistanceWhat(OptionKind kind) => kind switch
    {
        OptionKind.HandMagnifier => "Lens to page",
        OptionKind.StandMagnifier => "Lens to page (set by the stand)",
        OptionKind.VideoMagnifier => "Eye to screen",
        OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope => "Eye to what you look at",
        OptionKind.ScreenMagnification => "Eye to screen",
        _ => "Eye to page",
    };

    /// <summary>Which glasses to wear with the device, in words; null when there is nothing to say.</summary>
    /// <param name="kind">The class of device, or null when not known.</param>
    /// <param name="readingAdd">The add to wear with it, or null (or zero) for the distance glasses.</param>
    /// <param name="formatProvider">Culture for the power.</param>
    public static string? Glasses(OptionKind? kind, Power? readingAdd, IFormatProvider? formatProvider)
    {
        var add = readingAdd is { Dioptres: > 0 } a ? a.ToString(null, formatProvider ?? CultureInfo.InvariantCulture) : null;
        return (kind, add) switch
        {
            (OptionKind.SpectacleAdd, not null) => "These are your reading glasses for this task: " + add + ". Wear them only sitting down.",
            (OptionKind.SpectacleAdd, null) => "These are your reading glasses for this task. Wear them only sitting down.",
            (OptionKind.NearTelescope, _) => "Wear the telescope glasses as the clinic fitted them.",
            (OptionKind.SpectacleTelescope, _) => "The telescope is fitted to glasses made for you. Wear them only while you sit and look.",
            (OptionKind.VideoMagnifier or OptionKind.ScreenMagnification, not null) => "Wear reading glasses of " + add + " to see the screen clearly at the distance given.",
            (OptionKind.VideoMagnifier or OptionKind.ScreenMagnification, null) => "Wear the glasses you see the screen most clearly with at the distance given.",
            (_, not null) => "Wear reading glasses of " + add + " with it.",
            (OptionKind.HandMagnifier or OptionKind.DistanceTelescope, null) => "Wear your distance glasses if you have them, not reading glasses.",
            _ => null,
        };
    }

    /// <summary>
    /// Which glasses to wear, in the fewest words, for the short handout (very large print): e.g. "reading glasses
    /// of +3.00 D" or "your distance glasses, or none"; null when there is nothing to say.
    /// </summary>
    /// <param name="kind">The class of device, or null when not known.</param>
    /// <param name="readingAdd">The add to wear with it, or null (or zero) for the distance glasses.</param>
    /// <param name="formatProvider">Culture for the power.</param>
    public static string? ShortGlasses(OptionKind? kind, Power? readingAdd, IFormatProvider? formatProvider)
    {
        var add = readingAdd is { Dioptres: > 0 } a ? a.ToString(null, formatProvider ?? CultureInfo.InvariantCulture) : null;
        return (kind, add) switch
        {
            (OptionKind.SpectacleAdd, not null) => "these are your reading glasses, " + add,
            (OptionKind.SpectacleAdd, null) => "these are your reading glasses",
            (OptionKind.NearTelescope or OptionKind.SpectacleTelescope, _) => "the telescope glasses, only sitting down",
            (_, not null) => "reading glasses of " + add,
            (OptionKind.VideoMagnifier or OptionKind.ScreenMagnification, null) => "the glasses you see the screen best with",
            (OptionKind.HandMagnifier or OptionKind.DistanceTelescope, null) => "your distance glasses, or none",
            _ => null,
        };
    }

    /// <summary>How to look after the device; empty when there is nothing to look after.</summary>
    /// <param name="kind">The class of device.</param>
    public static IReadOnlyList<string> Care(OptionKind kind) => kind switch
    {
        OptionKind.VideoMagnifier =>
        [
            "Wipe the screen and the camera window with a dry, soft cloth.",
            "Keep drinks and water away from it.",
        ],
        OptionKind.LargePrint or OptionKind.MovingCloser or OptionKind.ScreenMagnification => [],
        _ =>
        [
            "Clean the lens with a soft cloth; do not use paper tissues.",
            "Keep it in its case, covered and out of sunlight.",
        ],
    };

    /// <summary>True for devices with a lens that can focus sunlight or be looked through while moving.</summary>
    /// <param name="kind">The class of device, or null when not known (treated as a lens).</param>
    public static bool HasLens(OptionKind? kind) => kind is not (OptionKind.VideoMagnifier or OptionKind.LargePrint or OptionKind.ScreenMagnification);

    /// <summary>The step for reversed polarity on a screen, advised when contrast sensitivity or lighting is poor (issue 10).</summary>
    public const string ReversedPolarity =
        "Turn on light letters on a dark background (it may be called dark mode, inverted colours or colour filters): it is easier to see when contrast is poor.";

    /// <summary>
    /// The setting of a screen in one line for the short handout, e.g. "Text size or zoom: about 200 %."; null for
    /// other devices or when the plan gave no setting.
    /// </summary>
    /// <param name="kind">The class of device.</param>
    /// <param name="screen">The screen setting, or null.</param>
    public static string? Setting(OptionKind? kind, HandoutScreen? screen) =>
        kind == OptionKind.ScreenMagnification && screen is { ZoomPercent: > 100 } s
            ? "Text size or zoom: about " + Percent(s.ZoomPercent) + "."
            : null;

    // A zoom the way phones and computers offer it: to the nearest 10 % (common practice: settings step by 10 % or more).
    private static string Percent(double percent) =>
        (Math.Round(percent / 10, MidpointRounding.AwayFromZero) * 10).ToString("0", CultureInfo.InvariantCulture) + " %";
}
