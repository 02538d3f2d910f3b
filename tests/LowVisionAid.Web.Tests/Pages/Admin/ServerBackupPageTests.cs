using System.Net;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Audit;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Pages.Admin;
using LowVisionAid.Web.Tests.Support;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Npgsql;

namespace LowVisionAid.Web.Tests.Pages.Admin;

/// <summary>
/// The backup page on a shared PostgreSQL server: no take-backup, restore or upload controls (the app's backups copy
/// a SQLite file), the pg_dump and pg_restore commands for this server instead (without the password), and a post to
/// those handlers refused with the page's message, not a server error. On SQLite the page is as before
/// (BackupRestoreTests, RoleLinksTests).
/// </summary>
[Trait("Category", TestServer.ServerOnlyCategory)]
public sealed class ServerBackupPageTests
{
    private const string AdminName = "backup.admin";
    private const string AdminPassword = "a long test password";

    [Fact]
    public async Task On_a_server_the_page_gives_the_pg_dump_and_pg_restore_commands_for_it_and_no_backup_controls()
    {
        TestServer.Require();
        using var app = new ClinicApp();
        using var browser = await SignedInAdministratorAsync(app);
        var server = new NpgsqlConnectionStringBuilder(app.ServerDatabase);

        using var response = await browser.GetAsync(new Uri("/Admin/Backup", UriKind.Relative));
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var commands = PageHtml.Texts(html, "li code");
        var dump = Assert.Single(commands, c => c.StartsWith("pg_dump ", StringComparison.Ordinal));
        var restore = Assert.Single(commands, c => c.StartsWith("pg_restore ", StringComparison.Ordinal));
        foreach (var command in new[] { dump, restore })
        {
            Assert.Contains($"-h {server.Host} -p {server.Port} -U {server.Username}", command, StringComparison.Ordinal);
        }

        Assert.Contains($"-d {server.Database} -Fc -f ", dump, StringComparison.Ordinal);   // custom format: pg_restore reads it
        Assert.Contains($"-d {server.Database}_restored ", restore, StringComparison.Ordinal);
        var text = PageHtml.Parse(html).Body!.TextContent;
        Assert.Contains(".pgpass", text, StringComparison.Ordinal);
        Assert.Contains("PGPASSWORD", text, StringComparison.Ordinal);
        Assert.Contains("off the server", text, StringComparison.Ordinal);
        Assert.Contains("Test a restore", text, StringComparison.Ordinal);
        Assert.DoesNotContain(server.Password!, html, StringComparison.Ordinal);

        // No control of the SQLite backups: the only form left is the layout's sign-out
        Assert.Equal(["/Account/SignOut"], PageHtml.Forms(html).Select(f => f.Action));
        Assert.DoesNotContain("type=\"file\"", html, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("Take")]
    [InlineData("Restore")]
    [InlineData("Upload")]
    public async Task On_a_server_a_post_to_take_or_restore_a_backup_is_refused_with_the_message_and_changes_nothing(string handler)
    {
        TestServer.Require();
        using var app = new ClinicApp();
        using var browser = await SignedInAdministratorAsync(app);
        var page = await (await browser.GetAsync(new Uri("/Admin/Backup", UriKind.Relative))).Content.ReadAsStringAsync();
        var auditBefore = await app.WithDbAsync(db => db.AuditEntries.CountAsync());

        using var response = await browser.PostFormAsync($"/Admin/Backup?handler={handler}", page,
            new Dictionary<string, string> { ["Name"] = "lowvisionaid-20261201-manual.db", ["Confirm"] = "true" });
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.Conflict, response.StatusCode);
        Assert.Contains(ServerBackupAdvice.Refusal, PageHtml.Texts(html, ".error-summary").Single(), StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(app.DataFolder, "backups")) && Directory.EnumerateFiles(Path.Combine(app.DataFolder, "backups")).Any(),
            "A backup file was written on a server database.");
        Assert.Equal(auditBefore, await app.WithDbAsync(db => db.AuditEntries.CountAsync()));
        Assert.Equal(0, await app.WithDbAsync(db => db.AuditEntries.CountAsync(e => e.Action == AuditAction.BackedUp || e.Action == AuditAction.Restored)));
    }

    private static async Task<HttpClient> SignedInAdministratorAsync(ClinicApp app)
    {
        await using (var scope = app.Services.CreateAsyncScope())
        {
            var users = scope.ServiceProvider.GetRequiredService<UserManager<IdentityUser>>();
            var user = new IdentityUser(AdminName);
            Assert.True((await users.CreateAsync(user, AdminPassword)).Succeeded);
            Assert.True((await users.AddToRoleAsync(user, ClinicRoles.Administrator)).Succeeded);
        }

        var browser = app.Browser();
        using var signIn = await browser.SubmitAsync("/Account/SignIn", new Dictionary<string, string> { ["Input.UserName"] = AdminName, ["Input.Password"] = AdminPassword });
        Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        return browser;
    }
}
