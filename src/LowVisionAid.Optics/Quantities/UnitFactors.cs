namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// The one table of unit conversion factors. Every conversion in the core goes through these constants.
/// </summary>
public static class UnitFactors
{
    /// <summary>Metres in one international inch (exact by definition, 1959).</summary>
    public const double MetresPerInch = 0.0254;

    /// <summary>Metres in one international foot (exact by definition, 1959).</summary>
    public const double MetresPerFoot = 0.3048;

    /// <summary>Millimetres in one DTP (PostScript) point, 1/72 inch (Kuhn, "Metric typographic units").</summary>
    public const double MillimetresPerPoint = 25.4 / 72.0;

    /// <summary>Radians in one minute of arc (π / 10 800).</summary>
    public const double RadiansPerArcminute = Math.PI / 10_800.0;

    /// <summary>Arcminutes subtended by a 1M letter at 1 m, and by any letter at its M distance (Sloan 1959).</summary>
    public const double ArcminutesPerMUnit = 5.0;

    /// <summary>
    /// Height of 1M print in millimetres: 1000 mm × tan(5′) = 1.4544 mm (Sloan 1959; Sloan and Habel 1956).
    /// </summary>
    public static readonly double MillimetresPerMUnit = 1000.0 * Math.Tan(ArcminutesPerMUnit * RadiansPerArcminute);
}
