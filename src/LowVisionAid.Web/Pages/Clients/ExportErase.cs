using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Export;
using LowVisionAid.Web.Security;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Pages.Clients;

public sealed record ExportedFile(byte[] Content, string ContentType, string FileName);

/// <summary>One client's whole record as JSON or CSV; each export is recorded in the audit trail.</summary>
public sealed class ClientExportHandler(ClinicDbContext db, AuditTrail audit, TimeProvider clock)
{
    public async Task<ExportedFile?> HandleAsync(int clientId, bool asCsv, CancellationToken ct)
    {
        var record = await ClientRecord.ReadAsync(db, clientId, ct).ConfigureAwait(false);
        if (record is null)
        {
            return null;
        }

        var now = clock.GetUtcNow().UtcDateTime;
        var file = asCsv
            ? new ExportedFile(ClientExportFormats.ToCsv(record), "text/csv; charset=utf-8", $"client-{clientId}-record.csv")
            : new ExportedFile(ClientExportFormats.ToJson(record, now), "application/json; charset=utf-8", $"client-{clientId}-record.json");
        await audit.RecordAsync(AuditAction.Exported, "Client", clientId, asCsv ? "CSV" : "JSON", ct).ConfigureAwait(false);
        return file;
    }
}

public sealed record ErasePreview(int Id, string Code, IReadOnlyDictionary<string, int> RowsPerTable);

/// <summary>What an erasure would remove, and the erasure itself (after the user typed the client's code).</summary>
public sealed class ClientEraseHandler(ClinicDbContext db, IAuditActor actor, TimeProvider clock)
{
    public const string ConfirmationMismatch = "Type the client's code exactly as shown to confirm the erasure.";

    public async Task<ErasePreview?> PreviewAsync(int clientId, CancellationToken ct)
    {
        var code = await db.Clients.AsNoTracking().Where(c => c.Id == clientId).Select(c => c.Code).FirstOrDefaultAsync(ct).ConfigureAwait(false);
        if (code is null)
        {
            return null;
        }

        var record = await ClientRecord.ReadAsync(db, clientId, ct).ConfigureAwait(false);
        var counts = ClientRecord.ChildrenFirst(record!).GroupBy(r => r.Table, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Count(), StringComparer.Ordinal);
        return new ErasePreview(clientId, code, counts);
    }

    public async Task<ErasureResult> EraseAsync(int clientId, CancellationToken ct) =>
        await ClientErasure.EraseAsync(db, clientId, actor.CurrentActor, clock, ct).ConfigureAwait(false);
}
