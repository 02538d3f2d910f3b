using System.Globalization;
using Microsoft.Data.Sqlite;

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
public sealed class DatabaseBackups(string databasePath, string backupFolder, TimeProvider clock)
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
        using (var source = Open(DatabasePath, SqliteOpenMode.ReadOnly))
        using (var copy = Open(partial, SqliteOpenMode.ReadWriteCreate))
        {
            source.BackupDatabase(copy);
            using var journal = copy.CreateCommand();
            journal.CommandText = "PRAGMA journal_mode=DELETE";
            journal.ExecuteNonQuery();
        }

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
    /// SQLite's integrity check passes, the clinic migration history is present, and every migration it records is
    /// one this build knows (a backup from a newer version is refused; an older one is upgraded after restore).
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
            using var connection = Open(candidatePath, SqliteOpenMode.ReadOnly);
            var integrity = Scalar(connection, "PRAGMA integrity_check");
            if (!string.Equals(integrity, "ok", StringComparison.Ordinal))
            {
                return RestoreCheck.Refuse($"The backup file is damaged (SQLite integrity check: {Shorten(integrity)}). Choose another backup.");
            }

            var applied = new List<string>();
            foreach (var table in HistoryTables)
            {
                if (Scalar(connection, $"SELECT name FROM sqlite_master WHERE type = 'table' AND name = '{table}'") is null)
                {
                    if (table == HistoryTables[0])
                    {
                        return RestoreCheck.Refuse("This file is not a LowVisionAid database (it has no schema history). Choose a backup made by LowVisionAid.");
                    }

                    continue;
                }

                applied.AddRange(Column(connection, $"SELECT \"MigrationId\" FROM \"{table}\" ORDER BY \"MigrationId\""));
            }

            var unknown = applied.Where(m => !knownMigrations.Contains(m)).ToList();
            if (unknown.Count > 0)
            {
                return RestoreCheck.Refuse($"This backup was made by a newer version of LowVisionAid (its schema has {unknown.Count} change(s) this version does not know, such as {unknown[0]}). Restore it with that version or a newer one.");
            }

            var missing = knownMigrations.Count(m => !applied.Contains(m) && !Access.AccessHistoryUpgrade.EarlierMigrations.Contains(m));
            return new RestoreCheck(true, missing == 0
                ? "The backup is intact and has the current schema."
                : $"The backup is intact; its schema is older and will be upgraded ({missing} change(s)) after restore.", applied);
        }
        catch (SqliteException e)
        {
            return RestoreCheck.Refuse($"This file cannot be read as a LowVisionAid database (SQLite error {e.SqliteErrorCode}). Choose a backup made by LowVisionAid.");
        }
    }

    /// <summary>
    /// Replaces the live database with <paramref name="candidatePath"/> after <see cref="Check"/> accepts it, first
    /// taking a backup of the live database ("before-restore"). The copy goes through SQLite's backup API into the
    /// live file, so connections held by the running app see the restored data and the file is never half-written.
    /// The caller applies any pending migrations afterwards.
    /// </summary>
    public RestoreCheck Restore(string candidatePath, IReadOnlySet<string> knownMigrations)
    {
        var check = Check(candidatePath, knownMigrations);
        if (!check.CanRestore)
        {
            return check;
        }

        Create("before-restore");
        using (var source = Open(candidatePath, SqliteOpenMode.ReadOnly))
        using (var live = Open(DatabasePath, SqliteOpenMode.ReadWrite))
        {
            source.BackupDatabase(live);
        }

        SqliteConnection.ClearAllPools();
        return check;
    }

    /// <summary>The result of SQLite's integrity check on the database at <paramref name="path"/> ("ok" when intact).</summary>
    public static string IntegrityCheck(string path)
    {
        using var connection = Open(path, SqliteOpenMode.ReadOnly);
        return Scalar(connection, "PRAGMA integrity_check") ?? "no answer";
    }

    private static SqliteConnection Open(string path, SqliteOpenMode mode)
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = mode,
            Pooling = false,
            DefaultTimeout = 30,
        }.ToString());
        connection.Open();
        return connection;
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
}
