using System.Globalization;
using FluentValidation;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Infrastructure;

namespace LowVisionAid.Web.Pages.Trials;

/// <summary>The trial form as typed.</summary>
public sealed class TrialInput
{
    public string TrialDate { get; set; } = "";

    /// <summary>A kit device id, or empty when the device is typed in.</summary>
    public string? KitDeviceId { get; set; }

    public string? DeviceDescription { get; set; }

    /// <summary>A <see cref="GoalTask"/> name, or empty.</summary>
    public string? Task { get; set; }

    public string? Result { get; set; }

    public string? ResultWordsPerMinute { get; set; }

    public string? ClientComment { get; set; }

    /// <summary>A <see cref="TrialOutcome"/> name.</summary>
    public string? Outcome { get; set; }

    public string? FollowUpDue { get; set; }

    internal static bool TryDate(string? text, out DateOnly date) =>
        DateOnly.TryParseExact(text?.Trim(), "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out date);

    internal int? KitId => int.TryParse(KitDeviceId, NumberStyles.None, CultureInfo.InvariantCulture, out var id) ? id : null;
}

public sealed class TrialInputValidator : AbstractValidator<TrialInput>
{
    public const string DeviceMissing = "Choose the device from the kit, or type what was tried, such as a 12 D hand magnifier.";

    public TrialInputValidator()
    {
        RuleFor(t => t.TrialDate)
            .Must(d => TrialInput.TryDate(d, out _)).WithMessage("Type the date of the trial as year-month-day, such as 2026-03-14.");
        RuleFor(t => t.DeviceDescription)
            .NotEmpty().When(t => t.KitId is null).WithMessage(DeviceMissing)
            .MaximumLength(FieldLimits.Name).WithMessage($"Keep the device description to {FieldLimits.Name} characters or fewer.");
        RuleFor(t => t.KitDeviceId)
            .Must(k => string.IsNullOrEmpty(k) || int.TryParse(k, NumberStyles.None, CultureInfo.InvariantCulture, out _))
            .WithMessage("Choose the device from the list.");
        RuleFor(t => t.Task)
            .Must(t => string.IsNullOrEmpty(t) || Enum.TryParse<GoalTask>(t, out _)).WithMessage("Choose the task from the list.");
        RuleFor(t => t.Result).Custom((text, context) =>
        {
            if (string.IsNullOrWhiteSpace(text))
            {
                return;
            }

            if (text.Length > FieldLimits.Measurement)
            {
                context.AddFailure($"Keep the result to {FieldLimits.Measurement} characters or fewer.");
            }
            else if (!FormFieldParsers.PrintSize(text).Success && !FormFieldParsers.Acuity(text).Success)
            {
                context.AddFailure("Type the print size or acuity reached with the device, such as 1M or 6/12.");
            }
        });
        RuleFor(t => t.ResultWordsPerMinute)
            .Must(w => string.IsNullOrWhiteSpace(w) || (int.TryParse(w.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var wpm) && wpm <= 1000))
            .WithMessage("Type the reading speed reached as whole words per minute, from 0 to 1000, such as 70.");
        RuleFor(t => t.ClientComment)
            .MaximumLength(FieldLimits.Notes).WithMessage($"Keep the comment to {FieldLimits.Notes} characters or fewer.");
        RuleFor(t => t.Outcome)
            .Must(o => Enum.TryParse<TrialOutcome>(o, out _)).WithMessage("Choose what was decided: dispensed, loaned, ordered or declined.");
        RuleFor(t => t.FollowUpDue)
            .Must(d => string.IsNullOrWhiteSpace(d) || TrialInput.TryDate(d, out _))
            .WithMessage("Type the follow-up date as year-month-day, such as 2026-04-14, or leave it empty.")
            .Must((t, d) => !TrialInput.TryDate(d, out var due) || !TrialInput.TryDate(t.TrialDate, out var tried) || due >= tried)
            .WithMessage("The follow-up date is before the trial; type a later date.");
    }
}
