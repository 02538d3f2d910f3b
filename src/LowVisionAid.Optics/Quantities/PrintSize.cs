using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// A print size held as lower-case x-height in M units (1M = 1.4544 mm, a letter subtending 5′ at 1 m; Sloan 1959).
/// The x-height is what the MNREAD chart and continuous-text M sizes measure (Mansfield et al. 1994).
/// Always greater than zero; the default value is not a valid print size and is rejected by the calculations.
/// </summary>
public readonly record struct PrintSize : IComparable<PrintSize>, IFormattable
{
    private readonly double _m;

    private PrintSize(double m) => _m = m;

    /// <summary>The size in M units.</summary>
    public double M => _m;

    /// <summary>The x-height in millimetres.</summary>
    public double XHeightMillimetres =>
        // x-height = M × 1.4544 mm (Sloan 1959).
        _m * UnitFactors.MillimetresPerMUnit;

    /// <summary>The x-height as a distance.</summary>
    public Distance XHeight => Distance.FromMillimetres(XHeightMillimetres);

    /// <summary>True for a real print size (the default value is not one).</summary>
    public bool IsValid => _m > 0;

    /// <summary>A print size in M units (greater than zero).</summary>
    public static PrintSize FromM(double m) => new(Guard.Positive(m, nameof(m), "A print size in M units", "1.0M"));

    /// <summary>A print size from its x-height in millimetres (greater than zero).</summary>
    public static PrintSize FromXHeightMillimetres(double millimetres) =>
        // M = x-height / 1.4544 mm (Sloan 1959).
        new(Guard.Positive(millimetres, nameof(millimetres), "An x-height", "1.45 mm") / UnitFactors.MillimetresPerMUnit);

    /// <summary>
    /// A print size from a point size and the typeface's x-height ratio (approximate):
    /// M = pt × 0.35278 × r_x / 1.4544 (derived from the point and M definitions).
    /// </summary>
    public static PrintSize FromPoints(double points, XHeightRatio ratio) =>
        // x-height = pt × 0.35278 mm × r_x, approximate (derived; methods §1.3).
        FromXHeightMillimetres(Guard.Positive(points, nameof(points), "A point size", "12 pt") * UnitFactors.MillimetresPerPoint * ratio.Value);

    /// <summary>
    /// The N-notation size: N is the point size of Times Roman text (Law 1951), so this is
    /// <see cref="FromPoints"/> with the given x-height ratio (approximate).
    /// </summary>
    public static PrintSize FromN(double n, XHeightRatio ratio) => FromPoints(n, ratio);

    /// <summary>The approximate point size that gives this x-height in a face of the given x-height ratio.</summary>
    public double ToPoints(XHeightRatio ratio) =>
        // pt = x-height / (0.35278 mm × r_x), approximate (derived; methods §1.3).
        XHeightMillimetres / (UnitFactors.MillimetresPerPoint * ratio.Value);

    /// <summary>
    /// The angle the x-height subtends at <paramref name="distance"/>, in the small-angle form used by M notation:
    /// 5′ × M / d(m) (Sloan; MNREAD print-size definition).
    /// </summary>
    public VisualAngle AngleAt(Distance distance) =>
        // angle = 5′ × M / d (Sloan; MNREAD print-size definition).
        VisualAngle.FromArcminutes(UnitFactors.ArcminutesPerMUnit * _m / Guard.Positive(distance.Metres, nameof(distance), "A viewing distance", "40 cm"));

    /// <summary>The logMAR equivalent of reading this print at <paramref name="distance"/>: log₁₀(M / d) (Colenbrander 2001).</summary>
    public double LogMarAt(Distance distance) =>
        // logMAR = log₁₀(M / d) (Colenbrander 2001, 1/V = M × D).
        Math.Log10(_m / Guard.Positive(distance.Metres, nameof(distance), "A viewing distance", "40 cm"));

    /// <summary>This print size scaled by a ratio (e.g. divided by an acuity reserve).</summary>
    public PrintSize Scale(double factor) => FromM(_m * factor);

    /// <summary>Ratio of two print sizes (a plain number).</summary>
    public static double operator /(PrintSize left, PrintSize right) => left._m / right._m;

    /// <summary>Ratio of two print sizes.</summary>
    public static double Divide(PrintSize left, PrintSize right) => left / right;

    /// <inheritdoc/>
    public int CompareTo(PrintSize other) => _m.CompareTo(other._m);

    /// <summary>Ordering.</summary>
    public static bool operator <(PrintSize left, PrintSize right) => left._m < right._m;

    /// <summary>Ordering.</summary>
    public static bool operator >(PrintSize left, PrintSize right) => left._m > right._m;

    /// <summary>Ordering.</summary>
    public static bool operator <=(PrintSize left, PrintSize right) => left._m <= right._m;

    /// <summary>Ordering.</summary>
    public static bool operator >=(PrintSize left, PrintSize right) => left._m >= right._m;

    /// <summary>Formats in M units, e.g. "1.0M"; format "mm" gives the x-height in millimetres.</summary>
    public string ToString(string? format, IFormatProvider? formatProvider) => format == "mm"
        ? XHeightMillimetres.ToString("0.00", formatProvider) + " mm"
        : _m.ToString(_m < 1 ? "0.0#" : "0.0", formatProvider) + "M";

    /// <summary>Formats with the invariant culture in M units.</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
