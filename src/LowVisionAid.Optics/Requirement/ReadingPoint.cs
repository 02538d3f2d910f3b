using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Optics.Requirement;

/// <summary>
/// One point of a reading-speed curve: the reading speed, in words per minute, for one print size, all read at
/// the same test distance. A speed of 0 means the sentence could not be read.
/// </summary>
public readonly record struct ReadingPoint
{
    /// <summary>A point from a print size (greater than zero) and a reading speed (zero or more words per minute).</summary>
    /// <exception cref="ArgumentOutOfRangeException">The print size is not greater than zero, or the speed is negative or not finite.</exception>
    public ReadingPoint(PrintSize printSize, double wordsPerMinute)
    {
        PrintSize = MethodInputGuards.Print(printSize, nameof(printSize), "print size of the sentence");
        WordsPerMinute = double.IsFinite(wordsPerMinute) && wordsPerMinute >= 0
            ? wordsPerMinute
            : throw new ArgumentOutOfRangeException(nameof(wordsPerMinute), wordsPerMinute,
                "Enter the reading speed in words per minute, zero or more, such as 85.");
    }

    /// <summary>
    /// A point from one timed chart sentence: speed = 60 × (10 − errors) / t (MNREAD manual; with 0 errors this is
    /// 600 / t).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">The print size, time or error count is out of range.</exception>
    public static ReadingPoint FromTimedSentence(PrintSize printSize, double seconds, int wordErrors) =>
        new(printSize, ReadingTestScoring.WordsPerMinute(wordErrors, seconds));

    /// <summary>The print size of the sentence (x-height in M units).</summary>
    public PrintSize PrintSize { get; }

    /// <summary>The reading speed in words per minute.</summary>
    public double WordsPerMinute { get; }
}
