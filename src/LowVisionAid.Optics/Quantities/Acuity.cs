using System.Globalization;

namespace LowVisionAid.Optics.Quantities;

/// <summary>
/// A visual acuity, held as logMAR (log₁₀ of the minimum angle of resolution in arcminutes; Bailey and Lovie 1976).
/// Lower is better; 0.0 is 6/6 (20/20). Every notation converts through this one value.
/// The default value is logMAR 0.0.
/// </summary>
public readonly record struct Acuity : IComparable<Acuity>, IFormattable
{
    private readonly double _logMar;

    private Acuity(double logMar) => _logMar = logMar;

    /// <summary>Best logMAR accepted (−0.5, beyond any chart).</summary>
    public const double BestLogMar = -0.5;

    /// <summary>Worst logMAR accepted (3.0, a MAR of 1000′, far below any chart line).</summary>
    public const double WorstLogMar = 3.0;

    /// <summary>logMAR = log₁₀(MAR).</summary>
    public double LogMar => _logMar;

    /// <summary>MAR in arcminutes = 10^logMAR.</summary>
    public double MarArcminutes =>
        // MAR = 10^logMAR (Bailey and Lovie 1976).
        Math.Pow(10, _logMar);

    /// <summary>Decimal acuity = 1 / MAR = 10^−logMAR.</summary>
    public double DecimalValue =>
        // V_dec = 1 / MAR = 10^−logMAR (Bailey and Lovie 1976).
        Math.Pow(10, -_logMar);

    /// <summary>Visual acuity score VAS = 100 − 50 × logMAR (DICOM PS3.17 Annex RR.2.2).</summary>
    public double VisualAcuityScore =>
        // VAS = 100 − 50 × logMAR (DICOM PS3.17 Annex RR.2.2, after Colenbrander/ICO).
        100.0 - 50.0 * _logMar;

    /// <summary>ETDRS letter score = 85 − 50 × logMAR (Gregori, Feuer and Rosenfeld 2010, Retina 30:1046; 20/20 = 85, 20/200 = 35).</summary>
    public double EtdrsLetters =>
        // ETDRS letters = 85 − 50 × logMAR (Gregori, Feuer and Rosenfeld 2010; methods §1.1, §11).
        85.0 - 50.0 * _logMar;

    /// <summary>The Snellen denominator for a given numerator (test distance): den = num × 10^logMAR.</summary>
    public double SnellenDenominator(double numerator) => Guard.Positive(numerator, nameof(numerator), "A Snellen numerator", "6 or 20") * MarArcminutes;

    /// <summary>An acuity from logMAR, between <see cref="BestLogMar"/> and <see cref="WorstLogMar"/>.</summary>
    public static Acuity FromLogMar(double logMar) => logMar is >= BestLogMar and <= WorstLogMar
        ? new(logMar)
        : throw new ArgumentOutOfRangeException(nameof(logMar), logMar, "An acuity must be between logMAR -0.5 and 3.0 (6/1.9 to 6/6000); enter one such as logMAR 1.0 (6/60).");

    /// <summary>An acuity from a decimal value (e.g. 0.5 for 6/12).</summary>
    public static Acuity FromDecimal(double value) =>
        FromLogMar(LogMarOfDecimal(Guard.Positive(value, nameof(value), "A decimal acuity", "0.5 for 6/12")));

    /// <summary>An acuity from a visual acuity score, 0 to 125 (VAS 100 is 6/6; VAS 50 is 6/60).</summary>
    public static Acuity FromVisualAcuityScore(double score) =>
        FromLogMar(LogMarOfVisualAcuityScore(Guard.Finite(score, nameof(score), "A visual acuity score", "50 for 6/60")));

    /// <summary>
    /// An acuity from an ETDRS letter score, 0 to 110 (85 letters is 6/6; 35 is 6/60; Gregori, Feuer and Rosenfeld
    /// 2010). A score of 0 is a floor (worse than the top line), so 0 gives logMAR 1.7 as a bound, not a measurement;
    /// the parser refuses it for that reason.
    /// </summary>
    public static Acuity FromEtdrsLetters(double letters) =>
        FromLogMar(LogMarOfEtdrsLetters(Guard.Finite(letters, nameof(letters), "An ETDRS letter score", "35 for 6/60")));

    /// <summary>logMAR = −log₁₀(decimal acuity); the parsers check the range before making a value.</summary>
    internal static double LogMarOfDecimal(double decimalAcuity) =>
        // logMAR = −log₁₀(V_dec) (Bailey and Lovie 1976).
        -Math.Log10(decimalAcuity);

    /// <summary>logMAR = (100 − VAS) / 50, the inverse of <see cref="VisualAcuityScore"/>.</summary>
    internal static double LogMarOfVisualAcuityScore(double score) =>
        // Inverse of VAS = 100 − 50 × logMAR (DICOM PS3.17 Annex RR.2.2).
        (100.0 - score) / 50.0;

    /// <summary>logMAR = (85 − letters) / 50, the inverse of <see cref="EtdrsLetters"/>.</summary>
    internal static double LogMarOfEtdrsLetters(double letters) =>
        // Inverse of ETDRS letters = 85 − 50 × logMAR (Gregori, Feuer and Rosenfeld 2010; methods §1.1).
        (85.0 - letters) / 50.0;

    /// <summary>An acuity from the minimum angle of resolution in arcminutes.</summary>
    public static Acuity FromMarArcminutes(double arcminutes) =>
        // logMAR = log₁₀(MAR in arcminutes) (Bailey and Lovie 1976).
        FromLogMar(Math.Log10(Guard.Positive(arcminutes, nameof(arcminutes), "A MAR", "10 arcminutes for 6/60")));

    /// <summary>An acuity from a Snellen fraction: decimal = numerator ÷ denominator (6/60, 20/200, 4/40).</summary>
    public static Acuity FromSnellen(double numerator, double denominator) =>
        // Decimal acuity = numerator ÷ denominator (Snellen convention).
        FromDecimal(Guard.Positive(numerator, nameof(numerator), "A Snellen numerator", "6 in 6/60") / Guard.Positive(denominator, nameof(denominator), "A Snellen denominator", "60 in 6/60"));

    /// <summary>
    /// The acuity implied by reading print of size <paramref name="threshold"/> at <paramref name="distance"/>:
    /// MAR = M / d, so logMAR = log₁₀(M / d) (Colenbrander's modified Snellen formula, 1/V = M × D).
    /// </summary>
    public static Acuity FromNearThreshold(PrintSize threshold, Distance distance) => FromLogMar(threshold.LogMarAt(distance));

    /// <summary>The print size at threshold at <paramref name="distance"/>: M = d × MAR (inverse of <see cref="FromNearThreshold"/>).</summary>
    public PrintSize ThresholdPrintAt(Distance distance) =>
        // Threshold print M = d × MAR (inverse of Colenbrander's logMAR = log₁₀(M / d)).
        PrintSize.FromM(distance.Abs().Metres * MarArcminutes);

    /// <summary>The difference in log units between two acuities (positive when this one is worse).</summary>
    public double LogUnitsWorseThan(Acuity other) => _logMar - other._logMar;

    /// <inheritdoc/>
    public int CompareTo(Acuity other) => _logMar.CompareTo(other._logMar);

    /// <summary>Ordering by logMAR (a larger logMAR is worse acuity).</summary>
    public static bool operator <(Acuity left, Acuity right) => left._logMar < right._logMar;

    /// <summary>Ordering by logMAR.</summary>
    public static bool operator >(Acuity left, Acuity right) => left._logMar > right._logMar;

    /// <summary>Ordering by logMAR.</summary>
    public static bool operator <=(Acuity left, Acuity right) => left._logMar <= right._logMar;

    /// <summary>Ordering by logMAR.</summary>
    public static bool operator >=(Acuity left, Acuity right) => left._logMar >= right._logMar;

    /// <summary>Formats as logMAR with two decimals, e.g. "1.00 logMAR".</summary>
    public string ToString(string? format, IFormatProvider? formatProvider) =>
        _logMar.ToString(string.IsNullOrEmpty(format) ? "0.00" : format, formatProvider) + " logMAR";

    /// <summary>Formats with the invariant culture.</summary>
    public override string ToString() => ToString(null, CultureInfo.InvariantCulture);
}
