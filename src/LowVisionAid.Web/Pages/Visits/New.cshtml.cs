using FluentValidation;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;

namespace LowVisionAid.Web.Pages.Visits;

public sealed class NewModel(IValidator<VisitInput> validator, VisitFormHandler form, NewVisitHandler handler, Infrastructure.ClinicCalendar calendar)
    : VisitFormPage(validator, form)
{
    private readonly VisitFormHandler _form = form;

    [BindProperty(SupportsGet = true)]
    public int ClientId { get; set; }

    public async Task<IActionResult> OnGetAsync(CancellationToken ct)
    {
        if (!await LoadClientAsync(ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        Input.VisitDate = calendar.Today.ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture);
        return Page();
    }

    public async Task<IActionResult> OnPostCheckAsync(CancellationToken ct) =>
        await LoadClientAsync(ct).ConfigureAwait(false) ? await CheckAsync(ct).ConfigureAwait(false) : NotFound();

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        if (!await LoadClientAsync(ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        if (!await ValidateAsync(ct).ConfigureAwait(false))
        {
            return Page();
        }

        var id = await handler.HandleAsync(ClientId, Input, ct).ConfigureAwait(false);
        return Redirect($"/Visits/{id}");
    }

    private async Task<bool> LoadClientAsync(CancellationToken ct)
    {
        var client = await _form.ClientAsync(ClientId, ct).ConfigureAwait(false);
        if (client is null)
        {
            return false;
        }

        Client = client;
        return true;
    }
}
