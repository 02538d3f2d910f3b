using Npgsql;

namespace LowVisionAid.Web.Pages.Admin;

/// <summary>A step of the advice: what to do, and the command that does it (null when there is none to type).</summary>
public sealed record AdviceStep(string Text, string? Command = null);

/// <summary>
/// What the backup page says when the clinic's database is on a PostgreSQL server. The app's own backups copy the
/// SQLite file on one PC and cannot copy a server's database, so the page gives the server's own tools instead:
/// <c>pg_dump -Fc</c> and <c>pg_restore</c> (postgresql.org/docs/current/app-pgdump.html, app-pgrestore.html), filled
/// in with the host, port, database and user of this clinic's connection string, never its password. docs/deployment.md
/// repeats these steps; the reliability tests run these very arguments (ServerBackupRoundTripTests).
/// </summary>
public sealed partial class ServerBackupAdvice
{
    /// <summary>The answer to a post that asks the app to take or restore a backup of a server database.</summary>
    public const string Refusal =
        "This clinic's database is on a PostgreSQL server: the app does not back it up or restore it (its own backups copy a SQLite file on this PC). " +
        "Nothing was changed. Use pg_dump and pg_restore on the server, as this page describes.";

    public const string DumpTool = "pg_dump";
    public const string RestoreTool = "pg_restore";

    private readonly NpgsqlConnectionStringBuilder _server;

    /// <param name="connectionString">The clinic's connection string (its password is never read out).</param>
    /// <param name="today">The date in the suggested file name.</param>
    public ServerBackupAdvice(string connectionString, DateOnly today)
    {
        _server = new NpgsqlConnectionStringBuilder(connectionString);
        DumpFile = $"{Database}-{today:yyyy-MM-dd}.dump";
    }

    public string Host => _server.Host ?? "localhost";

    public int Port => _server.Port;

    public string Database => _server.Database ?? "lowvisionaid";

    /// <summary>The role the app signs in to the server with (the same one runs the backup), or null when the setting names none.</summary>
    public string? User => string.IsNullOrWhiteSpace(_server.Username) ? null : _server.Username;

    /// <summary>The suggested backup file name: the database and today's date.</summary>
    public string DumpFile { get; }

    /// <summary>The database a backup is restored into (new and empty, made by the server's administrator).</summary>
    public string RestoredDatabase => Database + "_restored";

    /// <summary>The arguments of <see cref="DumpTool"/>: the whole database in the custom format (compressed, restorable table by table) into <paramref name="file"/>.</summary>
    public IReadOnlyList<string> DumpArguments(string file) => [.. Connection(Database), "-Fc", "-f", file];

    /// <summary>
    /// The arguments of <see cref="RestoreTool"/>: <paramref name="file"/> into the empty database <paramref name="into"/>,
    /// owned by the restoring role, all or nothing (one transaction, stop at the first error).
    /// </summary>
    public IReadOnlyList<string> RestoreArguments(string into, string file) =>
        [.. Connection(into), "--no-owner", "--single-transaction", "--exit-on-error", file];

    /// <summary>
    /// The environment the commands need besides the password: libpq's names for the connection string's TLS settings
    /// (postgresql.org/docs/current/libpq-envars.html), so the backup travels as the app's own connection does.
    /// </summary>
    public IReadOnlyDictionary<string, string> Environment
    {
        get
        {
            var variables = new SortedDictionary<string, string>(StringComparer.Ordinal);
            if (_server.SslMode is SslMode.Require or SslMode.VerifyCA or SslMode.VerifyFull)
            {
                variables["PGSSLMODE"] = _server.SslMode switch
                {
                    SslMode.VerifyCA => "verify-ca",
                    SslMode.VerifyFull => "verify-full",
                    _ => "require",
                };
            }

            if (!string.IsNullOrWhiteSpace(_server.RootCertificate))
            {
                variables["PGSSLROOTCERT"] = _server.RootCertificate;
            }

            return variables;
        }
    }

