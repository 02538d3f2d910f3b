using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>Levels of vision recorded without a letter chart.</summary>
public enum NonChartVisionLevel
{
    /// <summary>Counting fingers (CF).</summary>
    CountingFingers,

    /// <summary>Hand movements (HM).</summary>
    HandMovements,

    /// <summary>Light perception (LP, PL).</summary>
    LightPerception,

    /// <summary>No light perception (NLP, NPL).</summary>
    NoLightPerception,
}

/// <summary>
/// A vision level recorded without a chart, such as "CF at 1 m". It can be recorded and shown, but it is never
/// used in a calculation: it has no logMAR. The default value is counting fingers with no distance.
/// </summary>
public readonly record struct NonChartVision
{
    /// <summary>A level with the distance it was tested at, if one was written.</summary>
    public NonChartVision(NonChartVisionLevel level, Distance? testDistance)
    {
        Level = level;
        TestDistance = testDistance;
    }

    /// <summary>The level recorded.</summary>
    public NonChartVisionLevel Level { get; }

    /// <summary>The distance written with it ("CF at 1 m"), or null.</summary>
    public Distance? TestDistance { get; }
}

/// <summary>
/// Recognises counting fingers, hand movements, light perception and no light perception in what was typed
/// (CF, HM, LP, PL, NLP, NPL, the words in full, with or without "at 1 m"), and writes them back.
/// </summary>
public static partial class NonChartVisionNotation
{
    /// <summary>
    /// Recognises a non-chart vision level. Never throws. Fails, with the general distance-acuity message, when the
    /// text is not one of these levels.
    /// </summary>
    public static ParseResult<NonChartVision> Parse(string? text, IFormatProvider? provider)
    {
        var normalised = NotationText.Normalise(text, out var error, ParseMessages.DistanceAcuityExpected);
        if (normalised is null)
        {
            return ParseResult.Fail<NonChartVision>(error!);
        }

        return TryRecognise(normalised, provider, out var vision, out var distanceError)
            ? ParseResult.Ok(vision)
            : ParseResult.Fail<NonChartVision>(distanceError ?? ParseMessages.DistanceAcuityExpected);
    }

    /// <summary>Writes the level with its usual abbreviation and the distance, e.g. "CF at 1 m".</summary>
    public static string Format(NonChartVision vision, IFormatProvider? provider)
    {
        var abbreviation = vision.Level switch
        {
            NonChartVisionLevel.CountingFingers => "CF",
            NonChartVisionLevel.HandMovements => "HM",
            NonChartVisionLevel.LightPerception => "LP",
            _ => "NLP",
        };
        return vision.TestDistance is { } distance
            ? abbreviation + " at " + DistanceNotation.Format(distance, provider, distance.Metres >= 1 ? "m" : null)
            : abbreviation;
    }

    /// <summary>
    /// Recognises a normalised entry. <paramref name="error"/> is set only when the level was recognised but the
    /// distance written with it was not readable.
    /// </summary>
    internal static bool TryRecognise(string normalised, IFormatProvider? provider, out NonChartVision vision, out string? error)
    {
        vision = default;
        error = null;
        var match = NonChartPattern().Match(normalised);
        if (!match.Success)
        {
            return false;
        }

        var word = match.Groups["level"].Value;
        var level = word switch
        {
            "cf" or "fc" => NonChartVisionLevel.CountingFingers,
            _ when word.StartsWith("count", StringComparison.Ordinal) || word.StartsWith("finger", StringComparison.Ordinal)
                => NonChartVisionLevel.CountingFingers,
            "hm" => NonChartVisionLevel.HandMovements,
            _ when word.StartsWith("hand", StringComparison.Ordinal) => NonChartVisionLevel.HandMovements,
            "lp" or "pl" or "lp+" or "pl+" or "light perception" or "perception of light" => NonChartVisionLevel.LightPerception,
            _ => NonChartVisionLevel.NoLightPerception,
        };

        Distance? distance = null;
        if (match.Groups["dist"].Success)
        {
            var parsed = DistanceNotation.ParseNormalised(match.Groups["dist"].Value, provider);
            if (!parsed.Success)
            {
                error = parsed.Error;
                return false;
            }

            distance = parsed.Value;
        }

        vision = new NonChartVision(level, distance);
        return true;
    }

    [GeneratedRegex(
        @"^(?<level>cf|fc|count(?:ing)? fingers?|fingers? count(?:ing)?|hm|hand motions?|hand movements?|nlp|npl|no light perception|no perception of light|lp\+?|pl\+?|light perception|perception of light)"
        + @"(?:\s*(?:at|@)?\s*(?<dist>" + NotationText.Number + @"\s*" + NotationText.DistanceUnit + "))?$",
        RegexOptions.CultureInvariant)]
    private static partial Regex NonChartPattern();
}
