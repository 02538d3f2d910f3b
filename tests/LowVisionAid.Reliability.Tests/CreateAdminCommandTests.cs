using LowVisionAid.TestSupport;
using System.Diagnostics;
using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.Web.Security;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// The documented command that creates an administrator: <c>create-admin --user &lt;name&gt;</c>, password on
/// standard input, checked by Identity's rules, an existing name refused, one audit line, no web server started.
/// </summary>
public sealed class CreateAdminCommandTests
{
    private const string Password = "a sentence long enough";

    [Fact]
    [Trait("Category", TestServer.SqliteFileCategory)]   // the process opens the data folder's SQLite file
    [Trait("Category", "Slow")]
    public async Task Run_as_a_process_with_the_password_piped_it_creates_an_administrator_who_can_sign_in_and_exits_without_serving()
    {
        // Arrange
        using var data = new TempFolder("create-admin");

        // Act
        var run = await RunProcessAsync(data.Path, "first.admin", Password + "\n");

        // Assert: exited by itself with 0 (a started server would never exit), and the account works for sign-in
        Assert.True(run.ExitCode == CreateAdminCommand.Created, run.Errors);
        Assert.Contains("Administrator first.admin created.", run.Output, StringComparison.Ordinal);
        Assert.DoesNotContain(Password, run.Output + run.Errors, StringComparison.Ordinal);
        using var app = new ClinicApp("create-admin-app", loadDemo: false, settings: Accounts.SignInOn, data: data);
        using var client = app.NewClient();
        using var signIn = await Accounts.SignInAsync(client, "first.admin", Password);
        Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        Assert.Contains("first.admin", await client.GetPageAsync("/Admin/Users"), StringComparison.Ordinal);
        var line = await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().AuditEntries.AsNoTracking().SingleAsync(e => e.RecordType == "User" && e.Action == AuditAction.Created));
        Assert.StartsWith("create-admin command", line.Actor, StringComparison.Ordinal);
        Assert.Equal("Account first.admin with role Administrator", line.Detail);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Run_again_for_the_same_name_it_refuses_and_leaves_the_account_as_it_was()
    {
        using var data = new TempFolder("create-admin-twice");
        var first = await RunProcessAsync(data.Path, "same.admin", Password + "\n");
        Assert.Equal(CreateAdminCommand.Created, first.ExitCode);
        var hashBefore = await PasswordHashAsync(data.Path, "same.admin");

        var second = await RunProcessAsync(data.Path, "same.admin", "another long password\n");

        Assert.Equal(CreateAdminCommand.Refused, second.ExitCode);
        Assert.Contains("An account named same.admin already exists; nothing was changed.", second.Errors, StringComparison.Ordinal);
        Assert.Equal(hashBefore, await PasswordHashAsync(data.Path, "same.admin"));
    }

    [Theory]
    [InlineData("short", "Type a password of at least 10 characters")]
    [InlineData("", "Type a password of at least 10 characters")]
    public async Task A_password_the_rules_refuse_creates_nothing_and_says_what_to_type(string password, string message)
    {
        using var app = new ClinicApp("create-admin-short", loadDemo: false);
        using var output = new StringWriter();
        using var errors = new StringWriter();

        var code = await CreateAdminCommand.RunAsync(app.Services, new AdminCommandLine("short.admin", []), _ => password, askTwice: false, output, errors, CancellationToken.None);

        Assert.Equal(CreateAdminCommand.Refused, code);
        Assert.Contains(message, errors.ToString(), StringComparison.Ordinal);
        Assert.Equal(0, await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().Users.CountAsync()));
    }

    [Fact]
    public async Task At_a_terminal_two_different_passwords_create_nothing()
    {
        using var app = new ClinicApp("create-admin-mismatch", loadDemo: false);
        using var output = new StringWriter();
        using var errors = new StringWriter();
        var answers = new Queue<string>([Password, Password + "x"]);

        var code = await CreateAdminCommand.RunAsync(app.Services, new AdminCommandLine("two.admin", []), _ => answers.Dequeue(), askTwice: true, output, errors, CancellationToken.None);

        Assert.Equal(CreateAdminCommand.Refused, code);
        Assert.Contains("The two passwords were not the same", errors.ToString(), StringComparison.Ordinal);
        Assert.Equal(0, await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().Users.CountAsync()));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_user_name_the_rules_refuse_creates_nothing_and_says_what_to_type()
    {
        using var app = new ClinicApp("create-admin-name", loadDemo: false);
        using var output = new StringWriter();
        using var errors = new StringWriter();

        var code = await CreateAdminCommand.RunAsync(app.Services, new AdminCommandLine("no spaces allowed", []), _ => Password, askTwice: false, output, errors, CancellationToken.None);

        Assert.Equal(CreateAdminCommand.Refused, code);
        Assert.Contains("Type a user name of 1 to 60 letters, digits, dots, dashes or underscores", errors.ToString(), StringComparison.Ordinal);
        Assert.Equal(0, await app.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().Users.CountAsync()));
    }

    [Fact]
    public void The_command_line_gives_the_user_name_and_passes_every_other_setting_to_the_host()
    {
        var parsed = AdminCommandLine.Parse(["create-admin", "--DataFolder", "/tmp/x", "--user", "a.khan", "--Access:RequireSignIn=true"]);

        Assert.NotNull(parsed);
        Assert.Equal("a.khan", parsed.UserName);
        Assert.Equal(["--DataFolder", "/tmp/x", "--Access:RequireSignIn=true"], parsed.HostArgs);
        Assert.Null(AdminCommandLine.Parse(["--urls", "http://127.0.0.1:5080"]));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Without_a_user_name_it_shows_how_to_run_it_and_exits_with_the_usage_code()
    {
        using var data = new TempFolder("create-admin-usage");

        var run = await RunProcessAsync(data.Path, userName: null, "");

        Assert.Equal(CreateAdminCommand.Usage, run.ExitCode);
        Assert.Contains("create-admin --user <name>", run.Errors, StringComparison.Ordinal);
    }

    private static async Task<string?> PasswordHashAsync(string folder, string name)
    {
        await using var db = TwoContextSchema.Context(folder);
        return await db.Users.AsNoTracking().Where(u => u.UserName == name).Select(u => u.PasswordHash).SingleAsync();
    }

    private sealed record Run(int ExitCode, string Output, string Errors);

    // The built app as a process, as an administrator would run it; bounded so that a server that started by mistake fails the test.
    private static async Task<Run> RunProcessAsync(string dataFolder, string? userName, string stdin)
    {
        var dll = AppProcess.WebAssemblyPath();
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add(dll);
        start.ArgumentList.Add("create-admin");
        if (userName is not null)
        {
            start.ArgumentList.Add("--user");
            start.ArgumentList.Add(userName);
        }

        start.ArgumentList.Add("--DataFolder");
        start.ArgumentList.Add(dataFolder);
        start.ArgumentList.Add("--urls");
        start.ArgumentList.Add($"http://127.0.0.1:{AppProcess.FreeLoopbackPort()}");
        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var errors = process.StandardError.ReadToEndAsync();
        await process.StandardInput.WriteAsync(stdin);
        process.StandardInput.Close();
        using var bound = new CancellationTokenSource(TimeSpan.FromSeconds(90));
        try
        {
            await process.WaitForExitAsync(bound.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("The command did not exit within 90 s: it may have started the web server.");
        }

        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        return new Run(process.ExitCode, await output, await errors);
    }
}
