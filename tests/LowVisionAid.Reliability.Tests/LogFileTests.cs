using System.Net;
using System.Text.RegularExpressions;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.Web.Infrastructure;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;
using Serilog;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// The log a clinic keeps: a production start writes a handful of lines and no SQL, a request writes one line without
/// its query, nothing names a client, the file in the data folder rolls by day and by size, and the keys that protect
/// the cookies are kept in the data folder too.
/// </summary>
[Collection(RealProcessTests.Name)]
public sealed partial class LogFileTests
{
    // "A handful": the app's start, migration and demo lines, the host's four, and the framework's rare warnings
    // (a migration step EF cannot wrap in a transaction, a new cookie key). Before this log was configured, a first
    // start wrote 159 entries, 144 of them SQL; now 9 (docs/reliability.md, "Logs").
    private const int HandfulOfLines = 12;

    private const string RequestCategory = "LowVisionAid.Web.Requests: ";

    // Invented, distinctive values, so that finding one in the file means it leaked.
    private const string Code = "LG-4417";
    private const string Name = "Pellucid Arbogast";
    private const string Notes = "tambourine harbour notes";

    private static readonly TimeSpan StartLimit = TimeSpan.FromSeconds(120);

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_production_start_logs_a_handful_of_lines_without_sql_and_each_request_one_line_without_its_query()
    {
        using var data = new TempFolder("log-file");

        // First start: a new database, migrated once, with the demo clinic.
        int firstStartLines;
        using (var app = await AppProcess.StartAsync(data.Path, loadDemo: true, StartLimit))
        {
            var start = StartLines(ReadLog(data.Path));
            firstStartLines = start.Count;
            Assert.True(start.Count <= HandfulOfLines, $"The first start wrote {start.Count} lines:\n{string.Join('\n', start)}");
            Assert.Single(start, l => l.Contains("starting in Production", StringComparison.Ordinal));
            Assert.Single(start, l => l.Contains("Database migrated:", StringComparison.Ordinal) || l.Contains("Database schema up to date", StringComparison.Ordinal));
            Assert.Single(start, l => l.Contains("Demo clinic loaded", StringComparison.Ordinal));
            Assert.DoesNotContain(start, IsSql);

            // One request, one line: method, path without the query, status, duration.
            using var client = app.NewClient();
            var before = ReadLog(data.Path).Count;
            await client.GetPageAsync("/Clients?q=" + Uri.EscapeDataString(Name));
            var added = await LinesAfterAsync(data.Path, before);
            var line = Assert.Single(added);
            Assert.Matches(RequestLine(), line);
            Assert.Contains("HTTP GET /Clients responded 200 in ", line, StringComparison.Ordinal);

            // The main records of a client, by form: the file names none of them.
            var clientId = await ClinicForms.AddClientAsync(client, Code, Name, "1941", Notes);
            await client.GetPageAsync($"/Clients/{clientId}");
            await client.GetPageAsync("/Clients?q=" + Code);
            var all = await LinesAfterAsync(data.Path, before);
            Assert.All(all.Where(l => l.Contains(RequestCategory, StringComparison.Ordinal)), l => Assert.Matches(RequestLine(), l));
            foreach (var secret in new[] { Code, Name, Notes, "1941", Uri.EscapeDataString(Name) })
            {
                Assert.DoesNotContain(ReadLog(data.Path), l => l.Contains(secret, StringComparison.OrdinalIgnoreCase));
            }
        }

        // A restart on the same folder: the database is up to date, so even fewer lines.
        var firstRunTotal = ReadLog(data.Path).Count;
        using (await AppProcess.StartAsync(data.Path, loadDemo: true, StartLimit))
        {
            var restart = StartLines(ReadLog(data.Path).Skip(firstRunTotal).ToList());
            Assert.True(restart.Count <= firstStartLines, $"The restart wrote {restart.Count} lines:\n{string.Join('\n', restart)}");
            Assert.Single(restart, l => l.Contains("Database schema up to date", StringComparison.Ordinal));
            Assert.DoesNotContain(restart, l => l.Contains("Demo clinic loaded", StringComparison.Ordinal));
            Assert.DoesNotContain(restart, IsSql);
        }
    }

