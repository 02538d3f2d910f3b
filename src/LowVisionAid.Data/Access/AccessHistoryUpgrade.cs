using System.Data.Common;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace LowVisionAid.Data.Access;

/// <summary>
/// Upgrades a database made while sign-in and the audit trail had a context of their own. That version kept the
/// Identity tables and <c>AuditEntries</c> under a second migration history table, <see cref="HistoryTable"/>. Now one
/// context holds them, and the clinic migration <see cref="AccessTablesMigration"/> creates exactly those tables. On
/// such a database they already exist, with the accounts in them, so that migration is recorded as applied instead of
/// run, and the second history table goes, in one transaction. Nothing in the tables is touched.
/// </summary>
public static class AccessHistoryUpgrade
{
    /// <summary>The second migration history table the earlier version kept.</summary>
    public const string HistoryTable = "__AccessMigrationsHistory";

    /// <summary>The one migration ever recorded in <see cref="HistoryTable"/>: it created the tables in <see cref="AccessTables"/>.</summary>
    public const string InitialAccessMigration = "20261201222101_InitialAccess";

    /// <summary>
    /// The clinic migration that creates the Identity tables and the audit trail, and nothing else (a test checks
    /// both). If it is ever regenerated under another name, this constant must follow.
    /// </summary>
    public const string AccessTablesMigration = "20261202005817_AccessInClinicContext";

    /// <summary>Migrations of the earlier separate history (a backup may still record them).</summary>
    public static IReadOnlyList<string> EarlierMigrations { get; } = [InitialAccessMigration];

    /// <summary>The tables <see cref="InitialAccessMigration"/> created, and <see cref="AccessTablesMigration"/> creates.</summary>
    public static IReadOnlyList<string> AccessTables { get; } =
    [
        "AspNetRoles", "AspNetUsers", "AspNetRoleClaims", "AspNetUserClaims", "AspNetUserLogins", "AspNetUserRoles", "AspNetUserTokens", "AuditEntries",
    ];

    /// <summary>
    /// When the database still has <see cref="HistoryTable"/>: records <see cref="AccessTablesMigration"/> as applied
    /// (the tables are there) and drops the old history table. Returns true when it did. A database without the old
    /// table is left alone. Call it before <c>Migrate</c>; <see cref="ClinicDatabase.UpgradeAsync"/> does both.
    /// </summary>
    public static async Task<bool> AdoptAsync(ClinicDbContext db, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(db);
        await db.Database.OpenConnectionAsync(ct).ConfigureAwait(false);
        try
        {
            var connection = db.Database.GetDbConnection();
            if (!await TableExistsAsync(connection, HistoryTable, ct).ConfigureAwait(false))
            {
                return false;
            }

            var earlier = await ReadHistoryAsync(connection, ct).ConfigureAwait(false);
            var present = new List<string>();
            foreach (var table in AccessTables)
            {
                if (await TableExistsAsync(connection, table, ct).ConfigureAwait(false))
                {
                    present.Add(table);
                }
            }

            var adopt = present.Count > 0;
            if (adopt && (present.Count < AccessTables.Count || !earlier.ContainsKey(InitialAccessMigration)))
            {
                throw new InvalidOperationException(
                    $"The database has an unfinished earlier sign-in schema ({present.Count} of {AccessTables.Count} tables, history: {string.Join(", ", earlier.Keys)}). " +
                    "Nothing was changed. Restore the latest backup from the backups folder, or ask for help before starting again.");
            }

            var history = db.GetService<IHistoryRepository>();
            await ExecuteAsync(connection, null, history.GetCreateIfNotExistsScript(), ct).ConfigureAwait(false);
            var applied = await history.GetAppliedMigrationsAsync(ct).ConfigureAwait(false);
            await using var transaction = await connection.BeginTransactionAsync(ct).ConfigureAwait(false);
            if (adopt && !applied.Any(row => string.Equals(row.MigrationId, AccessTablesMigration, StringComparison.Ordinal)))
            {
                await ExecuteAsync(connection, transaction, history.GetInsertScript(new HistoryRow(AccessTablesMigration, earlier[InitialAccessMigration])), ct).ConfigureAwait(false);
            }

            await ExecuteAsync(connection, transaction, $"DROP TABLE \"{HistoryTable}\"", ct).ConfigureAwait(false);
            await transaction.CommitAsync(ct).ConfigureAwait(false);
            return adopt;
        }
        finally
        {
            await db.Database.CloseConnectionAsync().ConfigureAwait(false);
        }
    }

    private static async Task<bool> TableExistsAsync(DbConnection connection, string table, CancellationToken ct)
    {
        await using var command = connection.CreateCommand();
        command.CommandText = "SELECT count(*) FROM sqlite_master WHERE type = 'table' AND name = $name";
        var name = command.CreateParameter();
        name.ParameterName = "$name";
        name.Value = table;
        command.Parameters.Add(name);
        return Convert.ToInt64(await command.ExecuteScalarAsync(ct).ConfigureAwait(false), System.Globalization.CultureInfo.InvariantCulture) > 0;
    }

    private static async Task<Dictionary<string, string>> ReadHistoryAsync(DbConnection connection, CancellationToken ct)
    {
        await using var command = connection.CreateCommand();
        command.CommandText = $"SELECT \"MigrationId\", \"ProductVersion\" FROM \"{HistoryTable}\"";
        await using var reader = await command.ExecuteReaderAsync(ct).ConfigureAwait(false);
        var rows = new Dictionary<string, string>(StringComparer.Ordinal);
        while (await reader.ReadAsync(ct).ConfigureAwait(false))
        {
            rows[reader.GetString(0)] = reader.GetString(1);
        }

        return rows;
    }

    private static async Task ExecuteAsync(DbConnection connection, DbTransaction? transaction, string sql, CancellationToken ct)
    {
        await using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        await command.ExecuteNonQueryAsync(ct).ConfigureAwait(false);
    }
}
