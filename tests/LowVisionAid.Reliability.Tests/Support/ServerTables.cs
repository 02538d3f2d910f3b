using System.Diagnostics;
using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using Npgsql;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>
/// Every table of a PostgreSQL database as its row count and a SHA-256 of its rows (each row as the server writes it
/// as text, read in primary-key order), plus where each sequence stands: two databases with equal figures hold the
/// same data, and the next row inserted gets the same key in both.
/// </summary>
public static class ServerTables
{
    public sealed record Figures(long Rows, string Sha256);

    public static async Task<SortedDictionary<string, Figures>> ReadAsync(string connectionString)
    {
        await using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(connectionString) { Pooling = false }.ConnectionString);
        await connection.OpenAsync();
        var figures = new SortedDictionary<string, Figures>(StringComparer.Ordinal);
        foreach (var table in await ListAsync(connection, "SELECT c.relname FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace WHERE n.nspname = 'public' AND c.relkind = 'r' ORDER BY 1"))
        {
            var key = await ListAsync(connection,
                "SELECT quote_ident(a.attname) FROM pg_index i JOIN pg_attribute a ON a.attrelid = i.indrelid AND a.attnum = ANY(i.indkey) " +
                $"WHERE i.indrelid = '\"{table}\"'::regclass AND i.indisprimary ORDER BY array_position(i.indkey::int2[], a.attnum)");
            var order = key.Count > 0 ? string.Join(", ", key) : "t::text";   // a table without a key: its whole rows, as text
            await using var select = connection.CreateCommand();
            select.CommandText = $"SELECT t::text FROM \"{table}\" t ORDER BY {order}";
            await using var reader = await select.ExecuteReaderAsync();
            using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
            long rows = 0;
            while (await reader.ReadAsync())
            {
                hash.AppendData(Encoding.UTF8.GetBytes(reader.GetString(0) + "\n"));
                rows++;
            }

            figures["table " + table] = new Figures(rows, Convert.ToHexString(hash.GetHashAndReset()));
        }

        await using (var sequences = connection.CreateCommand())
        {
            sequences.CommandText = "SELECT sequencename, COALESCE(last_value, 0) FROM pg_sequences WHERE schemaname = 'public' ORDER BY 1";
            await using var reader = await sequences.ExecuteReaderAsync();
            while (await reader.ReadAsync())
            {
                figures["sequence " + reader.GetString(0)] = new Figures(reader.GetInt64(1), "");
            }
        }

        return figures;
    }

    private static async Task<List<string>> ListAsync(NpgsqlConnection connection, string sql)
    {
        await using var command = connection.CreateCommand();
        command.CommandText = sql;
        await using var reader = await command.ExecuteReaderAsync();
        var values = new List<string>();
        while (await reader.ReadAsync())
        {
            values.Add(reader.GetString(0));
        }

        return values;
    }
}

/// <summary>
/// PostgreSQL's own programs (pg_dump, pg_restore) from Debian's server package, run as an administrator would: the
/// password in the process's environment (PGPASSWORD), never on its command line.
/// </summary>
public static class PostgresTools
{
    public static string Path(string tool)
    {
        var bin = Directory.Exists("/usr/lib/postgresql")
            ? Directory.GetDirectories("/usr/lib/postgresql").Select(d => System.IO.Path.Combine(d, "bin"))
                .Where(d => File.Exists(System.IO.Path.Combine(d, tool)))
                .OrderByDescending(d => int.TryParse(new DirectoryInfo(d).Parent!.Name, NumberStyles.None, CultureInfo.InvariantCulture, out var v) ? v : 0)
                .FirstOrDefault()
            : null;
        return bin is null
            ? throw new FileNotFoundException($"{tool} is not under /usr/lib/postgresql/*/bin: install Debian's postgresql (scripts/bootstrap.sh does).")
            : System.IO.Path.Combine(bin, tool);
    }

    /// <summary>Runs <paramref name="tool"/> with <paramref name="arguments"/>; fails the test with its output unless it exits with 0.</summary>
    public static async Task RunAsync(string tool, IEnumerable<string> arguments, string password, IReadOnlyDictionary<string, string> environment)
    {
        var start = new ProcessStartInfo(Path(tool)) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        foreach (var (name, value) in environment)
        {
            start.Environment[name] = value;
        }

        start.Environment["PGPASSWORD"] = password;
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var errors = process.StandardError.ReadToEndAsync();
        using var limit = new CancellationTokenSource(TimeSpan.FromMinutes(2));
        try
        {
            await process.WaitForExitAsync(limit.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"{tool} did not finish within 2 minutes.");
        }

        Assert.True(process.ExitCode == 0, $"{tool} {string.Join(' ', start.ArgumentList)} exited with {process.ExitCode}: {await output}{await errors}");
    }
}
