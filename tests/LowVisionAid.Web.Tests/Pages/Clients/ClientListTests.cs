using System.Text.RegularExpressions;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Pages.Clients;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

namespace LowVisionAid.Web.Tests.Pages.Clients;

/// <summary>
/// Finding a client as a clinician types (any part of the code or name, whatever the case and accents: common
/// practice for a records search) and lists that stay short however many clients and visits the clinic has.
/// </summary>
public sealed partial class ClientListTests
{
    [Theory]
    [InlineData("muller", "A-0002")]
    [InlineData("MÜLLER", "A-0002")]
    [InlineData("irene", "A-0001")]
    [InlineData("Irène", "A-0001")]
    [InlineData("ène du", "A-0001")]
    [InlineData("a-0003", "A-0003")]
    [InlineData("0003", "A-0003")]
    [InlineData("  orm  ", "A-0003")]
    public async Task A_search_finds_any_part_of_a_code_or_name_ignoring_case_and_accents(string typed, string expected)
    {
        // Arrange: invented clients.
        using var app = new ClinicApp();
        await app.WithDbAsync(async db =>
        {
            db.Clients.AddRange(
                new Client { Code = "A-0001", Name = "Irène Dubarry" },
                new Client { Code = "A-0002", Name = "Jonas Müller" },
                new Client { Code = "A-0003", Name = "Nils Ormond" });
            await db.SaveChangesAsync();
        });
        using var browser = app.Browser();

        // Act
        var html = await browser.GetStringAsync(new Uri("/Clients?q=" + Uri.EscapeDataString(typed), UriKind.Relative));

        // Assert
        Assert.Equal([expected], Codes(html));
    }

