using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>An angle subtended at the eye, held in minutes of arc (′). The default value is 0′.</summary>
public readonly record struct VisualAngle : IComparable<VisualAngle>, IFormattable
{
    private readonly double _arcminutes;

    private VisualAngle(double arcminutes) => _arcminutes = arcminutes;

    /// <summary>The angle in minutes of arc.</summary>
    public double Arcminutes => _arcminutes;

    /// <summary>The angle in degrees.</summary>
    public double Degrees => _arcminutes / 60.0;

    /// <summary>The angle in radians.</summary>
    public double Radians => _arcminutes * UnitFactors.RadiansPerArcminute;

    /// <summary>An angle from a finite, non-negative number of arcminutes.</summary>
    public static VisualAngle FromArcminutes(double arcminutes) =>
        arcminutes >= 0 && double.IsFinite(arcminutes)
            ? new(arcminutes)
            : throw new ArgumentOutOfRangeException(nameof(arcminutes), arcminutes, "A visual angle must be a finite number of arcminutes, zero or more, such as 12.5 (1M at 40 cm).");

    /// <summary>An angle from degrees.</summary>
    public static VisualAngle FromDegrees(double degrees) => FromArcminutes(degrees * 60.0);

    /// <summary>An angle from radians.</summary>
    public static VisualAngle FromRadians(double radians) => FromArcminutes(radians / UnitFactors.RadiansPerArcminute);

    /// <summary>
    /// The angle subtended by an object of height <paramref name="size"/> at <paramref name="distance"/>:
    /// θ = 2·atan(h / 2d) (exact for an object centred on the line of sight).
    /// </summary>
    public static VisualAngle Subtended(Distance size, Distance distance) =>
        // θ = 2·atan(h / 2d) (plane geometry, object centred on the line of sight).
        FromRadians(2.0 * Math.Atan(size.Abs().Metres / (2.0 * Guard.Positive(distance.Metres, nameof(distance), "A viewing distance", "40 cm"))));

    /// <inheritdoc/>
    public int CompareTo(VisualAngle other) => _arcminutes.CompareTo(other._arcminutes);

    /// <summary>Ordering.</summary>
    public static bool operator <(VisualAngle left, VisualAngle right) => left._arcminutes < right._arcminutes;

    /// <summary>Ordering.</summary>
    public static bool operator >(VisualAngle left, VisualAngle right) => left._arcminutes > right._arcminutes;

    /// <summary>Ordering.</summary>
    public static bool operator <=(VisualAngle left, VisualAngle right) => left._arcminutes <= right._arcminutes;

    /// <summary>Ordering.</summary>
    public static bool operator >=(VisualAngle left, VisualAngle right) => left._arcminutes >= right._arcminutes;

    /// <summary>Formats in arcminutes, e.g. "12.5′"; format "deg" gives degrees.</summary>
    public string ToString(string? format, IFormatProvider? formatProvider) => format == "deg"
        ? Degrees.ToString("0.000", formatProvider) + "°"
        : _arcminutes.ToString("0.0", formatProvider) + "′";

    /// <summary>Formats with the invariant culture in arcminutes.</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
