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
        OptionKind.LargePrint => "Print made bigger: large-print books, bills and labels, or print enlarged on a copier or a screen.",
        _ => "Holding the print closer to your eyes, with the glasses the clinic gave you.",
    };

    /// <summary>The steps for holding or setting the device.</summary>
    /// <param name="kind">The class of device.</param>
    public static IReadOnlyList<string> HowToUse(OptionKind kind) => kind switch
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
        OptionKind.DistanceTelescope => "Eye to what you look at",
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
            (OptionKind.VideoMagnifier, not null) => "Wear reading glasses of " + add + " to see the screen clearly at the distance given.",
            (OptionKind.VideoMagnifier, null) => "Wear the glasses you see the screen most clearly with at the distance given.",
            (_, not null) => "Wear reading glasses of " + add + " with it.",
            (OptionKind.HandMagnifier or OptionKind.DistanceTelescope, null) => "Wear your distance glasses if you have them, not reading glasses.",
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
        OptionKind.LargePrint or OptionKind.MovingCloser => [],
        _ =>
        [
            "Clean the lens with a soft cloth; do not use paper tissues.",
            "Keep it in its case, covered and out of sunlight.",
        ],
    };

    /// <summary>True for devices with a lens that can focus sunlight or be looked through while moving.</summary>
    /// <param name="kind">The class of device, or null when not known (treated as a lens).</param>
    public static bool HasLens(OptionKind? kind) => kind is not (OptionKind.VideoMagnifier or OptionKind.LargePrint);
}
