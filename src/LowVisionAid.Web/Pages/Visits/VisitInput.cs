using System.Globalization;
using FluentValidation;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Infrastructure;

namespace LowVisionAid.Web.Pages.Visits;

/// <summary>The visit form as typed. Every measurement is a string, read by the optics core's parsers.</summary>
public sealed class VisitInput
{
    public const int GoalRows = 4;
    public const int ReadingSpeedRows = 4;

    public string VisitDate { get; set; } = "";

    public string? Practitioner { get; set; }

    public string? DistanceRight { get; set; }

    public string? DistanceLeft { get; set; }

    public string? DistanceBoth { get; set; }

    public string? NearThreshold { get; set; }

    public string? NearTestDistance { get; set; }

    public List<ReadingSpeedInput> ReadingSpeeds { get; set; } = [];

    public string? ContrastSensitivity { get; set; }

    public string? RefractionWorn { get; set; }

    public string? AddWorn { get; set; }

    public string? Accommodation { get; set; }

    public string? WorkingDistance { get; set; }

    public List<GoalInput> Goals { get; set; } = [];

    public bool NeedsHandsFree { get; set; }

    public bool HasTremor { get; set; }

    public UsefulEyes UsefulEyes { get; set; }

    public HomeLighting HomeLighting { get; set; }

    public string? Notes { get; set; }

    /// <summary>The visit's version when the form was opened (edits only).</summary>
    public Guid Version { get; set; }

    /// <summary>Pads the repeating rows so the form always offers the same number of empty lines.</summary>
    public VisitInput WithBlankRows()
    {
        while (Goals.Count < GoalRows)
        {
            Goals.Add(new GoalInput());
        }

        while (ReadingSpeeds.Count < ReadingSpeedRows)
        {
            ReadingSpeeds.Add(new ReadingSpeedInput());
        }

        return this;
    }

    internal static bool TryDate(string? text, out DateOnly date) =>
        DateOnly.TryParseExact(text?.Trim(), "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out date);
}

public sealed class GoalInput
{
    /// <summary>A <see cref="GoalTask"/> name, or empty for an unused row.</summary>
    public string? Task { get; set; }

    public string? Detail { get; set; }

    public string? TargetPrint { get; set; }

    /// <summary>The distance a distance task is seen from, such as 8 m for a whiteboard; empty for near tasks.</summary>
    public string? ViewingDistance { get; set; }

    public bool IsDistanceTask => Enum.TryParse<GoalTask>(Task, out var task) && VisitGoal.IsDistanceTask(task);

    public bool IsUsed => !string.IsNullOrWhiteSpace(Task) || !string.IsNullOrWhiteSpace(TargetPrint) || !string.IsNullOrWhiteSpace(Detail)
        || !string.IsNullOrWhiteSpace(ViewingDistance);
}

public sealed class ReadingSpeedInput
{
    public string? PrintSize { get; set; }

    public string? WordsPerMinute { get; set; }

    public bool IsUsed => !string.IsNullOrWhiteSpace(PrintSize) || !string.IsNullOrWhiteSpace(WordsPerMinute);
}

public sealed class VisitInputValidator : AbstractValidator<VisitInput>
{
    public const int MaximumWordsPerMinute = 1000;

    /// <summary>The largest amplitude of accommodation the core accepts as measured.</summary>
    public const double MaximumAmplitude = 30;

    /// <summary>Shown when a viewing distance is typed for a near task, whose distance is the visit's working distance.</summary>
    public const string NearGoalDistance =
        "A viewing distance is for distance tasks such as television or a whiteboard; a near task uses the preferred working distance above. Clear this field.";

