using System.Globalization;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Infrastructure;

namespace LowVisionAid.Web.Pages.Visits;

/// <summary>Copies a validated form onto a visit (text and parsed value side by side), and a visit back into a form.</summary>
internal static class VisitMapping
{
    public static void Apply(VisitInput input, Visit visit)
    {
        VisitInput.TryDate(input.VisitDate, out var date);
        visit.VisitDate = date;
        visit.Practitioner = Clean(input.Practitioner);
        // Counting fingers and the like are kept as typed with no acuity value: recorded, never calculated with.
        (visit.DistanceRightText, visit.DistanceRight) = ReadVision(input.DistanceRight);
        (visit.DistanceLeftText, visit.DistanceLeft) = ReadVision(input.DistanceLeft);
        (visit.DistanceBothText, visit.DistanceBoth) = ReadVision(input.DistanceBoth);
        (visit.NearThresholdText, visit.NearThreshold) = Read(input.NearThreshold, FormFieldParsers.PrintSize);
        (visit.NearTestDistanceText, visit.NearTestDistance) = Read(input.NearTestDistance, FormFieldParsers.Distance);
        visit.ContrastSensitivityText = Clean(input.ContrastSensitivity);
        visit.ContrastLogCs = visit.ContrastSensitivityText is { } cs ? FormFieldParsers.LogContrastSensitivity(cs).Value : null;
        visit.RefractionWorn = Clean(input.RefractionWorn);
        (visit.AddWornText, visit.AddWorn) = Read(input.AddWorn, FormFieldParsers.Power);
        (visit.AccommodationText, visit.AccommodationMeasured) = Read(input.Accommodation, FormFieldParsers.Power);
        (visit.WorkingDistanceText, visit.WorkingDistance) = Read(input.WorkingDistance, FormFieldParsers.Distance);
        visit.NeedsHandsFree = input.NeedsHandsFree;
        visit.HasTremor = input.HasTremor;
        visit.UsefulEyes = input.UsefulEyes;
        visit.HomeLighting = input.HomeLighting;
        visit.Notes = Clean(input.Notes);

        visit.Goals.Clear();
        foreach (var (goal, position) in input.Goals.Where(g => g.IsUsed).Select((g, i) => (g, i)))
        {
            var target = Clean(goal.TargetPrint)!;
            var task = Enum.Parse<GoalTask>(goal.Task!);
            var distance = VisitGoal.IsDistanceTask(task);
            var (viewingText, viewing) = distance ? Read(goal.ViewingDistance, FormFieldParsers.Distance) : (null, null);
            visit.Goals.Add(new VisitGoal
            {
                Position = position,
                Task = task,
                Detail = Clean(goal.Detail),
                TargetText = target,
                TargetPrint = distance ? null : FormFieldParsers.PrintSize(target).Value,
                TargetAcuity = distance ? FormFieldParsers.Acuity(target).Value : null,
                ViewingDistanceText = viewingText,
                ViewingDistance = viewing,
            });
        }

        visit.ReadingSpeeds.Clear();
        foreach (var (speed, position) in input.ReadingSpeeds.Where(s => s.IsUsed).Select((s, i) => (s, i)))
        {
            var print = Clean(speed.PrintSize)!;
            visit.ReadingSpeeds.Add(new ReadingSpeed
            {
                Position = position,
                PrintSizeText = print,
                PrintSize = FormFieldParsers.PrintSize(print).Value,
                WordsPerMinute = int.Parse(speed.WordsPerMinute!.Trim(), NumberStyles.None, CultureInfo.InvariantCulture),
            });
        }
    }

    public static VisitInput ToInput(Visit visit) => new VisitInput
    {
        VisitDate = visit.VisitDate.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
        Practitioner = visit.Practitioner,
        DistanceRight = visit.DistanceRightText,
        DistanceLeft = visit.DistanceLeftText,
        DistanceBoth = visit.DistanceBothText,
        NearThreshold = visit.NearThresholdText,
        NearTestDistance = visit.NearTestDistanceText,
        ContrastSensitivity = visit.ContrastSensitivityText,
        RefractionWorn = visit.RefractionWorn,
        AddWorn = visit.AddWornText,
        Accommodation = visit.AccommodationText,
        WorkingDistance = visit.WorkingDistanceText,
        NeedsHandsFree = visit.NeedsHandsFree,
        HasTremor = visit.HasTremor,
        UsefulEyes = visit.UsefulEyes,
        HomeLighting = visit.HomeLighting,
        Notes = visit.Notes,
        Version = visit.Version,
        Goals = [.. visit.Goals.OrderBy(g => g.Position).Select(g => new GoalInput { Task = g.Task.ToString(), Detail = g.Detail, TargetPrint = g.TargetText, ViewingDistance = g.ViewingDistanceText })],
        ReadingSpeeds = [.. visit.ReadingSpeeds.OrderBy(s => s.Position).Select(s => new ReadingSpeedInput { PrintSize = s.PrintSizeText, WordsPerMinute = s.WordsPerMinute.ToString(CultureInfo.InvariantCulture) })],
    }.WithBlankRows();

    private static (string? Text, T? Value) Read<T>(string? typed, Func<string, Optics.Text.ParseResult<T>> parse) where T : struct =>
        Clean(typed) is { } text ? (text, parse(text).Value) : (null, null);

    private static (string? Text, Optics.Quantities.Acuity? Value) ReadVision(string? typed) =>
        Clean(typed) is { } text ? (text, FormFieldParsers.RecordedVision(text).Value) : (null, null);

    private static string? Clean(string? text) => string.IsNullOrWhiteSpace(text) ? null : text.Trim();
}
