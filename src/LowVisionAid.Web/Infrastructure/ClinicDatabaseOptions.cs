using LowVisionAid.Data;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// Which database holds the clinic, from configuration section <c>Database</c> (appsettings.json lists it): the SQLite
/// file in the data folder (the default), or a shared PostgreSQL server named by its connection string.
/// </summary>
public sealed class ClinicDatabaseOptions
{
    public const string Section = "Database";

    /// <summary><c>Sqlite</c> (default) or <c>PostgreSql</c>.</summary>
    public string Provider { get; set; } = nameof(DatabaseProvider.Sqlite);

    /// <summary>The server's connection string (PostgreSql only; the SQLite file is always the data folder's).</summary>
    public string? ConnectionString { get; set; }

    /// <summary>The provider named by <see cref="Provider"/>, or null when it names none.</summary>
    public DatabaseProvider? ParsedProvider =>
        Enum.TryParse<DatabaseProvider>(Provider?.Trim(), ignoreCase: true, out var provider) && Enum.IsDefined(provider) ? provider : null;

    /// <summary>True when the clinic is on a shared server (then sign-in is always required).</summary>
    public bool IsServer => ParsedProvider == DatabaseProvider.PostgreSql;

    /// <summary>What is wrong with the settings, said as what to type instead; null when they are usable.</summary>
    public string? Problem()
    {
        if (ParsedProvider is not { } provider)
        {
            return $"Database:Provider is \"{Provider}\". Type Sqlite (the clinic's own file, the default) or PostgreSql (a shared server).";
        }

        if (provider == DatabaseProvider.Sqlite)
        {
            return string.IsNullOrWhiteSpace(ConnectionString)
                ? null
                : "Database:ConnectionString is only for a PostgreSql server: the SQLite file is always in the data folder. Leave it empty, or set Database:Provider to PostgreSql.";
        }

        if (string.IsNullOrWhiteSpace(ConnectionString))
        {
            return "Database:Provider is PostgreSql but Database:ConnectionString is empty. Give the server's, such as Host=clinic-server;Database=lowvisionaid;Username=lowvisionaid;Password=…;SSL Mode=Require.";
        }

        return ClinicDatabase.ServerConnectionProblem(ConnectionString, "Database:ConnectionString");
    }

    /// <summary>The section as bound at start, for the decisions made before the services exist.</summary>
    public static ClinicDatabaseOptions From(IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        return configuration.GetSection(Section).Get<ClinicDatabaseOptions>() ?? new ClinicDatabaseOptions();
    }
}

/// <summary>The clinic's database as resolved at start: its provider and connection string (which may hold a password: never log it; log <see cref="Description"/>).</summary>
public sealed record ClinicDatabaseTarget(DatabaseProvider Provider, string ConnectionString)
{
    /// <summary>True on a shared PostgreSQL server.</summary>
    public bool IsServer => Provider == DatabaseProvider.PostgreSql;

    /// <summary>Where the database is, without the password.</summary>
    public string Description => ClinicDatabase.Describe(Provider, ConnectionString);

    public static ClinicDatabaseTarget Resolve(ClinicDatabaseOptions options, ClinicFolders folders)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(folders);
        return options.IsServer
            ? new ClinicDatabaseTarget(DatabaseProvider.PostgreSql, options.ConnectionString!)
            : new ClinicDatabaseTarget(DatabaseProvider.Sqlite, folders.ConnectionString);
    }
}
