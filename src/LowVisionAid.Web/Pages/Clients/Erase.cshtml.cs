using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

[Authorize(Policy = ClinicPolicies.ExportOrDelete)]
public sealed class EraseModel(ClientEraseHandler handler) : PageModel
{
    public ErasePreview? Client { get; private set; }

    public string? Erased { get; private set; }

    [BindProperty]
    public string? Confirmation { get; set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        Client = await handler.PreviewAsync(id, ct).ConfigureAwait(false);
        return Client is null ? NotFound() : Page();
    }

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        Client = await handler.PreviewAsync(id, ct).ConfigureAwait(false);
        if (Client is null)
        {
            return NotFound();
        }

        if (!string.Equals(Confirmation?.Trim(), Client.Code, StringComparison.OrdinalIgnoreCase))
        {
            ModelState.AddModelError(nameof(Confirmation), ClientEraseHandler.ConfirmationMismatch);
            return Page();
        }

        var result = await handler.EraseAsync(id, ct).ConfigureAwait(false);
        Erased = $"Client record #{id} was erased ({string.Join(", ", result.RowsPerTable.Select(kv => $"{kv.Value} {kv.Key}"))}). Only an audit line without clinical content remains.";
        Client = null;
        return Page();
    }
}
