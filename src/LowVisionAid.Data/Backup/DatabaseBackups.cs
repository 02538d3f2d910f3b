using System.Globalization;
using System.Text.RegularExpressions;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data.Backup;

/// <summary>A backup file in the backup folder.</summary>
public sealed record BackupFile(string Path, string Name, DateTime CreatedUtc, long Bytes);

/// <summary>The verdict on a file offered for restore: fit to restore, or why not, in words for the user.</summary>
public sealed record RestoreCheck(bool CanRestore, string Message, IReadOnlyList<string> AppliedMigrations)
{
    public static RestoreCheck Refuse(string message) => new(false, message, []);
}

/// <summary>
/// Consistent copies of the live database made while the app runs (SQLite's online backup API), and restore from
/// such a copy after checking it (integrity check, then schema version against the migrations this build knows).
/// </summary>
public sealed partial class DatabaseBackups(string databasePath, string backupFolder, TimeProvider clock)
{
    public const string FilePrefix = "lowvisionaid-";
    public const string FileExtension = ".db";

    /// <summary>
    /// The migration history tables a LowVisionAid database may have: the one history (required), and the separate
    /// access history of a backup made by the earlier two-context version (upgraded after restore).
    /// </summary>
    public static IReadOnlyList<string> HistoryTables { get; } = ["__EFMigrationsHistory", Access.AccessHistoryUpgrade.HistoryTable];

    public string DatabasePath { get; } = databasePath;

    public string BackupFolder { get; } = backupFolder;

    /// <summary>
    /// Copies the live database into a new file in the backup folder, page by page through SQLite's backup API, so
    /// the copy is a consistent snapshot even while other connections write. <paramref name="reason"/> is a short
    /// tag put in the file name (letters, digits and dashes), e.g. "manual" or "before-migration".
    /// </summary>
    public BackupFile Create(string reason)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(reason);
        if (!reason.All(c => char.IsAsciiLetterOrDigit(c) || c == '-'))
        {
            throw new ArgumentException("Use letters, digits and dashes only.", nameof(reason));
        }

        Directory.CreateDirectory(BackupFolder);
        var now = clock.GetUtcNow().UtcDateTime;
        var name = string.Create(CultureInfo.InvariantCulture, $"{FilePrefix}{now:yyyyMMdd-HHmmss-fff}-{reason}{FileExtension}");
        var path = Path.Combine(BackupFolder, name);
        var partial = path + ".partial";
        Copy(DatabasePath, partial);

