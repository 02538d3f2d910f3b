using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// Optical power or vergence in dioptres (1/m). Signed: plus lenses and converging light are positive,
/// diverging light is negative (vergence convention, Schwartz, Geometrical and Visual Optics).
/// The default value is 0 D.
/// </summary>
public readonly record struct Power : IComparable<Power>, IFormattable
{
    private readonly double _dioptres;

    private Power(double dioptres) => _dioptres = dioptres;

    /// <summary>0 D.</summary>
    public static Power Zero => default;

    /// <summary>The power in dioptres.</summary>
    public double Dioptres => _dioptres;

    /// <summary>True when the power is exactly zero.</summary>
    public bool IsZero => _dioptres == 0;

    /// <summary>A power from a finite number of dioptres.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is NaN or infinite.</exception>
    public static Power FromDioptres(double dioptres) => new(Guard.Finite(dioptres, nameof(dioptres), "A power", "+4.00 D"));

    /// <summary>The power whose focal length (or the vergence whose distance) is <paramref name="distance"/>: F = 1/f.</summary>
    /// <exception cref="ArgumentException">The distance is zero.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The distance is so short that 1/f is not a finite number.</exception>
    public static Power FromFocalLength(Distance distance) => distance.IsZero
        ? throw new ArgumentException("A focal length of zero has no power; enter a distance greater than zero.", nameof(distance))
        // F = 1/f, the definition of the dioptre (f in metres); FromDioptres refuses a power too large to be finite.
        : FromDioptres(1.0 / distance.Metres);

    /// <summary>The focal length f = 1/F (signed). </summary>
    /// <exception cref="InvalidOperationException">The power is zero, so the focal length is infinite.</exception>
    public Distance FocalLength => IsZero
        ? throw new InvalidOperationException("A power of 0 D has no finite focal length.")
        : Distance.FromMetres(1.0 / _dioptres);

    /// <summary>
    /// Magnification relative to a reference viewing distance: M = F × d_ref (Bailey 2004 notes).
    /// With 25 cm this is F/4; with 40 cm, F/2.5. Always state the reference used.
    /// </summary>
    public double MagnificationRelativeTo(Distance reference) =>
        // M = Feq × d_ref (Bailey 2004 notes).
        _dioptres * reference.Metres;

    /// <summary>The absolute value of the power.</summary>
    public Power Abs() => new(Math.Abs(_dioptres));

    /// <summary>The sum of two powers (thin lenses in contact, or vergence plus power).</summary>
    public static Power Add(Power left, Power right) => left + right;

    /// <summary>The difference of two powers.</summary>
    public static Power Subtract(Power left, Power right) => left - right;

    /// <summary>A power scaled by a plain number.</summary>
    public static Power Multiply(Power power, double factor) => power * factor;

    /// <summary>The negated power.</summary>
    public static Power Negate(Power power) => -power;

    /// <summary>Sum.</summary>
    public static Power operator +(Power left, Power right) => FromDioptres(left._dioptres + right._dioptres);

    /// <summary>Difference.</summary>
    public static Power operator -(Power left, Power right) => FromDioptres(left._dioptres - right._dioptres);

    /// <summary>Negation.</summary>
    public static Power operator -(Power power) => new(-power._dioptres);

    /// <summary>Scaling by a plain number.</summary>
    public static Power operator *(Power power, double factor) => FromDioptres(power._dioptres * factor);

    /// <summary>Scaling by a plain number.</summary>
    public static Power operator *(double factor, Power power) => FromDioptres(power._dioptres * factor);

    /// <summary>Ratio of two powers (a plain number).</summary>
    public static double operator /(Power left, Power right) => left._dioptres / right._dioptres;

    /// <inheritdoc/>
    public int CompareTo(Power other) => _dioptres.CompareTo(other._dioptres);

    /// <summary>Ordering.</summary>
    public static bool operator <(Power left, Power right) => left._dioptres < right._dioptres;

    /// <summary>Ordering.</summary>
    public static bool operator >(Power left, Power right) => left._dioptres > right._dioptres;

    /// <summary>Ordering.</summary>
    public static bool operator <=(Power left, Power right) => left._dioptres <= right._dioptres;

    /// <summary>Ordering.</summary>
    public static bool operator >=(Power left, Power right) => left._dioptres >= right._dioptres;

    /// <summary>Formats as a signed value with two decimals and the unit, e.g. "+4.00 D".</summary>
    public string ToString(string? format, IFormatProvider? formatProvider) =>
        // A value that rounds to zero shows as 0.00, never "-0.00"; arithmetic noise far below the shown digits is
        // dropped first, so 4 / (0.32 × 0.8) = 15.624999… shows as the published 15.63 D (Bailey's example, methods §2.2).
        (string.IsNullOrEmpty(format) && Math.Abs(_dioptres) < 0.005 ? 0.0 : Math.Round(_dioptres, 9)).ToString(string.IsNullOrEmpty(format) ? "+0.00;-0.00;0.00" : format, formatProvider) + " D";

    /// <summary>Formats with the invariant culture, e.g. "+4.00 D".</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
