using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Devices;

/// <summary>Video magnifiers and screens: relative size on screen × relative distance (methods §3.6).</summary>
public static class VideoMagnifier
{
    /// <summary>F_eq = ER / viewing distance (Bailey 2004 notes).</summary>
    public static Power EquivalentPower(double enlargement, Distance viewingDistance) =>
        Power.FromDioptres(PositiveRatio(enlargement) / PositiveDistance(viewingDistance));

    /// <summary>EVD = viewing distance ÷ ER (Bailey 2004 notes).</summary>
    public static Distance EquivalentViewingDistance(double enlargement, Distance viewingDistance) =>
        Distance.FromMetres(PositiveDistance(viewingDistance) / PositiveRatio(enlargement));

    /// <summary>The screen enlargement needed to give <paramref name="required"/> at a viewing distance: ER = F_eq × d.</summary>
    public static double EnlargementNeeded(Power required, Distance viewingDistance) => required.Dioptres * PositiveDistance(viewingDistance);

    /// <summary>
    /// Characters of the original print that fit on one screen line: width ÷ (k × x-height × ER)
    /// (N ≈ y/(k·h_x), methods §4.2, with the on-screen x-height h_x × ER).
    /// </summary>
    public static double CharactersPerLine(Distance screenWidth, PrintSize print, double characterPitch, double enlargement) =>
        screenWidth.Millimetres / (characterPitch * print.XHeightMillimetres * PositiveRatio(enlargement));

    private static double PositiveRatio(double ratio) => double.IsFinite(ratio) && ratio > 0
        ? ratio
        : throw new ArgumentOutOfRangeException(nameof(ratio), ratio, "A screen enlargement must be a number greater than zero, e.g. 10 for 10×.");

    private static double PositiveDistance(Distance d) => d.Metres > 0
        ? d.Metres
        : throw new ArgumentOutOfRangeException(nameof(d), d.Metres, "A viewing distance must be greater than zero, e.g. 40 cm.");
}

/// <summary>Relative distance magnification (methods §2.7).</summary>
public static class RelativeDistance
{
    /// <summary>M = old distance ÷ new distance (Ryan and Margrain 2006).</summary>
    public static double Magnification(Distance from, Distance to) => from.Abs().Metres / to.Abs().Metres;

    /// <summary>The new distance for a wanted magnification: d_new = d_old ÷ M.</summary>
    public static Distance DistanceFor(Distance from, double magnification) => from.Abs() / magnification;
}
