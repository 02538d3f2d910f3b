using System.Globalization;
using System.Text;
using LowVisionAid.Kit;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;

namespace LowVisionAid.Web.Pages.Kit;

public sealed class IndexModel(KitHandler handler) : PageModel
{
    public const long MaximumFileBytes = 1_000_000;
    public const string NoFile = "Choose a CSV file to import.";
    public const string FileTooLarge = "The file is larger than 1 MB; a kit catalogue is much smaller. Check that it is the right file.";

    public IReadOnlyList<KitRow> Devices { get; private set; } = [];

    public IReadOnlyList<KitCsvError> ImportErrors { get; private set; } = [];

    public static IReadOnlyList<string> Columns => KitCsv.Columns;

    public string? FileError => ModelState.TryGetValue("file", out var entry) && entry.Errors.Count > 0
        ? string.Join(" ", entry.Errors.Select(e => e.ErrorMessage))
        : null;

    [TempData]
    public string? Message { get; set; }

    public async Task OnGetAsync(CancellationToken ct) => Devices = await handler.ListAsync(ct).ConfigureAwait(false);

    public async Task<IActionResult> OnGetExportAsync(CancellationToken ct) =>
        File(Encoding.UTF8.GetBytes(await handler.ExportAsync(ct).ConfigureAwait(false)), "text/csv", "kit.csv");

    public async Task<IActionResult> OnPostImportAsync(IFormFile? file, CancellationToken ct)
    {
        if (file is null || file.Length == 0)
        {
            ModelState.AddModelError("file", NoFile);
        }
        else if (file.Length > MaximumFileBytes)
        {
            ModelState.AddModelError("file", FileTooLarge);
        }
        else
        {
            using var bytes = new MemoryStream();
            await file.CopyToAsync(bytes, ct).ConfigureAwait(false);
            var (added, updated, encoding, errors) = await handler.ImportAsync(bytes.ToArray(), ct).ConfigureAwait(false);
            if (errors.Count == 0)
            {
                Message = string.Create(CultureInfo.InvariantCulture, $"Imported: {added} added, {updated} updated.")
                    + (encoding == KitCsvText.Utf8 ? "" : $" The file was read as {encoding} text.");
                return RedirectToPage();
            }

            ImportErrors = errors;
            ModelState.AddModelError("file", "Nothing was imported: fix the rows listed below and import the file again.");
        }

        Devices = await handler.ListAsync(ct).ConfigureAwait(false);
        return Page();
    }
}
