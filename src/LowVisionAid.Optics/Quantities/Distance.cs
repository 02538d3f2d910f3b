using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// A length along the optical axis, held in metres. Signed where a sign convention applies (distances against
/// the light are negative); distances shown to users are magnitudes. The default value is 0 m.
/// </summary>
public readonly record struct Distance : IComparable<Distance>, IFormattable
{
    private readonly double _metres;

    private Distance(double metres) => _metres = metres;

    /// <summary>0 m.</summary>
    public static Distance Zero => default;

    /// <summary>The distance in metres.</summary>
    public double Metres => _metres;

    /// <summary>The distance in centimetres.</summary>
    public double Centimetres => _metres * 100.0;

    /// <summary>The distance in millimetres.</summary>
    public double Millimetres => _metres * 1000.0;

    /// <summary>The distance in inches.</summary>
    public double Inches => _metres / UnitFactors.MetresPerInch;

    /// <summary>The distance in feet.</summary>
    public double Feet => _metres / UnitFactors.MetresPerFoot;

    /// <summary>True when the distance is exactly zero.</summary>
    public bool IsZero => _metres == 0;

    /// <summary>A distance from a finite number of metres.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is NaN or infinite.</exception>
    public static Distance FromMetres(double metres) => new(Guard.Finite(metres, nameof(metres), "A distance", "40 cm"));

    /// <summary>A distance from centimetres.</summary>
    public static Distance FromCentimetres(double centimetres) =>
        new(Guard.Finite(centimetres, nameof(centimetres), "A distance", "40 cm") / 100.0);

    /// <summary>A distance from millimetres.</summary>
    public static Distance FromMillimetres(double millimetres) =>
        new(Guard.Finite(millimetres, nameof(millimetres), "A distance", "40 cm") / 1000.0);

    /// <summary>A distance from inches.</summary>
    public static Distance FromInches(double inches) =>
        new(Guard.Finite(inches, nameof(inches), "A distance", "40 cm") * UnitFactors.MetresPerInch);

    /// <summary>A distance from feet.</summary>
    public static Distance FromFeet(double feet) =>
        new(Guard.Finite(feet, nameof(feet), "A distance", "40 cm") * UnitFactors.MetresPerFoot);

    /// <summary>The vergence of light at this distance, or the power whose focal length this is: 1/d.</summary>
    /// <exception cref="InvalidOperationException">The distance is zero.</exception>
    public Power Inverse() => IsZero
        ? throw new InvalidOperationException("A distance of zero has no finite vergence.")
        : Power.FromFocalLength(this);

    /// <summary>The magnitude of the distance.</summary>
    public Distance Abs() => new(Math.Abs(_metres));

    /// <summary>Sum.</summary>
    public static Distance Add(Distance left, Distance right) => left + right;

    /// <summary>Difference.</summary>
    public static Distance Subtract(Distance left, Distance right) => left - right;

    /// <summary>Sum.</summary>
    public static Distance operator +(Distance left, Distance right) => FromMetres(left._metres + right._metres);

    /// <summary>Difference.</summary>
    public static Distance operator -(Distance left, Distance right) => FromMetres(left._metres - right._metres);

    /// <summary>Negation.</summary>
    public static Distance operator -(Distance distance) => new(-distance._metres);

    /// <summary>Scaling by a plain number.</summary>
    public static Distance operator *(Distance distance, double factor) => FromMetres(distance._metres * factor);

    /// <summary>Scaling by a plain number.</summary>
    public static Distance operator *(double factor, Distance distance) => FromMetres(distance._metres * factor);

    /// <summary>Division by a plain number.</summary>
    public static Distance operator /(Distance distance, double divisor) => FromMetres(distance._metres / divisor);

    /// <summary>Ratio of two distances (a plain number).</summary>
    public static double operator /(Distance left, Distance right) => left._metres / right._metres;

    /// <summary>Scaling by a plain number.</summary>
    public static Distance Multiply(Distance distance, double factor) => distance * factor;

    /// <summary>Division by a plain number.</summary>
    public static Distance Divide(Distance distance, double divisor) => distance / divisor;

    /// <summary>Negation.</summary>
    public static Distance Negate(Distance distance) => -distance;

    /// <inheritdoc/>
    public int CompareTo(Distance other) => _metres.CompareTo(other._metres);

    /// <summary>Ordering.</summary>
    public static bool operator <(Distance left, Distance right) => left._metres < right._metres;

    /// <summary>Ordering.</summary>
    public static bool operator >(Distance left, Distance right) => left._metres > right._metres;

    /// <summary>Ordering.</summary>
    public static bool operator <=(Distance left, Distance right) => left._metres <= right._metres;

    /// <summary>Ordering.</summary>
    public static bool operator >=(Distance left, Distance right) => left._metres >= right._metres;

    /// <summary>Formats in centimetres with one decimal, e.g. "25.0 cm". Format "in" gives inches.</summary>
    public string ToString(string? format, IFormatProvider? formatProvider) => format switch
    {
        "in" => Inches.ToString("0.0", formatProvider) + " in",
        "mm" => Millimetres.ToString("0.0", formatProvider) + " mm",
        "m" => Metres.ToString("0.00", formatProvider) + " m",
        _ => Centimetres.ToString("0.0", formatProvider) + " cm",
    };

    /// <summary>Formats with the invariant culture in centimetres.</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
