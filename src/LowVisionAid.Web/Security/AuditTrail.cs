using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Storage;

namespace LowVisionAid.Web.Security;

/// <summary>
/// Writes the audit lines that are not record saves: exports, backups, restores, accounts and sign-ins. The line is
/// inserted on the context's connection (inside its transaction, if one is open), so nothing else the context tracks
/// is saved with it.
/// </summary>
public sealed class AuditTrail(ClinicDbContext db, IAuditActor actor, TimeProvider clock)
{
    public async Task RecordAsync(AuditAction action, string recordType, long? recordId, string? detail, CancellationToken ct, string? actorName = null)
    {
        var entry = new AuditEntry
        {
            AtUtc = clock.GetUtcNow().UtcDateTime,
            Actor = actorName ?? actor.CurrentActor,
            Action = action,
            RecordType = recordType,
            RecordId = recordId,
            Detail = detail,
        };
        await db.Database.OpenConnectionAsync(ct).ConfigureAwait(false);
        try
        {
            await AuditWriter.InsertAsync(db.Database.GetDbConnection(), db.Database.CurrentTransaction?.GetDbTransaction(), entry, ct).ConfigureAwait(false);
        }
        finally
        {
            await db.Database.CloseConnectionAsync().ConfigureAwait(false);
        }
    }
}
