using System.Collections.Immutable;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Contrast reserve for reading: print contrast ÷ the reader's letter contrast threshold (Whittaker and
/// Lovie-Kitchin 1993, 1994), from a letter contrast sensitivity score in log units (Pelli–Robson style).
/// </summary>
public static class ContrastReserve
{
    /// <summary>The contrast of ordinary black print on white paper, about 0.90 (methods §2.4).</summary>
    public const double TypicalPrintContrast = 0.9;

    /// <summary>Below this reserve (10×) reading slows (Whittaker and Lovie-Kitchin 1994).</summary>
    public const double SlowsReadingBelow = 10.0;

    /// <summary>Below this reserve (4×) reading rate and accuracy are seriously impaired (Whittaker and Lovie-Kitchin 1994).</summary>
    public const double SeriouslyImpairsBelow = 4.0;

    /// <summary>A letter contrast threshold above this (9 %) is poor (Whittaker and Lovie-Kitchin 1994).</summary>
    public const double PoorThresholdAbove = 0.09;

    /// <summary>A letter contrast threshold above this (25 %) is very poor (Whittaker and Lovie-Kitchin 1994).</summary>
    public const double VeryPoorThresholdAbove = 0.25;

    /// <summary>Highest letter contrast sensitivity accepted, 2.5 log units (above any chart's best score).</summary>
    public const double MaximumLogCs = 2.5;

    /// <summary>The letter contrast threshold, as a fraction: 10^(−logCS). logCS 1.05 → 0.089; 0.6 → 0.25.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The score is not from 0 to 2.5.</exception>
    public static double Threshold(double letterLogCs) =>
        // Contrast threshold = 10^(−logCS) (Pelli–Robson scoring; methods §2.4).
        Math.Pow(10, -LogCs(letterLogCs, nameof(letterLogCs)));

    /// <summary>Assesses the contrast reserve and says what it means for reading, with the 1994 cut-offs.</summary>
    /// <param name="letterLogCs">Letter contrast sensitivity in log units, 0 to 2.5 (e.g. 1.05).</param>
    /// <param name="printContrast">The contrast of the print to be read, as a fraction from above 0 to 1; ordinary print is about 0.9.</param>
    /// <param name="measuredAt">
    /// What size of letters the sensitivity was measured with. Large letters (a Pelli–Robson chart, the default) give
    /// a lower threshold than reading-size print, so the reserve is then an upper bound; a threshold measured at
    /// reading size gives the reserve itself.
    /// </param>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public static ContrastReserveAssessment Assess(double letterLogCs, double printContrast = TypicalPrintContrast, ContrastMeasuredAt measuredAt = ContrastMeasuredAt.LargeLetters)
    {
        if (!(double.IsFinite(printContrast) && printContrast is > 0 and <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(printContrast), printContrast,
                "Enter the print contrast as a fraction greater than 0 and at most 1, such as 0.9 for ordinary black print on white paper.");
        }

        var threshold = Threshold(letterLogCs);
        // Contrast reserve = print contrast ÷ contrast threshold (Whittaker and Lovie-Kitchin 1993).
        var reserve = printContrast / threshold;
        var reserveLevel = reserve < SeriouslyImpairsBelow ? ContrastReserveLevel.SeriouslyImpairsReading
            : reserve < SlowsReadingBelow ? ContrastReserveLevel.SlowsReading
            : ContrastReserveLevel.Sufficient;
        var thresholdLevel = threshold > VeryPoorThresholdAbove ? ContrastThresholdLevel.VeryPoor
            : threshold > PoorThresholdAbove ? ContrastThresholdLevel.Poor
            : ContrastThresholdLevel.WithinUsualRange;
        var advice = Advise(letterLogCs, reserveLevel, thresholdLevel);
        var upperBound = measuredAt != ContrastMeasuredAt.ReadingSize;
        if (upperBound)
        {
            advice = advice.Add(UpperBoundNote);
        }

        return new ContrastReserveAssessment(letterLogCs, printContrast, threshold, reserve, reserveLevel, thresholdLevel, advice)
        {
            IsUpperBound = upperBound,
        };
    }

    /// <summary>The note added when the threshold was measured with large letters.</summary>
    public const string UpperBoundNote =
        "Contrast sensitivity was measured with large letters (Pelli–Robson style); the contrast threshold for reading-size print is higher, so this reserve is an upper bound. A contrast threshold measured at the reading print size gives the reserve itself.";

