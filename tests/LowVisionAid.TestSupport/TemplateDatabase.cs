using LowVisionAid.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.TestSupport;

/// <summary>
/// An empty clinic database brought to the current schema once per test run (per test process) by the app's own
/// upgrade (<see cref="ClinicDatabase.UpgradeAsync"/>), then copied into each host's data folder. The app's start
/// still runs against the copy; it finds no migration pending, so a host starts in a fraction of the time.
/// </summary>
public static class TemplateDatabase
{
    private static readonly Lazy<Task<string>> Template = new(BuildAsync, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>Copies the migrated template into <paramref name="dataFolder"/> unless a database file is already there.</summary>
    public static void CopyTo(string dataFolder)
    {
        ArgumentException.ThrowIfNullOrEmpty(dataFolder);
        var target = Path.Combine(dataFolder, ClinicDatabase.FileName);
        if (File.Exists(target))
        {
            return;
        }

        var source = Template.Value.GetAwaiter().GetResult();
        Directory.CreateDirectory(dataFolder);
        File.Copy(source, target);
    }

    private static async Task<string> BuildAsync()
    {
        var folder = Path.Combine(Path.GetTempPath(), "lva-template-" + Environment.ProcessId + "-" + Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(folder);
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicSqlite(ClinicDatabase.ConnectionStringFor(folder));
        await using (var db = new ClinicDbContext(options.Options))
        {
            await db.UpgradeAsync();
        }

        // Fold the write-ahead log into the file and close every connection, so the one file is the whole database.
        var path = Path.Combine(folder, ClinicDatabase.FileName);
        using (var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString()))
        {
            connection.Open();
            using var checkpoint = connection.CreateCommand();
            checkpoint.CommandText = "PRAGMA wal_checkpoint(TRUNCATE);";
            checkpoint.ExecuteNonQuery();
        }

        SqliteConnection.ClearAllPools();
        AppDomain.CurrentDomain.ProcessExit += (_, _) => TryDelete(folder);
        return path;
    }

    private static void TryDelete(string folder)
    {
        try
        {
            Directory.Delete(folder, recursive: true);
        }
        catch (IOException)
        {
            // Left for the system's temp cleaner.
        }
        catch (UnauthorizedAccessException)
        {
        }
    }
}
