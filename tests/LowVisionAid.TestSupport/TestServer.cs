using LowVisionAid.Data;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace LowVisionAid.TestSupport;

/// <summary>
/// The throwaway PostgreSQL server the tests run against when <see cref="ConnectionVariable"/> holds its administrator's
/// connection string (scripts/test.sh starts one with scripts/test-server.sh and runs the database suites a second time
/// with it set). Each host gets its own database, copied from a template database migrated once per test process
/// (<c>CREATE DATABASE … TEMPLATE</c>), and dropped when the host is disposed. Unset: every test uses SQLite files.
/// </summary>
public static class TestServer
{
    /// <summary>The environment variable with the test server's administrator connection string.</summary>
    public const string ConnectionVariable = "LVA_TEST_POSTGRES";

    /// <summary>
    /// The trait of tests about the SQLite setup itself (its file, backups, restores, migrations and locks, its FTS5
    /// index, sign-in off on one PC): not run in the server pass.
    /// </summary>
    public const string SqliteFileCategory = "SqliteFile";

    /// <summary>
    /// The trait of tests that need the server itself (two app processes on one database, pg_dump, moving a clinic to a
    /// server): run only in the server pass. Run alone without the server they fail with <see cref="Require"/>'s message.
    /// </summary>
    public const string ServerOnlyCategory = "ServerOnly";

    /// <summary>
    /// Tests whose subject never reads or writes the database (the calculation API, the parsers): not run again in the
    /// server pass, where they would check the same code on a second database they do not touch.
    /// </summary>
    public const string NoDatabaseCategory = "NoDatabase";

    private static readonly Lazy<Task<string>> Template = new(BuildTemplateAsync, LazyThreadSafetyMode.ExecutionAndPublication);
    private static readonly SemaphoreSlim Creating = new(1, 1);

    /// <summary>True when this test run is against the PostgreSQL server.</summary>
    public static bool InUse => !string.IsNullOrWhiteSpace(Environment.GetEnvironmentVariable(ConnectionVariable));

    /// <summary>The provider the database tests of this run use.</summary>
    public static DatabaseProvider Provider => InUse ? DatabaseProvider.PostgreSql : DatabaseProvider.Sqlite;

    /// <summary>Fails (never skips) a server-only test run without the server, saying how to run it.</summary>
    public static void Require()
    {
        if (!InUse)
        {
            throw new InvalidOperationException(
                $"This test needs the PostgreSQL test server: bash scripts/test-server.sh start /tmp/lva-pg, then set {ConnectionVariable} to the text of /tmp/lva-pg/connection (scripts/test.sh does both).");
        }
    }

    /// <summary>The administrator's connection string of the test server (for pg_dump, psql and the like).</summary>
    public static string AdministratorConnectionString => Administrator;

    private static string Administrator => Environment.GetEnvironmentVariable(ConnectionVariable)
        ?? throw new InvalidOperationException($"{ConnectionVariable} is not set: start a test server with scripts/test-server.sh and set it to the connection file's text.");

    /// <summary>A new database on the server, already migrated (a copy of the template) or empty; returns its connection string.</summary>
    public static string CreateDatabase(bool migrated = true)
    {
        var name = "lva_" + Guid.NewGuid().ToString("N");
        var template = migrated ? Template.Value.GetAwaiter().GetResult() : "template0";
        Creating.Wait();
        try
        {
            Execute($"CREATE DATABASE \"{name}\" TEMPLATE \"{template}\"");
        }
        finally
        {
            Creating.Release();
        }

        return ConnectionStringOf(name);
    }

    /// <summary>Drops a database made by <see cref="CreateDatabase"/>, closing whatever still uses it.</summary>
    public static void DropDatabase(string connectionString)
    {
        var name = new NpgsqlConnectionStringBuilder(connectionString).Database!;
        NpgsqlConnection.ClearAllPools();
        Execute($"DROP DATABASE IF EXISTS \"{name}\" WITH (FORCE)");
    }

    /// <summary>The connection string of database <paramref name="database"/> on the test server, as the app's setting takes it.</summary>
    public static string ConnectionStringOf(string database) =>
        new NpgsqlConnectionStringBuilder(Administrator) { Database = database }.ConnectionString;

    private static void Execute(string sql)
    {
        using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(Administrator) { Pooling = false }.ConnectionString);
        try
        {
            connection.Open();
        }
        catch (NpgsqlException e)
        {
            throw new InvalidOperationException($"The test server in {ConnectionVariable} cannot be reached: {e.Message}. Start it with scripts/test-server.sh start <folder>.", e);
        }

        using var command = connection.CreateCommand();
#pragma warning disable CA2100 // Database names are made here from a Guid.
        command.CommandText = sql;
#pragma warning restore CA2100
        command.ExecuteNonQuery();
    }

    private static async Task<string> BuildTemplateAsync()
    {
        var name = "lva_template_" + Environment.ProcessId + "_" + Guid.NewGuid().ToString("N")[..8];
        Execute($"CREATE DATABASE \"{name}\" TEMPLATE template0");
        var options = new DbContextOptionsBuilder<ClinicDbContext>();
        options.UseClinicServer(new NpgsqlConnectionStringBuilder(ConnectionStringOf(name)) { Pooling = false }.ConnectionString);
        await using (var db = new ClinicDbContext(options.Options))
        {
            await db.UpgradeAsync();
        }

        NpgsqlConnection.ClearAllPools();
        AppDomain.CurrentDomain.ProcessExit += (_, _) =>
        {
            try
            {
                Execute($"DROP DATABASE IF EXISTS \"{name}\" WITH (FORCE)");
            }
            catch (InvalidOperationException)
            {
                // The server was stopped first; its folder goes with it.
            }
            catch (NpgsqlException)
            {
            }
        };
        return name;
    }
}
