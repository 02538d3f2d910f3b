using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Entities;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Pages.Admin;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Npgsql;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// The backup the backup page tells a server's administrator to take, restored as it says: <c>pg_dump -Fc</c> of a
/// filled clinic database, <c>pg_restore</c> into a new empty database, and every table's row count and checksum
/// equal; the app then starts on the restored database with nothing to migrate and its accounts working.
/// </summary>
[Trait("Category", TestServer.ServerOnlyCategory)]
public sealed class ServerBackupRoundTripTests(ITestOutputHelper output)
{
    [Fact]
    public async Task A_pg_dump_of_a_filled_clinic_restored_with_pg_restore_into_an_empty_database_has_every_table_equal()
    {
        TestServer.Require();
        using var folder = new TempFolder("server-backup");
        var dumpFile = Path.Combine(folder.Path, "clinic.dump");
        string? restored = null;
        try
        {
            // Arrange: the demo clinic, an administrator, a client and a visit added through the forms (with their audit lines)
            using var app = new ClinicApp("server-backup-source", loadDemo: true) { SignInOnServer = false };   // the test makes its own first administrator
            using (var browser = app.NewClient())
            {
                await Accounts.CreateFirstAdministratorAsync(browser);
                using var signIn = await Accounts.SignInAsync(browser, Accounts.AdminName, Accounts.AdminPassword);
                Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
                var clientId = await ClinicForms.AddClientAsync(browser, "SB-001", "Invented Person", "1951", "Added before the backup");
                await ClinicForms.AddVisitAsync(browser, clientId, ("Input.Practitioner", "Invented Practitioner"));
            }

            var source = app.ServerDatabase!;
            var password = new NpgsqlConnectionStringBuilder(source).Password!;
            var advice = new ServerBackupAdvice(source, new DateOnly(2026, 12, 3));
            var before = await ServerTables.ReadAsync(source);

            // Act: the page's own commands, the password in the environment only
            await PostgresTools.RunAsync(ServerBackupAdvice.DumpTool, advice.DumpArguments(dumpFile), password, advice.Environment);
            restored = TestServer.CreateDatabase(migrated: false);
            var restoredName = new NpgsqlConnectionStringBuilder(restored).Database!;
            await PostgresTools.RunAsync(ServerBackupAdvice.RestoreTool, advice.RestoreArguments(restoredName, dumpFile), password, advice.Environment);

            // Assert: the source did not change meanwhile, and the copy is equal table by table and sequence by sequence
            var after = await ServerTables.ReadAsync(source);
            var copy = await ServerTables.ReadAsync(restored);
            Assert.Equal(before, after);
            Assert.Equal(before.Keys, copy.Keys);
            foreach (var (name, figures) in before)
            {
                Assert.True(figures == copy[name], $"{name}: {figures} in the source, {copy[name]} in the restored copy");
            }

            foreach (var filled in new[] { "Clients", "Visits", "Plans", AuditEntry.Table, "AspNetUsers", "__EFMigrationsHistory" })
            {
                Assert.True(before["table " + filled].Rows > 0, $"Table {filled} was empty: the round trip would prove little about it.");
            }

            var rows = before.Where(f => f.Key.StartsWith("table ", StringComparison.Ordinal)).Sum(f => f.Value.Rows);
            output.WriteLine($"pg_dump -Fc ({new FileInfo(dumpFile).Length / 1024.0:0} KB) and pg_restore: {before.Count(f => f.Key.StartsWith("table ", StringComparison.Ordinal))} tables, {rows} rows, {before.Count(f => f.Key.StartsWith("sequence ", StringComparison.Ordinal))} sequences equal");

            // The app on the restored database: nothing to migrate, the administrator signs in, a new client gets the next key
            app.Dispose();
            using var onCopy = new ClinicApp("server-backup-copy", loadDemo: false, settings: new Dictionary<string, string?>
            {
                ["Database:Provider"] = nameof(DatabaseProvider.PostgreSql),
                ["Database:ConnectionString"] = restored,
            });
            using var again = onCopy.NewClient();
            using var signInAgain = await Accounts.SignInAsync(again, Accounts.AdminName, Accounts.AdminPassword);
            Assert.Equal(HttpStatusCode.Redirect, signInAgain.StatusCode);
            Assert.Contains("SB-001", await again.GetPageAsync("/Clients?q=sb-001"), StringComparison.Ordinal);
            Assert.Empty(await onCopy.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().Database.GetPendingMigrationsAsync()));
            Assert.Contains(onCopy.Logs.Lines, l => l.Contains("Database schema up to date", StringComparison.Ordinal));
            var newId = await ClinicForms.AddClientAsync(again, "SB-002");
            Assert.True(newId > await onCopy.ServiceAsync(sp => sp.GetRequiredService<ClinicDbContext>().Clients.Where(c => c.Code != "SB-002").MaxAsync(c => c.Id)));
        }
        finally
        {
            if (restored is not null)
            {
                TestServer.DropDatabase(restored);
            }
        }
    }
}
