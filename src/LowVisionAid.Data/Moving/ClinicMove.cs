using System.Data.Common;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Storage;
using Npgsql;

namespace LowVisionAid.Data.Moving;

/// <summary>How a move ended.</summary>
public enum MoveOutcome
{
    /// <summary>Every row copied and checked; the server holds the clinic.</summary>
    Moved,

    /// <summary>Nothing was copied: the source or the target is not fit for a move (the message says why and what to do).</summary>
    Refused,

    /// <summary>The copy failed or a check differed: rolled back, the target holds no row.</summary>
    Failed,
}

/// <summary>One table's count and checksum as read from the SQLite file and as read back from the server.</summary>
public sealed record TableCheck(string Table, long SourceRows, string SourceChecksum, long TargetRows, string TargetChecksum)
{
    public bool Matches => SourceRows == TargetRows && string.Equals(SourceChecksum, TargetChecksum, StringComparison.Ordinal);
}

/// <summary>What a move did: its outcome, a sentence for the person running it, and each table's check (empty when refused).</summary>
public sealed record MoveReport(MoveOutcome Outcome, string Message, IReadOnlyList<TableCheck> Tables);

/// <summary>
/// Moves a clinic from its SQLite file to an empty PostgreSQL database: the file is opened read-only and never
/// written; the server database is brought to the current schema, refused if any table of the model already holds a
/// row, then filled in one transaction, every table of the model with its keys as they were (clinic records, accounts
/// and roles, the audit trail), the identity sequences set past the highest key, and each table's count and checksum
/// (<see cref="TableChecksum"/>) read back and compared before the transaction commits. Any difference or error
/// rolls the whole copy back. Connection strings are never part of a message (<see cref="ClinicDatabase.Describe"/>).
/// </summary>
public static class ClinicMove
{
    // A PostgreSQL statement takes at most 65,535 parameters; batches stay well below that.
    private const int ParametersPerInsert = 10_000;

    private static readonly HashSet<string> MigrationTables = new(StringComparer.Ordinal) { "__EFMigrationsHistory", "__EFMigrationsLock" };

    public static async Task<MoveReport> ToServerAsync(string sqliteFile, string serverConnectionString, CancellationToken ct = default)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(sqliteFile);
        ArgumentException.ThrowIfNullOrWhiteSpace(serverConnectionString);
        var server = ClinicDatabase.Describe(DatabaseProvider.PostgreSql, serverConnectionString);
        if (!File.Exists(sqliteFile))
        {
            return Refused($"There is no clinic database at {sqliteFile}. Give the data folder that holds {ClinicDatabase.FileName} (--DataFolder <folder>).");
        }

        await using var source = Context(DatabaseProvider.Sqlite, ReadOnly(sqliteFile));
        if (await SourceProblemAsync(source, sqliteFile, ct).ConfigureAwait(false) is { } problem)
        {
            return Refused(problem);
        }

        await using var target = Context(DatabaseProvider.PostgreSql, serverConnectionString);
        var tables = ModelTable.InForeignKeyOrder(source.Model);
        try
        {
            await target.Database.OpenConnectionAsync(ct).ConfigureAwait(false);
            var others = await OtherTablesAsync(target, tables, ct).ConfigureAwait(false);
            if (others.Count > 0)
            {
                return Refused($"{server} holds tables that are not LowVisionAid's ({string.Join(", ", others.Take(5))}); nothing was copied. Move into a new, empty database.");
            }

            await target.UpgradeAsync(ct).ConfigureAwait(false);
            var holding = await TablesWithRowsAsync(target, tables, ct).ConfigureAwait(false);
            if (holding.Count > 0)
            {
                return Refused(
                    $"{server} already holds rows ({string.Join(", ", holding)}); nothing was copied and nothing there was changed. " +
                    "Move into a new, empty database; if this one holds nothing you need, drop it and create it again.");
            }
        }
        catch (NpgsqlException e)
        {
            // Npgsql's messages name the host, the database and the server's error, never the password.
            return Refused($"{server} cannot be used: {e.Message}. Nothing was copied. Check the server's name and port, that the database exists (create it, empty, first) and the user's password.");
        }