    private static ImmutableArray<string> Advise(double logCs, ContrastReserveLevel reserveLevel, ContrastThresholdLevel thresholdLevel)
    {
        var advice = ImmutableArray.CreateBuilder<string>();
        advice.Add(reserveLevel switch
        {
            ContrastReserveLevel.SeriouslyImpairsReading => "The print is less than 4 times the reader's contrast threshold: reading speed and accuracy are likely to be seriously impaired (Whittaker and Lovie-Kitchin 1994).",
            ContrastReserveLevel.SlowsReading => "The print is less than 10 times the reader's contrast threshold: reading is likely to be slowed (Whittaker and Lovie-Kitchin 1994).",
            _ => "The print is at least 10 times the reader's contrast threshold: contrast is unlikely to limit reading speed (Whittaker and Lovie-Kitchin 1994).",
        });
        switch (thresholdLevel)
        {
            case ContrastThresholdLevel.VeryPoor:
                advice.Add("A letter contrast threshold above 25 % is very poor: consider a video magnifier (contrast and polarity control) or non-visual methods such as audio (Whittaker and Lovie-Kitchin 1994).");
                break;
            case ContrastThresholdLevel.Poor:
                advice.Add("A letter contrast threshold above 9 % is poor: assess lighting, and consider extra magnification or a video magnifier (Whittaker and Lovie-Kitchin 1994).");
                break;
            default:
                break;
        }

        // Latham and Tabrett 2012: 1M is likely with an aid if reading acuity is better than 0.85 logMAR, or failing that, if CS is better than 1.05 logCS.
        advice.Add(logCs > 1.05
            ? "Contrast sensitivity better than 1.05 log units makes reading 1M print with an aid likely, even when reading acuity is worse than 0.85 logMAR (Latham and Tabrett 2012)."
            : "Contrast sensitivity is not better than 1.05 log units, so reading 1M print with an aid is likely only if reading acuity is better than 0.85 logMAR (Latham and Tabrett 2012).");
        return advice.ToImmutable();
    }

    private static double LogCs(double value, string paramName) =>
        double.IsFinite(value) && value is >= 0 and <= MaximumLogCs
            ? value
            : throw new ArgumentOutOfRangeException(paramName, value,
                "Enter the letter contrast sensitivity in log units from 0 to 2.5, such as 1.05.");
}

/// <summary>The letter size a contrast threshold was measured with.</summary>
public enum ContrastMeasuredAt
{
    /// <summary>Large letters (a Pelli–Robson style chart): the reserve worked out is an upper bound for reading-size print.</summary>
    LargeLetters,

    /// <summary>Letters at the size of the print to be read: the reserve worked out applies to that print.</summary>
    ReadingSize,
}

/// <summary>What the contrast reserve means for reading speed (Whittaker and Lovie-Kitchin 1994).</summary>
public enum ContrastReserveLevel
{
    /// <summary>At least 10×: contrast is unlikely to limit reading speed.</summary>
    Sufficient,

    /// <summary>From 4× up to 10×: reading is slowed.</summary>
    SlowsReading,

    /// <summary>Below 4×: reading rate and accuracy are seriously impaired.</summary>
    SeriouslyImpairsReading,
}

/// <summary>How the letter contrast threshold compares with the 1994 cut-offs (Whittaker and Lovie-Kitchin 1994).</summary>
public enum ContrastThresholdLevel
{
    /// <summary>9 % or better.</summary>
    WithinUsualRange,

    /// <summary>Above 9 %: assess lighting; more magnification or a video magnifier.</summary>
    Poor,

    /// <summary>Above 25 %: video magnifier or non-visual methods.</summary>
    VeryPoor,
}

/// <summary>A contrast-reserve assessment.</summary>
/// <param name="LetterLogCs">The letter contrast sensitivity entered (log units).</param>
/// <param name="PrintContrast">The print contrast used (fraction).</param>
/// <param name="ThresholdContrast">The letter contrast threshold, 10^(−logCS), as a fraction.</param>
/// <param name="Reserve">Print contrast ÷ threshold (e.g. 10.1 for 10.1:1).</param>
/// <param name="ReserveLevel">What the reserve means for reading.</param>
/// <param name="ThresholdLevel">How the threshold compares with the 9 % and 25 % cut-offs.</param>
/// <param name="Advice">Plain-words advice with its sources.</param>
public sealed record ContrastReserveAssessment(
    double LetterLogCs,
    double PrintContrast,
    double ThresholdContrast,
    double Reserve,
    ContrastReserveLevel ReserveLevel,
    ContrastThresholdLevel ThresholdLevel,
    ImmutableArray<string> Advice)
{
    /// <summary>True when the threshold came from large letters, so the reserve for reading-size print is at most this.</summary>
    public bool IsUpperBound { get; init; }
}