    [Fact]
    public void The_log_file_rolls_at_its_size_limit_and_keeps_only_the_configured_number_of_files()
    {
        using var folder = new TempFolder("log-roll");
        var options = new LogFileOptions { FileSizeLimitBytes = LogFileOptions.MinimumFileSizeLimitBytes, RetainedFileCountLimit = 3 };

        using (var logger = ClinicLogging.CreateFileLogger(folder.Path, options))
        {
            for (var i = 0; i < 200; i++)
            {
                logger.Information("Line {Number} of the rolling test, long enough to fill a small file quickly", i);
            }
        }

        var files = Directory.GetFiles(folder.Path).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToList();
        Assert.Equal(3, files.Count);                                              // 200 lines of ~110 bytes fill about 20 files of 1 KB
        Assert.All(files, f => Assert.Matches(DatedFileName(), f!));               // the day is in every name (daily rolling)
        Assert.Contains(files, f => f!.Contains('_', StringComparison.Ordinal));   // _001, _002...: rolled by size within the day
        // The sink keeps the line that reaches the limit whole, then starts the next file: at most one line over.
        Assert.All(files, f => Assert.InRange(new FileInfo(Path.Combine(folder.Path, f!)).Length, 1, options.FileSizeLimitBytes + 200));
        Assert.Contains("Line 199 of the rolling test", File.ReadAllText(Path.Combine(folder.Path, files[^1]!)), StringComparison.Ordinal);
    }

    [Fact]
    public void The_shipped_settings_roll_the_log_each_day_and_at_10_MB_and_keep_31_files()
    {
        // The defaults written in appsettings.json and docs/reliability.md: a month of daily files, none over 10 MB.
        using var app = new ClinicApp("log-settings", loadDemo: false);

        var options = app.Service(sp => sp.GetRequiredService<IOptions<LogFileOptions>>().Value);

        Assert.Equal(RollingInterval.Day, options.RollingInterval);
        Assert.Equal(10L * 1024 * 1024, options.FileSizeLimitBytes);
        Assert.Equal(31, options.RetainedFileCountLimit);
    }

    [Theory]
    [InlineData("LogFile:FileSizeLimitBytes", "100", LogFileOptions.SizeProblem)]
    [InlineData("LogFile:RetainedFileCountLimit", "0", LogFileOptions.CountProblem)]
    public void A_log_setting_out_of_range_stops_the_start_with_a_message_that_says_what_to_set(string key, string value, string message)
    {
        // No template database copied in: the check is that the refused start creates none.
        using var app = new ClinicApp("log-bad-setting", loadDemo: false, settings: new Dictionary<string, string?> { [key] = value }) { UseTemplateDatabase = false };

        var refusal = Assert.ThrowsAny<Exception>(() => app.CreateClient());

        Assert.Contains(message, refusal.ToString(), StringComparison.Ordinal);
        Assert.False(File.Exists(app.Data.DatabasePath), "The settings are checked before the database is touched.");
    }

    [Fact]
    public void The_keys_that_protect_the_cookies_are_kept_in_the_data_folder_and_outlive_a_restart()
    {
        using var data = new TempFolder("cookie-keys");
        string sealedText;
        using (var first = new ClinicApp("cookie-keys-1", loadDemo: false, data: data))
        {
            sealedText = first.Service(sp => sp.GetRequiredService<IDataProtectionProvider>().CreateProtector("restart test").Protect("still readable"));
        }

        Assert.NotEmpty(Directory.GetFiles(Path.Combine(data.Path, ClinicFolders.KeysFolderName), "key-*.xml"));
        using var second = new ClinicApp("cookie-keys-2", loadDemo: false, data: data);
        Assert.Equal("still readable", second.Service(sp => sp.GetRequiredService<IDataProtectionProvider>().CreateProtector("restart test").Unprotect(sealedText)));
    }

