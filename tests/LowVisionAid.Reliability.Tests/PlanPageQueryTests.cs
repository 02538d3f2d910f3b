using LowVisionAid.Reliability.Tests.Support;
using Microsoft.Extensions.Logging;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// The plan page and its "Handouts and print" part share one load of the plan (docs/performance.md: the part used
/// to load the plan, its visit, trials and settings again, about 40 % of the request).
/// </summary>
public sealed class PlanPageQueryTests
{
    [Fact]
    public async Task The_plan_page_reads_the_plan_its_trials_and_the_settings_once_each()
    {
        using var app = new ClinicApp("plan-page-queries", loadDemo: true);
        using var client = app.CreateClient();
        using (var warm = await client.GetAsync(new Uri("/Plans/1", UriKind.Relative)))
        {
            Assert.True(warm.IsSuccessStatusCode);
        }

        app.Logs.Collector.Clear();
        using var response = await client.GetAsync(new Uri("/Plans/1", UriKind.Relative));

        Assert.True(response.IsSuccessStatusCode);
        var commands = app.Logs.Collector.GetSnapshot()
            .Where(r => r.Level == LogLevel.Information && r.Category == "Microsoft.EntityFrameworkCore.Database.Command")
            .Select(r => r.Message)
            .ToList();
        Assert.NotEmpty(commands);
        Assert.Single(commands, c => c.Contains("FROM \"Plans\"", StringComparison.Ordinal));
        Assert.Single(commands, c => c.Contains("FROM \"Trials\"", StringComparison.Ordinal));
        Assert.Single(commands, c => c.Contains("FROM \"Settings\"", StringComparison.Ordinal));
    }
}
