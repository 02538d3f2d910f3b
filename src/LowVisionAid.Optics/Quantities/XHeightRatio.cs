using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// The x-height of a typeface as a fraction of its point (body) size. Point sizes name the body, not a visible
/// letter, so converting between points and M units needs this ratio (Legge and Bigelow 2011).
/// The default value is <see cref="Conventional"/> (0.50, the "1M ≈ 8 pt" convention).
/// </summary>
public readonly record struct XHeightRatio : IFormattable
{
    // Implementation note: stored as the offset from 0.50 so that default(XHeightRatio) is the convention.
    private readonly double _offsetFromHalf;

    private XHeightRatio(double ratio) => _offsetFromHalf = ratio - 0.5;

    /// <summary>Smallest ratio accepted (no common text face has a smaller x-height).</summary>
    public const double Minimum = 0.30;

    /// <summary>Largest ratio accepted.</summary>
    public const double Maximum = 0.80;

    /// <summary>
    /// 0.50: lower-case body about half the point size, the convention behind "1M ≈ N8" (medical-dictionary
    /// definition of point-system test types). Results through it are approximate.
    /// </summary>
    public static XHeightRatio Conventional => default;

    /// <summary>The ratio, x-height ÷ point size.</summary>
    public double Value => _offsetFromHalf + 0.5;

    /// <summary>A ratio between <see cref="Minimum"/> and <see cref="Maximum"/>.</summary>
    public static XHeightRatio FromRatio(double ratio) => ratio is >= Minimum and <= Maximum
        ? new(ratio)
        : throw new ArgumentOutOfRangeException(nameof(ratio), ratio,
            $"An x-height ratio must be between {Minimum.ToString(CultureInfo.InvariantCulture)} and {Maximum.ToString(CultureInfo.InvariantCulture)}; type 0.5 if the typeface is not known.");

    /// <inheritdoc/>
    public string ToString(string? format, IFormatProvider? formatProvider) => Value.ToString(format ?? "0.000", formatProvider);

    /// <summary>Formats with the invariant culture.</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
