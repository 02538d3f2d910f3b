using LowVisionAid.TestSupport;
using System.Globalization;
using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Backup;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.AspNetCore.Identity;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;
using Microsoft.Extensions.DependencyInjection;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// For every earlier schema (after each migration, in the order they were made, including the separate access
/// history the two-context version kept), a database is built at that point and filled with rows in every table, then
/// upgraded to the current schema as the app does at start: every value is still there.
/// </summary>
[Trait("Category", TestServer.SqliteFileCategory)]   // upgrading SQLite files of earlier versions
public sealed class MigrationSafetyTests(ITestOutputHelper output)
{
    private const int RowsPerTable = 3;
    private static readonly string[] Bookkeeping = ["__EFMigrationsHistory", "__EFMigrationsLock", TwoContextSchema.HistoryTable];

    public static TheoryData<int> EarlierStates()
    {
        var data = new TheoryData<int>();
        for (var i = 0; i < Steps().Count - 1; i++)
        {
            data.Add(i);
        }

        return data;
    }

    [Fact]
    public void There_is_at_least_one_earlier_schema_to_upgrade_from() => Assert.True(Steps().Count >= 2);

    [Theory]
    [MemberData(nameof(EarlierStates))]
    public async Task A_populated_database_at_an_earlier_migration_loses_nothing_when_upgraded(int lastApplied)
    {
        using var data = new TempFolder("migration");
        var steps = Steps();

        // Arrange: the schema as it was after steps[0..lastApplied], with rows in every table
        await BuildAsync(data.Path, steps.Take(lastApplied + 1).ToList());
        var filled = Fill(data.DatabasePath);
        var before = DatabaseDump.Read(data.DatabasePath, Bookkeeping);

        // Act: upgrade to the current schema, as the app does at start
        await using (var clinic = TwoContextSchema.Context(data.Path))
        {
            await clinic.UpgradeAsync();
        }

        SqliteConnection.ClearAllPools();
        var after = DatabaseDump.Read(data.DatabasePath, Bookkeeping);

        // Assert: every row of every earlier table keeps every earlier column's value
        foreach (var (table, rows) in before)
        {
            Assert.True(after.ContainsKey(table), $"Table {table} disappeared.");
            Assert.Equal(rows.Count, after[table].Count);
            for (var r = 0; r < rows.Count; r++)
            {
                var upgraded = after[table][r].Split('|').ToHashSet(StringComparer.Ordinal);
                var upgradedColumns = upgraded.Select(f => f[..f.IndexOf('=', StringComparison.Ordinal)]).ToHashSet(StringComparer.Ordinal);
                foreach (var field in rows[r].Split('|'))
                {
                    var name = field[..field.IndexOf('=', StringComparison.Ordinal)];
                    var value = field[(name.Length + 1)..];

                    // Kept under its name; or, for a column renamed or dropped, its value kept in another column of the row.
                    var kept = upgraded.Contains(field)
                        || upgraded.Any(f => f.StartsWith(name + "=", StringComparison.Ordinal) && f[(name.Length + 1)..].Contains(value, StringComparison.Ordinal))
                        || (!upgradedColumns.Contains(name) && upgraded.Any(f => f[(f.IndexOf('=', StringComparison.Ordinal) + 1)..].Contains(value, StringComparison.Ordinal)));
                    Assert.True(kept, $"{table} row {r + 1}: {field} was lost or changed.");
                }
            }
        }

        // The database now has one history, with every migration of this build in it
        await using (var clinic = TwoContextSchema.Context(data.Path))
        {
            Assert.Equal(clinic.Database.GetMigrations(), await clinic.Database.GetAppliedMigrationsAsync());
        }

        Assert.DoesNotContain(TwoContextSchema.HistoryTable, DatabaseDump.Read(data.DatabasePath).Keys);
        Assert.Equal("ok", DatabaseBackups.IntegrityCheck(data.DatabasePath));
        output.WriteLine($"after {steps[lastApplied].Id}: {before.Count} tables, {filled} rows filled and found again after upgrading through {steps.Count - lastApplied - 1} migration(s)");
    }

