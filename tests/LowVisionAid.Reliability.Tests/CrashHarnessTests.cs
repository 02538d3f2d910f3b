using System.Collections.Concurrent;
using System.Diagnostics;
using System.Net;
using LowVisionAid.Data.Backup;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.TestSupport;
using Microsoft.Data.Sqlite;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// The app as a real process, killed with SIGKILL at random moments while clients are being saved over loopback,
/// then restarted: every save it acknowledged is there, and SQLite's integrity check passes.
/// </summary>
[Trait("Category", "Slow")]
[Trait("Category", TestServer.SqliteFileCategory)]   // kills and restarts on the SQLite file: its locks, its WAL, its integrity check
[Collection(RealProcessTests.Name)]
public sealed class CrashHarnessTests(ITestOutputHelper output)
{
    public const int Runs = 10;
    private const int WritersPerRun = 4;
    private const int MaxWritesPerWriter = 150;

    // A run is killed after a random number of its saves were acknowledged, then a random few milliseconds more, so
    // the kill lands among the writes however slow the shared machine is (a fixed delay in ms killed some runs before
    // any save on 2 loaded cores). A start is killed at a random fraction of the last measured start time.
    private const int MinAcknowledgedBeforeKill = 5;
    private const int MaxAcknowledgedBeforeKill = 40;
    private static readonly TimeSpan RunLimit = TimeSpan.FromSeconds(30);

    // Start-up (migrations, demo plans) shares 2 cores with the rest of the suite: give it its own, longer bound.
    private static readonly TimeSpan StartLimit = TimeSpan.FromSeconds(120);

    // What the app logs (Warning) when start-up removes a migration lock left by a start that was killed.
    private const string ReleasedLockLine = "its migration lock was released";

    [Fact]
    public async Task Every_acknowledged_save_survives_a_kill_at_a_random_moment_and_the_database_stays_intact()
    {
        using var data = new TempFolder("crash");
        var random = new Random(20261201);
        var acknowledged = new ConcurrentDictionary<string, int>(StringComparer.Ordinal);
        var attempted = 0;
        var serverErrors = new ConcurrentBag<string>();
        var killsDuringStart = 0;
        var locksReleased = 0;
        var clock = Stopwatch.StartNew();

        var lastStart = TimeSpan.FromSeconds(2);
        for (var run = 0; run < Runs; run++)
        {
            // Every third run is killed while the app is still starting (migrations, demo data).
            var killWhileStarting = run % 3 == 2;
            var starting = Stopwatch.StartNew();
            using var app = await AppProcess.StartAsync(data.Path, loadDemo: run == 0, StartLimit, waitUntilReady: !killWhileStarting);
            if (killWhileStarting)
            {
                await Task.Delay(TimeSpan.FromMilliseconds(Math.Max(50, random.NextDouble() * lastStart.TotalMilliseconds)));
                app.Kill();
                killsDuringStart++;
                continue;
            }

            lastStart = starting.Elapsed;
            locksReleased += app.HasWritten(ReleasedLockLine) ? 1 : 0;
            using var stop = new CancellationTokenSource(RunLimit);
            var killAtAcknowledged = random.Next(MinAcknowledgedBeforeKill, MaxAcknowledgedBeforeKill + 1);
            var jitter = TimeSpan.FromMilliseconds(random.Next(0, 250));
            var acknowledgedThisRun = 0;
            var enoughAcknowledged = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
            var writers = Enumerable.Range(0, WritersPerRun).Select(w => Task.Run(async () =>
            {
                using var client = app.NewClient();
                for (var n = 0; n < MaxWritesPerWriter && !stop.IsCancellationRequested; n++)
                {
                    var code = $"CR-{run:00}-{w}-{n:000}";
                    Interlocked.Increment(ref attempted);
                    try
                    {
                        var page = await client.GetPageAsync("/Clients/New");
                        using var response = await client.PostWithTokenAsync("/Clients/New", FormClient.Token(page), [new("Input.Code", code), new("Input.Notes", "crash run " + run)]);
                        if (response.StatusCode == HttpStatusCode.Redirect)
                        {
                            acknowledged[code] = run;
                            if (Interlocked.Increment(ref acknowledgedThisRun) >= killAtAcknowledged)
                            {
                                enoughAcknowledged.TrySetResult();
                            }
                        }
                        else if ((int)response.StatusCode >= 500)
                        {
                            serverErrors.Add($"{code}: {(int)response.StatusCode}");
                        }
                    }
                    catch (Exception e) when (e is HttpRequestException or TaskCanceledException or IOException or Xunit.Sdk.XunitException)
                    {
                        // The process was killed mid-request: this write was never acknowledged.
                        return;
                    }
                }
            })).ToList();

            // Bounded: a run that never reaches its number of saves is killed when its time is up.
            await Task.WhenAny(enoughAcknowledged.Task, Task.Delay(RunLimit));
            await Task.Delay(jitter);
            app.Kill();
            await Task.WhenAll(writers);

            // After every kill: the file is intact.
            Assert.Equal("ok", IntegrityCheckAfterKill(data.DatabasePath));
        }

        // A last restart: the app starts on the crashed database and shows the saved clients.
        using (var last = await AppProcess.StartAsync(data.Path, loadDemo: false, StartLimit))
        {
            locksReleased += last.HasWritten(ReleasedLockLine) ? 1 : 0;
            using var client = last.NewClient();
            foreach (var code in acknowledged.Keys.Order(StringComparer.Ordinal).Where((_, i) => i % 25 == 0))
            {
                Assert.Contains(code, await client.GetPageAsync("/Clients?q=" + code), StringComparison.Ordinal);
            }
        }

        var stored = DatabaseDump.Read(data.DatabasePath)["Clients"]
            .Select(r => r.Split('|').First(f => f.StartsWith("Code=", StringComparison.Ordinal))["Code=".Length..])
            .ToHashSet(StringComparer.OrdinalIgnoreCase);
        var lost = acknowledged.Keys.Where(c => !stored.Contains(c)).ToList();
        output.WriteLine($"crash harness: {Runs} runs ({killsDuringStart} killed while starting), {Runs} SIGKILLs, {attempted} writes attempted, " +
            $"{acknowledged.Count} acknowledged, {stored.Count} client rows checked, {lost.Count} lost, {serverErrors.Count} server errors, " +
            $"{locksReleased} restarts freed a migration lock left by a kill, {clock.Elapsed.TotalSeconds:0} s");
        Assert.Empty(lost);
        Assert.Empty(serverErrors);
        Assert.True(acknowledged.Count >= 50, $"Only {acknowledged.Count} writes were acknowledged; the harness did not exercise the app.");
        Assert.Equal("ok", IntegrityCheckAfterKill(data.DatabasePath));
    }

