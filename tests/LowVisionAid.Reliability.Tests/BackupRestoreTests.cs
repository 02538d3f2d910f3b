using LowVisionAid.TestSupport;
using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Data.Backup;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests;

/// <summary>Online backup, checked restore, and the automatic backup before a migration.</summary>
[Trait("Category", TestServer.SqliteFileCategory)]   // backups of the SQLite file (a server is backed up with pg_dump)
public sealed class BackupRestoreTests
{
    [Fact]
    public async Task Backup_then_restore_gives_back_exactly_the_data_at_the_time_of_the_backup()
    {
        // Arrange: the demo clinic plus clients added through the form
        using var app = new ClinicApp("backup-restore");
        using var client = app.NewClient();
        for (var i = 0; i < 5; i++)
        {
            await ClinicForms.AddClientAsync(client, $"BR-{i:000}", $"Invented Person {i}", "1950", $"Notes {i}");
        }

        var atBackup = DatabaseDump.Read(app.Data.DatabasePath);

        // Act: back up, change the data, restore
        using (var take = await client.PostFormAsync("/Admin/Backup", [], handler: "Take"))
        {
            Assert.Equal(HttpStatusCode.OK, take.StatusCode);
        }

        var backup = Assert.Single(app.Service(sp => sp.GetRequiredService<DatabaseBackups>().List()));
        await ClinicForms.AddClientAsync(client, "BR-LATER", "Added after the backup");
        using (var erase = await client.PostFormAsync("/Clients/1/Erase", [new("Confirmation", atBackupCode(atBackup))]))
        {
            Assert.Equal(HttpStatusCode.OK, erase.StatusCode);
        }

        Assert.NotEqual(atBackup["Clients"], DatabaseDump.Read(app.Data.DatabasePath)["Clients"]);
        using var restore = await client.PostFormAsync("/Admin/Backup", [new("Name", backup.Name), new("Confirm", "true")], handler: "Restore");
        var restoreBody = await restore.Content.ReadAsStringAsync();
        var afterRestore = DatabaseDump.Read(app.Data.DatabasePath);

        // Assert: every table identical, the audit trail as it was plus the line recording the restore
        Assert.Contains("Restored " + backup.Name, restoreBody, StringComparison.Ordinal);
        foreach (var table in atBackup.Keys.Where(t => t != AuditEntry.Table))
        {
            Assert.Equal(atBackup[table], afterRestore[table]);
        }

        Assert.Equal(atBackup[AuditEntry.Table], afterRestore[AuditEntry.Table].Take(atBackup[AuditEntry.Table].Count));
        Assert.Contains("Action=Restored", Assert.Single(afterRestore[AuditEntry.Table].Skip(atBackup[AuditEntry.Table].Count)), StringComparison.Ordinal);
        Assert.True(DatabaseDump.RowCount(atBackup) > 20, "The comparison covered too few rows to mean much.");
        Assert.Equal("ok", DatabaseBackups.IntegrityCheck(app.Data.DatabasePath));

        static string atBackupCode(SortedDictionary<string, List<string>> dump) =>
            dump["Clients"][0].Split('|').First(f => f.StartsWith("Code=", StringComparison.Ordinal))["Code=".Length..];
    }

    [Fact]
    public async Task A_damaged_backup_is_refused_with_a_message_and_the_live_data_is_untouched()
    {
        using var app = new ClinicApp("restore-damaged");
        using var client = app.NewClient();
        using (await client.PostFormAsync("/Admin/Backup", [], handler: "Take"))
        {
        }

        var backups = app.Service(sp => sp.GetRequiredService<DatabaseBackups>());
        var good = Assert.Single(backups.List());
        var damaged = Path.Combine(app.Data.Path, "damaged.db");
        var bytes = await File.ReadAllBytesAsync(good.Path);
        Assert.True(bytes.Length >= 4 * 4096, "The backup is too small to damage its inner pages.");
        for (var i = 2 * 4096 + 8; i < 4 * 4096; i += 7)
        {
            bytes[i] ^= 0x5A;
        }

        await File.WriteAllBytesAsync(damaged, bytes);
        var before = DatabaseDump.Read(app.Data.DatabasePath);

        using var form = new MultipartFormDataContent();
        var page = await client.GetPageAsync("/Admin/Backup");
        form.Add(new StringContent(FormClient.Token(page)!), FormClient.TokenField);
        form.Add(new StringContent("true"), "Confirm");
        form.Add(new ByteArrayContent(bytes), "upload", "damaged.db");
        using var response = await client.Http.PostAsync(new Uri("/Admin/Backup?handler=Upload", UriKind.Relative), form);
        var body = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Matches("damaged|cannot be read", body);
        Assert.False(DatabaseBackups.Check(damaged, Known(app)).CanRestore);
        Assert.Equal(before, DatabaseDump.Read(app.Data.DatabasePath));
    }

