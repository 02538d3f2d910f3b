using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads a signed power in dioptres as typed by a clinician: "+2.50", "+4 D", "-1.25D", "3 dioptres". The unit word
/// is optional. Accepted range: <see cref="MinimumDioptres"/> to <see cref="MaximumDioptres"/>.
/// </summary>
public static partial class PowerNotation
{
    /// <summary>Most negative power accepted, D.</summary>
    public const double MinimumDioptres = -40;

    /// <summary>Most positive power accepted, D (stronger than any near-vision lens or magnifier in use).</summary>
    public const double MaximumDioptres = 80;

    /// <summary>
    /// Parses a power in dioptres. Never throws. "." and "," are both decimal marks (a power has no thousands),
    /// so <paramref name="provider"/> changes nothing today; it is taken for symmetry with the other notations.
    /// </summary>
    public static ParseResult<Power> Parse(string? text, IFormatProvider? provider) =>
        NotationText.NumberInRange(text, PowerPattern(), MinimumDioptres, MaximumDioptres, ParseMessages.PowerExpected).Map(Power.FromDioptres);

    /// <summary>Parses a power; false when the text is not one (see <see cref="Parse"/> for the message).</summary>
    public static bool TryParse(string? text, IFormatProvider? provider, out Power power) =>
        Parse(text, provider).TryGetValue(out power);

    [GeneratedRegex(@"^(?<v>[-+]?[0-9]+(?:[.,][0-9]+)?)\s*(?:d|dioptres?|diopters?)?$", RegexOptions.CultureInvariant)]
    private static partial Regex PowerPattern();
}
