using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads and writes a viewing or test distance as typed by a clinician: "40 cm", "40cm", "0.4 m", "400 mm",
/// "16 in", "16\"", "2 ft". A unit is always required. Accepted range: <see cref="Minimum"/> to <see cref="Maximum"/>.
/// </summary>
public static partial class DistanceNotation
{
    /// <summary>Shortest distance accepted: 1 mm.</summary>
    public static readonly Distance Minimum = Distance.FromMillimetres(1);

    /// <summary>Longest distance accepted: 100 m.</summary>
    public static readonly Distance Maximum = Distance.FromMetres(100);

    /// <summary>
    /// Parses a distance with its unit. Never throws. A null <paramref name="provider"/> means the current culture;
    /// it only decides which of "." and "," can be a thousands separator (both are read as decimal marks).
    /// </summary>
    public static ParseResult<Distance> Parse(string? text, IFormatProvider? provider)
    {
        var normalised = NotationText.Normalise(text, out var error, ParseMessages.DistanceExpected);
        return normalised is null ? ParseResult.Fail<Distance>(error!) : ParseNormalised(normalised, provider);
    }

    /// <summary>Parses a distance; false when the text is not one (see <see cref="Parse"/> for the message).</summary>
    public static bool TryParse(string? text, IFormatProvider? provider, out Distance distance) =>
        Parse(text, provider).TryGetValue(out distance);

    /// <summary>
    /// The stored form: metres, invariant, shortest exact digits ("0.4 m"). Parses back to the same value.
    /// </summary>
    public static string FormatCanonical(Distance distance) => NotationText.Exact(distance.Metres) + " m";

    /// <summary>
    /// A display form in centimetres with up to one decimal ("40 cm", "33.3 cm"); <paramref name="format"/> "in"
    /// gives inches, "mm" millimetres and "m" metres.
    /// </summary>
    public static string Format(Distance distance, IFormatProvider? provider, string? format = null) => format switch
    {
        "in" => NotationText.Show(distance.Inches, "0.#", provider) + " in",
        "mm" => NotationText.Show(distance.Millimetres, "0.#", provider) + " mm",
        "m" => NotationText.Show(distance.Metres, "0.0#", provider) + " m",
        _ => NotationText.Show(distance.Centimetres, "0.#", provider) + " cm",
    };

    /// <summary>Reads an already normalised distance (lower case, single spaces).</summary>
    internal static ParseResult<Distance> ParseNormalised(string normalised, IFormatProvider? provider)
    {
        var match = DistancePattern().Match(normalised);
        if (!match.Success)
        {
            var bare = NotationText.BareNumberPattern().Match(normalised);
            return bare.Success
                ? ParseResult.Fail<Distance>(ParseMessages.DistanceNeedsUnit(bare.Value))
                : ParseResult.Fail<Distance>(ParseMessages.DistanceExpected);
        }

        if (!NotationText.TryNumber(match.Groups["v"].Value, provider, out var value, out var numberError))
        {
            return ParseResult.Fail<Distance>(numberError!);
        }

        // Centimetres and millimetres go through the Distance factories so that "40 cm" is exactly FromCentimetres(40).
        var unit = match.Groups["u"].Value;
        var distance = unit switch
        {
            _ when unit == "cm" || unit.StartsWith("centi", StringComparison.Ordinal) => Distance.FromCentimetres(value),
            _ when unit == "mm" || unit.StartsWith("milli", StringComparison.Ordinal) => Distance.FromMillimetres(value),
            "in" or "inch" or "inches" or "\"" => Distance.FromInches(value),
            "ft" or "feet" or "foot" => Distance.FromFeet(value),
            _ => Distance.FromMetres(value),
        };

        return distance >= Minimum && distance <= Maximum
            ? ParseResult.Ok(distance)
            : ParseResult.Fail<Distance>(ParseMessages.DistanceOutOfRange);
    }

    [GeneratedRegex("^(?<v>" + NotationText.Number + @")\s*(?<u>" + NotationText.DistanceUnit + ")$", RegexOptions.CultureInvariant)]
    private static partial Regex DistancePattern();
}
