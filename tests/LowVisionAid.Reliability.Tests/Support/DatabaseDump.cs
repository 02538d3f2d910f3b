using System.Globalization;
using Microsoft.Data.Sqlite;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>Every row of every table of a SQLite file, as invariant text, for exact comparison.</summary>
public static class DatabaseDump
{
    public static SortedDictionary<string, List<string>> Read(string path, params string[] skipTables)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
        connection.Open();
        var tables = new List<string>();
        using (var list = connection.CreateCommand())
        {
            // Ordinary tables only: a full-text index (a virtual table and its shadow tables) is derived from them.
            list.CommandText = "SELECT name FROM pragma_table_list WHERE schema = 'main' AND type = 'table' AND name NOT LIKE 'sqlite_%' AND name <> '__EFMigrationsLock' ORDER BY name";
            using var reader = list.ExecuteReader();
            while (reader.Read())
            {
                tables.Add(reader.GetString(0));
            }
        }

        var dump = new SortedDictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (var table in tables.Where(t => !skipTables.Contains(t)))
        {
            using var select = connection.CreateCommand();
            select.CommandText = $"SELECT * FROM \"{table}\" ORDER BY rowid";
            using var reader = select.ExecuteReader();
            var rows = new List<string>();
            while (reader.Read())
            {
                rows.Add(string.Join('|', Enumerable.Range(0, reader.FieldCount).Select(i =>
                    reader.GetName(i) + "=" + (reader.IsDBNull(i) ? "NULL" : Convert.ToString(reader.GetValue(i), CultureInfo.InvariantCulture)))));
            }

            dump[table] = rows;
        }

        return dump;
    }

    public static int RowCount(SortedDictionary<string, List<string>> dump) => dump.Values.Sum(r => r.Count);

    public static long Scalar(string path, string sql)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    public static void Execute(string path, string sql)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
