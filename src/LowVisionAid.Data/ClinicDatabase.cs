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
        return options.UseSqlite(connectionString, sqlite => sqlite.MigrationsAssembly(MigrationsAssembly));
    }
}
