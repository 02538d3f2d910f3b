using LowVisionAid.Data;
using LowVisionAid.Load;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Pages.Clients;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Web.Tests.Pages.Clients;

/// <summary>A clinic group's records: 100,000 synthetic clients with two visits each, made once for the class.</summary>
public sealed class SyntheticClinicFixture : IAsyncLifetime
{
    public ClinicApp App { get; } = new();

    public async Task InitializeAsync()
    {
        await App.WithDbAsync(_ => Task.CompletedTask);
        await SyntheticClinic.AddAsync(App.DataFolder, new SyntheticSize(100_000, 200_000, 0, 0), _ => { });
    }

    public Task DisposeAsync()
    {
        App.Dispose();
        return Task.CompletedTask;
    }
}

/// <summary>
/// The client list and search give the right clients, each once and in order, at clinic-group scale (the same
/// answers as a reference computed in memory from the visits themselves, not from the stored columns). Results, not
/// times: the times are measured by the load harness (docs/performance.md).
/// </summary>
// The synthetic clinic is written straight into the SQLite file (the load harness's generator), and the index it checks
// is SQLite's FTS5 table; on a server the same searches go through the trigram index (ClientListTests, both passes).
[Trait("Category", "Slow")]
[Trait("Category", TestServer.SqliteFileCategory)]
public sealed class ClientListAtScaleTests(SyntheticClinicFixture clinic) : IClassFixture<SyntheticClinicFixture>
{
    [Fact]
    public async Task An_exact_code_finds_that_one_client()
    {
        var page = await ListAsync("SYN-054321", 1);

        Assert.Equal(["SYN-054321"], page.Rows.Select(r => r.Code));
        Assert.False(page.HasNext);
    }

    [Fact]
    public async Task A_code_prefix_finds_every_client_with_it_in_pages_most_recently_seen_first()
    {
        // SYN-099900 to SYN-099999: 100 clients, two pages of 50.
        var listed = await AllPagesAsync("SYN-0999");
        var expected = (await ReferenceAsync()).Where(c => c.Code.StartsWith("SYN-0999", StringComparison.Ordinal)).Select(c => c.Code).ToList();

        Assert.Equal(100, expected.Count);
        Assert.Equal(expected, listed);
    }

    [Fact]
    public async Task A_name_fragment_typed_without_its_accent_finds_every_client_whose_name_holds_it()
    {
        var listed = await AllPagesAsync("strom");
        var expected = (await ReferenceAsync()).Where(c => ClientSearch.Fold(c.Name).Contains("strom", StringComparison.Ordinal)).Select(c => c.Code).ToList();

        Assert.True(expected.Count > 1000, $"Only {expected.Count} synthetic names hold 'ström'; the check needs many pages.");
        Assert.Equal(expected, listed);
    }

    [Fact]
    public async Task The_first_and_a_deep_page_of_the_whole_list_match_the_order_of_the_latest_visits()
    {
        var reference = await ReferenceAsync();

        var first = await ListAsync(null, 1);
        var deep = await ListAsync(null, 1500);

        Assert.Equal(reference.Take(ClientListHandler.PageSize).Select(c => c.Code), first.Rows.Select(r => r.Code));
        Assert.Equal(reference.Skip(1499 * ClientListHandler.PageSize).Take(ClientListHandler.PageSize).Select(c => c.Code), deep.Rows.Select(r => r.Code));
        Assert.Equal(reference.Take(ClientListHandler.PageSize).Select(c => c.LastVisit), first.Rows.Select(r => r.LastVisit));
    }

    private async Task<LowVisionAid.Web.Infrastructure.ListPage<ClientRow>> ListAsync(string? search, int page)
    {
        using var scope = clinic.App.Services.CreateScope();
        return await scope.ServiceProvider.GetRequiredService<ClientListHandler>().HandleAsync(search, page, CancellationToken.None);
    }

    private async Task<List<string>> AllPagesAsync(string search)
    {
        var codes = new List<string>();
        for (var n = 1; ; n++)
        {
            var page = await ListAsync(search, n);
            codes.AddRange(page.Rows.Select(r => r.Code));
            if (!page.HasNext)
            {
                return codes;
            }
        }
    }

    // Every client with the latest of their visits, computed from the visits, in the order the list promises:
    // latest visit first (none last), then by code.
    private Task<List<(string Code, string? Name, DateOnly? LastVisit)>> ReferenceAsync() =>
        clinic.App.WithDbAsync(async db =>
        {
            var latest = await db.Visits.AsNoTracking().GroupBy(v => v.ClientId).Select(g => new { g.Key, Last = g.Max(v => v.VisitDate) }).ToDictionaryAsync(x => x.Key, x => x.Last);
            var clients = await db.Clients.AsNoTracking().Select(c => new { c.Id, c.Code, c.Name }).ToListAsync();
            return clients
                .Select(c => (c.Code, c.Name, LastVisit: latest.TryGetValue(c.Id, out var d) ? d : (DateOnly?)null))
                .OrderByDescending(c => c.LastVisit).ThenBy(c => c.Code, StringComparer.OrdinalIgnoreCase)
                .ToList();
        });
}
