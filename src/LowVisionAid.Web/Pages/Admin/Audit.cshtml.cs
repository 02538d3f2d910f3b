using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Admin;

public sealed class AuditModel(ClinicDbContext db) : PageModel
{
    public const int PageSize = 500;

    [BindProperty(SupportsGet = true, Name = "type")]
    public string? RecordType { get; set; }

    [BindProperty(SupportsGet = true, Name = "id")]
    public long? RecordId { get; set; }

    public IReadOnlyList<AuditEntry> Entries { get; private set; } = [];

    public async Task OnGetAsync(CancellationToken ct)
    {
        var query = db.AuditEntries.AsNoTracking();
        if (!string.IsNullOrWhiteSpace(RecordType))
        {
            query = query.Where(e => e.RecordType == RecordType.Trim());
        }

        if (RecordId is { } id)
        {
            query = query.Where(e => e.RecordId == id);
        }

        Entries = await query.OrderByDescending(e => e.Id).Take(PageSize).ToListAsync(ct).ConfigureAwait(false);
    }
}
