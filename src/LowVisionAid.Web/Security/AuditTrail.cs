using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;

namespace LowVisionAid.Web.Security;

/// <summary>Writes the audit lines that are not record saves: exports, backups, restores and sign-ins.</summary>
public sealed class AuditTrail(AccessDbContext db, IAuditActor actor, TimeProvider clock)
{
    public async Task RecordAsync(AuditAction action, string recordType, long? recordId, string? detail, CancellationToken ct, string? actorName = null)
    {
        db.AuditEntries.Add(new AuditEntry
        {
            AtUtc = clock.GetUtcNow().UtcDateTime,
            Actor = actorName ?? actor.CurrentActor,
            Action = action,
            RecordType = recordType,
            RecordId = recordId,
            Detail = detail,
        });
        await db.SaveChangesAsync(ct).ConfigureAwait(false);
    }
}
