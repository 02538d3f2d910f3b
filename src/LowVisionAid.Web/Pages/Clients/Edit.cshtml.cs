using System.Globalization;
using FluentValidation;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

public sealed class EditModel(IValidator<ClientInput> validator, EditClientHandler handler, Infrastructure.ClinicCalendar calendar) : PageModel
{
    public const string ConflictMessage =
        "Someone else saved this client's details while you were editing them. Nothing you typed is lost: your version is still in the form below, not yet saved. "
        + "Open the client in a new tab to compare, then press Save client again to keep your version.";

    [BindProperty]
    public ClientInput Input { get; set; } = new();

    public int Id { get; private set; }

    /// <summary>The code as saved, for the heading and the way back (the form may hold a changed one).</summary>
    public string SavedCode { get; private set; } = "";

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var client = await LoadAsync(id, ct).ConfigureAwait(false);
        if (client is null)
        {
            return NotFound();
        }

        Input = new ClientInput
        {
            Code = client.Code,
            Name = client.Name,
            YearOfBirth = client.YearOfBirth?.ToString(CultureInfo.InvariantCulture),
            Notes = client.Notes,
            Version = client.Version,
        };
        return Page();
    }

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        if (await LoadAsync(id, ct).ConfigureAwait(false) is null)
        {
            return NotFound();
        }

        var check = await validator.ValidateAsync(Input, ct).ConfigureAwait(false);
        if (!check.IsValid)
        {
            ModelState.AddErrors(check, nameof(Input));
            return Page();
        }

        var result = await handler.HandleAsync(id, Input, ct).ConfigureAwait(false);
        if (result.NotFound)
        {
            return NotFound();
        }

        if (result.CodeError is not null)
        {
            ModelState.AddModelError($"{nameof(Input)}.{nameof(ClientInput.Code)}", result.CodeError);
            return Page();
        }

        if (result.Conflict)
        {
            // Keep everything typed; take the saved version so that a second Save deliberately keeps this one.
            ModelState.Remove($"{nameof(Input)}.{nameof(ClientInput.Version)}");
            Input.Version = result.CurrentVersion;
            var when = result.ChangedAtUtc is { } at ? calendar.TimeOf(at) : null;
            ModelState.AddModelError(string.Empty, when is null ? ConflictMessage : $"{ConflictMessage} (Saved by the other person at {when}.)");
            return Page();
        }

        return Redirect($"/Clients/{id}");
    }

    private async Task<Client?> LoadAsync(int id, CancellationToken ct)
    {
        var client = await handler.LoadAsync(id, ct).ConfigureAwait(false);
        if (client is not null)
        {
            Id = id;
            SavedCode = client.Code;
        }

        return client;
    }
}
