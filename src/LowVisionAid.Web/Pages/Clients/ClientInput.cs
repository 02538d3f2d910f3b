using System.Globalization;
using FluentValidation;
using LowVisionAid.Data;

namespace LowVisionAid.Web.Pages.Clients;

/// <summary>The client form as typed.</summary>
public sealed class ClientInput
{
    public string Code { get; set; } = "";

    public string? Name { get; set; }

    public string? YearOfBirth { get; set; }

    public string? Notes { get; set; }

    /// <summary>The client's version when the form was opened (edits only).</summary>
    public Guid Version { get; set; }

    public int? ParsedYearOfBirth => int.TryParse(YearOfBirth?.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var year) ? year : null;
}

public sealed class ClientInputValidator : AbstractValidator<ClientInput>
{
    public const int EarliestYearOfBirth = 1900;

    public ClientInputValidator(TimeProvider clock)
    {
        ArgumentNullException.ThrowIfNull(clock);
        RuleFor(c => c.Code).Cascade(CascadeMode.Stop)
            .NotEmpty().WithMessage("Type the clinic's code for this client, such as HB-0042.")
            .MaximumLength(FieldLimits.Code).WithMessage($"Keep the client code to {FieldLimits.Code} characters or fewer.")
            .Matches(@"^[\p{L}\p{N}][\p{L}\p{N} ._/-]*$").WithMessage("Use letters, digits, spaces, dots, dashes or slashes in the client code, such as HB-0042.");
        RuleFor(c => c.Name)
            .MaximumLength(FieldLimits.Name).WithMessage($"Keep the name to {FieldLimits.Name} characters or fewer.");
        RuleFor(c => c.YearOfBirth)
            .Must(y => string.IsNullOrWhiteSpace(y) || BeAYear(y, clock))
            .WithMessage(_ => $"Type the year of birth as four digits between {EarliestYearOfBirth} and {clock.GetLocalNow().Year}, such as 1948, or leave it empty.");
        RuleFor(c => c.Notes)
            .MaximumLength(FieldLimits.Notes).WithMessage($"Keep the notes to {FieldLimits.Notes} characters or fewer.");
    }

    private static bool BeAYear(string text, TimeProvider clock) =>
        text.Trim().Length == 4
        && int.TryParse(text.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var year)
        && year >= EarliestYearOfBirth && year <= clock.GetLocalNow().Year;
}