    // Found by the harness above after the full merge (a restarted app never answered): EF Core's migration lock on
    // SQLite is a row in __EFMigrationsLock that only the process holding it deletes, with no timeout, so a start
    // killed while it migrated left the row and every later start waited for it forever.
    [Fact]
    public async Task A_start_killed_while_it_holds_the_migration_lock_does_not_stop_the_next_start()
    {
        using var data = new TempFolder("killed-migration");

        // What a first start killed right after it took EF Core's migration lock on a new database leaves: the lock
        // table with its row (EF Core's own SQLite statements) and nothing else. Catching a real start in that window
        // (polling the file while it migrated, then killing it) was a race the test lost on a loaded machine; the
        // harness above kills real starts mid-write.
        DatabaseDump.Execute(data.DatabasePath,
            "CREATE TABLE IF NOT EXISTS \"__EFMigrationsLock\" (\"Id\" INTEGER NOT NULL CONSTRAINT \"PK___EFMigrationsLock\" PRIMARY KEY, \"Timestamp\" TEXT NOT NULL);" +
            "INSERT INTO \"__EFMigrationsLock\" (\"Id\", \"Timestamp\") VALUES (1, '2026-12-03 10:00:00+00:00');");

        Assert.Equal(1, MigrationLockRows(data.DatabasePath));

        var clock = Stopwatch.StartNew();
        using (var second = await AppProcess.StartAsync(data.Path, loadDemo: true, StartLimit))
        {
            var started = clock.Elapsed;
            Assert.True(await second.WaitForOutputAsync(ReleasedLockLine, TimeSpan.FromSeconds(10)), second.LastOutput());
            using var client = second.NewClient();
            await ClinicForms.AddClientAsync(client, "KM-0001");   // the schema is complete: a client is saved and found
            Assert.Contains("KM-0001", await client.GetPageAsync("/Clients?q=KM-0001"), StringComparison.Ordinal);
            output.WriteLine($"left holding the migration lock; the next start released it and answered after {started.TotalSeconds:0.0} s");
        }

        Assert.Equal(0, MigrationLockRows(data.DatabasePath));
        Assert.Equal("ok", IntegrityCheckAfterKill(data.DatabasePath));
    }

    // As the next start opens it: read-write, so SQLite can recover the killed process's WAL first. A read-only
    // connection cannot, and failed with "attempt to write a readonly database" after a kill in the middle of a write
    // (R1, 2026-12-02); that is the check's limit, not damage.
    private static string IntegrityCheckAfterKill(string databasePath)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = databasePath, Mode = SqliteOpenMode.ReadWrite, Pooling = false }.ToString());
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = "PRAGMA integrity_check";
        return command.ExecuteScalar() as string ?? "no answer";
    }

    private static long MigrationLockRows(string databasePath)
    {
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = databasePath, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
        connection.Open();
        return LockRows(connection, null);
    }

    private static long LockRows(SqliteConnection connection, SqliteTransaction? transaction)
    {
        using var command = connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = "SELECT COUNT(*) FROM sqlite_master WHERE type = 'table' AND name = '__EFMigrationsLock'";
        if ((long)command.ExecuteScalar()! == 0)
        {
            return 0;
        }

        command.CommandText = "SELECT COUNT(*) FROM \"__EFMigrationsLock\"";
        return (long)command.ExecuteScalar()!;
    }
}

/// <summary>
/// Tests that start the app as a real process run one at a time, in one collection: beside at most one in-process
/// class, not alone at the end of the run with a core idle (they hold the most Slow tests, so SlowClassesFirst
/// starts them first).
/// </summary>
[CollectionDefinition(Name)]
public sealed class RealProcessTests
{
    public const string Name = "Real app process";
}
