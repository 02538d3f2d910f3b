using System.Net;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Pages.Trials;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Trials;

public class TrialPagesTests
{
    [Fact]
    public async Task A_trial_of_a_kit_device_is_saved_with_its_outcome_and_follow_up()
    {
        using var app = new ClinicApp();
        var (_, planId) = await app.PlanAsync("T-1");
        var kitId = await app.KitDeviceAsync("HM-T", "Test hand magnifier");
        using var browser = app.Browser();

        var response = await browser.SubmitAsync($"/Trials/New?planId={planId}", new Dictionary<string, string>
        {
            ["Input.TrialDate"] = "2026-11-21",
            ["Input.KitDeviceId"] = kitId.ToString(CultureInfo.InvariantCulture),
            ["Input.Task"] = "Newspaper",
            ["Input.Result"] = "1M",
            ["Input.ResultWordsPerMinute"] = "72",
            ["Input.ClientComment"] = "Easier than expected.",
            ["Input.Outcome"] = "Loaned",
            ["Input.FollowUpDue"] = "2026-12-05",
        });

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var trial = await app.WithDbAsync(db => db.Trials.SingleAsync());
        Assert.Equal($"/Plans/{planId}#trial-{trial.Id}", response.Headers.Location?.OriginalString);
        Assert.Equal(kitId, trial.KitDeviceId);
        Assert.Equal("Test hand magnifier (HM-T)", trial.DeviceDescription);
        Assert.Equal(TrialOutcome.Loaned, trial.Outcome);
        Assert.Equal(new DateOnly(2026, 12, 5), trial.FollowUpDue);
        Assert.Equal(72, trial.ResultWordsPerMinute);
    }

    [Fact]
    public async Task A_trial_with_no_device_and_no_outcome_is_refused_and_saves_nothing()
    {
        using var app = new ClinicApp();
        var (_, planId) = await app.PlanAsync("T-2");
        using var browser = app.Browser();

        var response = await browser.SubmitAsync($"/Trials/New?planId={planId}", new Dictionary<string, string>
        {
            ["Input.TrialDate"] = "2026-11-21",
            ["Input.Result"] = "about one M",
            ["Input.FollowUpDue"] = "2026-11-01",
        });

        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains(WebUtility.HtmlEncode(TrialInputValidator.DeviceMissing), html, StringComparison.Ordinal);
        Assert.Contains("<a href=\"#Input_Outcome\">", html, StringComparison.Ordinal);
        Assert.Contains("<a href=\"#Input_Result\">", html, StringComparison.Ordinal);
        Assert.Contains("<a href=\"#Input_FollowUpDue\">", html, StringComparison.Ordinal);
        Assert.Contains("value=\"about one M\"", html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.Trials.CountAsync()));
    }

    [Fact]
    public async Task An_unknown_plan_has_no_trial_form()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri("/Trials/New?planId=777", UriKind.Relative));

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }
}
