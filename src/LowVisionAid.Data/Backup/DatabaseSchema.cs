using System.Collections.Concurrent;
using System.Globalization;
using System.Text.RegularExpressions;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace LowVisionAid.Data.Backup;

/// <summary>One object of a SQLite schema: a table, a column, an index, a foreign key, a trigger or a view.</summary>
/// <param name="Kind">"table", "column", "index", "foreign key", "trigger" or "view".</param>
/// <param name="Table">The table it belongs to (for a table or view, its own name).</param>
/// <param name="Name">Its name (for an index SQLite made for a key, the columns it covers).</param>
/// <param name="Definition">What it is, as SQLite reports it (whitespace collapsed), so two objects compare exactly.</param>
public sealed record SchemaItem(string Kind, string Table, string Name, string Definition)
{
    public string Key => Kind + "|" + Table + "|" + Name;

    /// <summary>"trigger "wipe" on table Clients", "column Clients.Notes", "table Visits".</summary>
    public string Describe() => Kind switch
    {
        "table" or "view" => $"{Kind} \"{Name}\"",
        "column" => $"column \"{Table}\".\"{Name}\"",
        _ => $"{Kind} \"{Name}\" on table \"{Table}\"",
    };
}

/// <summary>
/// Every table, column, index, foreign key, trigger and view in a SQLite file (from <c>sqlite_schema</c> and the
/// table pragmas), and the same for what this app's migrations create at a given migration, so a file offered for
/// restore can be compared with what LowVisionAid itself makes: anything extra, missing or different is named.
/// </summary>
public static partial class DatabaseSchema
{
    /// <summary>EF Core's migration lock table: made by whichever version last migrated, holds no data; not compared.</summary>
    public const string MigrationLockTable = "__EFMigrationsLock";

    private const string HistoryTable = "__EFMigrationsHistory";

    private static readonly ConcurrentDictionary<string, Lazy<IReadOnlyList<SchemaItem>>> References = new(StringComparer.Ordinal);

    /// <summary>Reads the schema of an open connection (SQLite's own tables and the migration lock table left out).</summary>
    public static IReadOnlyList<SchemaItem> Read(SqliteConnection connection)
    {
        ArgumentNullException.ThrowIfNull(connection);
        var items = new List<SchemaItem>();
        var objects = Rows(connection, "SELECT type, name, tbl_name, sql FROM sqlite_master ORDER BY type, name");
        foreach (var row in objects)
        {
            var (type, name, table, sql) = (row[0]!, row[1]!, row[2]!, row[3]);
            if (name.StartsWith("sqlite_", StringComparison.Ordinal) && type == "table")
            {
                continue;
            }

            if (table == MigrationLockTable && type is "table" or "index")
            {
                continue;
            }

            switch (type)
            {
                case "table":
                    items.Add(new SchemaItem("table", name, name, Collapse(sql)));
                    items.AddRange(Rows(connection, $"PRAGMA table_xinfo(\"{Quote(name)}\")").Select(c =>
                        new SchemaItem("column", name, c[1]!, $"type={c[2]} notnull={c[3]} default={c[4] ?? "none"} pk={c[5]} hidden={c[6]}")));
                    items.AddRange(Rows(connection, $"PRAGMA foreign_key_list(\"{Quote(name)}\")")
                        .GroupBy(f => f[0])
                        .Select(g => g.ToList())
                        .Select(f => new SchemaItem("foreign key", name, string.Join(",", f.Select(c => c[3])) + " -> " + f[0][2],
                            $"to={string.Join(",", f.Select(c => c[4]))} update={f[0][5]} delete={f[0][6]} match={f[0][7]}")));
                    break;
                case "index":
                    var columns = string.Join(",", Rows(connection, $"PRAGMA index_xinfo(\"{Quote(name)}\")").Where(c => c[5] == "1").Select(c => c[2] ?? "(expression)"));
                    var shown = sql is null ? "key (" + columns + ")" : name;
                    items.Add(new SchemaItem("index", table, shown, $"columns={columns} {Collapse(sql)}"));
                    break;
                default:
                    items.Add(new SchemaItem(type, table, name, Collapse(sql)));
                    break;
            }
        }

        return items;
    }

    /// <summary>Reads the schema of the SQLite file at <paramref name="path"/> (opened read-only).</summary>
    public static IReadOnlyList<SchemaItem> Read(string path)
    {
        using var connection = Sqlite.Open(path, SqliteOpenMode.ReadOnly);
        return Read(connection);
    }

    /// <summary>
    /// The schema this app's migrations create when applied up to and including <paramref name="migration"/>
    /// (built once per process in a temporary file, then kept).
    /// </summary>
    public static IReadOnlyList<SchemaItem> AtMigration(string migration)
    {
        ArgumentException.ThrowIfNullOrEmpty(migration);
        return References.GetOrAdd(migration, m => new Lazy<IReadOnlyList<SchemaItem>>(() => Reference(m))).Value;
    }

