using System.Collections.Concurrent;
using System.Net;
using LowVisionAid.Data.Backup;
using LowVisionAid.Reliability.Tests.Support;
using Xunit.Abstractions;

namespace LowVisionAid.Reliability.Tests;

/// <summary>The real app over loopback with 20 parallel writers, on the same and on different records.</summary>
[Trait("Category", "Slow")]
[Collection(RealProcessTests.Name)]
public sealed class ConcurrencyTests(ITestOutputHelper output) : IAsyncLifetime, IDisposable
{
    public const int Writers = 20;
    private readonly TempFolder _data = new("concurrency");
    private AppProcess _app = null!;

    public async Task InitializeAsync() => _app = await AppProcess.StartAsync(_data.Path, loadDemo: false, TimeSpan.FromSeconds(60));

    public Task DisposeAsync()
    {
        Dispose();
        return Task.CompletedTask;
    }

    public void Dispose()
    {
        _app?.Dispose();
        _data.Dispose();
    }

    [Fact]
    public async Task Twenty_writers_adding_different_clients_lose_nothing_while_a_backup_is_taken()
    {
        const int perWriter = 10;
        var statuses = new ConcurrentBag<HttpStatusCode>();
        var backupTask = Task.Run(async () =>
        {
            await Task.Delay(300);
            using var admin = _app.NewClient();
            using var response = await admin.PostFormAsync("/Admin/Backup", [], handler: "Take");
            return response.StatusCode;
        });

        await Task.WhenAll(Enumerable.Range(0, Writers).Select(w => Task.Run(async () =>
        {
            using var client = _app.NewClient();
            for (var n = 0; n < perWriter; n++)
            {
                using var response = await client.PostFormAsync("/Clients/New", [new("Input.Code", $"PW-{w:00}-{n:00}")]);
                statuses.Add(response.StatusCode);
            }
        })));

        var codes = Codes();
        Assert.Equal(Writers * perWriter, statuses.Count(s => s == HttpStatusCode.Redirect));
        Assert.All(Enumerable.Range(0, Writers).SelectMany(w => Enumerable.Range(0, perWriter).Select(n => $"PW-{w:00}-{n:00}")), c => Assert.Contains(c, codes));
        Assert.Equal(HttpStatusCode.OK, await backupTask);
        var backup = Directory.GetFiles(Path.Combine(_data.Path, "backups"), "*-manual.db").Single();
        Assert.Equal("ok", DatabaseBackups.IntegrityCheck(backup));
        output.WriteLine($"different records: {Writers} writers × {perWriter} = {statuses.Count} saves, all acknowledged and present; backup taken during the writes passes integrity_check");
    }

    [Fact]
    public async Task Twenty_writers_adding_the_same_client_code_at_once_give_one_client_and_nineteen_clear_messages()
    {
        var clients = Enumerable.Range(0, Writers).Select(_ => _app.NewClient()).ToList();
        var tokens = await Task.WhenAll(clients.Select(async c => FormClient.Token(await c.GetPageAsync("/Clients/New"))));
        using var start = new ManualResetEventSlim();

        var responses = await Task.WhenAll(clients.Select((c, i) => Task.Run(async () =>
        {
            start.Wait();
            using var response = await c.PostWithTokenAsync("/Clients/New", tokens[i], [new("Input.Code", "SAME-001"), new("Input.Name", $"Writer {i:00}")]);
            return (StatusCode: response.StatusCode, Body: await response.Content.ReadAsStringAsync());
        })).Append(Task.Run(() => { start.Set(); return (StatusCode: HttpStatusCode.Continue, Body: ""); })));

        var posts = responses.Where(r => r.StatusCode != HttpStatusCode.Continue).ToList();
        output.WriteLine("same code: " + string.Join(", ", posts.GroupBy(p => (int)p.StatusCode).Select(g => $"{g.Count()}× {g.Key}")));
        Assert.DoesNotContain(posts, p => (int)p.StatusCode >= 500);
        Assert.Single(posts, p => p.StatusCode == HttpStatusCode.Redirect);
        Assert.Equal(Writers - 1, posts.Count(p => p.StatusCode == HttpStatusCode.OK && p.Body.Contains("Another client already has this code", StringComparison.Ordinal)));
        Assert.Equal(1, DatabaseDump.Scalar(_data.DatabasePath, "SELECT COUNT(*) FROM Clients WHERE Code = 'SAME-001'"));
        clients.ForEach(c => c.Dispose());
    }

