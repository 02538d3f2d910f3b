using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Infrastructure;
using Microsoft.Extensions.Configuration;
using Npgsql;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// A clinic on a shared server: its settings refused with what to type, sign-in always on, TLS as configured, and the
/// connection string's password in no log line and no page.
/// </summary>
public sealed class ServerExposureTests
{
    private const string Password = "pw-Zq81-never-shown";

    [Theory]
    [InlineData("Oracle", "", "Type Sqlite")]
    [InlineData("PostgreSql", "", "Database:ConnectionString is empty")]
    [InlineData("PostgreSql", "Host=clinic-server;Password=" + Password, "must name the server and the database")]
    [InlineData("PostgreSql", "Host=clinic-server;Database=lva;Colour=blue;Password=" + Password, "is not a PostgreSQL connection string")]
    [InlineData("Sqlite", "Host=clinic-server;Database=lva;Password=" + Password, "only for a PostgreSql server")]
    public void Unusable_database_settings_stop_the_start_with_what_to_type_and_never_the_password(string provider, string connection, string says)
    {
        var configuration = new ConfigurationBuilder().AddInMemoryCollection(new Dictionary<string, string?>
        {
            ["Database:Provider"] = provider,
            ["Database:ConnectionString"] = connection,
        }).Build();

        var problem = ClinicDatabaseOptions.From(configuration).Problem();   // what the start prints before it stops (StartRefusal)

        Assert.NotNull(problem);
        Assert.Contains(says, problem, StringComparison.Ordinal);
        Assert.DoesNotContain(Password, problem, StringComparison.Ordinal);
    }

    [Fact]
    public void The_sqlite_default_and_a_named_server_are_accepted()
    {
        foreach (var settings in new[]
                 {
                     new Dictionary<string, string?>(),
                     new Dictionary<string, string?> { ["Database:Provider"] = "postgresql", ["Database:ConnectionString"] = "Host=clinic-server;Database=lowvisionaid;Username=lva;Password=x;SSL Mode=VerifyFull" },
                 })
        {
            Assert.Null(ClinicDatabaseOptions.From(new ConfigurationBuilder().AddInMemoryCollection(settings).Build()).Problem());
        }
    }

    [Fact]
    [Trait("Category", TestServer.ServerOnlyCategory)]
    public async Task With_a_server_database_every_page_needs_sign_in_and_the_password_is_in_no_log_line_and_no_page()
    {
        TestServer.Require();
        using var app = new ClinicApp("server-exposure", loadDemo: true) { SignInOnServer = false };
        using var signedOut = app.NewClient();

        // Sign-in is required although the app listens on this computer only and Access says nothing.
        using var clients = await signedOut.Http.GetAsync(new Uri("/Clients", UriKind.Relative));
        Assert.Equal(HttpStatusCode.Redirect, clients.StatusCode);
        Assert.StartsWith("/Account/SignIn", clients.Headers.Location!.PathAndQuery(), StringComparison.Ordinal);

        // The first administrator, then the pages an administrator sees, the backup page (which names the server) among them.
        await Accounts.CreateFirstAdministratorAsync(signedOut);
        using var signIn = await Accounts.SignInAsync(signedOut, Accounts.AdminName, Accounts.AdminPassword);
        Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        var pages = new List<string>();
        foreach (var url in new[] { "/", "/Clients", "/Admin/Backup", "/Admin/Users", "/Settings", "/no-such-page" })
        {
            using var response = await signedOut.Http.GetAsync(new Uri(url, UriKind.Relative));
            pages.Add(await response.Content.ReadAsStringAsync());
        }

        var password = new NpgsqlConnectionStringBuilder(app.ServerDatabase!).Password!;
        Assert.False(string.IsNullOrEmpty(password), "the test server asks for a password");
        Assert.Contains(app.Logs.Lines, l => l.Contains("sign-in required (shared database)", StringComparison.Ordinal));
        Assert.Contains(app.Logs.Lines, l => l.Contains("PostgreSQL database", StringComparison.Ordinal));
        Assert.DoesNotContain(app.Logs.Lines, l => l.Contains(password, StringComparison.Ordinal));
        Assert.All(pages, p => Assert.DoesNotContain(password, p, StringComparison.Ordinal));
        Assert.Contains(pages, p => p.Contains("pg_dump", StringComparison.Ordinal));
    }

    [Fact]
    [Trait("Category", TestServer.ServerOnlyCategory)]
    public void TLS_asked_for_in_the_connection_string_is_required_of_the_server()
    {
        // The test server speaks no TLS: a setting that requires it must stop the start, not fall back to plain text.
        TestServer.Require();
        var database = TestServer.CreateDatabase();
        try
        {
            using var app = new ClinicApp("server-tls", loadDemo: false, settings: new Dictionary<string, string?>
            {
                ["Database:Provider"] = nameof(DatabaseProvider.PostgreSql),
                ["Database:ConnectionString"] = database + ";SSL Mode=Require",
            });

            var failed = Record.Exception(() => app.Services);

            Assert.NotNull(failed);
            var chain = string.Join(" / ", Causes(failed).Select(e => e.Message));
            Assert.Contains("SSL", chain, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain(new NpgsqlConnectionStringBuilder(database).Password!, chain, StringComparison.Ordinal);
        }
        finally
        {
            TestServer.DropDatabase(database);
        }
    }

    private static IEnumerable<Exception> Causes(Exception error)
    {
        for (Exception? e = error; e is not null; e = e.InnerException)
        {
            yield return e;
        }
    }
}
