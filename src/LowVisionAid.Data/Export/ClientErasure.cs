using System.Globalization;
using LowVisionAid.Data.Audit;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data.Export;

/// <summary>The outcome of an erasure: how many rows went, per table (counts only, no content).</summary>
public sealed record ErasureResult(bool Erased, IReadOnlyDictionary<string, int> RowsPerTable);

/// <summary>
/// Erases one client completely: every row of <see cref="ClientRecord"/>, deleted children first, with SQLite's
/// secure_delete on so the freed pages are overwritten (a server reclaims them by its vacuum), and one audit line (table, number and row counts only) in
/// the same transaction. Backups taken earlier still hold the client until they are deleted.
/// </summary>
public static class ClientErasure
{
    public static async Task<ErasureResult> EraseAsync(ClinicDbContext db, int clientId, string actor, TimeProvider clock, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(db);
        ArgumentNullException.ThrowIfNull(clock);
        await db.Database.OpenConnectionAsync(ct).ConfigureAwait(false);
        try
        {
            var connection = db.Database.GetDbConnection();
            var file = !db.Database.IsServer();
            if (file)
            {
                await ExecuteAsync(connection, null, "PRAGMA secure_delete = ON", ct).ConfigureAwait(false);
            }

            await using var transaction = await connection.BeginTransactionAsync(ct).ConfigureAwait(false);
            await db.Database.UseTransactionAsync(transaction, ct).ConfigureAwait(false);
            var record = await ClientRecord.ReadAsync(db, clientId, ct).ConfigureAwait(false);
            if (record is null)
            {
                return new ErasureResult(false, new Dictionary<string, int>());
            }

            var counts = new SortedDictionary<string, int>(StringComparer.Ordinal);
            var keyColumns = db.Model.GetEntityTypes().Where(t => t.GetTableName() is not null && !t.IsOwned() && t.FindPrimaryKey() is { Properties.Count: 1 })
                .GroupBy(t => t.GetTableName()!, StringComparer.Ordinal)
                .ToDictionary(g => g.Key, g => ClientRecord.KeyColumn(g.First()), StringComparer.Ordinal);
            foreach (var row in ClientRecord.ChildrenFirst(record))
            {
                await ExecuteAsync(connection, transaction, $"DELETE FROM \"{row.Table}\" WHERE \"{keyColumns[row.Table]}\" = {row.Id.ToString(CultureInfo.InvariantCulture)}", ct).ConfigureAwait(false);
                counts[row.Table] = counts.GetValueOrDefault(row.Table) + 1;
            }

            await AuditWriter.InsertAsync(connection, transaction, new AuditEntry
            {
                AtUtc = clock.GetUtcNow().UtcDateTime,
                Actor = actor,
                Action = AuditAction.Erased,
                RecordType = "Client",
                RecordId = clientId,
                Detail = "Rows erased: " + string.Join(", ", counts.Select(c => string.Create(CultureInfo.InvariantCulture, $"{c.Key} {c.Value}"))),
            }, ct).ConfigureAwait(false);
            await transaction.CommitAsync(ct).ConfigureAwait(false);
            await db.Database.UseTransactionAsync(null, ct).ConfigureAwait(false);

            // Move the overwritten pages out of the write-ahead log into the main file and empty the log. On a server the
            // deleted rows' space is reclaimed by the server's vacuum (docs/deployment.md).
            if (file)
            {
                await ExecuteAsync(connection, null, "PRAGMA wal_checkpoint(TRUNCATE)", ct).ConfigureAwait(false);
            }
            return new ErasureResult(true, counts);
        }
        finally
        {
            await db.Database.CloseConnectionAsync().ConfigureAwait(false);
        }
    }

    private static async Task ExecuteAsync(System.Data.Common.DbConnection connection, System.Data.Common.DbTransaction? transaction, string sql, CancellationToken ct)
    {
        await using var command = connection.CreateCommand();
        command.Transaction = transaction;
#pragma warning disable CA2100 // Table and column names come from the EF Core model and ids are integers; nothing here is user text.
        command.CommandText = sql;
#pragma warning restore CA2100
        await command.ExecuteNonQueryAsync(ct).ConfigureAwait(false);
    }
}
