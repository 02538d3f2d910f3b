using System.Text.RegularExpressions;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads letter contrast sensitivity in log units as typed by a clinician: "1.05" or "1.05 logCS". Accepted range:
/// <see cref="MinimumLogCs"/> to <see cref="MaximumLogCs"/> (the span of letter contrast charts such as the
/// Pelli-Robson chart, 0.00 to 2.25 log units, with room for charts that go a step further).
/// </summary>
public static partial class ContrastSensitivityNotation
{
    /// <summary>Lowest log contrast sensitivity accepted.</summary>
    public const double MinimumLogCs = 0;

    /// <summary>Highest log contrast sensitivity accepted.</summary>
    public const double MaximumLogCs = 2.4;

    /// <summary>
    /// Parses a log contrast sensitivity. Never throws. "." and "," are both decimal marks (the values have no
    /// thousands), so <paramref name="provider"/> changes nothing today; it is taken for symmetry with the other notations.
    /// </summary>
    public static ParseResult<double> Parse(string? text, IFormatProvider? provider) =>
        NotationText.NumberInRange(text, LogCsPattern(), MinimumLogCs, MaximumLogCs, ParseMessages.ContrastSensitivityExpected);

    [GeneratedRegex(@"^(?<v>[0-9]+(?:[.,][0-9]+)?)\s*(?:log\s*cs)?$", RegexOptions.CultureInvariant)]
    private static partial Regex LogCsPattern();
}
