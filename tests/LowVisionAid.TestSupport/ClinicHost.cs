using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Microsoft.Extensions.Logging.Testing;

namespace LowVisionAid.TestSupport;

/// <summary>
/// The one host fixture of the app tests: the real app in process over its own data folder, whose database starts as
/// a copy of <see cref="TemplateDatabase"/> (already migrated), so no host applies the migrations again. The demo
/// clinic is off unless asked for; in the run against the test PostgreSQL server (<see cref="TestServer"/>) the host's
/// database is its own database on that server instead; the environment is Production unless set (no developer error pages); a test that
/// depends on today's date passes its own clock; logs go to the framework's fake collector when asked for.
/// </summary>
public class ClinicHost : WebApplicationFactory<Program>
{
    private readonly bool _ownsDataFolder;
    private string? _serverDatabase;

    // A test process starts dozens of hosts; each would watch its settings files and content folders with inotify,
    // and Linux allows 128 inotify instances per user across every process (more than one test project, or another
    // build, runs at once on a shared machine). Tests never change those files while a host runs: no reload on
    // change, and the file providers poll instead of taking an instance.
    static ClinicHost()
    {
        Environment.SetEnvironmentVariable("DOTNET_hostBuilder__reloadConfigOnChange", "false");
        Environment.SetEnvironmentVariable("DOTNET_USE_POLLING_FILE_WATCHER", "true");
    }

    /// <param name="dataFolder">A folder the test owns (kept on dispose), or null for a fresh temp folder deleted on dispose.</param>
    public ClinicHost(string? dataFolder = null)
    {
        _ownsDataFolder = dataFolder is null;
        DataFolder = dataFolder ?? Path.Combine(Path.GetTempPath(), "lowvisionaid-tests", Guid.NewGuid().ToString("N"));
    }

    /// <summary>This host's database on the test PostgreSQL server (its connection string), or null on SQLite.</summary>
    public string? ServerDatabase => _serverDatabase;

    /// <summary>The folder that holds this host's database (the app's <c>DataFolder</c> setting).</summary>
    public string DataFolder { get; }

    /// <summary>Whether the app loads the invented demo clinic into its (empty) database at start. Default: no.</summary>
    public bool LoadDemo { get; init; }

    /// <summary>The host environment. Default: Production, what a clinic runs.</summary>
    public string EnvironmentName { get; init; } = "Production";

    /// <summary>The clock the app reads (e.g. a <c>FakeTimeProvider</c>); null keeps the system clock.</summary>
    public TimeProvider? Clock { get; init; }

    /// <summary>Start from a copy of the migrated template when the folder has no database. Default: yes.</summary>
    public bool UseTemplateDatabase { get; init; } = true;

    /// <summary>Extra configuration settings (key, value), applied after the ones above.</summary>
    public IReadOnlyDictionary<string, string?> Settings { get; init; } = new Dictionary<string, string?>();

    /// <summary>When set, every log line from <see cref="LogCaptureLevel"/> up goes here and nowhere else (the console stays quiet).</summary>
    public FakeLogCollector? LogCollector { get; init; }

    /// <summary>
    /// The lowest level <see cref="LogCollector"/> receives. Default: Debug, every line (the privacy checks read them
    /// all). A test that only asks whether an error was logged sets Warning: at Debug, EF Core and ASP.NET Core write
    /// dozens of lines a request, which thousands of requests pile up in memory.
    /// </summary>
    public LogLevel LogCaptureLevel { get; init; } = LogLevel.Debug;

    /// <summary>The account a client of this host signs in as in the server pass (an administrator, made on first use).</summary>
    public const string ServerPassAccount = "server.pass";

    /// <summary>The password of <see cref="ServerPassAccount"/>.</summary>
    public const string ServerPassPassword = "a shared database needs sign-in";

    private readonly SemaphoreSlim _accountMade = new(1, 1);
    private string? _signInCookie;

    /// <summary>
    /// On a server database sign-in is always required. So that the suites test the same pages in the server pass, each
    /// client this host makes then signs in first as <see cref="ServerPassAccount"/>. False keeps clients signed out;
    /// unset, it is false for a host whose settings already turn sign-in on (the tests of sign-in and accounts, which
    /// make their own accounts and sign in themselves), true otherwise. No effect on SQLite.
    /// </summary>
    public bool? SignInOnServer { get; init; }

    private bool SignsInOnServer => SignInOnServer ?? !new[] { "Access:RequireSignIn", "Access:AllowLan" }.Any(
        key => Settings.TryGetValue(key, out var value) && string.Equals(value, "true", StringComparison.OrdinalIgnoreCase));

