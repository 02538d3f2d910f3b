using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads an acuity reserve typed as a ratio: "2", "2:1" or "2.5 : 1". Accepted range: 1:1 to
/// <see cref="AcuityReserve.MaximumRatio"/>:1.
/// </summary>
public static partial class AcuityReserveNotation
{
    /// <summary>
    /// Parses a reserve ratio. Never throws. "." and "," are both decimal marks (a ratio has no thousands), so
    /// <paramref name="provider"/> changes nothing today; it is taken for symmetry with the other notations.
    /// </summary>
    public static ParseResult<AcuityReserve> Parse(string? text, IFormatProvider? provider) =>
        NotationText.NumberInRange(text, RatioPattern(), 1, AcuityReserve.MaximumRatio, ParseMessages.AcuityReserveExpected).Map(AcuityReserve.FromRatio);

    [GeneratedRegex(@"^(?<v>[0-9]+(?:[.,][0-9]+)?)\s*(?::\s*1)?$", RegexOptions.CultureInvariant)]
    private static partial Regex RatioPattern();
}