    [Fact]
    public async Task A_backup_from_a_newer_version_or_another_kind_of_file_is_refused_before_anything_is_replaced()
    {
        using var app = new ClinicApp("restore-schema");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var backups = app.Service(sp => sp.GetRequiredService<DatabaseBackups>());
        var newer = backups.Create("test");
        DatabaseDump.Execute(newer.Path, "INSERT INTO \"__EFMigrationsHistory\" VALUES ('29991231235959_FromALaterVersion', '99.0.0')");
        var other = Path.Combine(app.Data.Path, "other.db");
        DatabaseDump.Execute(other, "CREATE TABLE notes (text TEXT); INSERT INTO notes VALUES ('x')");
        var text = Path.Combine(app.Data.Path, "text.db");
        await File.WriteAllTextAsync(text, "this is not a database at all, just some text in a file with a .db name");
        var before = DatabaseDump.Read(app.Data.DatabasePath);

        var newerCheck = await backups.RestoreAsync(newer.Path, Known(app), CancellationToken.None);
        var otherCheck = await backups.RestoreAsync(other, Known(app), CancellationToken.None);
        var textCheck = await backups.RestoreAsync(text, Known(app), CancellationToken.None);

        Assert.False(newerCheck.CanRestore);
        Assert.Contains("newer version", newerCheck.Message, StringComparison.Ordinal);
        Assert.False(otherCheck.CanRestore);
        Assert.Contains("not a LowVisionAid database", otherCheck.Message, StringComparison.Ordinal);
        Assert.False(textCheck.CanRestore);
        Assert.Contains("cannot be read", textCheck.Message, StringComparison.Ordinal);
        Assert.Equal(before, DatabaseDump.Read(app.Data.DatabasePath));
    }

    [Fact]
    public async Task Starting_on_a_database_with_pending_migrations_takes_a_backup_of_it_first()
    {
        // Arrange: a database as an earlier version left it (clinic schema only, no sign-in or audit tables yet), with one client
        using var data = new TempFolder("pre-migration");
        await TwoContextSchema.BuildAsync(data.Path, TwoContextSchema.ClinicMigrationThen, withAccess: false);
        await using (var db = TwoContextSchema.Context(data.Path))
        {
            TwoContextSchema.AddEarlierClient(db, "OLD-001", "Invented Earlier Client");
            await db.SaveChangesAsync();
        }

        SqliteConnection.ClearAllPools();
        var old = DatabaseDump.Read(data.DatabasePath);

        // Act
        using var app = new ClinicApp("pre-migration", data: data);
        using var client = app.NewClient();
        await client.GetPageAsync("/");

        // Assert: one automatic backup, identical to the database before the upgrade
        var backups = app.Service(sp => sp.GetRequiredService<DatabaseBackups>().List());
        var automatic = Assert.Single(backups);
        Assert.EndsWith("-before-migration.db", automatic.Name, StringComparison.Ordinal);
        Assert.Equal(old, DatabaseDump.Read(automatic.Path));
        Assert.DoesNotContain("AspNetUsers", DatabaseDump.Read(automatic.Path).Keys);
        Assert.Contains("AspNetUsers", DatabaseDump.Read(data.DatabasePath).Keys);
    }

    [Fact]
    public async Task Starting_on_an_up_to_date_database_takes_no_backup()
    {
        using var data = new TempFolder("no-migration");
        using (var first = new ClinicApp("no-migration-1", data: data))
        {
            using var client = first.NewClient();
            await client.GetPageAsync("/");
        }

        using var second = new ClinicApp("no-migration-2", data: data);
        using var again = second.NewClient();
        await again.GetPageAsync("/");

        Assert.Empty(second.Service(sp => sp.GetRequiredService<DatabaseBackups>().List()));
    }

    private static IReadOnlySet<string> Known(ClinicApp app) =>
        app.Service(sp => sp.GetRequiredService<ClinicDbContext>().KnownMigrations());
}