    [Fact]
    public async Task The_migration_recorded_for_two_context_databases_creates_exactly_the_schema_the_access_history_had_made()
    {
        // Arrange: the sign-in and audit tables as the earlier access history made them, and as the one history makes them
        using var earlier = new TempFolder("access-earlier");
        using var current = new TempFolder("access-current");
        await TwoContextSchema.BuildAsync(earlier.Path, clinicMigration: null);
        await using (var clinic = TwoContextSchema.Context(current.Path))
        {
            var migrations = clinic.Database.GetMigrations().ToList();
            Assert.Contains(AccessHistoryUpgrade.AccessTablesMigration, migrations);
            await clinic.GetService<IMigrator>().MigrateAsync(AccessHistoryUpgrade.AccessTablesMigration);
        }

        SqliteConnection.ClearAllPools();

        // Act
        var made = SchemaOf(earlier.DatabasePath, keep: _ => true);
        var makes = SchemaOf(current.DatabasePath, keep: t => AccessHistoryUpgrade.AccessTables.Contains(t));
        var makesAlone = SchemaOf(current.DatabasePath, keep: _ => true).Except(SchemaOf(Before(current.Path), keep: _ => true)).ToList();

        // Assert: the same tables, columns, keys and indexes, and that migration adds nothing else
        Assert.Equal(made, makes);
        Assert.Equal(made, makesAlone);
        Assert.Equal(AccessHistoryUpgrade.AccessTables.Order(StringComparer.Ordinal), made.Where(s => s.StartsWith("table ", StringComparison.Ordinal)).Select(s => s.Split(' ')[1]).Order(StringComparer.Ordinal));
    }

