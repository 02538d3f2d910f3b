using LowVisionAid.Data.Access;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.Extensions.Logging;
using Npgsql;

namespace LowVisionAid.Data;

/// <summary>Which database holds the clinic: the embedded SQLite file (the default), or a shared PostgreSQL server.</summary>
public enum DatabaseProvider
{
    /// <summary>One file in the app's data folder, on one PC.</summary>
    Sqlite,

    /// <summary>A PostgreSQL server that several PCs of the clinic use at once (docs/deployment.md).</summary>
    PostgreSql,
}

/// <summary>Where the clinic's database lives and how to open it, on either provider.</summary>
public static class ClinicDatabase
{
    public const string FileName = "lowvisionaid.db";

    /// <summary>The SQLite migrations live in their own assembly so that schema history sits at the top of the repository.</summary>
    public const string MigrationsAssembly = "LowVisionAid.Migrations";

    /// <summary>The PostgreSQL migrations: the same model, its own history (EF Core keeps one migration set per provider).</summary>
    public const string ServerMigrationsAssembly = "LowVisionAid.Migrations.PostgreSql";

    /// <summary>The case-insensitive collation of codes on PostgreSQL (ICU, strength 2: "ab-1" equals "AB-1"); SQLite uses NOCASE.</summary>
    public const string ServerCaseInsensitiveCollation = "lva_case_insensitive";

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

    /// <summary>The PostgreSQL provider with the server migrations, for a clinic on a shared server.</summary>
    public static DbContextOptionsBuilder UseClinicServer(this DbContextOptionsBuilder options, string connectionString)
    {
        ArgumentNullException.ThrowIfNull(options);
        return options.UseNpgsql(connectionString, npgsql => npgsql.MigrationsAssembly(ServerMigrationsAssembly).UseQuerySplittingBehavior(QuerySplittingBehavior.SingleQuery));
    }

    /// <summary>The context options for <paramref name="provider"/>: the SQLite file's connection string, or the server's.</summary>
    public static DbContextOptionsBuilder UseClinicDatabase(this DbContextOptionsBuilder options, DatabaseProvider provider, string connectionString) =>
        provider switch
        {
            DatabaseProvider.Sqlite => options.UseClinicSqlite(connectionString),
            DatabaseProvider.PostgreSql => options.UseClinicServer(connectionString),
            _ => throw new ArgumentOutOfRangeException(nameof(provider), provider, "Use Sqlite or PostgreSql."),
        };

    /// <summary>True when the clinic is on a shared PostgreSQL server rather than its own SQLite file.</summary>
    public static bool IsServer(this DatabaseFacade database) => database.IsNpgsql();

    /// <summary>True when a save broke a unique index (a code already taken), on either provider.</summary>
    public static bool IsDuplicateKey(this DbUpdateException error) =>
        error?.InnerException is SqliteException { SqliteExtendedErrorCode: 2067 } or PostgresException { SqlState: PostgresErrorCodes.UniqueViolation };

    /// <summary>
    /// What is wrong with a PostgreSQL connection string given as <paramref name="setting"/>, said as what to type instead;
    /// null when it names a server and a database. Never echoes the value (it may hold a password).
    /// </summary>
    public static string? ServerConnectionProblem(string connectionString, string setting)
    {
        try
        {
            var server = new NpgsqlConnectionStringBuilder(connectionString);
            return string.IsNullOrWhiteSpace(server.Host) || string.IsNullOrWhiteSpace(server.Database)
                ? $"{setting} must name the server and the database, such as Host=clinic-server;Database=lowvisionaid;Username=lowvisionaid."
                : null;
        }
        catch (ArgumentException)
        {
            return $"{setting} is not a PostgreSQL connection string. Give Key=Value pairs separated by ';', such as Host=clinic-server;Database=lowvisionaid;Username=lowvisionaid.";
        }
    }

    /// <summary>
    /// Where the database is, for people and logs: the file, or the server's host, port and database. Never the password.
    /// </summary>
    public static string Describe(DatabaseProvider provider, string connectionString) =>
        provider == DatabaseProvider.PostgreSql
            ? new NpgsqlConnectionStringBuilder(connectionString) is var server
                ? $"PostgreSQL database {server.Database} on {server.Host}:{server.Port}"
                : ""
            : "SQLite file " + new SqliteConnectionStringBuilder(connectionString).DataSource;

    /// <summary>
    /// Brings the database to the current schema: first a database from the two-context version is recognised
    /// (<see cref="AccessHistoryUpgrade"/>), then every pending migration is applied. Use this, never
    /// <c>Database.Migrate</c> alone, wherever the app upgrades a database (start-up, restore, commands).
    /// </summary>
    public static async Task UpgradeAsync(this ClinicDbContext db, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(db);
        await db.EnsureMigrationHistoryAsync(ct).ConfigureAwait(false);
        if (!db.Database.IsServer())
        {
            await AccessHistoryUpgrade.AdoptAsync(db, ct).ConfigureAwait(false);   // only SQLite files predate the one context
        }

        // Migrate also builds the whole model to compare it with the last migration's (seconds at start on a slow PC);
        // with nothing pending there is nothing to apply and nothing to fill in.
        if (!(await db.Database.GetPendingMigrationsAsync(ct).ConfigureAwait(false)).Any())
        {
            return;
        }

        await db.Database.MigrateAsync(ct).ConfigureAwait(false);
        await ClientSearch.FillMissingAsync(db, ct).ConfigureAwait(false);
    }

    /// <summary>
    /// Makes the migration history table on a new server database before anything asks what was applied: EF Core's
    /// PostgreSQL provider otherwise tries its query on a database without the table, and each try is logged as a failed
    /// command. Nothing to do on SQLite (whose provider looks for the table first) or on a database already set up.
    /// </summary>
    public static async Task EnsureMigrationHistoryAsync(this ClinicDbContext db, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(db);
        if (db.Database.IsServer())
        {
            await db.GetService<Microsoft.EntityFrameworkCore.Migrations.IHistoryRepository>().CreateIfNotExistsAsync(ct).ConfigureAwait(false);
        }
    }

    /// <summary>Every migration id a LowVisionAid database may record: this build's, and the earlier separate access history's.</summary>
    public static IReadOnlySet<string> KnownMigrations(this ClinicDbContext db)
    {
        ArgumentNullException.ThrowIfNull(db);
        return db.Database.GetMigrations().Concat(AccessHistoryUpgrade.EarlierMigrations).ToHashSet(StringComparer.Ordinal);
    }
}
