using System.Globalization;
using System.Text.RegularExpressions;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Optics.Text;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// The one place the web app turns what a clinician typed into optics values. Each method returns the core's
/// <see cref="ParseResult{T}"/>: a value (maybe with a warning to show beside it) or a message that says what to type.
/// </summary>
internal static partial class Readings
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    // Interim until the notation parsers reach main: Snellen fractions, decimal and logMAR only.
    public static ParseResult<Acuity> Acuity(string text)
    {
        var t = text.Trim();
        var fraction = FractionPattern().Match(t);
        if (fraction.Success && Number(fraction.Groups[1].Value) is { } num && Number(fraction.Groups[2].Value) is { } den && num > 0 && den > 0)
        {
            return Within(Optics.Quantities.Acuity.FromSnellen(num, den).LogMar);
        }

        var logMar = LogMarPattern().Match(t);
        if (logMar.Success && Number(logMar.Groups["v"].Value) is { } l)
        {
            return Within(l);
        }

        return Number(t) is { } dec and > 0 and <= 10
            ? Within(-Math.Log10(dec))
            : ParseResult.Fail<Acuity>("Type an acuity such as 6/60, 20/200, 0.1 (decimal) or 1.0 logMAR.");
    }

    // Interim: M sizes and N sizes (N through the 1M ≈ N8 convention, marked approximate).
    public static ParseResult<PrintSize> PrintSize(string text)
    {
        var t = text.Trim();
        var m = MPattern().Match(t);
        if (m.Success && Number(m.Groups[1].Value) is { } mValue and > 0 and <= 100)
        {
            return ParseResult.Ok(Optics.Quantities.PrintSize.FromM(mValue));
        }

        var n = NPattern().Match(t);
        if (n.Success && Number(n.Groups[1].Value) is { } nValue and > 0 and <= 200)
        {
            return ParseResult.Ok(Optics.Quantities.PrintSize.FromN(nValue, XHeightRatio.Conventional), "N sizes are converted to M approximately (1M ≈ N8).");
        }

        return ParseResult.Fail<PrintSize>("Type a print size such as 1M, 2.5M or N12.");
    }

    // Interim: cm, m, mm and inches.
    public static ParseResult<Distance> Distance(string text)
    {
        var match = DistancePattern().Match(text.Trim());
        if (match.Success && Number(match.Groups[1].Value) is { } value and > 0)
        {
            var distance = match.Groups[2].Value.ToUpperInvariant() switch
            {
                "M" => Optics.Quantities.Distance.FromMetres(value),
                "MM" => Optics.Quantities.Distance.FromMillimetres(value),
                "IN" or "\"" => Optics.Quantities.Distance.FromInches(value),
                _ => Optics.Quantities.Distance.FromCentimetres(value),
            };
            if (distance.Metres is > 0.01 and <= 10)
            {
                return ParseResult.Ok(distance);
            }
        }

        return ParseResult.Fail<Distance>("Type a distance with its unit, such as 25 cm, 0.4 m or 16 in.");
    }

    /// <summary>A signed power in dioptres, e.g. "+2.50", "+4 D", "-1.25D".</summary>
    public static ParseResult<Power> Power(string text)
    {
        var match = PowerPattern().Match(text.Trim());
        return match.Success && Number(match.Groups[1].Value) is { } d and >= -40 and <= 80
            ? ParseResult.Ok(Optics.Quantities.Power.FromDioptres(d))
            : ParseResult.Fail<Power>("Type a power in dioptres, such as +2.50 or +4 D.");
    }

    /// <summary>Letter contrast sensitivity in log units (e.g. "1.05" or "1.05 logCS"), 0 to 2.4.</summary>
    public static ParseResult<double> LogContrastSensitivity(string text)
    {
        var match = LogCsPattern().Match(text.Trim());
        return match.Success && Number(match.Groups[1].Value) is { } cs and >= 0 and <= 2.4
            ? ParseResult.Ok(cs)
            : ParseResult.Fail<double>("Type contrast sensitivity in log units between 0 and 2.4, such as 1.05 logCS.");
    }

    private static ParseResult<Acuity> Within(double logMar) => logMar is >= Optics.Quantities.Acuity.BestLogMar and <= Optics.Quantities.Acuity.WorstLogMar
        ? ParseResult.Ok(Optics.Quantities.Acuity.FromLogMar(logMar))
        : ParseResult.Fail<Acuity>("That acuity is outside the charts (logMAR −0.5 to 3.0); check what you typed, such as 6/60 or 20/200.");

    private static double? Number(string text) =>
        double.TryParse(text.Replace(',', '.'), NumberStyles.Float, Invariant, out var value) && double.IsFinite(value) ? value : null;

    [GeneratedRegex(@"^(\d+(?:[.,]\d+)?)\s*/\s*(\d+(?:[.,]\d+)?)$")]
    private static partial Regex FractionPattern();

    [GeneratedRegex(@"^(?:logMAR\s*(?<v>-?\d+(?:[.,]\d+)?)|(?<v>-?\d+(?:[.,]\d+)?)\s*logMAR)$", RegexOptions.IgnoreCase)]
    private static partial Regex LogMarPattern();

    [GeneratedRegex(@"^(\d+(?:[.,]\d+)?)\s*M$", RegexOptions.IgnoreCase)]
    private static partial Regex MPattern();

    [GeneratedRegex(@"^N\s*(\d+(?:[.,]\d+)?)$", RegexOptions.IgnoreCase)]
    private static partial Regex NPattern();

    [GeneratedRegex(@"^(\d+(?:[.,]\d+)?)\s*(cm|mm|m|in|"")$", RegexOptions.IgnoreCase)]
    private static partial Regex DistancePattern();

    [GeneratedRegex(@"^([+-]?\d+(?:[.,]\d+)?)\s*(?:D|dioptres?|diopters?)?$", RegexOptions.IgnoreCase)]
    private static partial Regex PowerPattern();

    [GeneratedRegex(@"^(\d+(?:[.,]\d+)?)\s*(?:log\s*CS)?$", RegexOptions.IgnoreCase)]
    private static partial Regex LogCsPattern();
}
