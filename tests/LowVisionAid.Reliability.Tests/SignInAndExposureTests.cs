using System.Net;
using LowVisionAid.Data.Access;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.Web.Pages.Account;
using LowVisionAid.Web.Security;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests;

/// <summary>Loopback by default; the network only by explicit setting and then with sign-in; roles; lockout; first run.</summary>
public sealed class SignInAndExposureTests
{
    [Theory]
    [InlineData("http://127.0.0.1:5080", true)]
    [InlineData("http://127.5.6.7:80", true)]
    [InlineData("http://localhost:5080", true)]
    [InlineData("http://[::1]:5080", true)]
    [InlineData("http://0.0.0.0:5080", false)]
    [InlineData("http://*:5080", false)]
    [InlineData("http://+:5080", false)]
    [InlineData("http://[::]:5080", false)]
    [InlineData("http://192.168.1.20:5080", false)]
    [InlineData("https://clinic-pc.local:5443", false)]
    public void Only_loopback_addresses_count_as_this_computer(string url, bool loopback) =>
        Assert.Equal(loopback, NetworkExposure.IsLoopbackUrl(url));

    [Fact]
    public void A_network_address_without_the_explicit_setting_stops_the_start_with_a_message_that_says_what_to_set()
    {
        var configuration = new ConfigurationBuilder().AddInMemoryCollection(new Dictionary<string, string?> { ["urls"] = "http://0.0.0.0:5080" }).Build();

        var refusal = Assert.Throws<InvalidOperationException>(() => NetworkExposure.Validate(configuration, AccessSettings.From(configuration)));

        Assert.Contains("Access:AllowLan=true", refusal.Message, StringComparison.Ordinal);
        Assert.Contains("0.0.0.0", refusal.Message, StringComparison.Ordinal);
    }

