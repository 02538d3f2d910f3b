using System.Globalization;
using LowVisionAid.Data;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// One start-up at a time per database, and recovery from a start that was killed while it migrated.
/// </summary>
/// <remarks>
/// EF Core's migration lock on SQLite is a row in <c>__EFMigrationsLock</c>, deleted only by the process that wrote
/// it, with no timeout. A start killed while migrating (power cut, SIGKILL, a closed terminal) leaves the row, and
/// every later start then waits for it forever. Start-up therefore holds an operating-system lock on a file beside the
/// database, which the OS releases when its process dies however it dies. While it is held no other start of the app
/// can be migrating this database, so a migration lock row found then was left by a killed start: it is removed.
/// On a shared PostgreSQL server the PCs of the clinic start against one database: the lock is then a session-level
/// advisory lock (postgresql.org/docs/current/explicit-locking.html#ADVISORY-LOCKS), which the server releases when the
/// holding connection ends, however its process ended; the first start migrates and the others find nothing to do.
/// </remarks>
internal sealed class StartUpLock : IAsyncDisposable
{
    /// <summary>The name of EF Core's migration lock table on SQLite (one table for every context in the file).</summary>
    public const string MigrationLockTable = "__EFMigrationsLock";

    /// <summary>Added to the database file's name for the start-up lock file, which stays in the data folder.</summary>
    public const string LockFileSuffix = ".start-lock";

    // Another start of the app on the same folder finishes its migrations and demo data well within this.
    private static readonly TimeSpan WaitLimit = TimeSpan.FromMinutes(2);
    private static readonly TimeSpan RetryDelay = TimeSpan.FromMilliseconds(100);

    /// <summary>The advisory lock key of the start-up on a server (any fixed 64-bit number the app alone uses).</summary>
    public const long ServerLockKey = 0x4C56_4153_5441_5254;   // "LVASTART"

    private readonly IAsyncDisposable _held;

    private StartUpLock(IAsyncDisposable held) => _held = held;

    /// <summary>Takes the start-up lock of the clinic database, then removes a migration lock left by a killed start.</summary>
    public static async Task<StartUpLock> TakeAsync(IServiceProvider services, ILogger logger, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(logger);
        string connectionString;
        bool server;
        await using (var scope = services.CreateAsyncScope())
        {
            var database = scope.ServiceProvider.GetRequiredService<ClinicDbContext>().Database;
            server = database.IsServer();
            connectionString = database.GetConnectionString()
                ?? throw new InvalidOperationException("The clinic database has no connection string.");
        }

        if (server)
        {
            return new StartUpLock(await TakeServerLockAsync(connectionString, ct).ConfigureAwait(false));
        }

        var databasePath = Path.GetFullPath(new SqliteConnectionStringBuilder(connectionString).DataSource);
        var file = await OpenExclusiveAsync(databasePath + LockFileSuffix, ct).ConfigureAwait(false);
        try
        {
            var released = await RemoveAbandonedMigrationLockAsync(databasePath).ConfigureAwait(false);
            if (released > 0)
            {
                AppLog.MigrationLockReleased(logger);
            }

            return new StartUpLock(file);
        }
        catch
        {
            await file.DisposeAsync().ConfigureAwait(false);
            throw;
        }
    }

    public ValueTask DisposeAsync() => _held.DisposeAsync();

    // The connection is the lock: closing it (or the process dying) releases the lock on the server.
    private static async Task<NpgsqlConnection> TakeServerLockAsync(string connectionString, CancellationToken ct)
    {
        var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(connectionString) { Pooling = false }.ConnectionString);
        try
        {
            await connection.OpenAsync(ct).ConfigureAwait(false);
            await using var command = connection.CreateCommand();
            command.CommandText = $"SET lock_timeout = '{(int)WaitLimit.TotalSeconds}s'; SELECT pg_advisory_lock({ServerLockKey.ToString(CultureInfo.InvariantCulture)})";
            await command.ExecuteNonQueryAsync(ct).ConfigureAwait(false);
            return connection;
        }
        catch (PostgresException e) when (e.SqlState == PostgresErrorCodes.LockNotAvailable)
        {
            await connection.DisposeAsync().ConfigureAwait(false);
            throw new InvalidOperationException(
                $"Another copy of LowVisionAid has been starting against the shared database for over {WaitLimit.TotalMinutes:0} minutes. " +
                "Wait for it to finish, or stop it, then start LowVisionAid again.", e);
        }
        catch
        {
            await connection.DisposeAsync().ConfigureAwait(false);
            throw;
        }
    }

    // FileShare.None takes an exclusive flock on Linux and macOS and a share lock on Windows; both end with the process.
    private static async Task<FileStream> OpenExclusiveAsync(string path, CancellationToken stopping)
    {
        var deadline = DateTime.UtcNow + WaitLimit;
        while (true)
        {
            try
            {
                return new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None, bufferSize: 1);
            }
            catch (IOException) when (DateTime.UtcNow < deadline)
            {
                await Task.Delay(RetryDelay, stopping).ConfigureAwait(false);
            }
            catch (IOException e)
            {
                throw new InvalidOperationException(
                    $"Another copy of LowVisionAid has been starting on the data folder {Path.GetDirectoryName(path)} for over {WaitLimit.TotalMinutes:0} minutes. " +
                    "Close the other copy (or restart the computer), then start LowVisionAid again.", e);
            }
        }
    }

    private static async Task<int> RemoveAbandonedMigrationLockAsync(string databasePath)
    {
        if (!File.Exists(databasePath))
        {
            return 0;
        }

        await using var connection = new SqliteConnection(new SqliteConnectionStringBuilder
        {
            DataSource = databasePath,
            Mode = SqliteOpenMode.ReadWrite,
            Pooling = false,
            DefaultTimeout = 30,
        }.ToString());
        await connection.OpenAsync().ConfigureAwait(false);
        await using var exists = connection.CreateCommand();
        exists.CommandText = $"SELECT COUNT(*) FROM sqlite_master WHERE type = 'table' AND name = '{MigrationLockTable}'";
        if (Convert.ToInt64(await exists.ExecuteScalarAsync().ConfigureAwait(false), CultureInfo.InvariantCulture) == 0)
        {
            return 0;
        }

        await using var delete = connection.CreateCommand();
        delete.CommandText = $"DELETE FROM \"{MigrationLockTable}\"";
        return await delete.ExecuteNonQueryAsync().ConfigureAwait(false);
    }
}
