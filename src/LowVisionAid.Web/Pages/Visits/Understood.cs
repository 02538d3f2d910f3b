using System.Globalization;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Notation;
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
        Add(rows, "Distance acuity, right eye", input.DistanceRight, t => Acuity(FormFieldParsers.Acuity(t), snellen));
        Add(rows, "Distance acuity, left eye", input.DistanceLeft, t => Acuity(FormFieldParsers.Acuity(t), snellen));
        Add(rows, "Distance acuity, both eyes", input.DistanceBoth, t => Acuity(FormFieldParsers.Acuity(t), snellen));
        Add(rows, "Near: smallest print read", input.NearThreshold, t => Print(FormFieldParsers.PrintSize(t)));
        Add(rows, "Near: test distance", input.NearTestDistance, t => Length(FormFieldParsers.Distance(t)));
        if (!string.IsNullOrWhiteSpace(input.NearThreshold) && !string.IsNullOrWhiteSpace(input.NearTestDistance)
            && FormFieldParsers.NearAcuity(input.NearThreshold, input.NearTestDistance).TryGetValue(out var near))
        {
            rows.Add(new("Near acuity", $"{input.NearThreshold.Trim()} at {input.NearTestDistance.Trim()}",
                $"{NearAcuityNotation.Format(near, Invariant)} ({NearAcuityNotation.FormatMetresOverM(near, Invariant)})", LogMar(near.Acuity), null, null));
        }

        Add(rows, "Add worn", input.AddWorn, t => Dioptres(FormFieldParsers.Power(t)));
        Add(rows, "Accommodation (measured)", input.Accommodation, t => Dioptres(FormFieldParsers.Power(t)));
        Add(rows, "Preferred working distance", input.WorkingDistance, t => Length(FormFieldParsers.Distance(t)));
        for (var i = 0; i < input.Goals.Count; i++)
        {
            var goal = input.Goals[i];
            if (goal.IsDistanceTask)
            {
                Add(rows, $"Goal {i + 1}: acuity wanted", goal.TargetPrint, t => Acuity(FormFieldParsers.Acuity(t), snellen));
                Add(rows, $"Goal {i + 1}: viewing distance", goal.ViewingDistance, t => Length(FormFieldParsers.Distance(t)));
            }
            else
            {
                Add(rows, $"Goal {i + 1}: target print", goal.TargetPrint, t => Print(FormFieldParsers.PrintSize(t)));
            }
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

        var snellenText = DistanceAcuityNotation.Format(acuity, snellen == SnellenUnit.Feet ? AcuityNotation.SnellenFeet : AcuityNotation.SnellenMetres, Invariant);
        return ($"{snellenText} ({DistanceAcuityNotation.Format(acuity, AcuityNotation.DecimalAcuity, Invariant)})", LogMar(acuity), result.Warning, null);
    }

    private static (string?, string?, string?, string?) Print(Optics.Text.ParseResult<PrintSize> result) =>
        result.TryGetValue(out var size)
            ? (ReadBackText.PrintSize(size, Invariant), null, result.Warning, null)
            : (null, null, null, result.Error);

    private static (string?, string?, string?, string?) Length(Optics.Text.ParseResult<Distance> result) =>
        result.TryGetValue(out var d)
            ? ($"{DistanceNotation.Format(d, Invariant)} ({DistanceNotation.Format(d, Invariant, "in")})", null, result.Warning, null)
            : (null, null, null, result.Error);

    private static (string?, string?, string?, string?) Dioptres(Optics.Text.ParseResult<Power> result) =>
        result.TryGetValue(out var p) ? (p.ToString(null, Invariant), null, result.Warning, null) : (null, null, null, result.Error);

    internal static string LogMar(Acuity acuity) => DistanceAcuityNotation.Format(acuity, AcuityNotation.LogMar, Invariant).Replace(" logMAR", "", StringComparison.Ordinal);
}
