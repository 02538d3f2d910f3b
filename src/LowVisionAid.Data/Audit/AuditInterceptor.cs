using System.Runtime.CompilerServices;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.ChangeTracking;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.EntityFrameworkCore.Storage;

namespace LowVisionAid.Data.Audit;

/// <summary>
/// Adds one audit line for every clinic record (client, visit, plan, trial, kit device, settings) created, changed
/// or deleted through <see cref="ClinicDbContext"/>, in the same transaction as the change. The line names the table and the record number only, never its content.
/// </summary>
public sealed class AuditInterceptor(IAuditActor actor, TimeProvider clock) : SaveChangesInterceptor
{
    private readonly ConditionalWeakTable<DbContext, PendingAudit> _pending = [];

    public override InterceptionResult<int> SavingChanges(DbContextEventData eventData, InterceptionResult<int> result)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Collect(eventData.Context, startTransaction: ctx => ctx.Database.BeginTransaction());
        return result;
    }

    public override async ValueTask<InterceptionResult<int>> SavingChangesAsync(DbContextEventData eventData, InterceptionResult<int> result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        var pending = Collect(eventData.Context, startTransaction: null);
        if (pending is not null && eventData.Context!.Database.CurrentTransaction is null)
        {
            pending.OwnTransaction = await eventData.Context.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        }

        return result;
    }

    public override int SavedChanges(SaveChangesCompletedEventData eventData, int result)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        WriteAsync(eventData.Context, CancellationToken.None).AsTask().GetAwaiter().GetResult();
        return result;
    }

    public override async ValueTask<int> SavedChangesAsync(SaveChangesCompletedEventData eventData, int result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        await WriteAsync(eventData.Context, cancellationToken).ConfigureAwait(false);
        return result;
    }

    public override void SaveChangesFailed(DbContextErrorEventData eventData)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Abandon(eventData.Context);
    }

    public override Task SaveChangesFailedAsync(DbContextErrorEventData eventData, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Abandon(eventData.Context);
        return Task.CompletedTask;
    }

    private PendingAudit? Collect(DbContext? context, Func<DbContext, IDbContextTransaction>? startTransaction)
    {
        if (context is not ClinicDbContext)
        {
            return null;
        }

        var changes = new List<PendingChange>();
        foreach (var entry in context.ChangeTracker.Entries())
        {
            if (!IsClinicRecord(entry) || entry.State is not (EntityState.Added or EntityState.Modified or EntityState.Deleted))
            {
                continue;
            }

            var action = entry.State switch
            {
                EntityState.Added => AuditAction.Created,
                EntityState.Deleted => AuditAction.Deleted,
                _ => AuditAction.Changed,
            };
            changes.Add(new PendingChange(entry, action, entry.Metadata.ClrType.Name, action == AuditAction.Created ? null : KeyOf(entry)));
        }

        if (changes.Count == 0)
        {
            return null;
        }

        var pending = new PendingAudit(changes);
        if (startTransaction is not null && context.Database.CurrentTransaction is null)
        {
            pending.OwnTransaction = startTransaction(context);
        }

        _pending.AddOrUpdate(context, pending);
        return pending;
    }

    private async ValueTask WriteAsync(DbContext? context, CancellationToken ct)
    {
        if (context is null || !_pending.TryGetValue(context, out var pending))
        {
            return;
        }

        _pending.Remove(context);
        try
        {
            var connection = context.Database.GetDbConnection();
            var transaction = context.Database.CurrentTransaction?.GetDbTransaction();
            var actorName = actor.CurrentActor;
            var now = clock.GetUtcNow().UtcDateTime;
            foreach (var change in pending.Changes)
            {
                var entry = new AuditEntry
                {
                    AtUtc = now,
                    Actor = actorName,
                    Action = change.Action,
                    RecordType = change.RecordType,
                    RecordId = change.RecordId ?? KeyOf(change.Entry),
                };
                await AuditWriter.InsertAsync(connection, transaction, entry, ct).ConfigureAwait(false);
            }

            if (pending.OwnTransaction is not null)
            {
                await pending.OwnTransaction.CommitAsync(ct).ConfigureAwait(false);
            }
        }
        finally
        {
            if (pending.OwnTransaction is not null)
            {
                await pending.OwnTransaction.DisposeAsync().ConfigureAwait(false);
            }
        }
    }

    private void Abandon(DbContext? context)
    {
        if (context is null || !_pending.TryGetValue(context, out var pending))
        {
            return;
        }

        _pending.Remove(context);
        if (pending.OwnTransaction is not null)
        {
            pending.OwnTransaction.Rollback();
            pending.OwnTransaction.Dispose();
        }
    }

    // Clinic records only: not the audit lines themselves, and not Identity's rows (accounts are audited by the
    // account pages, sign-ins by the sign-in page, so a changed failed-sign-in counter is no record change).
    private static bool IsClinicRecord(EntityEntry entry) =>
        !entry.Metadata.IsOwned() && entry.Metadata.ClrType.Namespace == typeof(Entities.Client).Namespace;

    private static long? KeyOf(EntityEntry entry)
    {
        var key = entry.Metadata.FindPrimaryKey();
        if (key is not { Properties.Count: 1 })
        {
            return null;
        }

        return entry.Property(key.Properties[0].Name).CurrentValue switch
        {
            int i => i,
            long l => l,
            _ => null,
        };
    }

    private sealed record PendingChange(EntityEntry Entry, AuditAction Action, string RecordType, long? RecordId);

    private sealed class PendingAudit(List<PendingChange> changes)
    {
        public List<PendingChange> Changes { get; } = changes;

        public IDbContextTransaction? OwnTransaction { get; set; }
    }
}
