using FluentValidation;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Options;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.AspNetCore.Mvc.Rendering;

namespace LowVisionAid.Web.Pages.Settings;

public sealed class IndexModel(IValidator<SettingsInput> validator, SettingsHandler handler) : PageModel
{
    public const string Saved = "Settings saved.";
    public const string DemoRemoved = "The demo clinic's clients, visits, plans, trials and kit have been removed.";
    public const string ConfirmDemoRemoval = "Tick the box to confirm that the demo records should be removed.";
    public const string ChangedMeanwhile = "Someone else saved the settings while you were editing. Your changes are still in the form below, not yet saved; press Save settings again to keep them.";

    [BindProperty]
    public SettingsInput Input { get; set; } = new();

    [BindProperty]
    public bool ConfirmRemoval { get; set; }

    public bool HasDemoData { get; private set; }

    [TempData]
    public string? Message { get; set; }

    public static IReadOnlyList<SelectListItem> UnitChoices { get; } =
        [new SelectListItem("Metric (cm, m)", nameof(UnitSystem.Metric)), new SelectListItem("Imperial (inches, feet)", nameof(UnitSystem.Imperial))];

    public static IReadOnlyList<SelectListItem> SnellenChoices { get; } =
        [new SelectListItem("Metres (6/x)", nameof(SnellenUnit.Metres)), new SelectListItem("Feet (20/x)", nameof(SnellenUnit.Feet))];

    public static IReadOnlyList<SelectListItem> CostChoices { get; } =
    [
        new SelectListItem("Low (free or a small outlay)", nameof(CostClass.Low)),
        new SelectListItem("Medium (a prescription or specialist device)", nameof(CostClass.Medium)),
        new SelectListItem("High (a custom telescope or an electronic device)", nameof(CostClass.High)),
    ];

    /// <summary>The label of a kind of option, as the plan shows it.</summary>
    public static string KindLabel(OptionKind kind) => Web.Plans.PlanText.Kind(kind);

    public async Task OnGetAsync(CancellationToken ct)
    {
        var settings = await handler.CurrentAsync(ct).ConfigureAwait(false);
        Input = SettingsHandler.ToInput(settings);
        HasDemoData = settings.HasDemoData;
    }

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        var check = await validator.ValidateAsync(Input, ct).ConfigureAwait(false);
        if (!check.IsValid)
        {
            ModelState.AddErrors(check, nameof(Input));
            return await PageAsync(ct).ConfigureAwait(false);
        }

        if (!await handler.SaveAsync(Input, ct).ConfigureAwait(false))
        {
            ModelState.Remove($"{nameof(Input)}.{nameof(SettingsInput.Version)}");
            Input.Version = (await handler.CurrentAsync(ct).ConfigureAwait(false)).Version;
            ModelState.AddModelError(string.Empty, ChangedMeanwhile);
            return await PageAsync(ct).ConfigureAwait(false);
        }

        Message = Saved;
        return RedirectToPage();
    }

    public async Task<IActionResult> OnPostRemoveDemoAsync(CancellationToken ct)
    {
        if (!ConfirmRemoval)
        {
            ModelState.Clear();
            ModelState.AddModelError(nameof(ConfirmRemoval), ConfirmDemoRemoval);
            Input = SettingsHandler.ToInput(await handler.CurrentAsync(ct).ConfigureAwait(false));
            return await PageAsync(ct).ConfigureAwait(false);
        }

        await handler.RemoveDemoAsync(ct).ConfigureAwait(false);
        Message = DemoRemoved;
        return RedirectToPage();
    }

    private async Task<IActionResult> PageAsync(CancellationToken ct)
    {
        HasDemoData = (await handler.CurrentAsync(ct).ConfigureAwait(false)).HasDemoData;
        return Page();
    }
}