    [Fact]
    public async Task A_backup_made_by_the_two_context_version_is_accepted_for_restore_as_an_older_schema()
    {
        using var data = new TempFolder("access-backup");
        await TwoContextSchema.BuildAsync(data.Path, TwoContextSchema.ClinicMigrationThen);
        await using var clinic = TwoContextSchema.Context(data.Path);

        var check = DatabaseBackups.Check(data.DatabasePath, clinic.KnownMigrations());

        Assert.True(check.CanRestore, check.Message);
        Assert.Contains(TwoContextSchema.InitialAccess, check.AppliedMigrations);
        Assert.Contains("will be upgraded", check.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_two_context_database_keeps_its_accounts_roles_audit_and_clinical_data_when_the_app_starts_on_it()
    {
        // Arrange: a database as the two-context version left it, with an administrator (real password hash), a client and an audit line
        using var data = new TempFolder("access-upgrade");
        await TwoContextSchema.BuildAsync(data.Path, TwoContextSchema.ClinicMigrationThen);
        const string name = "earlier.admin";
        const string password = "an earlier long password";
        await using (var db = TwoContextSchema.Context(data.Path))
        {
            var user = new IdentityUser(name) { NormalizedUserName = name.ToUpperInvariant(), SecurityStamp = Guid.NewGuid().ToString("N"), LockoutEnabled = true };
            user.PasswordHash = new PasswordHasher<IdentityUser>().HashPassword(user, password);
            var role = new IdentityRole(ClinicRoles.Administrator) { NormalizedName = ClinicRoles.Administrator.ToUpperInvariant() };
            db.Users.Add(user);
            db.Roles.Add(role);
            db.UserRoles.Add(new IdentityUserRole<string> { UserId = user.Id, RoleId = role.Id });
            TwoContextSchema.AddEarlierClient(db, "EARLIER-7", "Invented Earlier Person");
            db.AuditEntries.Add(new LowVisionAid.Data.Audit.AuditEntry { AtUtc = new DateTime(2026, 12, 1, 22, 30, 0, DateTimeKind.Utc), Actor = name, RecordType = "Client", RecordId = 1 });
            await db.SaveChangesAsync();
        }

        SqliteConnection.ClearAllPools();
        var before = DatabaseDump.Read(data.DatabasePath, Bookkeeping);

        // Act: the app starts on it with sign-in on, and the earlier administrator signs in
        using var app = new ClinicApp("access-upgrade", loadDemo: false, settings: Accounts.SignInOn, data: data);
        using var client = app.NewClient();
        using var signIn = await Accounts.SignInAsync(client, name, password);
        var clients = await client.GetPageAsync("/Clients");
        var users = await client.GetPageAsync("/Admin/Users");

        // Assert: signed in with the old password, still an administrator, the client is there, the old rows are all kept
        Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        Assert.Contains("EARLIER-7", clients, StringComparison.Ordinal);
        Assert.Contains(name, users, StringComparison.Ordinal);
        var after = DatabaseDump.Read(data.DatabasePath, Bookkeeping);
        Assert.Equal(before["AspNetUserRoles"], after["AspNetUserRoles"]);
        // The client keeps every earlier column's value; the two columns added since are filled from the rest.
        string[] added = ["LastVisitDate", "SearchText"];
        Assert.Equal(before["Clients"], after["Clients"].Select(row => string.Join('|', row.Split('|').Where(cell => !added.Any(a => cell.StartsWith(a + "=", StringComparison.Ordinal))))));
        Assert.Contains("|SearchText=earlier-7 invented earlier person", Assert.Single(after["Clients"]), StringComparison.Ordinal);
        Assert.Single(after["AspNetUsers"]);

        // Rows may be added at start (the two missing roles, audit lines), never changed or lost
        foreach (var table in new[] { "AspNetRoles", "AuditEntries" })
        {
            Assert.Equal(before[table], after[table].Take(before[table].Count));
        }

        Assert.Equal(ClinicRoles.All.Count, after["AspNetRoles"].Count);
        Assert.DoesNotContain(TwoContextSchema.HistoryTable, after.Keys);
        var backup = Assert.Single(app.Service(sp => sp.GetRequiredService<DatabaseBackups>().List()));
        Assert.EndsWith("-before-migration.db", backup.Name, StringComparison.Ordinal);
        Assert.Contains(TwoContextSchema.HistoryTable, DatabaseDump.Read(backup.Path).Keys);
    }

    // Each step is a migration of the one history, or the earlier separate access history's InitialAccess (applied
    // from its frozen script), in the order they were made; InitialAccess exists only in schemas before the
    // migration that took its tables over.
    private static List<(bool Earlier, string Id)> Steps()
    {
        using var data = new TempFolder("migration-list");
        using var clinic = TwoContextSchema.Context(data.Path);
        return clinic.Database.GetMigrations().Select(m => (false, m))
            .Append((true, TwoContextSchema.InitialAccess))
            .OrderBy(s => s.Item2, StringComparer.Ordinal)
            .ToList();
    }

    private static async Task BuildAsync(string folder, List<(bool Earlier, string Id)> applied)
    {
        var clinicTarget = applied.LastOrDefault(s => !s.Earlier).Id;
        var separateAccess = applied.Any(s => s.Earlier) && !applied.Any(s => s.Id == AccessHistoryUpgrade.AccessTablesMigration);
        if (separateAccess || clinicTarget is null)
        {
            await TwoContextSchema.BuildAsync(folder, clinicTarget, withAccess: separateAccess);
            return;
        }

        await using var clinic = TwoContextSchema.Context(folder);
        await clinic.GetService<IMigrator>().MigrateAsync(clinicTarget);
        SqliteConnection.ClearAllPools();
    }

    // The schema at the migration just before the access tables migration, in a folder of its own.
    private static string Before(string currentFolder)
    {
        var folder = Path.Combine(currentFolder, "before");
        using (var clinic = TwoContextSchema.Context(folder))
        {
            var previous = clinic.Database.GetMigrations().TakeWhile(m => m != AccessHistoryUpgrade.AccessTablesMigration).Last();
            clinic.GetService<IMigrator>().Migrate(previous);
        }

        SqliteConnection.ClearAllPools();
        return Path.Combine(folder, ClinicDatabase.FileName);
    }

    // Every table and index with its SQL as SQLite stores it (history tables left out), e.g. "table AspNetUsers CREATE TABLE ...".
    private static List<string> SchemaOf(string path, Func<string, bool> keep)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        return Query(connection, "SELECT type, name, tbl_name, sql FROM sqlite_master WHERE name NOT LIKE 'sqlite_%' AND sql IS NOT NULL")
            .Where(r => !Bookkeeping.Contains(r[2]) && keep(r[2]))
            .Select(r => $"{r[0]} {r[1]} {r[3]}")
            .Order(StringComparer.Ordinal)
            .ToList();
    }

    // Inserts RowsPerTable rows into every table, parents before children, with a value in every column chosen by its
    // declared type; foreign keys point at the parent's rows. Returns the number of rows inserted.
    private static int Fill(string path)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        var tables = Query(connection, "SELECT name FROM pragma_table_list WHERE schema = 'main' AND type = 'table' AND name NOT LIKE 'sqlite_%'")
            .Select(r => r[0]).Where(t => !Bookkeeping.Contains(t)).ToList();
        var parents = tables.ToDictionary(t => t, t => Query(connection, $"PRAGMA foreign_key_list(\"{t}\")").Select(r => (Table: r[2], From: r[3], To: r[4])).ToList());
        var ordered = new List<string>();
        while (ordered.Count < tables.Count)
        {
            var next = tables.First(t => !ordered.Contains(t) && parents[t].All(p => p.Table == t || ordered.Contains(p.Table)));
            ordered.Add(next);
        }

        var inserted = 0;
        foreach (var table in ordered)
        {
            var columns = Query(connection, $"PRAGMA table_info(\"{table}\")").Select(r => (Name: r[1], Type: r[2].ToUpperInvariant())).ToList();
            for (var row = 1; row <= RowsPerTable; row++)
            {
                using var insert = connection.CreateCommand();
                insert.CommandText = $"INSERT INTO \"{table}\" ({string.Join(", ", columns.Select(c => $"\"{c.Name}\""))}) VALUES ({string.Join(", ", columns.Select((_, i) => "$p" + i.ToString(CultureInfo.InvariantCulture)))})";
                for (var i = 0; i < columns.Count; i++)
                {
                    var (name, type) = columns[i];
                    var foreignKey = parents[table].FirstOrDefault(p => p.From == name);
                    object value = foreignKey.Table is not null
                        ? ParentKey(connection, foreignKey.Table, foreignKey.To, row)
                        : type switch
                        {
                            "INTEGER" => row,
                            "REAL" => row + 0.25,
                            "BLOB" => new byte[] { (byte)row, 0x42 },
                            _ => $"{table[..Math.Min(3, table.Length)]}-{name}-{row}",
                        };
                    insert.Parameters.AddWithValue("$p" + i.ToString(CultureInfo.InvariantCulture), value);
                }

                insert.ExecuteNonQuery();
                inserted++;
            }
        }

        return inserted;
    }

    private static object ParentKey(SqliteConnection connection, string table, string column, int row)
    {
        using var command = connection.CreateCommand();
        command.CommandText = $"SELECT \"{column}\" FROM \"{table}\" ORDER BY rowid LIMIT 1 OFFSET {row - 1}";
        return command.ExecuteScalar()!;
    }

    private static List<string[]> Query(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var rows = new List<string[]>();
        while (reader.Read())
        {
            rows.Add(Enumerable.Range(0, reader.FieldCount).Select(i => reader.IsDBNull(i) ? "" : Convert.ToString(reader.GetValue(i), CultureInfo.InvariantCulture)!).ToArray());
        }

        return rows;
    }
}
