using LowVisionAid.Data.Access;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.Extensions.Logging;

namespace LowVisionAid.Data;

/// <summary>Where the clinic's database file lives and how to open it.</summary>
public static class ClinicDatabase
{
    public const string FileName = "lowvisionaid.db";

    /// <summary>The migrations live in their own assembly so that schema history sits at the top of the repository.</summary>
    public const string MigrationsAssembly = "LowVisionAid.Migrations";

    /// <summary>The connection string for the database file in <paramref name="dataFolder"/>, creating the folder if missing.</summary>
    public static string ConnectionStringFor(string dataFolder)
    {
        Directory.CreateDirectory(dataFolder);
        return new SqliteConnectionStringBuilder
        {
            DataSource = Path.Combine(dataFolder, FileName),
            Mode = SqliteOpenMode.ReadWriteCreate,
            Cache = SqliteCacheMode.Private,
            Pooling = true,
        }.ToString();
    }

    /// <summary>The one way the context is configured: SQLite, with the migrations from <see cref="MigrationsAssembly"/>.</summary>
    public static DbContextOptionsBuilder UseClinicSqlite(this DbContextOptionsBuilder options, string connectionString)
    {
        ArgumentNullException.ThrowIfNull(options);
        // One query per Include chain (EF's default, stated so EF does not warn at each first use): a visit's goals and
        // reading speeds are a handful of rows, read in one consistent snapshot.
        return options.UseSqlite(connectionString, sqlite => sqlite.MigrationsAssembly(MigrationsAssembly).UseQuerySplittingBehavior(QuerySplittingBehavior.SingleQuery))
            // SQLite cannot drop a column or change a key in place: EF Core's SQLite provider rebuilds the table and
            // must turn foreign keys off for that outside the migration's transaction (SQLite ignores the pragma inside
            // one; sqlite.org/lang_altertable.html, "Making Other Kinds Of Table Schema Changes"). EF Core 10 warns
            // about its own rebuild step. An existing database gets a backup before any migration (DatabaseStartUp),
            // so the warning is kept in the log at Information, where a start that migrates can still be traced.
            .ConfigureWarnings(w => w.Log((RelationalEventId.NonTransactionalMigrationOperationWarning, LogLevel.Information)));
    }

    /// <summary>
    /// Brings the database to the current schema: first a database from the two-context version is recognised
    /// (<see cref="AccessHistoryUpgrade"/>), then every pending migration is applied. Use this, never
    /// <c>Database.Migrate</c> alone, wherever the app upgrades a database (start-up, restore, commands).
    /// </summary>
    public static async Task UpgradeAsync(this ClinicDbContext db, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(db);
        await AccessHistoryUpgrade.AdoptAsync(db, ct).ConfigureAwait(false);

        // Migrate also builds the whole model to compare it with the last migration's (seconds at start on a slow PC);
        // with nothing pending there is nothing to apply and nothing to fill in.
        if (!(await db.Database.GetPendingMigrationsAsync(ct).ConfigureAwait(false)).Any())
        {
            return;
        }

        await db.Database.MigrateAsync(ct).ConfigureAwait(false);
        await ClientSearch.FillMissingAsync(db, ct).ConfigureAwait(false);
    }

    /// <summary>Every migration id a LowVisionAid database may record: this build's, and the earlier separate access history's.</summary>
    public static IReadOnlySet<string> KnownMigrations(this ClinicDbContext db)
    {
        ArgumentNullException.ThrowIfNull(db);
        return db.Database.GetMigrations().Concat(AccessHistoryUpgrade.EarlierMigrations).ToHashSet(StringComparer.Ordinal);
    }
}
