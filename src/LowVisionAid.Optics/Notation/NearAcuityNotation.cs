using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads and writes a near acuity: the smallest print read and the distance. Accepted forms: M at a distance
/// ("4M at 40 cm", "1.6M @ 25cm", "1M 40cm"), N at a distance ("N8 at 25 cm", approximate), points or x-height at a
/// distance ("12 pt at 40 cm", "1.5 mm at 40 cm"), near Snellen equivalents at a distance ("20/50 at 40 cm",
/// "6/15 at 40 cm"), metres over M ("0.40/1.0M"), and Jaeger ("J5", "J5 at 40 cm") with a warning.
/// A print size without a distance is refused (except Jaeger, whose table assumes 40 cm, with a warning).
/// </summary>
public static partial class NearAcuityNotation
{
    /// <summary>The distance Jaeger equivalents assume when none is written (methods §1.4: cards used at 40 cm).</summary>
    public static readonly Distance JaegerCardDistance = Distance.FromCentimetres(40);

    /// <summary>
    /// Parses a near acuity. Never throws. <paramref name="xHeightRatio"/> converts N and points (default 0.50).
    /// A null <paramref name="provider"/> means the current culture (it only decides the thousands separator).
    /// </summary>
    public static ParseResult<NearAcuity> Parse(string? text, IFormatProvider? provider, XHeightRatio xHeightRatio = default)
    {
        var normalised = NotationText.Normalise(text, out var error, ParseMessages.NearAcuityExpected);
        if (normalised is null)
        {
            return ParseResult.Fail<NearAcuity>(error!);
        }

        Match match;
        if ((match = MetresOverMPattern().Match(normalised)).Success)
        {
            // Near Snellen-type fraction: V = d / M with d in metres (Colenbrander 2001).
            var distance = DistanceNotation.ParseNormalised(match.Groups["d"].Value + " m", provider);
            var size = PrintSizeNotation.ParseNormalised(match.Groups["m"].Value + "m", provider, xHeightRatio);
            return Combine(size, distance, null);
        }

        if ((match = PrintSizeNotation.JaegerPattern().Match(normalised)).Success)
        {
            return Combine(PrintSizeNotation.ReadJaeger(match.Groups["j"].Value, provider, assumedDistance: true),
                ParseResult.Ok(JaegerCardDistance), null);
        }

        if ((match = SizeAtDistancePattern().Match(normalised)).Success)
        {
            var sizeText = match.Groups["size"].Value;
            var distance = DistanceNotation.ParseNormalised(match.Groups["dist"].Value, provider);
            var snellen = SnellenPattern().Match(sizeText);
            if (snellen.Success)
            {
                var acuity = DistanceAcuityNotation.Parse(sizeText, provider);
                if (!acuity.Success)
                {
                    return ParseResult.Fail<NearAcuity>(acuity.Error);
                }

                if (!distance.Success)
                {
                    return ParseResult.Fail<NearAcuity>(distance.Error);
                }

                // A near Snellen equivalent at d: threshold M = d × MAR (inverse of logMAR = log₁₀(M/d)).
                var threshold = acuity.Value.ThresholdPrintAt(distance.Value);
                return Combine(ParseResult.Ok(threshold), distance, null);
            }

            var jaeger = PrintSizeNotation.JaegerPattern().Match(sizeText);
            var size = jaeger.Success
                ? PrintSizeNotation.ReadJaeger(jaeger.Groups["j"].Value, provider, assumedDistance: false)
                : PrintSizeNotation.ParseNormalised(sizeText, provider, xHeightRatio);
            if (size.Success || match.Groups["at"].Success)
            {
                return Combine(size, distance, null);
            }
        }

        if ((match = MissingUnitPattern().Match(normalised)).Success)
        {
            return ParseResult.Fail<NearAcuity>(ParseMessages.DistanceNeedsUnit(match.Groups["n"].Value));
        }

        if (PrintSizeNotation.ParseNormalised(normalised, provider, xHeightRatio).Success || SnellenPattern().IsMatch(normalised))
        {
            return ParseResult.Fail<NearAcuity>(ParseMessages.NearNeedsDistance(text!.Trim()));
        }

        return ParseResult.Fail<NearAcuity>(ParseMessages.NearAcuityExpected);
    }

