using FluentValidation;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

public sealed class NewModel(IValidator<ClientInput> validator, NewClientHandler handler) : PageModel
{
    [BindProperty]
    public ClientInput Input { get; set; } = new();

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

        var result = await handler.HandleAsync(Input, ct).ConfigureAwait(false);
        if (result.CodeError is not null)
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(ClientInput.Code)}", result.CodeError);
            return Page();
        }

        return Redirect($"/Clients/{result.Id}");
    }
}