    [Theory]
    [InlineData("%")]
    [InlineData("_")]
    [InlineData("\\")]
    public async Task Wildcards_typed_in_a_search_are_taken_as_the_characters_themselves(string typed)
    {
        // Arrange
        using var app = new ClinicApp();
        await app.ClientAsync("B-0001");
        using var browser = app.Browser();

        // Act
        var html = await browser.GetStringAsync(new Uri("/Clients?q=" + Uri.EscapeDataString(typed), UriKind.Relative));

        // Assert
        Assert.Empty(Codes(html));
        Assert.Contains("No client matches that search.", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_latest_visit_date_follows_visits_added_moved_and_removed()
    {
        // Arrange
        using var app = new ClinicApp();
        var id = await app.ClientAsync("C-0001");

        // Act and assert: two visits, the later one counts ...
        var (early, late) = await app.WithDbAsync(async db =>
        {
            var first = new Visit { ClientId = id, VisitDate = new DateOnly(2026, 3, 1) };
            var second = new Visit { ClientId = id, VisitDate = new DateOnly(2026, 9, 15) };
            db.Visits.AddRange(first, second);
            await db.SaveChangesAsync();
            return (first.Id, second.Id);
        });
        Assert.Equal(new DateOnly(2026, 9, 15), await LastVisitAsync(app, id));

        // ... its date corrected to earlier, the other one now counts ...
        await app.WithDbAsync(async db =>
        {
            (await db.Visits.SingleAsync(v => v.Id == late)).VisitDate = new DateOnly(2026, 1, 10);
            await db.SaveChangesAsync();
        });
        Assert.Equal(new DateOnly(2026, 3, 1), await LastVisitAsync(app, id));

        // ... and with both removed there is no latest visit.
        await app.WithDbAsync(async db =>
        {
            db.Visits.RemoveRange(await db.Visits.Where(v => v.ClientId == id).ToListAsync());
            await db.SaveChangesAsync();
        });
        Assert.Null(await LastVisitAsync(app, id));
        Assert.NotEqual(early, late);
    }

    [Fact]
    public async Task The_client_list_comes_in_pages_most_recently_seen_first_each_client_once()
    {
        // Arrange: 120 clients, client n last seen n days after 1 January 2026, and 3 never seen.
        using var app = new ClinicApp();
        await app.WithDbAsync(async db =>
        {
            for (var n = 1; n <= 120; n++)
            {
                var client = new Client { Code = $"P-{n:0000}" };
                client.Visits.Add(new Visit { VisitDate = new DateOnly(2026, 1, 1).AddDays(n) });
                db.Clients.Add(client);
            }

            db.Clients.AddRange(new Client { Code = "P-NEW-1" }, new Client { Code = "P-NEW-2" }, new Client { Code = "P-NEW-3" });
            await db.SaveChangesAsync();
        });
        using var browser = app.Browser();

        // Act
        var pages = new List<string>();
        for (var p = 1; p <= 3; p++)
        {
            pages.Add(await browser.GetStringAsync(new Uri($"/Clients?p={p}", UriKind.Relative)));
        }

        // Assert
        var seen = pages.SelectMany(Codes).ToList();
        var expected = Enumerable.Range(1, 120).Reverse().Select(n => $"P-{n:0000}").Concat(["P-NEW-1", "P-NEW-2", "P-NEW-3"]).ToList();
        Assert.Equal(expected, seen);
        Assert.Equal([ClientListHandler.PageSize, ClientListHandler.PageSize, 23], pages.Select(p => Codes(p).Count));
        Assert.Contains("href=\"/Clients?p=2\" rel=\"next\"", pages[0], StringComparison.Ordinal);
        Assert.DoesNotContain("rel=\"prev\"", pages[0], StringComparison.Ordinal);
        Assert.Contains("href=\"/Clients?p=2\" rel=\"prev\"", pages[2], StringComparison.Ordinal);
        Assert.DoesNotContain("rel=\"next\"", pages[2], StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_search_keeps_its_text_in_the_page_links()
    {
        // Arrange: 60 invented clients whose names hold "Orsa", and one other.
        using var app = new ClinicApp();
        await app.WithDbAsync(async db =>
        {
            for (var n = 1; n <= 60; n++)
            {
                db.Clients.Add(new Client { Code = $"Q-{n:0000}", Name = $"Synthetic Orsa {n}" });
            }

            db.Clients.Add(new Client { Code = "Q-OTHER", Name = "Synthetic Bell" });
            await db.SaveChangesAsync();
        });
        using var browser = app.Browser();

        // Act
        var first = await browser.GetStringAsync(new Uri("/Clients?q=orsa", UriKind.Relative));
        var second = await browser.GetStringAsync(new Uri("/Clients?q=orsa&p=2", UriKind.Relative));

        // Assert
        Assert.Contains("href=\"/Clients?q=orsa&amp;p=2\" rel=\"next\"", first, StringComparison.Ordinal);
        Assert.Equal(60, Codes(first).Count + Codes(second).Count);
        Assert.DoesNotContain("Q-OTHER", first + second, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_client_page_shows_the_latest_visits_a_page_at_a_time()
    {
        // Arrange: one client with 25 visits, one a week.
        using var app = new ClinicApp();
        var id = await app.ClientAsync("V-0001");
        await app.WithDbAsync(async db =>
        {
            for (var n = 0; n < 25; n++)
            {
                db.Visits.Add(new Visit { ClientId = id, VisitDate = new DateOnly(2026, 1, 5).AddDays(7 * n), Practitioner = $"Week {n + 1}" });
            }

            await db.SaveChangesAsync();
        });
        using var browser = app.Browser();

        // Act
        var first = await browser.GetStringAsync(new Uri($"/Clients/{id}", UriKind.Relative));
        var second = await browser.GetStringAsync(new Uri($"/Clients/{id}?visits=2&trials=1", UriKind.Relative));

        // Assert: weeks 25 down to 6 on the first page, 5 down to 1 on the second.
        Assert.Equal(Enumerable.Range(6, 20).Reverse().Select(w => $"Week {w}"), Weeks(first));
        Assert.Equal(Enumerable.Range(1, 5).Reverse().Select(w => $"Week {w}"), Weeks(second));
        Assert.Contains($"href=\"/Clients/{id}?visits=2&amp;trials=1#visits\" rel=\"next\"", first, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Upgrading_a_database_made_before_the_list_columns_fills_each_clients_latest_visit_and_search_text()
    {
        // Arrange: the current schema, then the two columns emptied as the migration before them left them.
        using var app = new ClinicApp();
        var id = await app.ClientAsync("U-0001");
        await app.WithDbAsync(async db =>
        {
            db.Visits.Add(new Visit { ClientId = id, VisitDate = new DateOnly(2026, 6, 30) });
            (await db.Clients.SingleAsync(c => c.Id == id)).Name = "Zoë Åberg";
            await db.SaveChangesAsync();
            var migrator = db.GetService<IMigrator>();
            var before = db.Database.GetMigrations().TakeWhile(m => !m.EndsWith("_ListsAtScale", StringComparison.Ordinal)).Last();
            await migrator.MigrateAsync(before);
        });

        // Act
        await app.WithDbAsync(async db => await db.UpgradeAsync());

        // Assert
        var client = await app.WithDbAsync(db => db.Clients.AsNoTracking().SingleAsync(c => c.Id == id));
        Assert.Equal(new DateOnly(2026, 6, 30), client.LastVisitDate);
        Assert.Equal("u-0001 zoe aberg", client.SearchText);
    }

    private static Task<DateOnly?> LastVisitAsync(ClinicApp app, int id) =>
        app.WithDbAsync(db => db.Clients.AsNoTracking().Where(c => c.Id == id).Select(c => c.LastVisitDate).SingleAsync());

    // The client codes in the list, in order (each row's header cell links to the client).
    private static List<string> Codes(string html) =>
        [.. CodeLink().Matches(html).Select(m => m.Groups[1].Value)];

    private static List<string> Weeks(string html) =>
        [.. WeekCell().Matches(html).Select(m => m.Groups[1].Value)];

    [GeneratedRegex("<th scope=\"row\"><a href=\"/Clients/\\d+\">([^<]+)</a>", RegexOptions.None, 1000)]
    private static partial Regex CodeLink();

    [GeneratedRegex("<td data-label=\"Practitioner\">(Week \\d+)</td>", RegexOptions.None, 1000)]
    private static partial Regex WeekCell();
}