    /// <summary>What the page says first: where the records are and why there are no backup buttons.</summary>
    public string Summary =>
        $"This clinic's records are in the PostgreSQL database {Database} on {Host}, port {Port}, shared by every PC that uses it. " +
        "The app's own backups copy a SQLite file on one PC; they cannot copy a server's database, so this page has no backup or restore buttons. " +
        "Back the database up with PostgreSQL's own tools, pg_dump and pg_restore, on the server or on a PC that can reach it, as below.";

    /// <summary>How to give the password without writing it into a command or a script.</summary>
    public string Password =>
        $"None of these commands holds the password{(User is null ? "" : " of " + User)}. Put it in a .pgpass file " +
        "(on Windows %APPDATA%\\postgresql\\pgpass.conf) that only the account running the backup can read, one line host:port:database:user:password, " +
        "or set the PGPASSWORD environment variable for that one command. Never type it into a command line or a script that others can read.";

    /// <summary>The TLS settings the commands need, said once; null when the connection asks for none.</summary>
    public string? Tls => Environment.Count == 0
        ? null
        : "The app reaches the server over TLS; give the commands the same settings: " + string.Join(", ", Environment.Select(v => $"{v.Key}={v.Value}")) + " (set them as environment variables).";

    /// <summary>Taking a backup, how often, and where to keep it.</summary>
    public IReadOnlyList<AdviceStep> BackupSteps =>
    [
        new("Take a backup every day the clinic is open (a scheduled task or cron job on the server), and before every upgrade of LowVisionAid or PostgreSQL:",
            Command(DumpTool, DumpArguments(DumpFile))),
        new("Keep copies off the server: on another computer or on an encrypted disk kept elsewhere. A copy on the server's own disk is lost with that disk."),
        new("A backup holds every client's record: protect it as you protect the records, and delete old ones as your retention rules say. " +
            "A client who was erased is still in the backups taken before the erasure."),
        new("Test a restore regularly, at least once a month and after any change to the backup job: restore the latest file into a spare database as below, " +
            "start LowVisionAid on a test PC against it, and open a few clients."),
    ];

    /// <summary>Restoring a backup into a new database, then moving the clinic to it.</summary>
    public IReadOnlyList<AdviceStep> RestoreSteps =>
    [
        new("Stop LowVisionAid on every PC of the clinic."),
        new("The server's administrator makes a new, empty database owned by the app's role:",
            Command("createdb", [.. Connection(null, "postgres"), "-T", "template0", "-O", User ?? "<the app's role>", RestoredDatabase])),
        new("Restore the backup into it (all or nothing: a failure leaves it empty):",
            Command(RestoreTool, RestoreArguments(RestoredDatabase, DumpFile))),
        new($"Set Database:ConnectionString to Database={RestoredDatabase} on every PC (or have the administrator rename the databases), " +
            "start LowVisionAid on one PC, check a few clients, then start the others. Keep the old database until you are sure."),
    ];

    /// <summary>A command as typed at a shell prompt, each argument quoted when it needs to be.</summary>
    public static string Command(string tool, IEnumerable<string> arguments) =>
        string.Join(' ', new[] { tool }.Concat(arguments.Select(Quote)));

    private List<string> Connection(string? database, string? user = null)
    {
        var arguments = new List<string> { "-h", Host, "-p", Port.ToString(System.Globalization.CultureInfo.InvariantCulture) };
        if ((user ?? User) is { } role)
        {
            arguments.AddRange(["-U", role]);
        }

        if (database is not null)
        {
            arguments.AddRange(["-d", database]);
        }

        return arguments;
    }

    // Letters, digits and the punctuation of host names, paths and options go as they are; anything else is quoted.
    private static string Quote(string argument) =>
        argument.Length > 0 && argument.All(c => char.IsAsciiLetterOrDigit(c) || "_./:=@%+,-".Contains(c, StringComparison.Ordinal))
            ? argument
            : "\"" + argument.Replace("\"", "\\\"", StringComparison.Ordinal) + "\"";
}
