namespace LowVisionAid.Web.Handouts;

/// <summary>
/// The handout's general advice (light, practice, what to do if it stops helping), one short instruction per line. The
/// wording for each class of device is <see cref="Reports.Handouts.DeviceWording"/>.
/// </summary>
internal static class HandoutTexts
{
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

    public static IReadOnlyList<string> IfItStopsHelping { get; } =
    [
        "Check that the light is good and that you use it as this sheet shows.",
        "If it still does not help, call the clinic: your needs may have changed.",
    ];
}