    [Fact]
    public async Task Twenty_writers_saving_the_same_visit_from_the_same_version_give_one_save_and_nineteen_conflict_messages_keeping_their_typing()
    {
        using var setup = _app.NewClient();
        var clientId = await ClinicForms.AddClientAsync(setup, "SV-001");
        var visitId = await ClinicForms.AddVisitAsync(setup, clientId, ("Input.Practitioner", "Before"));
        var url = $"/Visits/{visitId}/Edit";
        var clients = Enumerable.Range(0, Writers).Select(_ => _app.NewClient()).ToList();
        var forms = await Task.WhenAll(clients.Select(async c => FormFields.Read(await c.GetPageAsync(url), a => a.Contains("post", StringComparison.OrdinalIgnoreCase))));

        var responses = await Task.WhenAll(clients.Select((c, i) => Task.Run(async () =>
        {
            var fields = forms[i].With(("Input.VisitDate", "2026-11-20"), ("Input.Practitioner", $"Writer {i:00}"));
            using var response = await c.PostWithTokenAsync(url, null, fields);
            return (Writer: i, response.StatusCode, Body: await response.Content.ReadAsStringAsync());
        })));

        output.WriteLine("same visit: " + string.Join(", ", responses.GroupBy(p => (int)p.StatusCode).Select(g => $"{g.Count()}× {g.Key}")));
        Assert.DoesNotContain(responses, p => (int)p.StatusCode >= 500);
        var winner = Assert.Single(responses, p => p.StatusCode == HttpStatusCode.Redirect);
        var losers = responses.Where(p => p.StatusCode != HttpStatusCode.Redirect).ToList();
        Assert.All(losers, l =>
        {
            Assert.Equal(HttpStatusCode.OK, l.StatusCode);
            Assert.Contains("Someone else saved this visit", l.Body, StringComparison.Ordinal);
            Assert.Contains($"value=\"Writer {l.Writer:00}\"", l.Body, StringComparison.Ordinal);
        });
        var saved = DatabaseDump.Read(_data.DatabasePath)["Visits"].Single(r => r.StartsWith($"Id={visitId}|", StringComparison.Ordinal));
        Assert.Contains($"Practitioner=Writer {winner.Writer:00}", saved, StringComparison.Ordinal);
        clients.ForEach(c => c.Dispose());
    }

    [Fact]
    public async Task Twenty_writers_each_editing_their_own_visit_repeatedly_all_save()
    {
        const int edits = 5;
        using var setup = _app.NewClient();
        var visits = new List<int>();
        for (var w = 0; w < Writers; w++)
        {
            var clientId = await ClinicForms.AddClientAsync(setup, $"DV-{w:00}");
            visits.Add(await ClinicForms.AddVisitAsync(setup, clientId));
        }

        var statuses = new ConcurrentBag<HttpStatusCode>();
        await Task.WhenAll(visits.Select((visitId, w) => Task.Run(async () =>
        {
            using var client = _app.NewClient();
            for (var n = 0; n < edits; n++)
            {
                var url = $"/Visits/{visitId}/Edit";
                var fields = FormFields.Read(await client.GetPageAsync(url), a => a.Contains("post", StringComparison.OrdinalIgnoreCase))
                    .With(("Input.VisitDate", "2026-11-20"), ("Input.Practitioner", $"W{w:00} edit {n}"));
                using var response = await client.PostWithTokenAsync(url, null, fields);
                statuses.Add(response.StatusCode);
            }
        })));

        Assert.Equal(Writers * edits, statuses.Count(s => s == HttpStatusCode.Redirect));
        var rows = DatabaseDump.Read(_data.DatabasePath)["Visits"];
        for (var w = 0; w < Writers; w++)
        {
            Assert.Contains(rows, r => r.StartsWith($"Id={visits[w]}|", StringComparison.Ordinal) && r.Contains($"Practitioner=W{w:00} edit {edits - 1}|", StringComparison.Ordinal));
        }

        output.WriteLine($"different visits: {Writers} writers × {edits} edits = {statuses.Count} saves, all acknowledged, last value of each present");
    }

    private HashSet<string> Codes() => DatabaseDump.Read(_data.DatabasePath)["Clients"]
        .Select(r => r.Split('|').First(f => f.StartsWith("Code=", StringComparison.Ordinal))["Code=".Length..])
        .ToHashSet(StringComparer.OrdinalIgnoreCase);
}