    public VisitInputValidator(Infrastructure.ClinicCalendar calendar)
    {
        ArgumentNullException.ThrowIfNull(calendar);
        RuleFor(v => v.VisitDate)
            .Must(d => VisitInput.TryDate(d, out _)).WithMessage("Type the visit date as year-month-day, such as 2026-03-14.")
            .Must(d => !VisitInput.TryDate(d, out var date) || date <= calendar.Today.AddDays(1))
            .WithMessage("The visit date is in the future; type the date the client was seen, such as today's.");
        RuleFor(v => v.Practitioner).MaximumLength(FieldLimits.Name).WithMessage($"Keep the practitioner's name to {FieldLimits.Name} characters or fewer.");

        // Counting fingers, hand movements, light perception and no light perception are recorded in any eye; they
        // are refused only for calculation (the plan uses the chart acuities and near measurements there are).
        RuleFor(v => v.DistanceRight).Reads(FormFieldParsers.RecordedVision);
        RuleFor(v => v.DistanceLeft).Reads(FormFieldParsers.RecordedVision);
        RuleFor(v => v.DistanceBoth).Reads(FormFieldParsers.RecordedVision);
        RuleFor(v => v.NearThreshold).Reads(FormFieldParsers.PrintSize);
        RuleFor(v => v.NearTestDistance).Reads(FormFieldParsers.Distance);
        RuleFor(v => v.NearTestDistance)
            .NotEmpty().When(v => !string.IsNullOrWhiteSpace(v.NearThreshold))
            .WithMessage("Type the distance the near test was done at, such as 40 cm; near acuity means nothing without it.");
        RuleFor(v => v.NearThreshold)
            .NotEmpty().When(v => !string.IsNullOrWhiteSpace(v.NearTestDistance))
            .WithMessage("Type the smallest print read at the test distance, such as 2.5M, or clear the test distance.");
        RuleFor(v => v.NearThreshold)
            .Custom((threshold, context) =>
            {
                var visit = context.InstanceToValidate;
                if (FormFieldParsers.PrintSize(threshold ?? "").Success && FormFieldParsers.Distance(visit.NearTestDistance ?? "").Success
                    && FormFieldParsers.NearAcuity(threshold!, visit.NearTestDistance!) is { Success: false } near)
                {
                    context.AddFailure(near.Error);
                }
            });
        RuleFor(v => v.ContrastSensitivity).Reads(FormFieldParsers.LogContrastSensitivity);
        RuleFor(v => v.RefractionWorn).MaximumLength(FieldLimits.Name).WithMessage($"Keep the refraction to {FieldLimits.Name} characters or fewer.");
        RuleFor(v => v.AddWorn).Reads(FormFieldParsers.Power);
        RuleFor(v => v.Accommodation).Reads(FormFieldParsers.Power);
        RuleFor(v => v.Accommodation)
            .Must(a => string.IsNullOrWhiteSpace(a) || !FormFieldParsers.Power(a).TryGetValue(out var amplitude) || amplitude.Dioptres is >= 0 and <= MaximumAmplitude)
            .WithMessage($"Type the measured amplitude of accommodation between 0 and {MaximumAmplitude} D, such as 8, or leave it empty to estimate it from age.");
        RuleFor(v => v.AddWorn)
            .Must(a => string.IsNullOrWhiteSpace(a) || !FormFieldParsers.Power(a).TryGetValue(out var add) || add.Dioptres >= 0)
            .WithMessage("A reading add is a plus power; type it such as +2.50, or leave it empty.");
        RuleFor(v => v.WorkingDistance).Reads(FormFieldParsers.Distance);
        RuleFor(v => v.WorkingDistance)
            .Custom((typed, context) =>
            {
                if (string.IsNullOrWhiteSpace(typed) || !FormFieldParsers.Distance(typed).TryGetValue(out var distance))
                {
                    return;
                }

                // The working distance is for the near goals: each one's sane range comes from the optics core's task rule.
                var rules = context.InstanceToValidate.Goals
                    .Where(g => g.IsUsed && !g.IsDistanceTask && Enum.TryParse<GoalTask>(g.Task, out _))
                    .Select(g => TaskRules.For(Enum.Parse<GoalTask>(g.Task!)))
                    .DefaultIfEmpty(TaskRules.For(ReadingTask.SustainedReading));
                if (rules.Select(r => r.CheckDistance(distance)).FirstOrDefault(m => m is not null) is { } problem)
                {
                    context.AddFailure(problem);
                }
            });
        RuleFor(v => v.Notes).MaximumLength(FieldLimits.Notes).WithMessage($"Keep the notes to {FieldLimits.Notes} characters or fewer.");
        RuleFor(v => v.UsefulEyes).IsInEnum().WithMessage("Choose which eyes are useful from the list.");
        RuleFor(v => v.HomeLighting).IsInEnum().WithMessage("Choose the lighting at home from the list.");

        RuleForEach(v => v.Goals).ChildRules(goal =>
        {
            goal.RuleFor(g => g.Task)
                .Must(t => Enum.TryParse<GoalTask>(t, out _)).When(g => g.IsUsed)
                .WithMessage("Choose the task from the list, such as Newspaper.");
            goal.RuleFor(g => g.TargetPrint)
                .NotEmpty().When(g => g.IsUsed)
                .WithMessage(g => g.IsDistanceTask
                    ? "Type the distance acuity this task needs, such as 6/12 for television."
                    : "Type the print size this task needs, such as 1M for newspaper text.");
            goal.RuleFor(g => g.TargetPrint).Reads(FormFieldParsers.PrintSize).When(g => !g.IsDistanceTask);
            goal.RuleFor(g => g.TargetPrint).Reads(FormFieldParsers.Acuity).When(g => g.IsDistanceTask);
            goal.RuleFor(g => g.ViewingDistance).Reads(FormFieldParsers.Distance);
            goal.RuleFor(g => g.ViewingDistance)
                .Must(string.IsNullOrWhiteSpace).When(g => Enum.TryParse<GoalTask>(g.Task, out _) && !g.IsDistanceTask)
                .WithMessage(NearGoalDistance);
            goal.RuleFor(g => g.ViewingDistance)
                .Custom((typed, context) =>
                {
                    var goalInput = context.InstanceToValidate;
                    if (goalInput.IsDistanceTask && !string.IsNullOrWhiteSpace(typed) && FormFieldParsers.Distance(typed).TryGetValue(out var distance)
                        && TaskRules.For(Enum.Parse<GoalTask>(goalInput.Task!)).CheckDistance(distance) is { } problem)
                    {
                        context.AddFailure(problem);
                    }
                });
            goal.RuleFor(g => g.Detail).MaximumLength(FieldLimits.Name).WithMessage($"Keep the task detail to {FieldLimits.Name} characters or fewer.");
        });

        RuleForEach(v => v.ReadingSpeeds).ChildRules(speed =>
        {
            speed.RuleFor(s => s.PrintSize)
                .NotEmpty().When(s => s.IsUsed)
                .WithMessage("Type the print size this speed was measured at, such as 2M.");
            speed.RuleFor(s => s.PrintSize).Reads(FormFieldParsers.PrintSize);
            speed.RuleFor(s => s.WordsPerMinute)
                .Must(w => int.TryParse(w?.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var wpm) && wpm <= MaximumWordsPerMinute)
                .When(s => s.IsUsed)
                .WithMessage($"Type the reading speed as whole words per minute, from 0 to {MaximumWordsPerMinute}, such as 85.");
        });
    }
}
