using LowVisionAid.Data;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// Where the clinic's files live and what an empty database gets: the top-level keys <c>DataFolder</c>,
/// <c>BackupFolder</c> and <c>LoadDemoClinic</c> (appsettings.json lists them with their defaults).
/// </summary>
public sealed class ClinicDataOptions
{
    /// <summary>The folder of the database, the log files and the sign-in keys; empty means <c>&lt;content root&gt;/data</c>.</summary>
    public string? DataFolder { get; set; }

    /// <summary>The folder of the backups; empty means <c>&lt;data folder&gt;/backups</c>.</summary>
    public string? BackupFolder { get; set; }

    /// <summary>Load the invented demo clinic into a database that has never been set up (default true).</summary>
    public bool LoadDemoClinic { get; set; } = true;

    /// <summary>True when both folder settings are empty (the defaults) or something a path can be.</summary>
    public bool FoldersAreValid() =>
        new[] { DataFolder, BackupFolder }.All(f => string.IsNullOrWhiteSpace(f) || f.IndexOfAny(Path.GetInvalidPathChars()) < 0);
}

/// <summary>
/// The one place that says where each file of the clinic lives, resolved from <see cref="ClinicDataOptions"/> against
/// the content root: the database, the backups, the log files and the keys that protect sign-in and form cookies.
/// </summary>
public sealed record ClinicFolders(string Data, string Backups, string Logs, string Keys)
{
    /// <summary>The log files' folder under the data folder.</summary>
    public const string LogsFolderName = "logs";

    /// <summary>The Data Protection key ring's folder under the data folder.</summary>
    public const string KeysFolderName = "keys";

    /// <summary>The SQLite database file.</summary>
    public string DatabaseFile => Path.Combine(Data, ClinicDatabase.FileName);

    /// <summary>The connection string of the database file (creates the data folder if it is missing).</summary>
    public string ConnectionString => ClinicDatabase.ConnectionStringFor(Data);

    public static ClinicFolders Resolve(ClinicDataOptions options, string contentRoot)
    {
        ArgumentNullException.ThrowIfNull(options);
        var data = string.IsNullOrWhiteSpace(options.DataFolder)
            ? Path.Combine(contentRoot, "data")
            : Path.GetFullPath(options.DataFolder, contentRoot);
        var backups = string.IsNullOrWhiteSpace(options.BackupFolder)
            ? Path.Combine(data, "backups")
            : Path.GetFullPath(options.BackupFolder, contentRoot);
        return new ClinicFolders(data, backups, Path.Combine(data, LogsFolderName), Path.Combine(data, KeysFolderName));
    }
}
