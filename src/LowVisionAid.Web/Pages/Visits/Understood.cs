using System.Globalization;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Web.Infrastructure;

namespace LowVisionAid.Web.Pages.Visits;

/// <summary>One measurement as typed and as the app understood it, so a typing mistake shows at once.</summary>
public sealed record UnderstoodReading(string Label, string Typed, string? Understood, string? LogMar, string? Warning, string? Error);

/// <summary>Reads each measurement of a form or a saved visit back to the clinician in a standard form.</summary>
internal static class Understood
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static IReadOnlyList<UnderstoodReading> From(VisitInput input, SnellenUnit snellen)
    {
        var rows = new List<UnderstoodReading>();
        Add(rows, "Distance acuity, right eye", input.DistanceRight, t => Acuity(Readings.Acuity(t), snellen));
        Add(rows, "Distance acuity, left eye", input.DistanceLeft, t => Acuity(Readings.Acuity(t), snellen));
        Add(rows, "Distance acuity, both eyes", input.DistanceBoth, t => Acuity(Readings.Acuity(t), snellen));
        Add(rows, "Near: smallest print read", input.NearThreshold, t => Print(Readings.PrintSize(t)));
        Add(rows, "Near: test distance", input.NearTestDistance, t => Length(Readings.Distance(t)));
        if (Readings.PrintSize(input.NearThreshold ?? "") is { Success: true } near && Readings.Distance(input.NearTestDistance ?? "") is { Success: true } at)
        {
            var acuity = Optics.Quantities.Acuity.FromNearThreshold(near.Value, at.Value);
            rows.Add(new("Near acuity", $"{input.NearThreshold!.Trim()} at {input.NearTestDistance!.Trim()}", NearFraction(near.Value, at.Value), LogMar(acuity), null, null));
        }

        Add(rows, "Add worn", input.AddWorn, t => Dioptres(Readings.Power(t)));
        Add(rows, "Accommodation (measured)", input.Accommodation, t => Dioptres(Readings.Power(t)));
        Add(rows, "Preferred working distance", input.WorkingDistance, t => Length(Readings.Distance(t)));
        for (var i = 0; i < input.Goals.Count; i++)
        {
            Add(rows, $"Goal {i + 1}: target print", input.Goals[i].TargetPrint, t => Print(Readings.PrintSize(t)));
        }

        return rows;
    }

    private static void Add(List<UnderstoodReading> rows, string label, string? typed, Func<string, (string? Understood, string? LogMar, string? Warning, string? Error)> read)
    {
        if (string.IsNullOrWhiteSpace(typed))
        {
            return;
        }

        var (understood, logMar, warning, error) = read(typed.Trim());
        rows.Add(new(label, typed.Trim(), understood, logMar, warning, error));
    }

    private static (string?, string?, string?, string?) Acuity(Optics.Text.ParseResult<Acuity> result, SnellenUnit snellen)
    {
        if (!result.TryGetValue(out var acuity))
        {
            return (null, null, null, result.Error);
        }

        var numerator = snellen == SnellenUnit.Feet ? 20 : 6;
        var snellenText = $"{numerator}/{acuity.SnellenDenominator(numerator).ToString("0.#", Invariant)}";
        return ($"{snellenText} (decimal {acuity.DecimalValue.ToString("0.00#", Invariant)})", LogMar(acuity), result.Warning, null);
    }

    private static (string?, string?, string?, string?) Print(Optics.Text.ParseResult<PrintSize> result) =>
        result.TryGetValue(out var size)
            ? ($"{size.ToString(null, Invariant)} (x-height {size.ToString("mm", Invariant)})", null, result.Warning, null)
            : (null, null, null, result.Error);

    private static (string?, string?, string?, string?) Length(Optics.Text.ParseResult<Distance> result) =>
        result.TryGetValue(out var d)
            ? ($"{d.ToString(null, Invariant)} ({d.ToString("in", Invariant)})", null, result.Warning, null)
            : (null, null, null, result.Error);

    private static (string?, string?, string?, string?) Dioptres(Optics.Text.ParseResult<Power> result) =>
        result.TryGetValue(out var p) ? (p.ToString(null, Invariant), null, result.Warning, null) : (null, null, null, result.Error);

    private static string NearFraction(PrintSize size, Distance distance) =>
        $"{distance.Metres.ToString("0.00", Invariant)}/{size.M.ToString("0.0#", Invariant)}M";

    internal static string LogMar(Acuity acuity) => acuity.LogMar.ToString("0.00", Invariant);
}
