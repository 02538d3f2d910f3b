using System.Globalization;
using FluentValidation;
using LowVisionAid.Data;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Web.Infrastructure;
using CoreKitDevice = LowVisionAid.Optics.Kit.KitDevice;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;

namespace LowVisionAid.Web.Pages.Kit;

/// <summary>The add-a-device form as typed. Label, image position and telescope fields come in through CSV import.</summary>
public sealed class KitInput
{
    public string Code { get; set; } = "";

    public string Name { get; set; } = "";

    public string? Kind { get; set; }

    public string? Power { get; set; }

    public string? Aperture { get; set; }

    public string? StandHeight { get; set; }

    public string? Magnification { get; set; }

    public string? ReadingCap { get; set; }

    public bool Illuminated { get; set; }

    public string? InStock { get; set; }

    public string? Notes { get; set; }

    /// <summary>The device as the core sees it, from fields that have already passed their own checks.</summary>
    internal CoreKitDevice ToCore() => new()
    {
        Id = Code.Trim(),
        Name = Name.Trim(),
        Kind = Enum.TryParse<DeviceKind>(Kind, out var kind) ? kind : default,
        Power = Read(Power, FormFieldParsers.Power),
        Aperture = Read(Aperture, FormFieldParsers.Distance),
        StandHeight = Read(StandHeight, FormFieldParsers.Distance),
        Magnification = double.TryParse(Magnification?.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var m) ? m : null,
        ReadingCap = Read(ReadingCap, FormFieldParsers.Power),
        Illuminated = Illuminated,
        Notes = string.IsNullOrWhiteSpace(Notes) ? null : Notes.Trim(),
    };

    private static T? Read<T>(string? text, Func<string, Optics.Text.ParseResult<T>> parse) where T : struct =>
        string.IsNullOrWhiteSpace(text) ? null : parse(text).TryGetValue(out var value) ? value : null;
}

public sealed class KitInputValidator : AbstractValidator<KitInput>
{
    public KitInputValidator()
    {
        RuleFor(k => k.Code)
            .NotEmpty().WithMessage("Type the clinic's stock code for the device, such as HM-12.")
            .MaximumLength(FieldLimits.Code).WithMessage($"Keep the stock code to {FieldLimits.Code} characters or fewer.");
        RuleFor(k => k.Name)
            .NotEmpty().WithMessage("Type a short description, such as Lit hand magnifier +12 D.")
            .MaximumLength(FieldLimits.Name).WithMessage($"Keep the description to {FieldLimits.Name} characters or fewer.");
        RuleFor(k => k.Kind)
            .Must(k => Enum.TryParse<DeviceKind>(k, out var kind) && Enum.IsDefined(kind)).WithMessage("Choose the kind of device from the list.");
        RuleFor(k => k.Power).Reads(FormFieldParsers.Power);
        RuleFor(k => k.Aperture).Reads(FormFieldParsers.Distance);
        RuleFor(k => k.StandHeight).Reads(FormFieldParsers.Distance);
        RuleFor(k => k.ReadingCap).Reads(FormFieldParsers.Power);
        RuleFor(k => k.Magnification)
            .Must(m => string.IsNullOrWhiteSpace(m) || double.TryParse(m.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var x) && double.IsFinite(x))
            .WithMessage("Type the magnification as a number, such as 3 for 3×.");
        RuleFor(k => k.InStock)
            .Must(s => string.IsNullOrWhiteSpace(s) || int.TryParse(s.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var n) && n <= 999)
            .WithMessage("Type how many are in stock as a whole number, such as 2, or leave it empty.");
        RuleFor(k => k.Notes).MaximumLength(FieldLimits.Notes).WithMessage($"Keep the notes to {FieldLimits.Notes} characters or fewer.");

        // What each kind of device needs (power, aperture, stand height…) is the core's rule: ask it.
        RuleFor(k => k).Custom((input, context) =>
        {
            if (!Enum.TryParse<DeviceKind>(input.Kind, out _) || string.IsNullOrWhiteSpace(input.Code) || string.IsNullOrWhiteSpace(input.Name))
            {
                return;
            }

            foreach (var problem in input.ToCore().Check())
            {
                context.AddFailure(problem.Field switch
                {
                    nameof(CoreKitDevice.Id) => nameof(KitInput.Code),
                    nameof(CoreKitDevice.Label) => nameof(KitInput.Power),
                    nameof(CoreKitDevice.ImageBelowLens) or nameof(CoreKitDevice.EnlargementRatio) => nameof(KitInput.StandHeight),
                    _ => problem.Field,
                }, problem.Message);
            }
        });
    }
}