    [Fact]
    public async Task A_refused_sign_in_is_logged_with_the_account_name_and_never_the_text_typed_for_an_unknown_name()
    {
        const string TypedPassword = "Wr0ng-box-secret";
        using var app = new ClinicApp("sign-in-log", loadDemo: false, settings: Accounts.SignInOn);
        using (var admin = app.NewClient())
        {
            await Accounts.CreateFirstAdministratorAsync(admin);
        }

        using var client = app.NewClient();
        using (var wrong = await Accounts.SignInAsync(client, Accounts.AdminName, "not the right password"))
        {
            Assert.Equal(HttpStatusCode.OK, wrong.StatusCode);
        }

        using (var unknown = await Accounts.SignInAsync(client, TypedPassword, "anything at all"))
        {
            Assert.Equal(HttpStatusCode.OK, unknown.StatusCode);
        }

        var lines = app.Logs.Lines.ToList();
        Assert.Single(lines, l => l.StartsWith("Warning", StringComparison.Ordinal) && l.Contains($"Sign-in refused for account {Accounts.AdminName}: wrong password", StringComparison.Ordinal));
        Assert.Single(lines, l => l.StartsWith("Warning", StringComparison.Ordinal) && l.Contains("Sign-in refused: the name typed is no account", StringComparison.Ordinal));
        Assert.DoesNotContain(lines, l => l.Contains(TypedPassword, StringComparison.Ordinal) || l.Contains("not the right password", StringComparison.Ordinal));
    }

    private static bool IsSql(string line) =>
        line.Contains("Executed DbCommand", StringComparison.Ordinal) || line.Contains("SELECT ", StringComparison.Ordinal) || line.Contains("CREATE TABLE", StringComparison.Ordinal);

    // The start's lines: everything before the first request line (the readiness poll's GET /).
    private static List<string> StartLines(IReadOnlyList<string> lines) =>
        lines.TakeWhile(l => !l.Contains(RequestCategory, StringComparison.Ordinal)).ToList();

    // The request line is written when the response has gone: wait for it (bounded) rather than race it.
    private static async Task<List<string>> LinesAfterAsync(string dataFolder, int count)
    {
        var deadline = DateTime.UtcNow.AddSeconds(5);
        List<string> added;
        do
        {
            await Task.Delay(100);
            added = ReadLog(dataFolder).Skip(count).ToList();
        }
        while (added.Count == 0 && DateTime.UtcNow < deadline);

        await Task.Delay(200);   // and any line that should not be there has had its chance
        return ReadLog(dataFolder).Skip(count).ToList();
    }

    // Every line of today's files in the data folder's logs folder, oldest file first; the app keeps the file open.
    private static List<string> ReadLog(string dataFolder)
    {
        var folder = Path.Combine(dataFolder, ClinicFolders.LogsFolderName);
        var files = Directory.Exists(folder) ? Directory.GetFiles(folder, "lowvisionaid-*.log").Order(StringComparer.Ordinal).ToList() : [];
        Assert.True(files.Count > 0, $"No log file in {folder}.");
        Assert.All(files, f => Assert.Matches(DatedFileName(), Path.GetFileName(f)));
        var lines = new List<string>();
        foreach (var file in files)
        {
            using var stream = new FileStream(file, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
            using var reader = new StreamReader(stream);
            while (reader.ReadLine() is { } line)
            {
                lines.Add(line);
            }
        }

        return lines;
    }

    [GeneratedRegex(@"^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}\.\d{3} [+-]\d{2}:\d{2} \[INF\] LowVisionAid\.Web\.Requests: HTTP (GET|POST) /[^?\s]* responded \d{3} in \d+ ms$")]
    private static partial Regex RequestLine();

    [GeneratedRegex(@"^lowvisionaid-\d{8}(_\d{3})?\.log$")]
    private static partial Regex DatedFileName();
}
