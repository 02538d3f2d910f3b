using System.Globalization;
using FluentValidation;
using Microsoft.AspNetCore.Mvc;

namespace LowVisionAid.Web.Pages.Visits;

public sealed class EditModel(IValidator<VisitInput> validator, VisitFormHandler form, EditVisitHandler handler, Infrastructure.ClinicCalendar calendar)
    : VisitFormPage(validator, form)
{
    public const string ConflictMessage =
        "Someone else saved this visit while you were editing it. Nothing you typed is lost: your version is still in the form below, not yet saved. "
        + "Open the saved visit in a new tab to compare, then press Save visit again to keep your version.";

    private readonly VisitFormHandler _form = form;

    public int Id { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var visit = await _form.LoadAsync(id, ct).ConfigureAwait(false);
        if (visit is null)
        {
            return NotFound();
        }

        Id = id;
        Client = new VisitClient(visit.Client!.Id, visit.Client.Code, visit.Client.Name);
        Input = VisitMapping.ToInput(visit);
        return Page();
    }

    public async Task<IActionResult> OnPostCheckAsync(int id, CancellationToken ct) =>
        await LoadClientAsync(id, ct).ConfigureAwait(false) ? await CheckAsync(ct).ConfigureAwait(false) : NotFound();

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        if (!await LoadClientAsync(id, ct).ConfigureAwait(false))
        {
            return NotFound();
        }

        if (!await ValidateAsync(ct).ConfigureAwait(false))
        {
            return Page();
        }

        var result = await handler.HandleAsync(id, Input, ct).ConfigureAwait(false);
        if (result.NotFound)
        {
            return NotFound();
        }

        if (result.Conflict)
        {
            // Keep everything typed; take the saved version so that a second Save deliberately keeps this one.
            ModelState.Remove($"{nameof(Input)}.{nameof(VisitInput.Version)}");
            Input.Version = result.CurrentVersion;
            var when = result.ChangedAtUtc is { } at ? calendar.TimeOf(at) : null;
            ModelState.AddModelError(string.Empty, when is null ? ConflictMessage : $"{ConflictMessage} (Saved by the other person at {when}.)");
            await ReadBackAsync(ct).ConfigureAwait(false);
            return Page();
        }

        return Redirect($"/Visits/{id}");
    }

    private async Task<bool> LoadClientAsync(int id, CancellationToken ct)
    {
        var visit = await _form.LoadAsync(id, ct).ConfigureAwait(false);
        if (visit is null)
        {
            return false;
        }

        Id = id;
        Client = new VisitClient(visit.Client!.Id, visit.Client.Code, visit.Client.Name);
        return true;
    }
}
