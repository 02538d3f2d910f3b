using LowVisionAid.Optics.Options;

namespace LowVisionAid.Web.Handouts;

/// <summary>The plain-language handout wording for each kind of device: one short instruction per line.</summary>
internal static class HandoutTexts
{
    public static string WhatItIs(OptionKind family) => family switch
    {
        OptionKind.HandMagnifier => "A lens you hold in your hand between your eye and the page. It makes print look bigger.",
        OptionKind.StandMagnifier => "A lens on legs that stands on the page, so the distance to the page is already set for you.",
        OptionKind.SpectacleAdd => "Strong reading glasses. You hold the page close to your face and keep both hands free.",
        OptionKind.NearTelescope => "A small telescope for reading, fitted to glasses. It lets you read from a little further away.",
        OptionKind.DistanceTelescope => "A small telescope for seeing things far away, such as a television or a sign.",
        OptionKind.VideoMagnifier => "A camera and screen that show the page bigger, brighter and with stronger contrast.",
        OptionKind.SpectacleTelescope => "A small telescope fitted to glasses for seeing things far away, such as a television or a board, with your hands free.",
        OptionKind.ScreenMagnification => "The bigger-text and zoom settings already in your phone, tablet or computer.",
        _ => "A way to make print easier to see, chosen with you at the clinic.",
    };

    public static IReadOnlyList<string> HowToUse(OptionKind family) => family switch
    {
        OptionKind.HandMagnifier =>
        [
            "Wear your usual distance glasses, or none, as the clinic showed you.",
            "Put the lens flat on the page, then lift it slowly until the print is clearest.",
            "Keep the lens at that distance from the page and move it along the line.",
            "Rest your elbow on a table to keep your hand steady.",
        ],
        OptionKind.StandMagnifier =>
        [
            "Wear the glasses the clinic told you to wear with it.",
            "Stand the magnifier flat on the page.",
            "Keep your eye at the distance shown below and slide the magnifier along the line.",
        ],
        OptionKind.SpectacleAdd =>
        [
            "Put the glasses on and hold the page at the distance shown below.",
            "Move the page nearer or further by a little until the print is clear.",
            "Keep the page there; do not move your head towards it.",
        ],
        OptionKind.NearTelescope =>
        [
            "Put the glasses on and hold the page at the distance shown below.",
            "Look straight through the telescope and keep the page still.",
        ],
        OptionKind.DistanceTelescope =>
        [
            "Sit down, then hold the telescope to your eye.",
            "Turn the focus until what you look at is clear.",
        ],
        OptionKind.SpectacleTelescope =>
        [
            "Sit down, put the glasses on and look through the telescope at what you want to see.",
            "Look under the telescope, or take the glasses off, before you move about.",
        ],
        OptionKind.ScreenMagnification =>
        [
            "Open the display or accessibility settings and turn the text size or zoom up to the amount shown below.",
            "If the screen is hard to see, try the setting for light letters on a dark background.",
        ],
        OptionKind.VideoMagnifier =>
        [
            "Switch it on and put the page under the camera or in front of it.",
            "Turn the size up until the print is comfortable to read.",
            "Try the colour settings: light letters on dark are easier for many people.",
        ],
        _ =>
        [
            "Use it as the clinic showed you.",
            "Keep the page at the distance shown below.",
        ],
    };

    public static string DistanceWhat(OptionKind family) => family switch
    {
        OptionKind.HandMagnifier => "Lens to page",
        OptionKind.StandMagnifier => "Lens to page (set by the stand)",
        OptionKind.VideoMagnifier => "Eye to screen",
        OptionKind.DistanceTelescope or OptionKind.SpectacleTelescope => "Eye to what you look at",
        OptionKind.ScreenMagnification => "Eye to screen",
        _ => "Eye to page",
    };

    public const string EyeToLens = "Eye to lens";

    public static IReadOnlyList<string> Light { get; } =
    [
        "Use a good lamp that shines on the page, not into your eyes.",
        "Put the lamp on the side of your better eye, or behind your shoulder.",
        "Avoid shiny paper and glare from windows.",
    ];

    public static IReadOnlyList<string> Practice { get; } =
    [
        "Practise for 10 minutes twice a day for the first two weeks.",
        "Start with large, clear print, such as a headline, then move to smaller print.",
        "Stop and rest your eyes when you feel tired.",
    ];

    public static IReadOnlyList<string> Care { get; } =
    [
        "Clean the lens with a soft cloth; do not use paper tissues.",
        "Keep it in its case, covered and out of sunlight.",
        "Do not drop it: a scratched lens shows less.",
    ];

    public static IReadOnlyList<string> IfItStopsHelping { get; } =
    [
        "Check the lens is clean and that the light is good.",
        "Check that you are holding the page at the distance shown.",
        "If it still does not help, call the clinic: your needs may have changed.",
    ];
}
