using System.Globalization;
using FluentValidation;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Notation;
using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Web.Infrastructure;

namespace LowVisionAid.Web.Pages.Settings;

/// <summary>The settings form as typed.</summary>
public sealed class SettingsInput
{
    public string ClinicName { get; set; } = "";

    public string? ClinicContact { get; set; }

    public UnitSystem Units { get; set; }

    public SnellenUnit SnellenIn { get; set; }

    public string SpotReserve { get; set; } = "";

    public string FluentReserve { get; set; } = "";

    public string SustainedReserve { get; set; } = "";

    public string CharacterPitch { get; set; } = "";

    public string HandoutPrintSize { get; set; } = "";

    /// <summary>One row per kind of option in the core's cost table (<see cref="DeviceRanges.Costs"/>).</summary>
    public List<CostClassInput> Costs { get; set; } = [];

    public Guid Version { get; set; }

    /// <summary>A reserve typed as "2", "2:1" or "2.5 : 1" (the core's notation); null when it is not one.</summary>
    internal static AcuityReserve? Reserve(string? text) =>
        AcuityReserveNotation.Parse(text, CultureInfo.InvariantCulture).TryGetValue(out var reserve) ? reserve : null;

    internal static double? Number(string? text) =>
        double.TryParse(text?.Trim().Replace(',', '.'), NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value) ? value : null;
}

/// <summary>The cost class the clinic gives one kind of option.</summary>
public sealed class CostClassInput
{
    public OptionKind Kind { get; set; }

    /// <summary>Null when the form did not send it: the kind keeps its class.</summary>
    public CostClass? Cost { get; set; }
}

public sealed class SettingsInputValidator : AbstractValidator<SettingsInput>
{
    public const double MinimumPitch = 0.5;
    public const double MaximumPitch = 2.0;

    public SettingsInputValidator()
    {
        RuleFor(s => s.ClinicName)
            .NotEmpty().WithMessage("Type the clinic's name as it should appear on handouts, such as Riverside Eye Clinic.")
            .MaximumLength(FieldLimits.Name).WithMessage($"Keep the clinic name to {FieldLimits.Name} characters or fewer.");
        RuleFor(s => s.ClinicContact)
            .MaximumLength(FieldLimits.Notes).WithMessage($"Keep the contact details to {FieldLimits.Notes} characters or fewer.");
        RuleFor(s => s.Units).IsInEnum().WithMessage("Choose metric or imperial units from the list.");
        RuleFor(s => s.SnellenIn).IsInEnum().WithMessage("Choose how Snellen fractions are written from the list.");
        RuleFor(s => s.SpotReserve).Must(BeAReserve).WithMessage(ReserveMessage("spot reading", "1:1"));
        RuleFor(s => s.FluentReserve).Must(BeAReserve).WithMessage(ReserveMessage("fluent reading", "2:1"));
        RuleFor(s => s.SustainedReserve).Must(BeAReserve).WithMessage(ReserveMessage("sustained reading", "3:1"));
        RuleFor(s => s.CharacterPitch)
            .Must(p => SettingsInput.Number(p) is >= MinimumPitch and <= MaximumPitch)
            .WithMessage("Type the character pitch as a number between 0.5 and 2.0 times the x-height, such as 1.1 for most book faces.");
        RuleForEach(s => s.Costs).ChildRules(cost =>
        {
            cost.RuleFor(c => c.Kind).Must(DeviceRanges.Default.Costs.ContainsKey)
                .WithMessage("That kind of option has no cost class; reload the settings page and choose again.");
            cost.RuleFor(c => c.Cost).IsInEnum().WithMessage("Choose low, medium or high cost from the list.");
        });
        RuleFor(s => s.Costs)
            .Must(c => c.Select(x => x.Kind).Distinct().Count() == c.Count)
            .WithMessage("Each kind of option takes one cost class; reload the settings page and choose again.");
        RuleFor(s => s.HandoutPrintSize).Custom((text, context) =>
        {
            var result = FormFieldParsers.PrintSize(text ?? "");
            if (!result.Success)
            {
                context.AddFailure(result.Error);
            }
            else if (result.Value.M < 1)
            {
                context.AddFailure("Handouts are large print: type a size of 1M or more, such as 3M.");
            }
        });
    }

    private static bool BeAReserve(string text) => SettingsInput.Reserve(text) is not null;

    private static string ReserveMessage(string task, string example) =>
        $"Type the {task} reserve as a ratio from 1:1 to 10:1, such as {example}.";
}
