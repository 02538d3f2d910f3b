namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// Every event the app itself writes to its log, in one list (source-generated, so a message costs nothing when its
/// level is off). Their values are counts, migration and backup file names, folders, staff account names, and a
/// request's method, path (never its query), status and duration: never a client's name, code or clinical value.
/// docs/security.md lists what the log holds; the privacy tests hold it to that.
/// </summary>
internal static partial class AppLog
{
    /// <summary>The logger category of the request lines, e.g. to silence them with <c>Logging:LogLevel</c>.</summary>
    public const string RequestCategory = "LowVisionAid.Web.Requests";

    [LoggerMessage(EventId = 1000, Level = LogLevel.Information,
        Message = "LowVisionAid {Version} starting in {Environment}; data folder {DataFolder}; {Database}; {Access}")]
    public static partial void Starting(ILogger logger, string version, string environment, string dataFolder, string database, string access);

    [LoggerMessage(EventId = 1005, Level = LogLevel.Information,
        Message = "The database is on a shared server: back it up with the server's own tools (pg_dump) before an upgrade; the app takes no backup of it.")]
    public static partial void ServerBackupIsTheAdministrators(ILogger logger);

    [LoggerMessage(EventId = 1001, Level = LogLevel.Warning,
        Message = "An earlier start was stopped while it migrated the database; its migration lock was released.")]
    public static partial void MigrationLockReleased(ILogger logger);

    [LoggerMessage(EventId = 1002, Level = LogLevel.Information,
        Message = "Database migrated: {Applied} migration(s) applied, schema now at {Latest}")]
    public static partial void DatabaseMigrated(ILogger logger, int applied, string latest);

    [LoggerMessage(EventId = 1003, Level = LogLevel.Information, Message = "Database schema up to date at {Latest}")]
    public static partial void DatabaseUpToDate(ILogger logger, string latest);

    [LoggerMessage(EventId = 1004, Level = LogLevel.Information, Message = "Demo clinic loaded into the new database: {ClinicName}")]
    public static partial void DemoClinicLoaded(ILogger logger, string clinicName);

    [LoggerMessage(EventId = 1010, Level = LogLevel.Information, Message = "Backup {FileName} taken {Reason}")]
    public static partial void BackupTaken(ILogger logger, string fileName, string reason);

    [LoggerMessage(EventId = 1011, Level = LogLevel.Information, Message = "Backup {Source} restored over the database (a backup of the data as it was is kept)")]
    public static partial void BackupRestored(ILogger logger, string source);

    [LoggerMessage(EventId = 1012, Level = LogLevel.Warning, Message = "Restore of {Source} refused: {Reason}")]
    public static partial void RestoreRefused(ILogger logger, string source, string reason);

    [LoggerMessage(EventId = 1020, Level = LogLevel.Warning, Message = "Sign-in refused for account {UserName}: {Outcome}")]
    public static partial void SignInRefused(ILogger logger, string userName, string outcome);

    [LoggerMessage(EventId = 1021, Level = LogLevel.Warning, Message = "Sign-in refused: the name typed is no account")]
    public static partial void SignInUnknownName(ILogger logger);

    [LoggerMessage(EventId = 1030, Level = LogLevel.Information, Message = "HTTP {Method} {Path} responded {StatusCode} in {ElapsedMs:0} ms")]
    public static partial void Request(ILogger logger, string method, string path, int statusCode, double elapsedMs);
}
