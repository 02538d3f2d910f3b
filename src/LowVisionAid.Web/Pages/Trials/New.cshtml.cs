using System.Globalization;
using FluentValidation;
using LowVisionAid.Data.Entities;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.AspNetCore.Mvc.Rendering;

namespace LowVisionAid.Web.Pages.Trials;

public sealed class NewModel(IValidator<TrialInput> validator, NewTrialHandler handler, Infrastructure.ClinicCalendar calendar) : PageModel
{
    [BindProperty(SupportsGet = true)]
    public int PlanId { get; set; }

    [BindProperty]
    public TrialInput Input { get; set; } = new();

    /// <summary>A kit code chosen on the plan, to preselect (GET only).</summary>
    [FromQuery(Name = "kit")]
    public string? Kit { get; set; }

    /// <summary>An option chosen on the plan, to prefill the device (GET only).</summary>
    [FromQuery(Name = "device")]
    public string? Device { get; set; }

    public TrialContext Context { get; private set; } = null!;

    public static IReadOnlyList<SelectListItem> TaskChoices { get; } =
        [new SelectListItem("Not for one task", ""), .. Labels.Choices<GoalTask>(Web.Plans.PlanText.Task)];

    public static IReadOnlyList<SelectListItem> OutcomeChoices { get; } =
        [new SelectListItem("Choose what was decided", ""), .. Labels.Choices<TrialOutcome>(Labels.Outcome)];

    public async Task<IActionResult> OnGetAsync(CancellationToken ct)
    {
        if (!await LoadAsync(ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        Input.TrialDate = calendar.Today.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
        Input.KitDeviceId = Kit is null ? null : await handler.KitIdAsync(Kit, ct).ConfigureAwait(false);
        Input.DeviceDescription = Input.KitDeviceId is null ? Device : null;
        return Page();
    }

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        if (!await LoadAsync(ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        var check = await validator.ValidateAsync(Input, ct).ConfigureAwait(false);
        if (!check.IsValid)
        {
            ModelState.AddErrors(check, nameof(Input));
            return Page();
        }

        var (id, kitError) = await handler.HandleAsync(PlanId, Input, ct).ConfigureAwait(false);
        if (kitError is not null)
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(TrialInput.KitDeviceId)}", kitError);
            return Page();
        }

        return Redirect($"/Plans/{PlanId}#trial-{id}");
    }

    private async Task<bool> LoadAsync(CancellationToken ct)
    {
        var context = await handler.ContextAsync(PlanId, ct).ConfigureAwait(false);
        if (context is null)
        {
            return false;
        }

        Context = context;
        return true;
    }
}
