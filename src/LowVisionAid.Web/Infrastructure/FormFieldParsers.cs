using System.Globalization;
using System.Text.RegularExpressions;
using LowVisionAid.Optics.Notation;
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

    /// <summary>A distance acuity in any notation the core reads (6/60, 20/200, 0.1 decimal, 1.0 logMAR, VAS, letters).</summary>
    public static ParseResult<Acuity> Acuity(string text) => DistanceAcuityNotation.Parse(text, Invariant);

    /// <summary>
    /// A recorded vision level: a chart acuity (its value) or counting fingers, hand movements, light perception or no
    /// light perception (recorded as typed, with no value: never used in a calculation). Fails with the acuity message.
    /// </summary>
    public static ParseResult<Acuity?> RecordedVision(string text)
    {
        var acuity = Acuity(text);
        if (acuity.Success)
        {
            return ParseResult.Ok<Acuity?>(acuity.Value);
        }

        return NonChartVisionNotation.Parse(text, Invariant).Success
            ? ParseResult.Ok<Acuity?>(null)
            : ParseResult.Fail<Acuity?>(acuity.Error!);
    }

    /// <summary>A print size in M, N, points, Jaeger (with a warning) or millimetres of x-height.</summary>
    public static ParseResult<PrintSize> PrintSize(string text) => PrintSizeNotation.Parse(text, Invariant);

    /// <summary>A distance with its unit (cm, m, mm, in, ft).</summary>
    public static ParseResult<Distance> Distance(string text) => DistanceNotation.Parse(text, Invariant);

    /// <summary>Near acuity from its two parts, checked together (print size and test distance in range).</summary>
    public static ParseResult<NearAcuity> NearAcuity(string threshold, string testDistance)
    {
        var size = PrintSize(threshold);
        var distance = Distance(testDistance);
        return size.Success && distance.Success
            ? NearAcuityNotation.FromMeasurement(size.Value, distance.Value)
            : ParseResult.Fail<NearAcuity>(size.Error ?? distance.Error!);
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

    private static double? Number(string text) =>
        double.TryParse(text.Replace(',', '.'), NumberStyles.Float, Invariant, out var value) && double.IsFinite(value) ? value : null;

    [GeneratedRegex(@"^([+-]?\d+(?:[.,]\d+)?)\s*(?:D|dioptres?|diopters?)?$", RegexOptions.IgnoreCase)]
    private static partial Regex PowerPattern();

    [GeneratedRegex(@"^(\d+(?:[.,]\d+)?)\s*(?:log\s*CS)?$", RegexOptions.IgnoreCase)]
    private static partial Regex LogCsPattern();
}