    /// <summary>
    /// The schema of a database the earlier two-context version left at clinic migration <paramref name="migration"/>:
    /// that clinic schema, plus the sign-in and audit tables as <see cref="Access.AccessHistoryUpgrade.AccessTablesMigration"/>
    /// creates them (the earlier migration made the same, a migration test checks), plus the separate access history table.
    /// </summary>
    public static IReadOnlyList<SchemaItem> AtEarlierTwoContextMigration(string migration)
    {
        var access = AtMigration(Access.AccessHistoryUpgrade.AccessTablesMigration);
        var history = access.Where(i => i.Table == HistoryTable).Select(i => i with
        {
            Table = Access.AccessHistoryUpgrade.HistoryTable,
            Name = i.Name.Replace(HistoryTable, Access.AccessHistoryUpgrade.HistoryTable, StringComparison.Ordinal),
            Definition = i.Definition.Replace(HistoryTable, Access.AccessHistoryUpgrade.HistoryTable, StringComparison.Ordinal),
        });
        return
        [
            .. AtMigration(migration),
            .. access.Where(i => Access.AccessHistoryUpgrade.AccessTables.Contains(i.Table)),
            .. history,
        ];
    }

    /// <summary>
    /// What differs between <paramref name="actual"/> and <paramref name="expected"/>, in words ("extra trigger …",
    /// "missing table …", "different column …"); empty when they are the same. A table whose columns differ is reported
    /// by its columns only.
    /// </summary>
    public static IReadOnlyList<string> Differences(IReadOnlyList<SchemaItem> actual, IReadOnlyList<SchemaItem> expected)
    {
        ArgumentNullException.ThrowIfNull(actual);
        ArgumentNullException.ThrowIfNull(expected);
        var have = actual.GroupBy(i => i.Key).ToDictionary(g => g.Key, g => g.First(), StringComparer.Ordinal);
        var want = expected.GroupBy(i => i.Key).ToDictionary(g => g.Key, g => g.First(), StringComparer.Ordinal);
        var differences = new List<(SchemaItem Item, string Text)>();
        foreach (var item in want.Values.Where(i => !have.ContainsKey(i.Key)))
        {
            differences.Add((item, "missing " + item.Describe()));
        }

        foreach (var item in have.Values.Where(i => !want.ContainsKey(i.Key)))
        {
            differences.Add((item, "extra " + item.Describe()));
        }

        foreach (var item in have.Values.Where(i => want.TryGetValue(i.Key, out var w) && !string.Equals(w.Definition, i.Definition, StringComparison.Ordinal)))
        {
            differences.Add((item, "different " + item.Describe()));
        }

        var tablesWithColumnChanges = differences.Where(d => d.Item.Kind == "column").Select(d => d.Item.Table).ToHashSet(StringComparer.Ordinal);
        var missingTables = differences.Where(d => d.Item.Kind == "table" && d.Text.StartsWith("missing", StringComparison.Ordinal)).Select(d => d.Item.Table).ToHashSet(StringComparer.Ordinal);
        return differences
            .Where(d => !(d.Item.Kind == "table" && d.Text.StartsWith("different", StringComparison.Ordinal) && tablesWithColumnChanges.Contains(d.Item.Table)))
            .Where(d => d.Item.Kind == "table" || !missingTables.Contains(d.Item.Table))
            .OrderBy(d => d.Item.Kind == "trigger" || d.Item.Kind == "view" ? 0 : 1)
            .ThenBy(d => d.Text, StringComparer.Ordinal)
            .Select(d => d.Text)
            .ToList();
    }

    /// <summary>Builds a database with this build's migrations applied up to <paramref name="migration"/> and reads it.</summary>
    private static IReadOnlyList<SchemaItem> Reference(string migration)
    {
        var folder = Path.Combine(Path.GetTempPath(), "lowvisionaid-schema-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            var path = Path.Combine(folder, "reference.db");
            using (var db = Sqlite.Context(path))
            {
                db.GetService<IMigrator>().Migrate(migration);
            }

            return Read(path);
        }
        finally
        {
            SqliteConnection.ClearAllPools();
            Directory.Delete(folder, recursive: true);
        }
    }

    private static string Collapse(string? sql) => sql is null ? "" : Whitespace().Replace(sql, " ").Trim();

    private static string Quote(string name) => name.Replace("\"", "\"\"", StringComparison.Ordinal);

    private static List<string?[]> Rows(SqliteConnection connection, string sql)
    {
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var rows = new List<string?[]>();
        while (reader.Read())
        {
            rows.Add(Enumerable.Range(0, reader.FieldCount)
                .Select(i => reader.IsDBNull(i) ? null : Convert.ToString(reader.GetValue(i), CultureInfo.InvariantCulture))
                .ToArray());
        }

        return rows;
    }

    [GeneratedRegex(@"\s+")]
    private static partial Regex Whitespace();
}
