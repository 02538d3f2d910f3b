using System.Data.Common;
using System.Globalization;
using Microsoft.Data.Sqlite;
using Npgsql;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>Every row of every table of a SQLite file (or of an app's server database), as invariant text, for exact comparison.</summary>
public static class DatabaseDump
{
    /// <summary>Every row of every table of the app's database, whichever provider the run uses.</summary>
    public static SortedDictionary<string, List<string>> Read(ClinicApp app, params string[] skipTables)
    {
        ArgumentNullException.ThrowIfNull(app);
        return app.ServerDatabase is { } server ? ReadServer(server, skipTables) : Read(app.Data.DatabasePath, skipTables);
    }

    /// <summary>One number from the app's database (quote the identifiers: "Clients", as both providers read them).</summary>
    public static long Scalar(ClinicApp app, string sql)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (app.ServerDatabase is not { } server)
        {
            return Scalar(app.Data.DatabasePath, sql);
        }

        using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(server) { Pooling = false }.ConnectionString);
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToInt64(command.ExecuteScalar(), CultureInfo.InvariantCulture);
    }

    // The server's rows in the forms SQLite stores (integers, EF Core's text forms of times and keys), sorted as text:
    // the server has no rowid, and the comparisons are between two reads of one database.
    private static SortedDictionary<string, List<string>> ReadServer(string connectionString, string[] skipTables)
    {
        using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(connectionString) { Pooling = false }.ConnectionString);
        connection.Open();
        return ReadTables(
            connection,
            "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_type = 'BASE TABLE' AND table_name <> '__EFMigrationsLock' ORDER BY table_name",
            orderBy: "",
            AsSqliteText,
            skipTables);
    }

    private static SortedDictionary<string, List<string>> ReadTables(
        DbConnection connection, string listTables, string orderBy, Func<object, string?> text, string[] skipTables)
    {
        var tables = new List<string>();
        using (var list = connection.CreateCommand())
        {
            list.CommandText = listTables;
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
            select.CommandText = $"SELECT * FROM \"{table}\" {orderBy}";
            using var reader = select.ExecuteReader();
            var rows = new List<string>();
            while (reader.Read())
            {
                rows.Add(string.Join('|', Enumerable.Range(0, reader.FieldCount).Select(i =>
                    reader.GetName(i) + "=" + (reader.IsDBNull(i) ? "NULL" : text(reader.GetValue(i))))));
            }

            if (orderBy.Length == 0)
            {
                rows.Sort(StringComparer.Ordinal);
            }

            dump[table] = rows;
        }

        return dump;
    }

    private static string? AsSqliteText(object value) => value switch
    {
        bool b => b ? "1" : "0",
        DateTime t => t.ToString("yyyy-MM-dd HH:mm:ss.FFFFFFF", CultureInfo.InvariantCulture),
        DateTimeOffset t => t.ToString("yyyy-MM-dd HH:mm:ss.FFFFFFFzzz", CultureInfo.InvariantCulture),
        DateOnly d => d.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
        Guid g => g.ToString("D").ToUpperInvariant(),
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        _ => Convert.ToString(value, CultureInfo.InvariantCulture),
    };

    public static SortedDictionary<string, List<string>> Read(string path, params string[] skipTables)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
        connection.Open();

        // Ordinary tables only: a full-text index (a virtual table and its shadow tables) is derived from them.
        return ReadTables(
            connection,
            "SELECT name FROM pragma_table_list WHERE schema = 'main' AND type = 'table' AND name NOT LIKE 'sqlite_%' AND name <> '__EFMigrationsLock' ORDER BY name",
            orderBy: "ORDER BY rowid",
            value => Convert.ToString(value, CultureInfo.InvariantCulture),
            skipTables);
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
