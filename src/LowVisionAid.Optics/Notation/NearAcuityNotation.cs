using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>
/// Reads and writes a near acuity: the smallest print read and the distance. Accepted forms: M at a distance
/// ("4M at 40 cm", "1.6M @ 25cm", "1M 40cm"), N at a distance ("N8 at 25 cm", approximate), points or x-height at a
/// distance ("12 pt at 40 cm", "1.5 mm at 40 cm"), near Snellen equivalents at a distance ("20/50 at 40 cm",
/// "6/15 at 40 cm"), metres over M ("0.40/1.0M"), and Jaeger ("J5", "J5 at 40 cm") with a warning.
/// A near card's Snellen equivalent labels a print size for the card's design distance (usually 40 cm or 14 in), not an
/// acuity at whatever distance the card was held (Colenbrander 2001): "20/50 at 25 cm" on a 40 cm card is 1.0M read at
/// 25 cm, and the result warns when the two distances differ, asking for M units or the card's design distance.
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
    public static ParseResult<NearAcuity> Parse(string? text, IFormatProvider? provider, XHeightRatio xHeightRatio = default) =>
        Parse(text, provider, xHeightRatio, CardDesignDistance);

    /// <summary>The design distance assumed for a near card's Snellen equivalents: 40 cm (methods §1.4, §11).</summary>
    public static readonly Distance CardDesignDistance = Distance.FromCentimetres(40);

    /// <summary>
    /// Parses a near acuity, reading a near Snellen equivalent ("20/50 at 25 cm") as the print size its label names
    /// at <paramref name="cardDesignDistance"/> (the card's design distance, e.g. 40 cm or 14 in), read at the
    /// distance typed (Colenbrander 2001). Never throws.
    /// </summary>
    public static ParseResult<NearAcuity> Parse(string? text, IFormatProvider? provider, XHeightRatio xHeightRatio, Distance cardDesignDistance)
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

                // A near card's Snellen label names the print size M = d_design × MAR at the card's design distance
                // (Colenbrander 2001; methods §1.2, §11), whatever distance the card was then held at.
                var design = cardDesignDistance.Metres > 0 ? cardDesignDistance : CardDesignDistance;
                var threshold = acuity.Value.ThresholdPrintAt(design);
                var differs = Math.Abs(design.Metres - distance.Value.Metres) > 0.005;
                return Combine(ParseResult.Ok(threshold), distance, differs
                    ? ParseMessages.NearSnellenIsAPrintSize(sizeText, PrintSizeNotation.Format(threshold, PrintSizeUnit.MUnits, provider), DistanceNotation.Format(design, provider), DistanceNotation.Format(distance.Value, provider))
                    : null);
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

    /// <summary>
    /// Reads a near acuity typed in two fields, the smallest print read and the test distance, and checks them
    /// together. Never throws; fails with the print size's message first, then the distance's, then the range's.
    /// </summary>
    public static ParseResult<NearAcuity> FromParts(string? threshold, string? testDistance, IFormatProvider? provider)
    {
        var size = PrintSizeNotation.Parse(threshold, provider);
        var distance = DistanceNotation.Parse(testDistance, provider);
        return size.Success && distance.Success
            ? FromMeasurement(size.Value, distance.Value)
            : ParseResult.Fail<NearAcuity>(size.Error ?? distance.Error!);
    }

    /// <summary>Checks a measurement entered as numbers, with the same messages as <see cref="Parse(string?, IFormatProvider?, XHeightRatio)"/>.</summary>
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
