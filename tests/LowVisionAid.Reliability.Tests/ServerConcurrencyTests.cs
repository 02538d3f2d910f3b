using System.Collections.Concurrent;
using System.Diagnostics;
using System.Globalization;
using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Data.Audit;
using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.TestSupport;
using Npgsql;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// Two PCs of a clinic on one PostgreSQL server: two processes of the real app (each with its own data folder, both on
/// the same server database, loopback only) started at the same moment on an empty database, then 20 parallel writers
/// split across them editing the same client records through the client edit form. Every save either lands or gets
/// the "changed by someone else" answer with what was typed still in the form; no update is lost; no server error.
/// </summary>
[Trait("Category", "Slow")]
[Trait("Category", TestServer.ServerOnlyCategory)]
[Collection(RealProcessTests.Name)]
public sealed class ServerConcurrencyTests(ITestOutputHelper output)
{
    public const int Writers = 20;
    private const int Rounds = 5;
    private const int SharedClients = 2;
    private static readonly TimeSpan StartLimit = TimeSpan.FromSeconds(180);

    [Fact]
    public async Task Two_app_processes_on_one_server_with_twenty_writers_on_the_same_clients_lose_no_update_and_answer_every_conflict()
    {
        TestServer.Require();
        var database = TestServer.CreateDatabase(migrated: false);
        using var folderA = new TempFolder("server-pc-a");
        using var folderB = new TempFolder("server-pc-b");
        AppProcess? a = null;
        AppProcess? b = null;
        try
        {
            // Two PCs start at once on the empty database: one migrates it under the start-up lock, the other finds nothing to do
            var environment = new Dictionary<string, string>
            {
                ["Database__Provider"] = nameof(DatabaseProvider.PostgreSql),
                ["Database__ConnectionString"] = database,
                ["Logging__LogLevel__LowVisionAid.Web.Requests"] = "Warning",   // keep the start-up lines among those the harness keeps
            };
            var starts = await Task.WhenAll(new[] { folderA, folderB }.Select(f => TryStartAsync(f.Path, environment)));
            (a, b) = (starts[0].App, starts[1].App);
            if (starts.FirstOrDefault(s => s.Error is not null).Error is { } failed)
            {
                throw new InvalidOperationException("An app process did not start.", failed);
            }

            AppProcess[] apps = [a!, b!];
            var migrated = apps.Count(app => app.HasWritten("Database migrated:"));
            var upToDate = apps.Count(app => app.HasWritten("Database schema up to date"));
            Assert.True(migrated == 1 && upToDate == 1, $"Expected one start to migrate and the other to find nothing to do.\nA:\n{a!.LastOutput()}\nB:\n{b!.LastOutput()}");

            // One account, made on the first PC and used on both; the shared clients made on the second
            using (var first = a!.NewClient())
            {
                await Accounts.CreateFirstAdministratorAsync(first);
            }

            var clientIds = new List<int>();
            using (var setup = await SignedInAsync(b!))
            {
                for (var c = 0; c < SharedClients; c++)
                {
                    clientIds.Add(await ClinicForms.AddClientAsync(setup, $"TP-{c:00}", "Invented Person", "1950", "Before the writers"));
                }
            }

            var auditBefore = await ChangedLinesAsync(database, clientIds);
            var writers = new List<FormClient>();
            for (var w = 0; w < Writers; w++)
            {
                writers.Add(await SignedInAsync(apps[w % 2]));
            }

            // Act: every writer opens the form, types, saves, Rounds times, all at once
            var saves = new ConcurrentBag<Save>();
            var load = File.ReadAllText("/proc/loadavg").Trim();
            var clock = Stopwatch.StartNew();
            var go = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
            var work = writers.Select((client, w) => Task.Run(async () =>
            {
                await go.Task;
                var clientId = clientIds[w / 2 % SharedClients];
                var url = $"/Clients/{clientId}/Edit";
                for (var n = 0; n < Rounds; n++)
                {
                    var form = FormFields.Read(await client.GetPageAsync(url), f => f.Contains("post", StringComparison.OrdinalIgnoreCase));
                    var typed = new Typed($"Writer {w:00} on PC {(w % 2 == 0 ? "A" : "B")}", $"Round {n} of writer {w:00}");
                    var baseVersion = form.Single(f => f.Key == "Input.Version").Value;
                    using var response = await client.PostWithTokenAsync(url, null, form.With(("Input.Name", typed.Name), ("Input.Notes", typed.Notes)));
                    saves.Add(new Save(w, clientId, baseVersion, typed, response.StatusCode, await response.Content.ReadAsStringAsync()));
                }
            })).ToList();
            go.SetResult();
            await Task.WhenAll(work);
            clock.Stop();
            var loadAfter = File.ReadAllText("/proc/loadavg").Trim();
            writers.ForEach(w => w.Dispose());

            // Assert: no server error; each answer is a save or a conflict that kept the typing
            Assert.Equal(Writers * Rounds, saves.Count);
            Assert.DoesNotContain(saves, s => (int)s.Status >= 500);
            var landed = saves.Where(s => s.Status == HttpStatusCode.Redirect).ToList();
            var conflicts = saves.Where(s => s.Status != HttpStatusCode.Redirect).ToList();
            Assert.All(conflicts, c =>
            {
                Assert.True(c.Status == HttpStatusCode.OK, $"Writer {c.Writer}: {(int)c.Status} {FormClient.Shorten(c.Body)}");
                Assert.Contains("Someone else saved this client's details while you were editing them", string.Join(' ', PageHtml.Texts(c.Body, ".error-summary")), StringComparison.Ordinal);
                var kept = FormFields.Read(c.Body, f => f.Contains("post", StringComparison.OrdinalIgnoreCase)).ToDictionary(f => f.Key, f => f.Value);
                Assert.Equal(c.Typed.Name, kept["Input.Name"]);
                Assert.Equal(c.Typed.Notes, kept["Input.Notes"].Trim());
            });

            // No lost update: on each client no two saves from the same version both landed, nothing landed on top of the
            // final row's version, and the final row is exactly the save that landed last (its typing, unique to it)
            var rows = await RowsAsync(database, clientIds);
            foreach (var clientId in clientIds)
            {
                var onClient = landed.Where(s => s.ClientId == clientId).ToList();
                Assert.NotEmpty(onClient);
                Assert.Equal(onClient.Count, onClient.Select(s => s.BaseVersion).Distinct(StringComparer.Ordinal).Count());
                var row = rows[clientId];
                Assert.Single(onClient, s => s.Typed.Name == row.Name && s.Typed.Notes == row.Notes);
                Assert.DoesNotContain(onClient, s => s.BaseVersion == row.Version);
            }

            // Every landed save is one "Changed" line of the audit trail, and no refused one is
            var auditAfter = await ChangedLinesAsync(database, clientIds);
            Assert.Equal(landed.Count, auditAfter - auditBefore);
            Assert.False(a!.HasExited || b!.HasExited, "An app process stopped during the writes.");

            var perPc = string.Join(", ", new[] { "A", "B" }.Select((pc, i) => $"PC {pc}: {landed.Count(s => s.Writer % 2 == i)} landed / {conflicts.Count(s => s.Writer % 2 == i)} conflicts"));
            output.WriteLine($"two processes on one PostgreSQL database, {Writers} writers ({Writers / 2} per process) × {Rounds} saves on {SharedClients} clients: " +
                $"{landed.Count} saves landed, {conflicts.Count} conflicts answered with the typing kept, 0 server errors, 0 lost; {clock.Elapsed.TotalSeconds:0.0} s ({perPc})");
            output.WriteLine($"load average before: {load}; after: {loadAfter}; {Environment.ProcessorCount} cores");
        }
        finally
        {
            a?.Dispose();
            b?.Dispose();
            TestServer.DropDatabase(database);
        }
    }

