using LowVisionAid.Reliability.Tests.Support;
using Microsoft.Extensions.Logging;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// What the plan page reads (docs/performance.md): on a miss, the stamp and one load of the plan that the page and its
/// "Handouts and print" part share (the part used to load the plan, its visit, trials and settings again, about 40 %
/// of the request); on a hit, the stamp alone, without the stored outputs (the body comes from the cache).
/// </summary>
public sealed class PlanPageQueryTests
{
    [Fact]
    public async Task The_plan_page_reads_the_plan_once_when_its_body_is_made_and_only_its_stamp_after()
    {
        using var app = new ClinicApp("plan-page-queries", loadDemo: true);
        using var client = app.CreateClient();
        using (var home = await client.GetAsync(new Uri("/", UriKind.Relative)))
        {
            Assert.True(home.IsSuccessStatusCode);
        }

        app.Logs.Collector.Clear();
        using (var first = await client.GetAsync(new Uri("/Plans/1", UriKind.Relative)))
        {
            Assert.True(first.IsSuccessStatusCode);
        }

        var made = Commands(app);
        // The stamp, then the plan with its visit and client, its trials and the settings: each once.
        Assert.Equal(4, made.Count);
        Assert.Single(made, c => c.Contains("\"OutputsJson\"", StringComparison.Ordinal));
        Assert.Single(made, c => c.Contains("FROM \"Trials\"", StringComparison.Ordinal));

        app.Logs.Collector.Clear();
        using var again = await client.GetAsync(new Uri("/Plans/1", UriKind.Relative));

        Assert.True(again.IsSuccessStatusCode);
        var stamp = Assert.Single(Commands(app));
        Assert.DoesNotContain("\"OutputsJson\"", stamp, StringComparison.Ordinal);
        Assert.DoesNotContain("\"InputsJson\"", stamp, StringComparison.Ordinal);
    }

    private static List<string> Commands(ClinicApp app) =>
    [
        .. app.Logs.Collector.GetSnapshot()
            .Where(r => r.Level == LogLevel.Information && r.Category == "Microsoft.EntityFrameworkCore.Database.Command")
            .Select(r => r.Message)
            // Sign-in's own reads (a server database always signs in) are not the page's.
            .Where(m => !m.Contains("\"AspNet", StringComparison.Ordinal)),
    ];
}
