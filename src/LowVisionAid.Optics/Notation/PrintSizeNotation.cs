using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Optics.Notation;

/// <summary>The units a print size can be written in.</summary>
public enum PrintSizeUnit
{
    /// <summary>M units of x-height (Sloan), "1.0M". Exact.</summary>
    MUnits,

    /// <summary>N notation (point size of Times Roman text, Law 1951), "N8". Approximate, through an x-height ratio.</summary>
    NNotation,

    /// <summary>Typographic points (1/72 in), "8.3 pt". Approximate, through an x-height ratio.</summary>
    Points,

    /// <summary>Lower-case x-height in millimetres, "1.45 mm". Exact.</summary>
    XHeightMillimetres,
}

/// <summary>
/// Reads and writes a print size typed on its own: M units ("1M", "1.0 M"), N notation ("N8"), points ("12 pt"),
/// x-height in millimetres ("1.5 mm") and, with a warning, Jaeger ("J5"). Points and N are converted through an
/// x-height ratio (default 0.50, methods §1.3) and carry a warning that the result is approximate.
/// Accepted range: 0.05M to 100M.
/// </summary>
public static partial class PrintSizeNotation
{
    /// <summary>Smallest print size accepted, in M units.</summary>
    public const double MinimumM = 0.05;

    /// <summary>Largest print size accepted, in M units.</summary>
    public const double MaximumM = 100;

    /// <summary>
    /// Parses a print size. Never throws. <paramref name="xHeightRatio"/> converts N and points (default 0.50).
    /// A null <paramref name="provider"/> means the current culture (it only decides the thousands separator).
    /// </summary>
    public static ParseResult<PrintSize> Parse(string? text, IFormatProvider? provider, XHeightRatio xHeightRatio = default)
    {
        var normalised = NotationText.Normalise(text, out var error, ParseMessages.PrintSizeExpected);
        return normalised is null ? ParseResult.Fail<PrintSize>(error!) : ParseNormalised(normalised, provider, xHeightRatio);
    }

    /// <summary>
    /// Parses a print size with the conventional x-height ratio; false when the text is not one.
    /// <paramref name="warning"/> is the caution to show beside the value (N, points, Jaeger), or null.
    /// </summary>
    public static bool TryParse(string? text, IFormatProvider? provider, out PrintSize printSize, out string? warning)
    {
        var result = Parse(text, provider);
        warning = result.Warning;
        return result.TryGetValue(out printSize);
    }

    /// <summary>
    /// Writes a print size for display: "1.0M", "N8.3", "8.3 pt" or "1.45 mm". N and points go through
    /// <paramref name="xHeightRatio"/> and are approximate; label them so where shown.
    /// </summary>
    public static string Format(PrintSize printSize, PrintSizeUnit unit, IFormatProvider? provider, XHeightRatio xHeightRatio = default) => unit switch
    {
        PrintSizeUnit.NNotation => "N" + NotationText.Show(printSize.ToPoints(xHeightRatio), "0.#", provider),
        PrintSizeUnit.Points => NotationText.Show(printSize.ToPoints(xHeightRatio), "0.#", provider) + " pt",
        PrintSizeUnit.XHeightMillimetres => NotationText.Show(printSize.XHeightMillimetres, "0.00", provider) + " mm",
        _ => NotationText.Show(printSize.M, printSize.M < 1 ? "0.0#" : "0.0", provider) + "M",
    };

    /// <summary>The stored form: M units with the shortest exact digits, invariant ("1M", "0.97M"). Reads back exactly.</summary>
    public static string FormatCanonical(PrintSize printSize) => NotationText.Exact(printSize.M) + "M";

