namespace LowVisionAid.Optics.Notation;

/// <summary>The ways a distance acuity can be written back for display.</summary>
public enum AcuityNotation
{
    /// <summary>logMAR with two decimals, "0.30 logMAR" (Bailey and Lovie 1976).</summary>
    LogMar,

    /// <summary>Snellen fraction over 6 m, "6/12"; a chart label when on a standard line.</summary>
    SnellenMetres,

    /// <summary>Snellen fraction over 20 ft, "20/40"; a chart label when on a standard line.</summary>
    SnellenFeet,

    /// <summary>Decimal acuity, "0.50 decimal".</summary>
    DecimalAcuity,

    /// <summary>Visual acuity score, "VAS 85" (DICOM PS3.17 Annex RR.2.2).</summary>
    VisualAcuityScore,

    /// <summary>ETDRS letter score, "85 letters" (85 − 50 × logMAR; Gregori, Feuer and Rosenfeld 2010).</summary>
    EtdrsLetters,
}

/// <summary>How a number typed on its own ("0.5") is read as a distance acuity.</summary>
public enum BareNumberReading
{
    /// <summary>
    /// The default: a bare number is refused with a message showing both readings (decimal and logMAR), because
    /// "0.5" is 6/12 as a decimal and 6/19 as logMAR.
    /// </summary>
    Ask,

    /// <summary>A bare number is logMAR; the result carries a warning that shows the reading.</summary>
    LogMar,

    /// <summary>A bare number is decimal acuity; the result carries a warning that shows the reading.</summary>
    DecimalAcuity,
}

/// <summary>Choices for reading a distance acuity. The default reads as a clinic would without guessing.</summary>
public sealed record DistanceAcuityOptions
{
    /// <summary>The default options: bare numbers refused, 5 letters a line.</summary>
    public static DistanceAcuityOptions Default { get; } = new();

    /// <summary>How a number typed on its own is read; <see cref="BareNumberReading.Ask"/> by default.</summary>
    public BareNumberReading BareNumbers { get; init; } = BareNumberReading.Ask;

    /// <summary>Letters on each line of the chart used for letter-by-letter scoring; 5 by default (ETDRS, Bailey–Lovie).</summary>
    public int LettersPerLine { get; init; } = 5;
}
