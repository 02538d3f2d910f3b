using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// Acuity reserve: target print size ÷ threshold print size (Whittaker and Lovie-Kitchin 1993), at least 1:1.
/// Applied as a multiplier on the required equivalent power, or as +log₁₀(R) in logMAR.
/// The default value is 1:1 (no reserve).
/// </summary>
public readonly record struct AcuityReserve : IFormattable
{
    // Implementation note: stored as ratio − 1 so that default(AcuityReserve) is 1:1.
    private readonly double _ratioMinusOne;

    private AcuityReserve(double ratio) => _ratioMinusOne = ratio - 1.0;

    /// <summary>Largest reserve accepted.</summary>
    public const double MaximumRatio = 10.0;

    /// <summary>Spot reading default, 1:1 (ABDO CPD article; common practice).</summary>
    public static AcuityReserve Spot => default;

    /// <summary>Fluent reading default, 2:1 (Cheong, Lovie-Kitchin and Bowers 2002; Latham and Tabrett 2012).</summary>
    public static AcuityReserve Fluent => new(2.0);

    /// <summary>Sustained (high-fluent) reading default, 3:1 (ABDO CPD article after Whittaker and Lovie-Kitchin 1993).</summary>
    public static AcuityReserve Sustained => new(3.0);

    /// <summary>The reserve as a ratio, e.g. 2 for 2:1.</summary>
    public double Ratio => _ratioMinusOne + 1.0;

    /// <summary>The reserve in log units, log₁₀(R): 0.30 for 2:1, 0.48 for 3:1.</summary>
    public double LogUnits =>
        // reserve in log units = log₁₀ R (Whittaker and Lovie-Kitchin 1993; +0.30 for 2:1).
        Math.Log10(Ratio);

    /// <summary>A reserve from a ratio between 1 and <see cref="MaximumRatio"/>.</summary>
    public static AcuityReserve FromRatio(double ratio) => ratio is >= 1.0 and <= MaximumRatio
        ? new(ratio)
        : throw new ArgumentOutOfRangeException(nameof(ratio), ratio, "An acuity reserve must be between 1 (1:1) and 10 (10:1); type 2 for 2:1.");

    /// <summary>Formats as a ratio, e.g. "2:1".</summary>
    public string ToString(string? format, IFormatProvider? formatProvider) => Ratio.ToString(format ?? "0.##", formatProvider) + ":1";

    /// <summary>Formats with the invariant culture.</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
