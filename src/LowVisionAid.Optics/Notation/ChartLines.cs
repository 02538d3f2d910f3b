namespace LowVisionAid.Optics.Notation;

/// <summary>
/// The standard chart lines and their usual printed labels (methods §1.1 table, derived from exact 0.1 logMAR steps;
/// the labels are the rounded ones charts print, e.g. 6/38 for an exact 6/37.9).
/// </summary>
internal static class ChartLines
{
    /// <summary>How close (in logMAR) a value must be to a line to be written with the line's chart label.</summary>
    public const double SnapTolerance = 0.005;

    private static readonly (double LogMar, double Metres, double Feet)[] Lines =
    [
        (0.0, 6, 20),
        (0.1, 7.5, 25),
        (0.2, 9.5, 32),
        (0.3, 12, 40),
        (0.4, 15, 50),
        (0.5, 19, 63),
        (0.6, 24, 80),
        (0.7, 30, 100),
        (0.8, 38, 125),
        (0.9, 48, 160),
        (1.0, 60, 200),
        (1.3, 120, 400),
    ];

    /// <summary>The chart label's denominator when <paramref name="logMar"/> is on a standard line.</summary>
    public static double? Label(double logMar, bool feet)
    {
        foreach (var line in Lines)
        {
            if (Math.Abs(line.LogMar - logMar) <= SnapTolerance)
            {
                return feet ? line.Feet : line.Metres;
            }
        }

        return null;
    }
}
