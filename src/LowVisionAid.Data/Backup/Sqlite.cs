using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Data.Backup;

/// <summary>Connections for backup and restore: unpooled, and waiting for a lock as SQLite itself waits.</summary>
internal static class Sqlite
{
    /// <summary>How long a backup or restore waits for another connection's lock before it gives up.</summary>
    public static readonly TimeSpan BusyWait = TimeSpan.FromSeconds(30);

    /// <summary>
    /// Opens <paramref name="path"/> and sets SQLite's own busy timeout on the connection. Microsoft.Data.Sqlite's
    /// <c>DefaultTimeout</c> only retries the commands it runs; SQLite's backup API (<c>BackupDatabase</c>) takes its
    /// locks itself and, without this, answers "database is locked" (error 5) at once when a writer holds the file
    /// for a moment.
    /// </summary>
    public static SqliteConnection Open(string path, SqliteOpenMode mode)
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = path,
            Mode = mode,
            Pooling = false,
            DefaultTimeout = (int)BusyWait.TotalSeconds,
        }.ToString());
        connection.Open();
        using var busy = connection.CreateCommand();
        busy.CommandText = $"PRAGMA busy_timeout = {(int)BusyWait.TotalMilliseconds}";
        busy.ExecuteNonQuery();
        return connection;
    }

    /// <summary>A clinic context (configured as the app configures it, without the audit trail) on a file that is not the live database.</summary>
    public static ClinicDbContext Context(string path)
    {
        var builder = new DbContextOptionsBuilder<ClinicDbContext>();
        builder.UseClinicSqlite(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        return new ClinicDbContext(builder.Options);
    }
}
