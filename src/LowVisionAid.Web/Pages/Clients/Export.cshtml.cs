using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Clients;

[Authorize(Policy = ClinicPolicies.ExportOrDelete)]
public sealed class ExportModel(ClientEraseHandler preview, ClientExportHandler export) : PageModel
{
    public ErasePreview Client { get; private set; } = null!;

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var found = await preview.PreviewAsync(id, ct).ConfigureAwait(false);
        if (found is null)
        {
            return NotFound();
        }

        Client = found;
        return Page();
    }

    public Task<IActionResult> OnPostJsonAsync(int id, CancellationToken ct) => ExportAsync(id, asCsv: false, ct);

    public Task<IActionResult> OnPostCsvAsync(int id, CancellationToken ct) => ExportAsync(id, asCsv: true, ct);

    private async Task<IActionResult> ExportAsync(int id, bool asCsv, CancellationToken ct)
    {
        var file = await export.HandleAsync(id, asCsv, ct).ConfigureAwait(false);
        return file is null ? NotFound() : File(file.Content, file.ContentType, file.FileName);
    }
}