    /// <summary>A client that keeps cookies (for antiforgery) and does not follow redirects, as the tests want a browser.</summary>
    public HttpClient NewBrowserClient() => CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });

    public async Task<T> WithDbAsync<T>(Func<ClinicDbContext, Task<T>> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        await using var scope = Services.CreateAsyncScope();
        return await work(scope.ServiceProvider.GetRequiredService<ClinicDbContext>());
    }

    public async Task WithDbAsync(Func<ClinicDbContext, Task> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        await using var scope = Services.CreateAsyncScope();
        await work(scope.ServiceProvider.GetRequiredService<ClinicDbContext>());
    }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        if (TestServer.InUse && !Settings.ContainsKey("Database:Provider"))
        {
            // The run against the PostgreSQL server: this host's own database on it, migrated or empty as asked.
            _serverDatabase ??= TestServer.CreateDatabase(migrated: UseTemplateDatabase);
            builder.UseSetting("Database:Provider", nameof(DatabaseProvider.PostgreSql));
            builder.UseSetting("Database:ConnectionString", _serverDatabase);
        }
        else if (UseTemplateDatabase)
        {
            TemplateDatabase.CopyTo(DataFolder);
        }

        builder.UseEnvironment(EnvironmentName);
        builder.UseSetting("DataFolder", DataFolder);
        builder.UseSetting("LoadDemoClinic", LoadDemo ? "true" : "false");
        foreach (var (key, value) in Settings)
        {
            builder.UseSetting(key, value);
        }

        if (Clock is not null)
        {
            builder.ConfigureTestServices(services => services.AddSingleton(Clock));
        }

        if (LogCollector is not null)
        {
            // The capture sees every line from LogCaptureLevel up (Debug unless set), whatever appsettings.json's levels
            // say (the privacy pin on the framework's request lines still holds); the console stays quiet so the runs stay fast.
            foreach (var category in new[] { "Default", "LowVisionAid", "Microsoft.AspNetCore", "Microsoft.EntityFrameworkCore" })
            {
                builder.UseSetting("Logging:LogLevel:" + category, LogCaptureLevel.ToString());
            }

            builder.ConfigureLogging(logging =>
            {
                logging.ClearProviders();
                logging.SetMinimumLevel(LogCaptureLevel);
                logging.AddProvider(new FakeLoggerProvider(LogCollector));
            });
        }
    }

    protected override void ConfigureClient(HttpClient client)
    {
        ArgumentNullException.ThrowIfNull(client);
        base.ConfigureClient(client);
        if (_serverDatabase is not null && SignsInOnServer)
        {
            // The client may not send anything yet (the factory sets its address after this): it carries the sign-in
            // cookie, got once per host through the app's own sign-in page, beside the cookies its own handler keeps.
            client.DefaultRequestHeaders.Add("Cookie", Task.Run(SignInCookieAsync).GetAwaiter().GetResult());
        }
    }

    private async Task<string> SignInCookieAsync()
    {
        await _accountMade.WaitAsync();
        try
        {
            if (_signInCookie is not null)
            {
                return _signInCookie;
            }

            await using (var scope = Services.CreateAsyncScope())
            {
                var users = scope.ServiceProvider.GetRequiredService<UserManager<IdentityUser>>();
                if (await users.FindByNameAsync(ServerPassAccount) is null)
                {
                    var user = new IdentityUser(ServerPassAccount);
                    Check(await users.CreateAsync(user, ServerPassPassword));
                    Check(await users.AddToRoleAsync(user, ClinicRoles.Administrator));
                }
            }

            using var raw = Server.CreateClient();
            using var page = await raw.GetAsync(new Uri("/Account/SignIn", UriKind.Relative));
            var formCookies = CookiePairs(page);
            using var post = new HttpRequestMessage(HttpMethod.Post, new Uri("/Account/SignIn", UriKind.Relative))
            {
                Content = new FormUrlEncodedContent(
                [
                    new("Input.UserName", ServerPassAccount),
                    new("Input.Password", ServerPassPassword),
                    new(PageHtml.TokenField, PageHtml.Token(await page.Content.ReadAsStringAsync()) ?? throw new InvalidOperationException("The sign-in page has no antiforgery token.")),
                ]),
            };
            post.Headers.Add("Cookie", formCookies);
            using var response = await raw.SendAsync(post);
            var signedIn = CookiePairs(response);
            if (response.StatusCode != System.Net.HttpStatusCode.Redirect || signedIn.Length == 0)
            {
                throw new InvalidOperationException($"The server pass could not sign in as {ServerPassAccount}: {(int)response.StatusCode}.");
            }

            return _signInCookie = signedIn;
        }
        finally
        {
            _accountMade.Release();
        }
    }

    // "name=value; name=value" from a response's Set-Cookie headers.
    private static string CookiePairs(HttpResponseMessage response) =>
        string.Join("; ", response.Headers.TryGetValues("Set-Cookie", out var values) ? values.Select(v => v.Split(';')[0]).Where(v => !v.EndsWith('=')) : []);

    private static void Check(IdentityResult result)
    {
        if (!result.Succeeded)
        {
            throw new InvalidOperationException("The server pass account was refused: " + string.Join("; ", result.Errors.Select(e => e.Description)));
        }
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing)
        {
            _accountMade.Dispose();
        }

        if (disposing && _serverDatabase is not null)
        {
            TestServer.DropDatabase(_serverDatabase);
            _serverDatabase = null;
        }

        if (disposing && _ownsDataFolder)
        {
            SqliteConnection.ClearAllPools();
            try
            {
                Directory.Delete(DataFolder, recursive: true);
            }
            catch (DirectoryNotFoundException)
            {
            }
            catch (IOException)
            {
                // A file still open on a slow file system; the system's temp cleaner takes it later.
            }
        }
    }
}
