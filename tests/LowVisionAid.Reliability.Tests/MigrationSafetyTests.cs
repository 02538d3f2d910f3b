using System.Globalization;
using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// For every earlier schema (after each migration of either context, in the order they were made), a database is
/// built at that point and filled with rows in every table, then upgraded to the current schema: every value is still there.
/// </summary>
public sealed class MigrationSafetyTests(ITestOutputHelper output)
{
    private const int RowsPerTable = 3;
    private static readonly string[] Bookkeeping = ["__EFMigrationsHistory", "__EFMigrationsLock", AccessDbContext.MigrationsHistoryTable];

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
        await using (var clinic = Clinic(data.Path))
        await using (var access = Access(data.Path))
        {
            foreach (var context in new DbContext[] { clinic, access })
            {
                var target = steps.Take(lastApplied + 1).LastOrDefault(s => s.Context == context.GetType().Name).Id;
                if (target is not null)
                {
                    await context.GetService<IMigrator>().MigrateAsync(target);
                }
            }
        }

        SqliteConnection.ClearAllPools();
        var filled = Fill(data.DatabasePath);
        var before = DatabaseDump.Read(data.DatabasePath, Bookkeeping);

        // Act: upgrade to the current schema, as the app does at start
        await using (var access = Access(data.Path))
        {
            await access.Database.MigrateAsync();
        }

        await using (var clinic = Clinic(data.Path))
        {
            await clinic.Database.MigrateAsync();
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

        Assert.Equal("ok", LowVisionAid.Data.Backup.DatabaseBackups.IntegrityCheck(data.DatabasePath));
        output.WriteLine($"after {steps[lastApplied].Id}: {before.Count} tables, {filled} rows filled and found again after upgrading through {steps.Count - lastApplied - 1} migration(s)");
    }

    private static List<(string Context, string Id)> Steps()
    {
        using var data = new TempFolder("migration-list");
        using var clinic = Clinic(data.Path);
        using var access = Access(data.Path);
        return clinic.Database.GetMigrations().Select(m => (nameof(ClinicDbContext), m))
            .Concat(access.Database.GetMigrations().Select(m => (nameof(AccessDbContext), m)))
            .OrderBy(s => s.m, StringComparer.Ordinal)
            .ToList();
    }

    private static ClinicDbContext Clinic(string folder)
    {
        var builder = new DbContextOptionsBuilder<ClinicDbContext>();
        builder.UseClinicSqlite(ClinicDatabase.ConnectionStringFor(folder));
        return new ClinicDbContext(builder.Options);
    }

    private static AccessDbContext Access(string folder) => new(new DbContextOptionsBuilder<AccessDbContext>()
        .UseSqlite(ClinicDatabase.ConnectionStringFor(folder), s => s.MigrationsAssembly(ClinicDatabase.MigrationsAssembly).MigrationsHistoryTable(AccessDbContext.MigrationsHistoryTable))
        .Options);

    // Inserts RowsPerTable rows into every table, parents before children, with a value in every column chosen by its
    // declared type; foreign keys point at the parent's rows. Returns the number of rows inserted.
    private static int Fill(string path)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        var tables = Query(connection, "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'")
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
