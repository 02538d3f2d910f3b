using System.Net;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.FollowUps;

public class FollowUpPagesTests
{
    [Fact]
    public async Task Open_follow_ups_are_listed_earliest_first_and_marking_one_done_removes_it()
    {
        using var app = new ClinicApp();
        var (_, planId) = await app.PlanAsync("F-1");
        await app.WithDbAsync(async db =>
        {
            db.Trials.AddRange(
                new Trial { PlanId = planId, DeviceDescription = "Later device", Outcome = TrialOutcome.Loaned, FollowUpDue = new DateOnly(2030, 2, 1) },
                new Trial { PlanId = planId, DeviceDescription = "Earlier device", Outcome = TrialOutcome.Dispensed, FollowUpDue = new DateOnly(2020, 1, 1) },
                new Trial { PlanId = planId, DeviceDescription = "No follow-up device", Outcome = TrialOutcome.Declined });
            await db.SaveChangesAsync();
        });
        using var browser = app.Browser();

        var html = await browser.GetStringAsync(new Uri("/FollowUps", UriKind.Relative));
        Assert.True(html.IndexOf("Earlier device", StringComparison.Ordinal) < html.IndexOf("Later device", StringComparison.Ordinal));
        Assert.Contains("Overdue", html, StringComparison.Ordinal);
        Assert.DoesNotContain("No follow-up device", html, StringComparison.Ordinal);

        // Act: mark the first (earliest) one done, with the hidden fields of its own row.
        var earlier = await app.WithDbAsync(db => db.Trials.SingleAsync(t => t.DeviceDescription == "Earlier device"));
        var response = await browser.PostFormAsync("/FollowUps?handler=Done", html, new Dictionary<string, string>
        {
            ["trialId"] = earlier.Id.ToString(CultureInfo.InvariantCulture),
            ["version"] = earlier.Version.ToString(),
        });

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var after = await browser.GetStringAsync(new Uri("/FollowUps", UriKind.Relative));
        Assert.DoesNotContain("Earlier device", after, StringComparison.Ordinal);
        Assert.Contains("Later device", after, StringComparison.Ordinal);
        Assert.Contains("Follow-up marked as done.", after, StringComparison.Ordinal);
        Assert.NotNull((await app.WithDbAsync(db => db.Trials.SingleAsync(t => t.Id == earlier.Id))).FollowUpDone);
    }

    [Fact]
    public async Task A_long_list_of_follow_ups_comes_in_pages_earliest_first_each_once()
    {
        // Arrange: 60 open follow-ups one day apart and 10 done ones.
        using var app = new ClinicApp();
        var (_, planId) = await app.PlanAsync("F-2");
        await app.WithDbAsync(async db =>
        {
            for (var n = 1; n <= 70; n++)
            {
                var due = new DateOnly(2030, 1, 1).AddDays(n);
                db.Trials.Add(new Trial { PlanId = planId, DeviceDescription = $"Device {n:00}", Outcome = TrialOutcome.Loaned, FollowUpDue = due, FollowUpDone = n > 60 ? due : null });
            }

            await db.SaveChangesAsync();
        });
        using var browser = app.Browser();

        // Act
        var first = await browser.GetStringAsync(new Uri("/FollowUps", UriKind.Relative));
        var second = await browser.GetStringAsync(new Uri("/FollowUps?p=2", UriKind.Relative));

        // Assert
        var listed = Devices(first).Concat(Devices(second)).ToList();
        Assert.Equal(Enumerable.Range(1, 60).Select(n => $"Device {n:00}"), listed);
        Assert.Equal(LowVisionAid.Web.Pages.FollowUps.FollowUpListHandler.PageSize, Devices(first).Count);
        Assert.Contains("href=\"/FollowUps?p=2\" rel=\"next\"", first, StringComparison.Ordinal);
        Assert.Contains("href=\"/FollowUps?p=1\" rel=\"prev\"", second, StringComparison.Ordinal);
    }

    private static List<string> Devices(string html) =>
        [.. System.Text.RegularExpressions.Regex.Matches(html, "<td data-label=\"Device\"><a href=\"/Plans/\\d+\">(Device \\d+)</a>", System.Text.RegularExpressions.RegexOptions.None, TimeSpan.FromSeconds(1)).Select(m => m.Groups[1].Value)];
}