        try
        {
            return await CopyAsync(source, target, tables, server, ct).ConfigureAwait(false);
        }
        catch (NpgsqlException e)
        {
            return new MoveReport(MoveOutcome.Failed, $"The copy to {server} failed: {e.Message}. It was rolled back; nothing was kept on the server.", []);
        }
    }

    /// <summary>The connection string that opens <paramref name="sqliteFile"/> read-only (SQLite refuses every write on it), unpooled.</summary>
    public static string ReadOnly(string sqliteFile) =>
        new SqliteConnectionStringBuilder { DataSource = sqliteFile, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString();

    private static ClinicDbContext Context(DatabaseProvider provider, string connectionString)
    {
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicDatabase(provider, connectionString);
        return new ClinicDbContext(options.Options);
    }

    private static MoveReport Refused(string message) => new(MoveOutcome.Refused, message, []);

    // The file must hold a clinic at this version's schema: it is only read, so an older one cannot be upgraded here.
    private static async Task<string?> SourceProblemAsync(ClinicDbContext source, string sqliteFile, CancellationToken ct)
    {
        try
        {
            if (!(await source.Database.GetAppliedMigrationsAsync(ct).ConfigureAwait(false)).Any())
            {
                return $"{sqliteFile} holds no clinic (no LowVisionAid tables). Give the data folder of the clinic to move (--DataFolder <folder>).";
            }

            return (await source.Database.GetPendingMigrationsAsync(ct).ConfigureAwait(false)).Any()
                ? $"{sqliteFile} was last opened by an earlier version of LowVisionAid. Start this version once on it (it backs the file up and upgrades it), stop it, then run the move again."
                : null;
        }
        catch (SqliteException e)
        {
            return $"{sqliteFile} cannot be read as a SQLite database: {e.Message}";
        }
    }

    // Tables of another application in the target database: the move never mixes a clinic into someone else's data.
    private static async Task<List<string>> OtherTablesAsync(ClinicDbContext target, IReadOnlyList<ModelTable> tables, CancellationToken ct)
    {
        var ours = tables.Select(t => (t.Schema ?? "public", t.Name)).ToHashSet();
        var others = new List<string>();
        await using var command = target.Database.GetDbConnection().CreateCommand();
        command.CommandText = "SELECT table_schema, table_name FROM information_schema.tables WHERE table_schema NOT IN ('pg_catalog', 'information_schema') ORDER BY 1, 2";
        await using var reader = await command.ExecuteReaderAsync(ct).ConfigureAwait(false);
        while (await reader.ReadAsync(ct).ConfigureAwait(false))
        {
            var (schema, name) = (reader.GetString(0), reader.GetString(1));
            if (!ours.Contains((schema, name)) && !MigrationTables.Contains(name))
            {
                others.Add(schema + "." + name);
            }
        }

        return others;
    }

    private static async Task<List<string>> TablesWithRowsAsync(ClinicDbContext target, IReadOnlyList<ModelTable> tables, CancellationToken ct)
    {
        var sql = target.GetService<ISqlGenerationHelper>();
        var holding = new List<string>();
        foreach (var table in tables)
        {
            await using var command = target.Database.GetDbConnection().CreateCommand();
#pragma warning disable CA2100 // The table name comes from the EF model, delimited by the provider.
            command.CommandText = $"SELECT COUNT(*) FROM {sql.DelimitIdentifier(table.Name, table.Schema)}";
#pragma warning restore CA2100
            var rows = Convert.ToInt64(await command.ExecuteScalarAsync(ct).ConfigureAwait(false), System.Globalization.CultureInfo.InvariantCulture);
            if (rows > 0)
            {
                holding.Add($"{table.Name}: {rows}");
            }
        }

        return holding;
    }

    private static async Task<MoveReport> CopyAsync(ClinicDbContext source, ClinicDbContext target, IReadOnlyList<ModelTable> tables, string server, CancellationToken ct)
    {
        await using var transaction = await target.Database.BeginTransactionAsync(ct).ConfigureAwait(false);
        var into = tables.Select(t => ModelTable.Like(target.Model, t)).ToList();
        var sent = new List<TableChecksum>();
        for (var i = 0; i < tables.Count; i++)
        {
            try
            {
                sent.Add(await CopyTableAsync(source, target, tables[i], into[i], ct).ConfigureAwait(false));
            }
            catch (NpgsqlException e)
            {
                var reason = e is PostgresException refused ? refused.MessageText : e.Message;
                return new MoveReport(MoveOutcome.Failed, $"Copying {tables[i].Name} to {server} failed: {reason}. The copy was rolled back; nothing was kept on the server.", []);
            }
        }

        var checks = new List<TableCheck>();
        for (var i = 0; i < tables.Count; i++)
        {
            var back = new TableChecksum();
            await foreach (var row in into[i].ReadAsync(target).WithCancellation(ct).ConfigureAwait(false))
            {
                back.Add(into[i].Properties, row);
            }

            checks.Add(new TableCheck(tables[i].Name, sent[i].Rows, sent[i].Hex, back.Rows, back.Hex));
        }

        if (checks.Any(c => !c.Matches))
        {
            await transaction.RollbackAsync(ct).ConfigureAwait(false);
            return new MoveReport(MoveOutcome.Failed, $"What {server} read back differs from the file in {string.Join(", ", checks.Where(c => !c.Matches).Select(c => c.Table))}. The copy was rolled back; nothing was kept on the server.", checks);
        }

        await transaction.CommitAsync(ct).ConfigureAwait(false);
        return new MoveReport(MoveOutcome.Moved, $"Moved {checks.Sum(c => c.TargetRows)} rows in {checks.Count} tables to {server}; every count and checksum is the same.", checks);
    }

    // Reads the table from the file through the model and writes it to the server through the server model's own
    // type mappings (so a power, an enum or a time is stored as the app on the server stores it), in batches.
    private static async Task<TableChecksum> CopyTableAsync(ClinicDbContext source, ClinicDbContext target, ModelTable from, ModelTable into, CancellationToken ct)
    {
        var sent = new TableChecksum();
        var batch = new List<object?[]>();
        var rowsPerInsert = Math.Max(1, ParametersPerInsert / into.Properties.Count);
        await foreach (var row in from.ReadAsync(source).WithCancellation(ct).ConfigureAwait(false))
        {
            sent.Add(from.Properties, row);
            batch.Add(row);
            if (batch.Count == rowsPerInsert)
            {
                await InsertAsync(target, into, batch, ct).ConfigureAwait(false);
                batch.Clear();
            }
        }

        if (batch.Count > 0)
        {
            await InsertAsync(target, into, batch, ct).ConfigureAwait(false);
        }

        await ResetSequencesAsync(target, into, ct).ConfigureAwait(false);
        return sent;
    }

    private static async Task InsertAsync(ClinicDbContext target, ModelTable table, List<object?[]> rows, CancellationToken ct)
    {
        var sql = target.GetService<ISqlGenerationHelper>();
        await using var command = NewCommand(target);
        var columns = string.Join(", ", table.Properties.Select(p => sql.DelimitIdentifier(table.ColumnOf(p))));
        var values = new List<string>(rows.Count);
        foreach (var row in rows)
        {
            var names = new string[table.Properties.Count];
            for (var i = 0; i < names.Length; i++)
            {
                var property = table.Properties[i];
                names[i] = "@p" + command.Parameters.Count.ToString(System.Globalization.CultureInfo.InvariantCulture);
                var value = row[i] is DateTimeOffset time ? time.ToUniversalTime() : row[i];   // timestamptz takes offset 0 only
                command.Parameters.Add(property.GetRelationalTypeMapping().CreateParameter(command, names[i], value, property.IsNullable));
            }

            values.Add("(" + string.Join(", ", names) + ")");
        }

#pragma warning disable CA2100 // Table and column names come from the EF model, delimited by the provider; every value is a parameter.
        command.CommandText = $"INSERT INTO {sql.DelimitIdentifier(table.Name, table.Schema)} ({columns}) VALUES {string.Join(", ", values)}";
#pragma warning restore CA2100
        await command.ExecuteNonQueryAsync(ct).ConfigureAwait(false);
    }

    // The copied rows kept their keys; the identity sequence behind each generated integer key must continue after the
    // highest of them, or the first client added on the server would take key 1 again.
    private static async Task ResetSequencesAsync(ClinicDbContext target, ModelTable table, CancellationToken ct)
    {
        var sql = target.GetService<ISqlGenerationHelper>();
        var keys = table.EntityType.FindPrimaryKey()?.Properties
            .Where(p => p.ClrType == typeof(int) || p.ClrType == typeof(long) || p.ClrType == typeof(short)) ?? [];
        foreach (var key in keys)
        {
            var tableName = sql.DelimitIdentifier(table.Name, table.Schema);
            var column = table.ColumnOf(key);
            await using var command = NewCommand(target);
#pragma warning disable CA2100 // Table and column names come from the EF model, delimited by the provider.
            command.CommandText =
                $"SELECT setval(pg_get_serial_sequence(@table, @column), COALESCE((SELECT MAX({sql.DelimitIdentifier(column)}) FROM {tableName}), 0) + 1, false)";
#pragma warning restore CA2100
            command.Parameters.Add(new NpgsqlParameter("table", tableName));
            command.Parameters.Add(new NpgsqlParameter("column", column));
            await command.ExecuteNonQueryAsync(ct).ConfigureAwait(false);   // no sequence (a key the app sets itself): setval(NULL, …) is NULL
        }
    }

    private static DbCommand NewCommand(ClinicDbContext target)
    {
        var command = target.Database.GetDbConnection().CreateCommand();
        command.Transaction = target.Database.CurrentTransaction?.GetDbTransaction();
        return command;
    }
}
