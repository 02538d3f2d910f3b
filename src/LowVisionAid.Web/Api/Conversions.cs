using System.Globalization;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Quantities;

namespace LowVisionAid.Web.Api;

/// <summary>A distance acuity in every notation the core writes.</summary>
public sealed record AcuityConversion(
    string Typed,
    double LogMar,
    double DecimalAcuity,
    double MarArcminutes,
    string SnellenMetres,
    string SnellenFeet,
    double VisualAcuityScore,
    double EtdrsLetters,
    string? Warning);

/// <summary>A print size in M units, x-height and (approximately, through an x-height ratio of 0.50) points and N.</summary>
public sealed record PrintSizeConversion(string Typed, double M, double XHeightMillimetres, double ApproximatePoints, string ApproximateN, string? Warning);

/// <summary>A near acuity: the smallest print read, its distance, and the acuity they imply.</summary>
public sealed record NearAcuityConversion(
    string Typed,
    double ThresholdM,
    double TestDistanceCentimetres,
    double LogMar,
    string MetresOverM,
    string SnellenMetresEquivalent,
    string? Warning);

/// <summary>A distance in the units the clinic uses.</summary>
public sealed record DistanceConversion(string Typed, double Metres, double Centimetres, double Inches, string? Warning);

/// <summary>Notation conversions for the API. Invariant culture: a decimal point, as in JSON.</summary>
internal static class Conversions
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static IResult Acuity(string? value) => Convert(DistanceAcuityNotation.Parse(value, Invariant), (a, warning) => new AcuityConversion(
        value!.Trim(),
        a.LogMar,
        a.DecimalValue,
        a.MarArcminutes,
        DistanceAcuityNotation.Format(a, AcuityNotation.SnellenMetres, Invariant),
        DistanceAcuityNotation.Format(a, AcuityNotation.SnellenFeet, Invariant),
        a.VisualAcuityScore,
        a.EtdrsLetters,
        warning));

    public static IResult PrintSize(string? value) => Convert(PrintSizeNotation.Parse(value, Invariant), (p, warning) => new PrintSizeConversion(
        value!.Trim(),
        p.M,
        p.XHeightMillimetres,
        p.ToPoints(XHeightRatio.Conventional),
        PrintSizeNotation.Format(p, PrintSizeUnit.NNotation, Invariant),
        warning));

    public static IResult NearAcuity(string? value) => Convert(NearAcuityNotation.Parse(value, Invariant), (n, warning) => new NearAcuityConversion(
        value!.Trim(),
        n.Threshold.M,
        n.TestDistance.Centimetres,
        n.Acuity.LogMar,
        NearAcuityNotation.FormatMetresOverM(n, Invariant),
        DistanceAcuityNotation.Format(n.Acuity, AcuityNotation.SnellenMetres, Invariant),
        warning));

    public static IResult Distance(string? value) => Convert(DistanceNotation.Parse(value, Invariant), (d, warning) => new DistanceConversion(
        value!.Trim(), d.Metres, d.Centimetres, d.Inches, warning));

    // A value the parser read is converted (with its warning, if any); anything else is a 400 with the parser's message.
    private static IResult Convert<T, TOut>(Optics.Text.ParseResult<T> parsed, Func<T, string?, TOut> map) =>
        parsed.TryGetValue(out var read) ? TypedResults.Ok(map(read, parsed.Warning)) : ValueProblem(parsed.Error!);

    internal static IResult ValueProblem(string message) => TypedResults.ValidationProblem(
        new Dictionary<string, string[]>(StringComparer.Ordinal) { ["value"] = [message] },
        title: "The value could not be read.");
}