    /// <summary>
    /// Parses a near acuity with the conventional x-height ratio; false when the text is not one.
    /// <paramref name="warning"/> is the caution to show beside the value (N, points, Jaeger), or null.
    /// </summary>
    public static bool TryParse(string? text, IFormatProvider? provider, out NearAcuity nearAcuity, out string? warning)
    {
        var result = Parse(text, provider);
        warning = result.Warning;
        return result.TryGetValue(out nearAcuity);
    }

    /// <summary>Checks a measurement entered as numbers, with the same messages as <see cref="Parse"/>.</summary>
    public static ParseResult<NearAcuity> FromMeasurement(PrintSize threshold, Distance testDistance)
    {
        if (!threshold.IsValid || !(threshold.M >= PrintSizeNotation.MinimumM && threshold.M <= PrintSizeNotation.MaximumM))
        {
            return ParseResult.Fail<NearAcuity>(ParseMessages.PrintSizeOutOfRange);
        }

        if (!(testDistance >= DistanceNotation.Minimum && testDistance <= DistanceNotation.Maximum))
        {
            return ParseResult.Fail<NearAcuity>(ParseMessages.DistanceOutOfRange);
        }

        return NearAcuity.IsInRange(threshold, testDistance)
            ? ParseResult.Ok(NearAcuity.Create(threshold, testDistance))
            : ParseResult.Fail<NearAcuity>(ParseMessages.NearAcuityOutOfRange);
    }

    /// <summary>Writes "1.0M at 40 cm" for display, with the caller's culture.</summary>
    public static string Format(NearAcuity nearAcuity, IFormatProvider? provider) =>
        PrintSizeNotation.Format(nearAcuity.Threshold, PrintSizeUnit.MUnits, provider) + " at " + DistanceNotation.Format(nearAcuity.TestDistance, provider);

    /// <summary>Writes the Snellen-type fraction of metres over M, "0.40/1.0M" (methods §1.2).</summary>
    public static string FormatMetresOverM(NearAcuity nearAcuity, IFormatProvider? provider) =>
        NotationText.Show(nearAcuity.TestDistance.Metres, "0.00", provider) + "/" + PrintSizeNotation.Format(nearAcuity.Threshold, PrintSizeUnit.MUnits, provider);

    /// <summary>The stored form, invariant with exact digits: "1M at 0.4 m". Reads back to exactly the same value.</summary>
    public static string FormatCanonical(NearAcuity nearAcuity) =>
        PrintSizeNotation.FormatCanonical(nearAcuity.Threshold) + " at " + DistanceNotation.FormatCanonical(nearAcuity.TestDistance);

    private static ParseResult<NearAcuity> Combine(ParseResult<PrintSize> size, ParseResult<Distance> distance, string? warning)
    {
        if (!size.Success)
        {
            return ParseResult.Fail<NearAcuity>(size.Error);
        }

        if (!distance.Success)
        {
            return ParseResult.Fail<NearAcuity>(distance.Error);
        }

        var result = FromMeasurement(size.Value, distance.Value);
        return result.Success ? ParseResult.Ok(result.Value, size.Warning ?? warning) : result;
    }

    [GeneratedRegex(@"^(?<d>" + NotationText.Number + @")\s*(?:m\s*)?/\s*(?<m>" + NotationText.Number + @")\s*m$", RegexOptions.CultureInvariant)]
    private static partial Regex MetresOverMPattern();

    [GeneratedRegex(@"^(?<size>.+?)\s*(?<at>\bat\b|@)?\s*(?<dist>" + NotationText.Number + @"\s*" + NotationText.DistanceUnit + ")$", RegexOptions.CultureInvariant)]
    private static partial Regex SizeAtDistancePattern();

    [GeneratedRegex(@"^" + NotationText.Number + @"\s*/\s*" + NotationText.Number + "$", RegexOptions.CultureInvariant)]
    private static partial Regex SnellenPattern();

    [GeneratedRegex(@"(?:\bat\b|@)\s*(?<n>" + NotationText.Number + ")$", RegexOptions.CultureInvariant)]
    private static partial Regex MissingUnitPattern();
}
