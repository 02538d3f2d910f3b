using FluentValidation;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.AspNetCore.Mvc.Rendering;
using DeviceKind = LowVisionAid.Optics.Kit.DeviceKind;

namespace LowVisionAid.Web.Pages.Kit;

public sealed class NewModel(IValidator<KitInput> validator, KitHandler handler) : PageModel
{
    [BindProperty]
    public KitInput Input { get; set; } = new();

    public static IReadOnlyList<SelectListItem> KindChoices { get; } =
        [new SelectListItem("Choose the kind", ""), .. Labels.Choices<DeviceKind>(Web.Plans.PlanText.Device)];

    public void OnGet()
    {
    }

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        var check = await validator.ValidateAsync(Input, ct).ConfigureAwait(false);
        if (!check.IsValid)
        {
            ModelState.AddErrors(check, nameof(Input));
            return Page();
        }

        if (await handler.AddAsync(Input, ct).ConfigureAwait(false) is { } codeError)
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(KitInput.Code)}", codeError);
            return Page();
        }

        return Redirect("/Kit");
    }
}