        // Only a finished copy gets the real name, so a crash mid-backup never leaves a file that looks complete.
        File.Move(partial, path, overwrite: false);
        return Describe(path);
    }

    /// <summary>The backups in the backup folder, newest first.</summary>
    public IReadOnlyList<BackupFile> List() => !Directory.Exists(BackupFolder)
        ? []
        : Directory.EnumerateFiles(BackupFolder, FilePrefix + "*" + FileExtension)
            .Select(Describe)
            .OrderByDescending(b => b.Name, StringComparer.Ordinal)
            .ToList();

    /// <summary>Finds a backup by its file name (never a path, so a request cannot point outside the folder).</summary>
    public BackupFile? Find(string name) => List().FirstOrDefault(b => string.Equals(b.Name, name, StringComparison.Ordinal));

    /// <summary>
    /// Checks that <paramref name="candidatePath"/> is an intact LowVisionAid database that this build can open:
    /// SQLite's integrity check passes; its migration history names this app's migrations in their order (a backup
    /// from a newer version is refused as newer, one naming anything else as not made by LowVisionAid); and every
    /// table, column, index, foreign key, trigger and view is exactly what this app's migrations create for the
    /// version its history names (<see cref="DatabaseSchema"/>). An older version is upgraded by the restore.
    /// </summary>
    public static RestoreCheck Check(string candidatePath, IReadOnlySet<string> knownMigrations)
    {
        ArgumentNullException.ThrowIfNull(knownMigrations);
        if (!File.Exists(candidatePath))
        {
            return RestoreCheck.Refuse("The backup file was not found. Choose a file from the list.");
        }

        try
        {
            using var connection = Sqlite.Open(candidatePath, SqliteOpenMode.ReadOnly);
            var integrity = Scalar(connection, "PRAGMA integrity_check");
            if (!string.Equals(integrity, "ok", StringComparison.Ordinal))
            {
                return RestoreCheck.Refuse($"The backup file is damaged (SQLite integrity check: {Shorten(integrity)}). Choose another backup.");
            }

            return CheckHistoryAndSchema(connection, knownMigrations);
        }
        catch (SqliteException e)
        {
            return RestoreCheck.Refuse($"This file cannot be read as a LowVisionAid database (SQLite error {e.SqliteErrorCode}). Choose a backup made by LowVisionAid.");
        }
    }

    /// <summary>
    /// Replaces the live database with <paramref name="candidatePath"/> if <see cref="Check"/> accepts it. The file is
    /// first copied into a working file (so it cannot change between check and restore), checked there, and, when it
    /// is from an older version, upgraded there and checked again against the current schema. Only then is a backup
    /// of the live database taken ("before-restore") and the working file copied into the live file through SQLite's
    /// backup API, in one write transaction: connections held by the running app see the restored data, and a copy
    /// that fails leaves the live file as it was. Any failure is a refusal in words; nothing is changed.
    /// </summary>
    public async Task<RestoreCheck> RestoreAsync(string candidatePath, IReadOnlySet<string> knownMigrations, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(knownMigrations);
        if (!File.Exists(candidatePath))
        {
            return Check(candidatePath, knownMigrations);
        }

        Directory.CreateDirectory(BackupFolder);
        var work = Path.Combine(BackupFolder, "restore-" + Guid.NewGuid().ToString("N") + ".partial");
        try
        {
            try
            {
                Copy(candidatePath, work);
            }
            catch (SqliteException)
            {
                return Check(candidatePath, knownMigrations);
            }

            var check = Check(work, knownMigrations);
            if (!check.CanRestore)
            {
                return check;
            }

            var latest = Ordered(knownMigrations)[^1];
            if (!string.Equals(check.AppliedMigrations.LastOrDefault(m => !Access.AccessHistoryUpgrade.EarlierMigrations.Contains(m)), latest, StringComparison.Ordinal))
            {
                await UpgradeAsync(work, ct).ConfigureAwait(false);
                var differences = DatabaseSchema.Differences(DatabaseSchema.Read(work), DatabaseSchema.AtMigration(latest));
                if (differences.Count > 0)
                {
                    return RestoreCheck.Refuse(SchemaRefusal("after its upgrade to the current version", differences));
                }
            }

            Create("before-restore");
            using (var source = Sqlite.Open(work, SqliteOpenMode.ReadOnly))
            using (var live = Sqlite.Open(DatabasePath, SqliteOpenMode.ReadWrite))
            {
                source.BackupDatabase(live);
            }

            return check;
        }
        catch (Exception e) when (e is SqliteException or InvalidOperationException or IOException or DbUpdateException)
        {
            return RestoreCheck.Refuse(FailureMessage(e));
        }
        finally
        {
            SqliteConnection.ClearAllPools();
            foreach (var leftover in new[] { work, work + "-journal", work + "-wal", work + "-shm" })
            {
                File.Delete(leftover);
            }
        }
    }

    /// <summary>The refusal for a restore that failed part way, with the reason and what to do.</summary>
    public static string FailureMessage(Exception error)
    {
        ArgumentNullException.ThrowIfNull(error);
        var reason = error is SqliteException { SqliteErrorCode: 5 or 6 }
            ? $"the database stayed busy with other saves for over {Sqlite.BusyWait.TotalSeconds:0} seconds"
            : error is SqliteException sqlite
                ? $"SQLite error {sqlite.SqliteErrorCode}"
                : "the file could not be prepared";
        return $"The backup was not restored: {reason}. Nothing was changed. Try again when no one is saving; if it happens again, keep the file and the app's log and ask for help.";
    }

    private static RestoreCheck CheckHistoryAndSchema(SqliteConnection connection, IReadOnlySet<string> knownMigrations)
    {
        var history = HistoryTables[0];
        var earlierHistory = HistoryTables[1];
        if (Scalar(connection, $"SELECT name FROM sqlite_master WHERE type = 'table' AND name = '{history}'") is null)
        {
            return RestoreCheck.Refuse("This file is not a LowVisionAid database (it has no schema history). Choose a backup made by LowVisionAid.");
        }

        var applied = Column(connection, $"SELECT \"MigrationId\" FROM \"{history}\" ORDER BY \"MigrationId\"");
        var twoContext = Scalar(connection, $"SELECT name FROM sqlite_master WHERE type = 'table' AND name = '{earlierHistory}'") is not null;
        var earlier = twoContext ? Column(connection, $"SELECT \"MigrationId\" FROM \"{earlierHistory}\" ORDER BY \"MigrationId\"") : [];
        var ordered = Ordered(knownMigrations);
        var unknown = applied.Concat(earlier).Where(m => !knownMigrations.Contains(m)).ToList();
        var newer = unknown.Where(m => MigrationId().IsMatch(m) && string.CompareOrdinal(m, ordered[^1]) > 0).ToList();
        if (unknown.Count > 0 && newer.Count == unknown.Count && applied.Except(newer).SequenceEqual(ordered) && !twoContext)
        {
            return RestoreCheck.Refuse($"This backup was made by a newer version of LowVisionAid (its schema has {newer.Count} change(s) this version does not know, such as {newer[0]}). Restore it with that version or a newer one. Nothing was changed.");
        }

        var inOrder = applied.Count > 0 && applied.SequenceEqual(ordered.Take(applied.Count));
        var earlierFits = !twoContext || (earlier.SequenceEqual(Access.AccessHistoryUpgrade.EarlierMigrations) && !applied.Contains(Access.AccessHistoryUpgrade.AccessTablesMigration));
        if (unknown.Count > 0 || !inOrder || !earlierFits)
        {
            var named = unknown.Count > 0 ? $"names {unknown.Count} change(s) LowVisionAid never made, such as {Shorten(unknown[0])}" : "does not list LowVisionAid's changes in the order it makes them";
            return RestoreCheck.Refuse($"This file was not made by LowVisionAid: its schema history {named}. Nothing was changed. Choose a backup made by LowVisionAid.");
        }

        var version = applied[^1];
        var expected = twoContext ? DatabaseSchema.AtEarlierTwoContextMigration(version) : DatabaseSchema.AtMigration(version);
        var differences = DatabaseSchema.Differences(DatabaseSchema.Read(connection), expected);
        if (differences.Count > 0)
        {
            return RestoreCheck.Refuse(SchemaRefusal($"for the version its history names ({version})", differences));
        }

        var missing = ordered.Count(m => !applied.Contains(m));
        return new RestoreCheck(true, missing == 0
            ? "The backup is intact and has the current schema."
            : $"The backup is intact; its schema is older and will be upgraded ({missing} change(s)) after restore.", [.. applied, .. earlier]);
    }

    private static string SchemaRefusal(string which, IReadOnlyList<string> differences)
    {
        const int shown = 8;
        var list = string.Join("; ", differences.Take(shown)) + (differences.Count > shown ? $"; and {differences.Count - shown} more" : "");
        return $"This backup was not restored: its schema is not the one LowVisionAid makes {which}. Differences: {list}. " +
            "Nothing was changed. Restore a backup LowVisionAid made and that no other program has changed.";
    }

    private static List<string> Ordered(IReadOnlySet<string> knownMigrations) =>
        knownMigrations.Where(m => !Access.AccessHistoryUpgrade.EarlierMigrations.Contains(m)).Order(StringComparer.Ordinal).ToList();

    private static void Copy(string from, string to)
    {
        using var source = Sqlite.Open(from, SqliteOpenMode.ReadOnly);
        using var copy = Sqlite.Open(to, SqliteOpenMode.ReadWriteCreate);
        source.BackupDatabase(copy);
        using var journal = copy.CreateCommand();
        journal.CommandText = "PRAGMA journal_mode=DELETE";
        journal.ExecuteNonQuery();
    }

    private static async Task UpgradeAsync(string path, CancellationToken ct)
    {
        await using var db = Sqlite.Context(path);
        await db.UpgradeAsync(ct).ConfigureAwait(false);
    }

    /// <summary>The result of SQLite's integrity check on the database at <paramref name="path"/> ("ok" when intact).</summary>
    public static string IntegrityCheck(string path)
    {
        using var connection = Sqlite.Open(path, SqliteOpenMode.ReadOnly);
        return Scalar(connection, "PRAGMA integrity_check") ?? "no answer";
    }

    private static string? Scalar(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return command.ExecuteScalar() is { } value ? Convert.ToString(value, CultureInfo.InvariantCulture) : null;
    }

    private static List<string> Column(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var values = new List<string>();
        while (reader.Read())
        {
            values.Add(reader.GetString(0));
        }

        return values;
    }

    private static string Shorten(string? text) => text is null ? "no answer" : text.Length <= 120 ? text : text[..120] + "…";

    private static BackupFile Describe(string path)
    {
        var info = new FileInfo(path);
        return new BackupFile(path, info.Name, info.LastWriteTimeUtc, info.Length);
    }

    [GeneratedRegex(@"^[0-9]{14}_[A-Za-z0-9_]+$")]
    private static partial Regex MigrationId();
}