    /// <summary>Reads an already normalised print size.</summary>
    internal static ParseResult<PrintSize> ParseNormalised(string normalised, IFormatProvider? provider, XHeightRatio xHeightRatio)
    {
        Match match;
        if ((match = JaegerPattern().Match(normalised)).Success)
        {
            return ReadJaeger(match.Groups["j"].Value, provider, assumedDistance: false);
        }

        if ((match = MUnitsPattern().Match(normalised)).Success)
        {
            return Read(match, provider, v => v, null);
        }

        if ((match = NPattern().Match(normalised)).Success)
        {
            // N is the point size of Times Roman text (Law 1951), converted by PrintSize.FromPoints (methods §1.3).
            return Read(match, provider, v => FromPoints(v, xHeightRatio), (token, m) =>
                ParseMessages.ApproximateFromPoints("N" + token, m, xHeightRatio.ToString("0.00", provider)));
        }

        if ((match = PointsPattern().Match(normalised)).Success)
        {
            return Read(match, provider, v => FromPoints(v, xHeightRatio), (token, m) =>
                ParseMessages.ApproximateFromPoints(token + " pt", m, xHeightRatio.ToString("0.00", provider)));
        }

        if ((match = MillimetresPattern().Match(normalised)).Success)
        {
            return Read(match, provider, v => v > 0 ? PrintSize.FromXHeightMillimetres(v).M : double.NaN, null);
        }

        var bare = NotationText.BareNumberPattern().Match(normalised);
        return ParseResult.Fail<PrintSize>(bare.Success ? ParseMessages.PrintSizeNeedsUnit(bare.Value) : ParseMessages.PrintSizeExpected);

        ParseResult<PrintSize> Read(Match m, IFormatProvider? p, Func<double, double> toM, Func<string, string, string>? warning)
        {
            var token = m.Groups["v"].Value;
            if (!NotationText.TryNumber(token, p, out var value, out var numberError))
            {
                return ParseResult.Fail<PrintSize>(numberError!);
            }

            var units = toM(value);
            if (!(units >= MinimumM && units <= MaximumM))
            {
                return ParseResult.Fail<PrintSize>(ParseMessages.PrintSizeOutOfRange);
            }

            var size = PrintSize.FromM(units);
            return ParseResult.Ok(size, warning?.Invoke(token, Format(size, PrintSizeUnit.MUnits, p)));
        }
    }

    /// <summary>Reads a Jaeger label through the §1.4 table, always with a warning.</summary>
    internal static ParseResult<PrintSize> ReadJaeger(string number, IFormatProvider? provider, bool assumedDistance)
    {
        if (!JaegerTable.TryFind("j" + number, out var label, out var feet, out var m))
        {
            return ParseResult.Fail<PrintSize>(ParseMessages.JaegerNotInTable("J" + number.ToUpperInvariant(), JaegerTable.Labels));
        }

        var size = PrintSize.FromM(m);
        var snellen = "20/" + NotationText.Show(feet, "0", provider);
        return ParseResult.Ok(size, ParseMessages.JaegerApproximate(label, Format(size, PrintSizeUnit.MUnits, provider), snellen, assumedDistance));
    }

    private static double FromPoints(double points, XHeightRatio ratio) =>
        points > 0 ? PrintSize.FromPoints(points, ratio).M : double.NaN;

    [GeneratedRegex(@"^j\s*(?<j>[0-9]{1,3}\+?)$", RegexOptions.CultureInvariant)]
    internal static partial Regex JaegerPattern();

    [GeneratedRegex(@"^(?<v>" + NotationText.Number + @")\s*m$", RegexOptions.CultureInvariant)]
    private static partial Regex MUnitsPattern();

    [GeneratedRegex(@"^n\s*(?<v>" + NotationText.Number + ")$", RegexOptions.CultureInvariant)]
    private static partial Regex NPattern();

    [GeneratedRegex(@"^(?<v>" + NotationText.Number + @")\s*(?:pt|pts|points?)$", RegexOptions.CultureInvariant)]
    private static partial Regex PointsPattern();

    [GeneratedRegex(@"^(?<v>" + NotationText.Number + @")\s*mm(?:\s*x-?height)?$", RegexOptions.CultureInvariant)]
    private static partial Regex MillimetresPattern();
}
