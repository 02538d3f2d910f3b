using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// Scoring of a continuous-text reading chart of the MNREAD kind (Mansfield, Ahn, Legge and Luebker 1993;
/// MNREAD manual, Minnesota Laboratory for Low-Vision Research): sentences of 10 standard-length words, printed
/// in 0.1 logMAR steps labelled for a 40 cm viewing distance, from 1.3 logMAR down.
/// </summary>
public static class ReadingTestScoring
{
    /// <summary>Words in one chart sentence (10 standard-length words of 6 characters).</summary>
    public const int WordsPerSentence = 10;

    /// <summary>The viewing distance the chart's logMAR labels are for: 40 cm.</summary>
    public static Distance ChartDistance => Distance.FromCentimetres(40);

    /// <summary>
    /// Reading speed in words per minute for a whole sentence read in <paramref name="seconds"/>: wpm = 600 / t
    /// (MNREAD manual). CV-26: 4.0 s → 150 wpm.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The time is not greater than zero.</exception>
    public static double WordsPerMinute(double seconds) =>
        // MNREAD: wpm = 600 / t(s) (60 s × 10 words).
        60.0 * WordsPerSentence / ReadingTime(seconds, nameof(seconds));

    /// <summary>
    /// Reading speed excluding words read wrongly: wpm = 60 × (10 − errors) / t (MNREAD manual).
    /// CV-26: 2 errors in 5.0 s → 96 wpm.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The time is not greater than zero, or errors is not 0 to 10.</exception>
    public static double WordsPerMinute(int wordErrors, double seconds) =>
        // MNREAD: wpm = 60 × (10 − errors) / t(s).
        60.0 * (WordsPerSentence - SentenceErrors(wordErrors, nameof(wordErrors))) / ReadingTime(seconds, nameof(seconds));

    /// <summary>
    /// Reading acuity in logMAR as labelled on the chart (for 40 cm):
    /// 1.4 − 0.1 × sentences read or attempted + 0.01 × word errors (MNREAD manual). The sentence count includes
    /// the last, partly read sentence, and the errors include its unread words.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Sentences is not 1 to 19, or errors is negative or more than all the words attempted.</exception>
    public static double ChartReadingAcuityLogMar(int sentencesAttempted, int wordErrors)
    {
        if (sentencesAttempted is < 1 or > MaximumSentences)
        {
            throw new ArgumentOutOfRangeException(nameof(sentencesAttempted), sentencesAttempted,
                "Enter the number of sentences read or attempted, counting the last, partly read one: a whole number from 1 to 19, such as 12.");
        }

        if (wordErrors < 0 || wordErrors > sentencesAttempted * WordsPerSentence)
        {
            throw new ArgumentOutOfRangeException(nameof(wordErrors), wordErrors,
                "Enter the number of words missed or read wrongly, including the unread words of the last sentence: a whole number from 0 up to 10 per sentence attempted, such as 3.");
        }

        // MNREAD: reading acuity = 1.4 − 0.1 × sentences + 0.01 × errors (logMAR at 40 cm).
        return 1.4 - 0.1 * sentencesAttempted + 0.01 * wordErrors;
    }

    /// <summary>
    /// Reading acuity at the actual test distance: chart logMAR + log₁₀(0.40 / d) (MNREAD distance correction).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range, or the corrected acuity is beyond −0.5 to 3.0 logMAR.</exception>
    public static Acuity ReadingAcuity(int sentencesAttempted, int wordErrors, Distance testDistance)
    {
        var logMar = ChartReadingAcuityLogMar(sentencesAttempted, wordErrors) + DistanceCorrection(testDistance);
        return logMar is >= Acuity.BestLogMar and <= Acuity.WorstLogMar
            ? Acuity.FromLogMar(logMar)
            : throw new ArgumentOutOfRangeException(nameof(testDistance), testDistance.Metres,
                "The reading acuity at this test distance is beyond the range the chart can measure; check the distance, such as 40 cm.");
    }

    /// <summary>
    /// The correction from the chart's 40 cm labels to the test distance d: log₁₀(0.40 / d) (MNREAD manual;
    /// +0.097 at 32 cm).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The test distance is not greater than zero.</exception>
    public static double DistanceCorrection(Distance testDistance) =>
        // MNREAD distance correction: + log₁₀(0.40 / d).
        Math.Log10(ChartDistance.Metres / MethodInputGuards.TestDistance(testDistance, nameof(testDistance)).Metres);

    /// <summary>
    /// The physical print size of a chart line labelled <paramref name="chartLogMar"/> (for 40 cm):
    /// M = 0.40 × 10^logMAR (from logMAR = log₁₀(M / d), Colenbrander 2001). 1.3 logMAR is 8M; 0.0 is 0.4M.
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not a finite logMAR from −0.5 to 3.0.</exception>
    public static PrintSize ChartPrintSize(double chartLogMar) => chartLogMar is >= Acuity.BestLogMar and <= Acuity.WorstLogMar
        // M = d × MAR at the chart's 40 cm (Acuity.ThresholdPrintAt; Colenbrander: logMAR = log₁₀(M/d)).
        ? Acuity.FromLogMar(chartLogMar).ThresholdPrintAt(ChartDistance)
        : throw new ArgumentOutOfRangeException(nameof(chartLogMar), chartLogMar,
            "Enter the chart's print size label in logMAR from -0.5 to 3.0, such as 0.8.");

    private const int MaximumSentences = 19;

    private static double ReadingTime(double seconds, string paramName) =>
        double.IsFinite(seconds) && seconds > 0
            ? seconds
            : throw new ArgumentOutOfRangeException(paramName, seconds,
                "Enter the reading time in seconds, greater than zero, such as 4.5.");

    private static int SentenceErrors(int errors, string paramName) =>
        errors is >= 0 and <= WordsPerSentence
            ? errors
            : throw new ArgumentOutOfRangeException(paramName, errors,
                "Enter the number of words missed or read wrongly in the sentence: a whole number from 0 to 10, such as 1.");
}
