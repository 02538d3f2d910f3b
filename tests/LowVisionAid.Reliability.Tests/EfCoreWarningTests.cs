using LowVisionAid.Reliability.Tests.Support;
using LowVisionAid.Web.Plans;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// EF Core warns about queries and migrations that may be slow or unsafe (several collections in one query without a
/// split setting, First without OrderBy, a migration step outside its transaction). A start from an empty folder
/// (every migration applied, demo clinic loaded) and the pages that read plans, visits and clients must log none.
/// </summary>
public sealed class EfCoreWarningTests
{
    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_start_from_an_empty_folder_and_the_plan_visit_and_client_pages_log_no_EF_Core_warning()
    {
        using var app = new ClinicApp("ef-warnings", loadDemo: true) { UseTemplateDatabase = false };
        using var client = app.CreateClient();
        foreach (var path in new[] { "/", "/Clients", "/Clients?q=DEMO", "/Clients/1", "/Visits/1", "/Plans/1", "/Plans/1/Handout", "/Plans/1/Summary", "/FollowUps" })
        {
            using var response = await client.GetAsync(new Uri(path, UriKind.Relative));
            Assert.True(response.IsSuccessStatusCode, $"{path} answered {(int)response.StatusCode}");
        }

        // Making a plan reads the visit with its goals and reading speeds (two collections) and the settings.
        var made = await app.ServiceAsync(sp => sp.GetRequiredService<MakePlanHandler>().HandleAsync(1, CancellationToken.None));
        Assert.NotNull(made?.PlanId);

        var records = app.Logs.Collector.GetSnapshot();
        Assert.Contains(records, r => r.Category?.StartsWith("Microsoft.EntityFrameworkCore", StringComparison.Ordinal) == true);   // the capture sees EF Core's lines
        var warnings = records
            .Where(r => r.Level >= LogLevel.Warning && r.Category?.StartsWith("Microsoft.EntityFrameworkCore", StringComparison.Ordinal) == true)
            .Select(r => $"{r.Category}: {r.Message}")
            .ToList();
        Assert.Empty(warnings);
    }
}
