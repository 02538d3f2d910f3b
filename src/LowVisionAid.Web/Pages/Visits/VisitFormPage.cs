using FluentValidation;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.AspNetCore.Mvc.Rendering;

namespace LowVisionAid.Web.Pages.Visits;

/// <summary>What the new-visit and edit-visit pages share: the form, its choices and the "check what I typed" step.</summary>
public abstract class VisitFormPage(IValidator<VisitInput> validator, VisitFormHandler form) : PageModel
{
    [BindProperty]
    public VisitInput Input { get; set; } = new VisitInput().WithBlankRows();

    public VisitClient Client { get; protected set; } = null!;

    /// <summary>Filled when the user asked to check the readings, or when the form came back with errors.</summary>
    public IReadOnlyList<UnderstoodReading> Readings { get; private set; } = [];

    public static IReadOnlyList<SelectListItem> TaskChoices { get; } =
        [new SelectListItem("No task on this line", ""), .. Labels.Choices<GoalTask>(Web.Plans.PlanText.Task)];

    public static IReadOnlyList<SelectListItem> EyeChoices { get; } = Labels.Choices<UsefulEyes>(Labels.Eyes);

    public static IReadOnlyList<SelectListItem> LightingChoices { get; } = Labels.Choices<HomeLighting>(Labels.Lighting);

    public static IReadOnlyList<CommonPrintSize> CommonPrintSizes => Visits.CommonPrintSize.All;

    /// <summary>Validates; on failure fills model state and the read-back, and returns false.</summary>
    protected async Task<bool> ValidateAsync(CancellationToken ct)
    {
        Input.WithBlankRows();
        var check = await validator.ValidateAsync(Input, ct).ConfigureAwait(false);
        if (check.IsValid)
        {
            return true;
        }

        ModelState.AddErrors(check, nameof(Input));
        await ReadBackAsync(ct).ConfigureAwait(false);
        return false;
    }

    protected async Task ReadBackAsync(CancellationToken ct) =>
        Readings = Understood.From(Input, await form.SnellenUnitAsync(ct).ConfigureAwait(false));

    /// <summary>The "Check readings" button: show how each measurement was read, save nothing.</summary>
    protected async Task<IActionResult> CheckAsync(CancellationToken ct)
    {
        if (await ValidateAsync(ct).ConfigureAwait(false))
        {
            await ReadBackAsync(ct).ConfigureAwait(false);
        }

        return Page();
    }
}

/// <summary>A print size commonly needed for a task, offered as a suggestion (common practice, approximate).</summary>
public sealed record CommonPrintSize(string Size, string Task)
{
    public static IReadOnlyList<CommonPrintSize> All { get; } =
    [
        new("0.8M", "telephone directory, small print on labels (common practice)"),
        new("1M", "newspaper text (common practice)"),
        new("1.6M", "children's books, some magazines (common practice)"),
        new("2M", "large-print books, about 16 pt (derived, 1M ≈ 8 pt)"),
        new("3M", "headlines, large-print forms (common practice)"),
    ];
}
