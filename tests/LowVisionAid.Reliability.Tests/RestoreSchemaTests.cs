using LowVisionAid.TestSupport;
using System.Net;
using LowVisionAid.Data.Backup;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// A file offered for restore is compared, object by object, with what this app's migrations make for the version its
/// history names; anything extra, missing or foreign is refused with what differs, and the live data is not touched.
/// Every case goes through the upload form, as a person would restore a file.
/// </summary>
[Trait("Category", TestServer.SqliteFileCategory)]   // restoring a SQLite file
public sealed class RestoreSchemaTests
{
    public static TheoryData<string, string, string> Tampering() => new()
    {
        { "CREATE TRIGGER wipe AFTER INSERT ON Clients BEGIN DELETE FROM Clients; END", "extra trigger", "wipe" },
        { "CREATE VIEW everyone AS SELECT * FROM Clients", "extra view", "everyone" },
        { "DROP TABLE Trials", "missing table", "Trials" },
        { "DROP INDEX IX_Plans_VisitId", "missing index", "IX_Plans_VisitId" },
        { "ALTER TABLE Clients ADD COLUMN Extra TEXT", "extra column", "Extra" },
    };

    [Theory]
    [MemberData(nameof(Tampering))]
    [Trait("Category", "Slow")]
    public async Task A_backup_with_a_schema_object_added_or_removed_is_refused_naming_it_and_nothing_changes(string tamper, string difference, string name)
    {
        // Arrange: a real backup of the running app, then one change to its schema
        using var app = new ClinicApp("restore-tampered");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var backups = app.Service(sp => sp.GetRequiredService<DatabaseBackups>());
        var file = backups.Create("test");
        DatabaseDump.Execute(file.Path, tamper);
        var bytes = await File.ReadAllBytesAsync(file.Path);
        var before = DatabaseDump.Read(app.Data.DatabasePath);
        var listed = backups.List().Count;

        // Act
        var (status, body) = await UploadAsync(client, bytes);

        // Assert: a refusal that names the difference; the live data and the backup list as they were
        Assert.Equal(HttpStatusCode.OK, status);
        Assert.DoesNotContain("Restored the uploaded backup", body, StringComparison.Ordinal);
        Assert.Contains(difference, body, StringComparison.Ordinal);
        Assert.Contains(name, body, StringComparison.Ordinal);
        Assert.Contains("Nothing was changed", body, StringComparison.Ordinal);
        Assert.Equal(before, DatabaseDump.Read(app.Data.DatabasePath));
        Assert.Equal(listed, backups.List().Count);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task After_refusing_a_backup_with_a_deleting_trigger_a_new_client_leaves_every_other_client_in_place()
    {
        using var app = new ClinicApp("restore-trigger");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var backups = app.Service(sp => sp.GetRequiredService<DatabaseBackups>());
        var file = backups.Create("test");
        DatabaseDump.Execute(file.Path, "CREATE TRIGGER wipe AFTER INSERT ON Clients BEGIN DELETE FROM Clients; END");
        var clients = DatabaseDump.Scalar(app.Data.DatabasePath, "SELECT count(*) FROM Clients");
        Assert.True(clients > 0, "The demo clinic should have clients.");

        await UploadAsync(client, await File.ReadAllBytesAsync(file.Path));
        await ClinicForms.AddClientAsync(client, "TRIG-001", "Invented After Refusal");

        Assert.Equal(clients + 1, DatabaseDump.Scalar(app.Data.DatabasePath, "SELECT count(*) FROM Clients"));
        // Only the triggers the app's own migrations make (they keep the client search index) are in the database.
        Assert.Equal(0, DatabaseDump.Scalar(app.Data.DatabasePath,
            "SELECT count(*) FROM sqlite_master WHERE type = 'trigger' AND name NOT IN ('Clients_SearchIndex_Insert', 'Clients_SearchIndex_Delete', 'Clients_SearchIndex_Update')"));
        Assert.Equal(3, DatabaseDump.Scalar(app.Data.DatabasePath, "SELECT count(*) FROM sqlite_master WHERE type = 'trigger'"));
    }

    [Fact]
    public async Task A_backup_from_a_newer_version_is_refused_as_newer()
    {
        using var app = new ClinicApp("restore-newer");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var file = app.Service(sp => sp.GetRequiredService<DatabaseBackups>()).Create("test");
        DatabaseDump.Execute(file.Path, "INSERT INTO \"__EFMigrationsHistory\" VALUES ('29991231235959_FromALaterVersion', '99.0.0')");
        var before = DatabaseDump.Read(app.Data.DatabasePath);

        var (_, body) = await UploadAsync(client, await File.ReadAllBytesAsync(file.Path));

        Assert.Contains("newer version", body, StringComparison.Ordinal);
        Assert.Equal(before, DatabaseDump.Read(app.Data.DatabasePath));
    }

    [Theory]
    [InlineData("INSERT INTO \"__EFMigrationsHistory\" VALUES ('20200101000000_SomeOtherApplication', '8.0.0')")]
    [InlineData("DELETE FROM \"__EFMigrationsHistory\" WHERE \"MigrationId\" = '20261201224900_KitOpticsAndDistanceGoals'")]
    public async Task A_backup_whose_history_names_changes_this_app_never_made_in_that_order_is_refused_as_foreign(string history)
    {
        using var app = new ClinicApp("restore-foreign");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var file = app.Service(sp => sp.GetRequiredService<DatabaseBackups>()).Create("test");
        DatabaseDump.Execute(file.Path, history);
        var before = DatabaseDump.Read(app.Data.DatabasePath);

        var (_, body) = await UploadAsync(client, await File.ReadAllBytesAsync(file.Path));

        Assert.DoesNotContain("Restored the uploaded backup", body, StringComparison.Ordinal);
        Assert.DoesNotContain("newer version", body, StringComparison.Ordinal);
        Assert.Contains("not made by LowVisionAid", body, StringComparison.Ordinal);
        Assert.Equal(before, DatabaseDump.Read(app.Data.DatabasePath));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_backup_from_an_older_version_is_restored_and_upgraded_but_the_same_with_an_extra_trigger_is_refused()
    {
        // Arrange: a database as the version before sign-in left it (its first two migrations), one clean, one with a trigger
        using var older = new TempFolder("restore-older");
        await using (var db = TwoContextSchema.Context(older.Path))
        {
            await db.GetService<IMigrator>().MigrateAsync(TwoContextSchema.ClinicMigrationThen);
            TwoContextSchema.AddEarlierClient(db, "OLDER-001", "Invented Older Client");
            await db.SaveChangesAsync();
        }

        SqliteConnection.ClearAllPools();
        var clean = await File.ReadAllBytesAsync(older.DatabasePath);
        DatabaseDump.Execute(older.DatabasePath, "CREATE TRIGGER wipe AFTER INSERT ON Clients BEGIN DELETE FROM Clients; END");
        var tampered = await File.ReadAllBytesAsync(older.DatabasePath);

        using var app = new ClinicApp("restore-older-app");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var before = DatabaseDump.Read(app.Data.DatabasePath);

        // Act
        var (_, refused) = await UploadAsync(client, tampered);
        var afterRefusal = DatabaseDump.Read(app.Data.DatabasePath);
        var (_, restored) = await UploadAsync(client, clean);

        // Assert
        Assert.Contains("extra trigger", refused, StringComparison.Ordinal);
        Assert.Equal(before, afterRefusal);
        Assert.Contains("Restored the uploaded backup", restored, StringComparison.Ordinal);
        Assert.Contains("will be upgraded", restored, StringComparison.Ordinal);
        Assert.Equal(["OLDER-001"], DatabaseDump.Read(app.Data.DatabasePath)["Clients"].Select(r => r.Split('|').First(f => f.StartsWith("Code=", StringComparison.Ordinal))[5..]));
        Assert.Empty(DatabaseSchema.Differences(DatabaseSchema.Read(app.Data.DatabasePath), DatabaseSchema.AtMigration(Latest(app))));
        await client.GetPageAsync("/Clients");
    }

    [Fact]
    public async Task A_copy_made_with_the_sqlite_backup_command_while_the_app_runs_restores_without_an_error()
    {
        // Arrange: what the sqlite3 shell's .backup writes: SQLite's backup API from the live file, left in WAL mode
        using var app = new ClinicApp("restore-shell-copy");
        using var client = app.NewClient();
        await ClinicForms.AddClientAsync(client, "SHELL-001", "Invented Shell Copy");
        var copy = Path.Combine(app.Data.Path, "shell-copy.db");
        using (var live = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = app.Data.DatabasePath, Pooling = false }.ToString()))
        using (var target = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = copy, Pooling = false }.ToString()))
        {
            live.Open();
            target.Open();
            live.BackupDatabase(target);
            using var wal = target.CreateCommand();
            wal.CommandText = "PRAGMA journal_mode=WAL";   // the shell's copy of a WAL database stays in WAL mode
            wal.ExecuteNonQuery();
        }

        var bytes = await File.ReadAllBytesAsync(copy);
        Assert.Equal(2, bytes[18]);   // file format 2: the copy is in WAL mode, as the shell leaves it (SQLite file format, §1.3)
        await ClinicForms.AddClientAsync(client, "SHELL-002", "Invented After The Copy");

        // Act
        var (status, body) = await UploadAsync(client, bytes);

        // Assert: restored; the client added after the copy is gone; nothing logged as an error
        Assert.Equal(HttpStatusCode.OK, status);
        Assert.Contains("Restored the uploaded backup", body, StringComparison.Ordinal);
        var codes = DatabaseDump.Read(app.Data.DatabasePath)["Clients"];
        Assert.Contains(codes, r => r.Contains("Code=SHELL-001", StringComparison.Ordinal));
        Assert.DoesNotContain(codes, r => r.Contains("Code=SHELL-002", StringComparison.Ordinal));
        Assert.DoesNotContain(app.Logs.Lines, l => l.StartsWith("Error", StringComparison.Ordinal) || l.Contains("database is locked", StringComparison.Ordinal));
    }

    [Fact]
    public async Task A_restore_waits_for_a_save_in_progress_instead_of_failing_with_database_is_locked()
    {
        using var app = new ClinicApp("restore-busy");
        using var client = app.NewClient();
        await client.GetPageAsync("/");
        var file = app.Service(sp => sp.GetRequiredService<DatabaseBackups>()).Create("test");
        var bytes = await File.ReadAllBytesAsync(file.Path);

        // Another writer holds the write lock for a moment, as a save does
        using var writer = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = app.Data.DatabasePath, Pooling = false }.ToString());
        writer.Open();
        using (var begin = writer.CreateCommand())
        {
            begin.CommandText = "BEGIN IMMEDIATE";
            begin.ExecuteNonQuery();
        }

        var upload = UploadAsync(client, bytes);
        await Task.Delay(1500);
        using (var commit = writer.CreateCommand())
        {
            commit.CommandText = "COMMIT";
            commit.ExecuteNonQuery();
        }

        var (status, body) = await upload;

        Assert.Equal(HttpStatusCode.OK, status);
        Assert.Contains("Restored the uploaded backup", body, StringComparison.Ordinal);
        Assert.DoesNotContain(app.Logs.Lines, l => l.Contains("database is locked", StringComparison.Ordinal));
    }

    private static string Latest(ClinicApp app) =>
        app.Service(sp => sp.GetRequiredService<LowVisionAid.Data.ClinicDbContext>().Database.GetMigrations().Last());

    private static async Task<(HttpStatusCode Status, string Body)> UploadAsync(FormClient client, byte[] bytes)
    {
        var page = await client.GetPageAsync("/Admin/Backup");
        using var form = new MultipartFormDataContent();
        form.Add(new StringContent(FormClient.Token(page)!), FormClient.TokenField);
        form.Add(new StringContent("true"), "Confirm");
        form.Add(new ByteArrayContent(bytes), "upload", "offered.db");
        using var response = await client.Http.PostAsync(new Uri("/Admin/Backup?handler=Upload", UriKind.Relative), form);
        return (response.StatusCode, System.Net.WebUtility.HtmlDecode(await response.Content.ReadAsStringAsync()));
    }
}