    private sealed record Typed(string Name, string Notes);

    private sealed record Save(int Writer, int ClientId, string BaseVersion, Typed Typed, HttpStatusCode Status, string Body);

    private sealed record Row(string? Name, string? Notes, string Version);

    // Both starts run to their end, so that neither is left running when the other fails.
    private static async Task<(AppProcess? App, Exception? Error)> TryStartAsync(string folder, IReadOnlyDictionary<string, string> environment)
    {
        try
        {
            return (await AppProcess.StartAsync(folder, loadDemo: false, StartLimit, environment: environment, readyPath: "/Account/SignIn"), null);
        }
        catch (Exception e) when (e is InvalidOperationException or TimeoutException or IOException)
        {
            return (null, e);
        }
    }

    private static async Task<FormClient> SignedInAsync(AppProcess app)
    {
        var client = app.NewClient();
        using var signIn = await Accounts.SignInAsync(client, Accounts.AdminName, Accounts.AdminPassword);
        Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
        return client;
    }

    private static async Task<Dictionary<int, Row>> RowsAsync(string database, List<int> ids)
    {
        await using var connection = new NpgsqlConnection(database);
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand("SELECT \"Id\", \"Name\", \"Notes\", \"Version\"::text FROM \"Clients\" WHERE \"Id\" = ANY(@ids)", connection);
        command.Parameters.AddWithValue("ids", ids.ToArray());
        await using var reader = await command.ExecuteReaderAsync();
        var rows = new Dictionary<int, Row>();
        while (await reader.ReadAsync())
        {
            rows[reader.GetInt32(0)] = new Row(reader.IsDBNull(1) ? null : reader.GetString(1), reader.IsDBNull(2) ? null : reader.GetString(2), reader.GetString(3));
        }

        return rows;
    }

    private static async Task<long> ChangedLinesAsync(string database, List<int> ids)
    {
        await using var connection = new NpgsqlConnection(database);
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand(
            $"SELECT COUNT(*) FROM \"{AuditEntry.Table}\" WHERE \"RecordType\" = 'Client' AND \"Action\" = @action AND \"RecordId\" = ANY(@ids)", connection);
        command.Parameters.AddWithValue("action", nameof(AuditAction.Changed));
        command.Parameters.AddWithValue("ids", ids.Select(i => (long)i).ToArray());
        return Convert.ToInt64(await command.ExecuteScalarAsync(), CultureInfo.InvariantCulture);
    }
}
