using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Shared text handling for the notation parsers: normalising what was typed, and reading numbers with either
/// decimal mark. Nothing here throws on user input.
/// </summary>
internal static partial class NotationText
{
    /// <summary>Longest entry read; anything longer is refused before any pattern runs.</summary>
    public const int MaximumLength = 80;

    /// <summary>Longest single number read (digits, mark and exponent).</summary>
    private const int MaximumNumberLength = 24;

    /// <summary>An unsigned number: digits with an optional "." or "," decimal part, and an optional exponent.</summary>
    public const string Number = @"(?:[0-9]+(?:[.,][0-9]+)?|[.,][0-9]+)(?:e[-+]?[0-9]{1,4})?";

    /// <summary>A number with an optional sign.</summary>
    public const string SignedNumber = "[-+]?" + Number;

    /// <summary>A distance: a number and a unit (the unit words <see cref="DistanceNotation"/> knows).</summary>
    public const string DistanceUnit = "(?:cm|mm|m|in|inch|inches|\"|ft|feet|foot|centimet(?:re|er)s?|millimet(?:re|er)s?|met(?:re|er)s?)";

    /// <summary>
    /// Normalises an entry: compatibility forms folded (full-width digits, non-breaking spaces), lower case,
    /// dashes and minus signs to "-", fraction slashes to "/", inch marks to a double quote, runs of white space
    /// to one space. Returns null when the entry is empty, too long, or holds a broken surrogate pair.
    /// </summary>
    public static string? Normalise(string? text, out string? error, string expected)
    {
        error = null;
        if (string.IsNullOrWhiteSpace(text))
        {
            error = expected;
            return null;
        }

        if (text.Length > MaximumLength)
        {
            error = ParseMessages.TooLong(expected);
            return null;
        }

        for (var i = 0; i < text.Length; i++)
        {
            // A lone surrogate cannot be normalised (string.Normalize throws on it); refuse it as unreadable text.
            if (char.IsHighSurrogate(text[i]) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                i++;
            }
            else if (char.IsSurrogate(text[i]))
            {
                error = expected;
                return null;
            }
        }

        // Fold look-alikes before and after compatibility normalisation (NFKC splits ″ into two primes, for example).
        var folded = FoldLookAlikes(FoldLookAlikes(text).Normalize(NormalizationForm.FormKC).ToLowerInvariant());
        return Spaces().Replace(folded, " ").Trim();
    }

    private static string FoldLookAlikes(string text)
    {
        var builder = new StringBuilder(text.Length);
        foreach (var c in text)
        {
            builder.Append(c switch
            {
                '\u2212' or '\u2010' or '\u2011' or '\u2012' or '\u2013' or '\u2014' => '-',
                '\u2044' or '\u2215' => '/',
                '\u2033' or '\u201c' or '\u201d' => '"',
                _ when char.IsWhiteSpace(c) => ' ',
                _ => c,
            });
        }

        return builder.ToString();
    }

    /// <summary>
    /// Reads a number matched by <see cref="Number"/> or <see cref="SignedNumber"/>. "." and "," are both decimal
    /// marks, except that a mark followed by exactly three digits after a non-zero whole part is refused when it is
    /// the culture's thousands separator ("1,000" in English, "1.000" in German), because it could mean either.
    /// </summary>
    public static bool TryNumber(string token, IFormatProvider? provider, out double value, out string? error)
    {
        value = 0;
        error = null;
        if (token.Length > MaximumNumberLength)
        {
            error = ParseMessages.NumberTooLong;
            return false;
        }

        var mark = token.IndexOfAny(['.', ',']);
        if (mark >= 0)
        {
            var exponent = token.IndexOf('e', StringComparison.Ordinal);
            var fractionDigits = (exponent < 0 ? token.Length : exponent) - mark - 1;
            var whole = token[..mark].TrimStart('-', '+');
            var wholeIsZero = whole.TrimStart('0').Length == 0;
            var groupSeparator = NumberFormatInfo.GetInstance(provider).NumberGroupSeparator;
            if (fractionDigits == 3 && !wholeIsZero && groupSeparator.Length == 1 && groupSeparator[0] == token[mark])
            {
                error = ParseMessages.AmbiguousThousands(token);
                return false;
            }
        }

        var invariantToken = token.Replace(',', '.');
        if (!double.TryParse(invariantToken, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
                CultureInfo.InvariantCulture, out value) || !double.IsFinite(value))
        {
            value = 0;
            error = ParseMessages.NumberTooLong;
            return false;
        }

        return true;
    }

    /// <summary>
    /// Reads an entry that is one number (the pattern's group "v", "." or "," as the decimal mark) with an optional
    /// unit word, between <paramref name="minimum"/> and <paramref name="maximum"/>. Every failure gives
    /// <paramref name="expected"/> (the family's message), an over-long entry <see cref="ParseMessages.TooLong"/> of it. For notations whose numbers have no
    /// thousands (powers, log units, ratios), so no separator can be ambiguous.
    /// </summary>
    public static ParseResult<double> NumberInRange(string? text, Regex pattern, double minimum, double maximum, string expected)
    {
        var normalised = Normalise(text, out var error, expected);
        if (normalised is null)
        {
            return ParseResult.Fail<double>(error!);
        }

        var match = pattern.Match(normalised);
        return match.Success
            && double.TryParse(match.Groups["v"].Value.Replace(',', '.'), NumberStyles.Float, CultureInfo.InvariantCulture, out var value)
            && value >= minimum && value <= maximum
                ? ParseResult.Ok(value)
                : ParseResult.Fail<double>(expected);
    }

    /// <summary>Formats a number for a message or a label with the caller's culture.</summary>
    public static string Show(double value, string format, IFormatProvider? provider) => value.ToString(format, provider);

    /// <summary>The shortest text that reads back to exactly the same double (invariant, for stored forms).</summary>
    public static string Exact(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>A number typed on its own, with an optional sign (each parser says what unit or word it needs).</summary>
    [GeneratedRegex("^" + SignedNumber + "$", RegexOptions.CultureInvariant)]
    public static partial Regex BareNumberPattern();

    [GeneratedRegex(@"\s+", RegexOptions.CultureInvariant)]
    private static partial Regex Spaces();
}
