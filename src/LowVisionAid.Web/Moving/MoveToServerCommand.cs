using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Moving;
using LowVisionAid.Web.Infrastructure;
using Microsoft.Extensions.Options;
using Npgsql;

namespace LowVisionAid.Web.Moving;

/// <summary>What the command line asked for: the move-to-server command and its target, and the arguments left for the host.</summary>
internal sealed record MoveCommandLine(string? To, string[] HostArgs)
{
    public const string Command = "move-to-server";
    public const string ToOption = "--to";

    /// <summary>
    /// <c>move-to-server --to &lt;connection string&gt; [host settings such as --DataFolder &lt;path&gt;]</c>, or null
    /// when the first argument is not the command. The target never goes to the host's configuration.
    /// </summary>
    public static MoveCommandLine? Parse(string[] args) =>
        CommandLineCommand.Take(args, Command, ToOption) is { } taken ? new MoveCommandLine(taken.Value, taken.HostArgs) : null;
}

/// <summary>
/// <c>dotnet run --project src/LowVisionAid.Web -- move-to-server --to "&lt;connection string&gt;"</c>: copies the
/// clinic in the configured data folder's SQLite file to an empty PostgreSQL database (<see cref="ClinicMove"/>),
/// without starting the web server, and prints each table's rows and checksums (docs/moving-to-server.md). The
/// connection string is never printed. Exit code 0 moved, 1 refused, 2 mistyped, 3 failed (rolled back).
/// </summary>
internal static class MoveToServerCommand
{
    public const int Moved = 0;
    public const int Refused = 1;
    public const int Usage = 2;
    public const int Failed = 3;

    public const string UsageText =
        "Usage: dotnet run --project src/LowVisionAid.Web -- move-to-server --to \"Host=<server>;Database=<empty database>;Username=<user>\" [--DataFolder <folder>]\n" +
        "Leave the password out of --to and set PGPASSWORD (or use a .pgpass file), so that it stays out of the shell's history.";

    public static async Task<int> RunAsync(IServiceProvider root, MoveCommandLine command, TextWriter output, TextWriter errors, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(root);
        ArgumentNullException.ThrowIfNull(command);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(errors);
        if (TargetProblem(command.To) is { } mistyped)
        {
            await errors.WriteLineAsync(mistyped + "\n" + UsageText).ConfigureAwait(false);
            return Usage;
        }

        var configured = ClinicDatabaseOptions.From(root.GetRequiredService<IConfiguration>());
        if (configured.Problem() is { } settings)
        {
            await errors.WriteLineAsync(settings + " Nothing was copied.").ConfigureAwait(false);
            return Refused;
        }

        if (configured.IsServer)
        {
            await errors.WriteLineAsync(
                "Database:Provider is PostgreSql: this app already uses a server. The move reads a clinic's own SQLite file: run it with " +
                "Database:Provider Sqlite (the default; --Database:Provider=Sqlite) and the data folder that holds the file (--DataFolder <folder>). Nothing was copied.").ConfigureAwait(false);
            return Refused;
        }

        ClinicFolders folders;
        try
        {
            folders = root.GetRequiredService<ClinicFolders>();
        }
        catch (OptionsValidationException)
        {
            await errors.WriteLineAsync(ClinicDataSetup.FolderProblem + " Nothing was copied.").ConfigureAwait(false);
            return Refused;
        }

        var to = command.To!;
        await output.WriteLineAsync($"Moving the clinic in SQLite file {folders.DatabaseFile} (read only) to {ClinicDatabase.Describe(DatabaseProvider.PostgreSql, to)}.").ConfigureAwait(false);
        var report = await ClinicMove.ToServerAsync(folders.DatabaseFile, to, ct).ConfigureAwait(false);
        if (report.Tables.Count > 0)
        {
            await output.WriteAsync(Table(report.Tables)).ConfigureAwait(false);
        }

        if (report.Outcome != MoveOutcome.Moved)
        {
            await errors.WriteLineAsync(report.Message).ConfigureAwait(false);
            return report.Outcome == MoveOutcome.Refused ? Refused : Failed;
        }

        await output.WriteLineAsync(report.Message).ConfigureAwait(false);
        await output.WriteLineAsync(
            "The SQLite file was not changed. Start the app on the server with --Database:Provider=PostgreSql and the same connection string " +
            "as Database:ConnectionString (sign-in is then required: docs/moving-to-server.md).").ConfigureAwait(false);
        return Moved;
    }

    /// <summary>What is wrong with the --to value, said as what to type; null when it names a server and a database. Never echoes the value.</summary>
    public static string? TargetProblem(string? to)
    {
        if (string.IsNullOrWhiteSpace(to))
        {
            return "Name the PostgreSQL database to move into: move-to-server --to \"Host=…;Database=…;Username=…\".";
        }

        return ClinicDatabase.ServerConnectionProblem(to, "--to");
    }

    /// <summary>One line per table: its name, its rows in the file and on the server, the start of each checksum, and whether they match.</summary>
    public static string Table(IReadOnlyList<TableCheck> tables)
    {
        ArgumentNullException.ThrowIfNull(tables);
        var width = Math.Max("Table".Length, tables.Max(t => t.Table.Length));
        var text = new System.Text.StringBuilder();
        text.AppendLine(CultureInfo.InvariantCulture, $"{"Table".PadRight(width)}  {"Rows in file",12}  {"Rows on server",14}  {"Checksum in file",-16}  {"Checksum on server",-18}  Match");
        foreach (var t in tables)
        {
            text.AppendLine(CultureInfo.InvariantCulture, $"{t.Table.PadRight(width)}  {t.SourceRows,12}  {t.TargetRows,14}  {t.SourceChecksum[..16],-16}  {t.TargetChecksum[..16],-18}  {(t.Matches ? "yes" : "NO")}");
        }

        return text.ToString();
    }
}
