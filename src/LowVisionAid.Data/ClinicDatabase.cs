using LowVisionAid.Data.Access;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

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
        return options.UseSqlite(connectionString, sqlite => sqlite.MigrationsAssembly(MigrationsAssembly).UseQuerySplittingBehavior(QuerySplittingBehavior.SingleQuery));
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
        await db.Database.MigrateAsync(ct).ConfigureAwait(false);
    }

    /// <summary>Every migration id a LowVisionAid database may record: this build's, and the earlier separate access history's.</summary>
    public static IReadOnlySet<string> KnownMigrations(this ClinicDbContext db)
    {
        ArgumentNullException.ThrowIfNull(db);
        return db.Database.GetMigrations().Concat(AccessHistoryUpgrade.EarlierMigrations).ToHashSet(StringComparer.Ordinal);
    }
}