    // Run as the real process: the start must end with the one message and a non-zero exit code, not a crash
    // (an unhandled exception prints a stack trace and ends with SIGABRT, exit code 134). The app never listens here.
    [Fact]
    public async Task The_app_refuses_to_start_on_a_network_address_with_one_clear_message_and_no_stack_trace()
    {
        using var data = new TempFolder("lan-refused");

        var (exitCode, output) = await AppProcess.RunToExitAsync(data.Path, ["--urls", "http://0.0.0.0:" + AppProcess.FreeLoopbackPort()], TimeSpan.FromSeconds(90));

        Assert.NotNull(exitCode);
        Assert.NotEqual(0, exitCode);
        Assert.NotEqual(134, exitCode);
        Assert.Contains("Access:AllowLan=true", output, StringComparison.Ordinal);
        Assert.Contains("0.0.0.0", output, StringComparison.Ordinal);
        Assert.DoesNotContain("Unhandled exception", output, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", output, StringComparison.Ordinal);
        Assert.Single(output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
    }

    [Fact]
    public async Task Allowing_the_network_turns_sign_in_on_even_when_it_was_not_asked_for()
    {
        using var app = new ClinicApp("lan-allowed", settings: new Dictionary<string, string?> { ["Access:AllowLan"] = "true", ["Access:RequireSignIn"] = "false" });
        using var client = app.NewClient();

        using var response = await client.Http.GetAsync(new Uri("/Clients", UriKind.Relative));

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.StartsWith("/Account/SignIn", response.Headers.Location!.PathAndQuery(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_request_from_another_computer_is_refused_when_the_network_is_not_allowed()
    {
        using var app = new ClinicApp("lan-request");
        using var client = app.NewClient();
        await client.GetPageAsync("/");

        var context = await app.Server.SendAsync(c =>
        {
            c.Request.Method = "GET";
            c.Request.Path = "/Clients";
            c.Connection.RemoteIpAddress = IPAddress.Parse("192.168.1.20");
        });

        Assert.Equal(StatusCodes.Status403Forbidden, context.Response.StatusCode);
    }

    [Fact]
    public async Task With_sign_in_on_every_clinic_page_sends_an_anonymous_visitor_to_sign_in()
    {
        using var app = new ClinicApp("signin-required", settings: Accounts.SignInOn);
        using var client = app.NewClient();

        foreach (var url in new[] { "/", "/Clients", "/Clients/New", "/Clients/1", "/Clients/1/Export", "/Admin/Audit", "/Admin/Backup", "/Admin/Users" })
        {
            using var response = await client.Http.GetAsync(new Uri(url, UriKind.Relative));
            Assert.True(response.StatusCode == HttpStatusCode.Redirect, $"{url} gave {(int)response.StatusCode}");
            Assert.StartsWith("/Account/SignIn", response.Headers.Location!.PathAndQuery(), StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task The_first_run_page_makes_one_administrator_from_this_computer_and_then_is_gone()
    {
        using var app = new ClinicApp("first-run", settings: Accounts.SignInOn);
        using var client = app.NewClient();
        var fromLan = await app.Server.SendAsync(c =>
        {
            c.Request.Method = "GET";
            c.Request.Path = "/Admin/FirstRun";
            c.Connection.RemoteIpAddress = IPAddress.Parse("10.0.0.7");
        });

        await Accounts.CreateFirstAdministratorAsync(client);
        var usersPage = await client.GetPageAsync("/Admin/Users");
        using var again = await client.Http.GetAsync(new Uri("/Admin/FirstRun", UriKind.Relative));

        Assert.Equal(StatusCodes.Status403Forbidden, fromLan.Response.StatusCode);
        Assert.Contains(Accounts.AdminName, usersPage, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.NotFound, again.StatusCode);
        var roles = await app.ServiceAsync(async sp =>
        {
            var users = sp.GetRequiredService<UserManager<IdentityUser>>();
            return await users.GetRolesAsync((await users.FindByNameAsync(Accounts.AdminName))!);
        });
        Assert.Equal([ClinicRoles.Administrator], roles);
    }

    [Fact]
    public async Task Passwords_are_stored_only_as_salted_hashes()
    {
        using var app = new ClinicApp("hash", settings: Accounts.SignInOn);
        using var client = app.NewClient();
        await Accounts.CreateFirstAdministratorAsync(client);

        var user = await app.ServiceAsync(async sp => (await sp.GetRequiredService<UserManager<IdentityUser>>().FindByNameAsync(Accounts.AdminName))!);
        var wal = app.Data.DatabasePath + "-wal";
        var databaseBytes = app.ServerDatabase is null
            ? await File.ReadAllBytesAsync(app.Data.DatabasePath)
            : System.Text.Encoding.UTF8.GetBytes(string.Join('\n', DatabaseDump.Read(app).SelectMany(t => t.Value)));   // every row of the server database
        var walBytes = File.Exists(wal) ? await File.ReadAllBytesAsync(wal) : [];

        Assert.NotNull(user.PasswordHash);
        Assert.DoesNotContain(Accounts.AdminPassword, user.PasswordHash, StringComparison.Ordinal);
        Assert.Equal(PasswordVerificationResult.Success, new PasswordHasher<IdentityUser>().VerifyHashedPassword(user, user.PasswordHash, Accounts.AdminPassword));
        Assert.Equal(-1, databaseBytes.AsSpan().IndexOf(System.Text.Encoding.UTF8.GetBytes(Accounts.AdminPassword)));
        Assert.Equal(-1, walBytes.AsSpan().IndexOf(System.Text.Encoding.UTF8.GetBytes(Accounts.AdminPassword)));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Five_wrong_passwords_lock_the_account_so_even_the_right_one_is_refused()
    {
        using var app = new ClinicApp("lockout", settings: Accounts.SignInOn);
        using (var setup = app.NewClient())
        {
            await Accounts.CreateFirstAdministratorAsync(setup);
        }

        using var client = app.NewClient();
        for (var i = 0; i < 5; i++)
        {
            using var wrong = await Accounts.SignInAsync(client, Accounts.AdminName, "not the password " + i);
            Assert.Equal(HttpStatusCode.OK, wrong.StatusCode);
        }

        using var right = await Accounts.SignInAsync(client, Accounts.AdminName, Accounts.AdminPassword);
        var body = System.Net.WebUtility.HtmlDecode(await right.Content.ReadAsStringAsync());

        // Refused with the one answer every failed sign-in gets, which does not say whether the account exists
        Assert.Equal(HttpStatusCode.OK, right.StatusCode);
        Assert.Contains(SignInModel.Refused, body, StringComparison.Ordinal);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_made_up_name_and_a_real_account_get_the_same_answer_before_and_after_lockout()
    {
        using var app = new ClinicApp("same-answer", settings: Accounts.SignInOn);
        using (var setup = app.NewClient())
        {
            await Accounts.CreateFirstAdministratorAsync(setup);
        }

        using var client = app.NewClient();
        var real = new List<string>();
        var madeUp = new List<string>();
        for (var i = 0; i < 6; i++)
        {
            real.Add(await RefusalAsync(client, Accounts.AdminName, "not the password " + i));
            madeUp.Add(await RefusalAsync(client, "no.such.person", "not the password " + i));
        }

        // Every answer, real or made up, before and after the real account locked, is the same sentence
        Assert.All(real.Concat(madeUp), a => Assert.Equal(SignInModel.Refused, a));
        Assert.True(await app.ServiceAsync(async sp =>
        {
            var users = sp.GetRequiredService<UserManager<IdentityUser>>();
            return await users.IsLockedOutAsync((await users.FindByNameAsync(Accounts.AdminName))!);
        }), "The real account should be locked by now, or the test shows nothing about the lockout answer.");

        static async Task<string> RefusalAsync(FormClient client, string name, string password)
        {
            using var response = await Accounts.SignInAsync(client, name, password);
            var body = System.Net.WebUtility.HtmlDecode(await response.Content.ReadAsStringAsync());
            Assert.Equal(HttpStatusCode.OK, response.StatusCode);
            var match = System.Text.RegularExpressions.Regex.Match(body, "The user name or password[^<]*");
            return match.Success ? match.Value.Trim() : "(no refusal on the page)";
        }
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_teacher_can_see_records_but_cannot_export_or_erase_and_a_clinician_can()
    {
        using var app = new ClinicApp("roles", settings: Accounts.SignInOn);
        using (var admin = app.NewClient())
        {
            await Accounts.CreateFirstAdministratorAsync(admin);
            await Accounts.AddAccountAsync(admin, "t.teacher", "teacher password 1", ClinicRoles.Teacher);
            await Accounts.AddAccountAsync(admin, "c.clinician", "clinician password 1", ClinicRoles.Clinician);
        }

        using var teacher = app.NewClient();
        using (var signIn = await Accounts.SignInAsync(teacher, "t.teacher", "teacher password 1"))
        {
            Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        }

        await teacher.GetPageAsync("/Clients/1");
        using var teacherExport = await teacher.Http.GetAsync(new Uri("/Clients/1/Export", UriKind.Relative));
        using var teacherErase = await teacher.Http.GetAsync(new Uri("/Clients/1/Erase", UriKind.Relative));
        using var teacherAdmin = await teacher.Http.GetAsync(new Uri("/Admin/Audit", UriKind.Relative));

        using var clinician = app.NewClient();
        using (var signIn = await Accounts.SignInAsync(clinician, "c.clinician", "clinician password 1"))
        {
            Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        }

        using var clinicianExport = await clinician.PostFormAsync("/Clients/1/Export", [], handler: "Json");

        foreach (var refused in new[] { teacherExport, teacherErase, teacherAdmin })
        {
            Assert.Equal(HttpStatusCode.Redirect, refused.StatusCode);
            Assert.StartsWith("/Account/NotAllowed", refused.Headers.Location!.PathAndQuery(), StringComparison.Ordinal);
        }

        Assert.Equal(HttpStatusCode.OK, clinicianExport.StatusCode);
        Assert.Equal("application/json", clinicianExport.Content.Headers.ContentType?.MediaType);
    }

    [Theory]
    [InlineData("/Clients/Erase", null, true)]
    [InlineData("/Kit/Index", "Export", true)]
    [InlineData("/Settings/Index", "RemoveDemo", true)]
    [InlineData("/Visits/Edit", "Delete", true)]
    [InlineData("/Visits/Edit", null, false)]
    [InlineData("/Clients/New", null, false)]
    public void Handlers_and_pages_named_for_deletion_or_export_are_kept_from_teachers(string page, string? handler, bool restricted) =>
        Assert.Equal(restricted, TeacherRestrictionFilter.IsRestricted(page, handler));
}
