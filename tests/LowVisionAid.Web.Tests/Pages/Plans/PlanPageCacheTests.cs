using System.Globalization;
using System.Net;
using System.Text.RegularExpressions;
using LowVisionAid.Data;
using LowVisionAid.Data.Entities;
using LowVisionAid.Web.Handouts;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging.Testing;
using static LowVisionAid.Web.Tests.Pages.Plans.PlanReportPagesTests;

namespace LowVisionAid.Web.Tests.Pages.Plans;

/// <summary>
/// The plan page's body is cached under a key made from the records it shows (<see cref="PlanPageStamp"/>): every
/// change those records can have shows at once, two plans never share a body, and the cached body holds no
/// antiforgery token (a missing plan's 404: <see cref="PlanPagesTests"/>). The app's clock is stopped, so a change is seen by its record's version token, never by a
/// later time stamp.
/// </summary>
public sealed partial class PlanPageCacheTests
{
    private static readonly DateTimeOffset Now = new(2026, 11, 20, 10, 0, 0, TimeSpan.Zero);

    [Fact]
    public async Task A_choice_and_a_clear_show_at_once()
    {
        using var app = new ClinicApp(clock: new FixedClock(Now));
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-1");
        Assert.Contains(PlanReports.NothingChosenHelp, await PageAsync(browser, planId), StringComparison.Ordinal);

        Assert.Equal(HttpStatusCode.Redirect, (await PressAsync(browser, planId, "(HM-08)", "Choose")).StatusCode);
        var chosen = await PageAsync(browser, planId);
        Assert.Contains("(HM-08) — chosen for the handout", chosen, StringComparison.Ordinal);
        Assert.DoesNotContain(PlanReports.NothingChosenHelp, chosen, StringComparison.Ordinal);
        Assert.Contains("Clear choice", chosen, StringComparison.Ordinal);

        Assert.Equal(HttpStatusCode.Redirect, (await PressAsync(browser, planId, "(HM-08)", "Clear")).StatusCode);
        var cleared = await PageAsync(browser, planId);
        Assert.DoesNotContain("— chosen for the handout", cleared, StringComparison.Ordinal);
        Assert.Contains(PlanReports.NothingChosenHelp, cleared, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_new_trial_and_each_edit_of_it_show_at_once()
    {
        using var app = new ClinicApp(clock: new FixedClock(Now));
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-2");
        Assert.Contains("No trial recorded yet.", await PageAsync(browser, planId), StringComparison.Ordinal);

        await TrialAsync(browser, planId, "Loaned", new() { ["Input.DeviceDescription"] = "Borrowed dome magnifier", ["Input.FollowUpDue"] = "2026-12-18" });
        var withTrial = await PageAsync(browser, planId);
        Assert.DoesNotContain("No trial recorded yet.", withTrial, StringComparison.Ordinal);
        Assert.Contains("Borrowed dome magnifier", withTrial, StringComparison.Ordinal);
        Assert.Contains("Loaned", withTrial, StringComparison.Ordinal);
        Assert.Contains("Due 18 Dec 2026", withTrial, StringComparison.Ordinal);

        // The follow-up marked done on the follow-ups page.
        var trial = await app.WithDbAsync(db => db.Trials.AsNoTracking().SingleAsync(t => t.PlanId == planId));
        var followUps = await browser.GetStringAsync(new Uri("/FollowUps", UriKind.Relative));
        var done = await browser.PostFormAsync("/FollowUps?handler=Done", followUps, new Dictionary<string, string>
        {
            ["trialId"] = trial.Id.ToString(CultureInfo.InvariantCulture),
            ["version"] = trial.Version.ToString(),
        });
        Assert.Equal(HttpStatusCode.Redirect, done.StatusCode);
        Assert.Contains("Done 20 Nov 2026", await PageAsync(browser, planId), StringComparison.Ordinal);

        // The outcome changed by any save of the trial.
        await app.WithDbAsync(async db =>
        {
            (await db.Trials.SingleAsync(t => t.Id == trial.Id)).Outcome = TrialOutcome.Declined;
            await db.SaveChangesAsync();
        });
        var declined = await PageAsync(browser, planId);
        Assert.Contains("<td data-label=\"Outcome\">Declined</td>", declined, StringComparison.Ordinal);
        Assert.DoesNotContain("<td data-label=\"Outcome\">Loaned</td>", declined, StringComparison.Ordinal);

        // A trial removed.
        await app.WithDbAsync(async db =>
        {
            db.Trials.Remove(await db.Trials.SingleAsync(t => t.Id == trial.Id));
            await db.SaveChangesAsync();
        });
        Assert.Contains("No trial recorded yet.", await PageAsync(browser, planId), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_changed_client_code_shows_at_once()
    {
        using var app = new ClinicApp(clock: new FixedClock(Now));
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-3");
        Assert.Contains("Plan for K-3", await PageAsync(browser, planId), StringComparison.Ordinal);
        var clientId = await app.WithDbAsync(db => db.Plans.Where(p => p.Id == planId).Select(p => p.Visit!.ClientId).SingleAsync());

        var saved = await browser.SubmitAsync($"/Clients/{clientId}/Edit", new Dictionary<string, string>
        {
            ["Input.Code"] = "K-3B",
            ["Input.Name"] = "Renamed Test Client",
        });

        Assert.Equal(HttpStatusCode.Redirect, saved.StatusCode);
        var page = await PageAsync(browser, planId);
        Assert.Contains("<title>Plan for K-3B", page, StringComparison.Ordinal);
        Assert.Contains($"<h1>Plan for <a href=\"/Clients/{clientId}\">K-3B</a></h1>", page, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Every_record_the_body_shows_changes_the_key_and_a_page_view_does_not()
    {
        using var app = new ClinicApp(clock: new FixedClock(Now));
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-4");
        var kitId = await app.WithDbAsync(db => db.KitDevices.Where(k => k.Code == "HM-08").Select(k => k.Id).SingleAsync());
        await TrialAsync(browser, planId, "Dispensed", new() { ["Input.KitDeviceId"] = kitId.ToString(CultureInfo.InvariantCulture) });
        var keys = new List<string> { await KeyAsync(app, planId) };
        await PageAsync(browser, planId);
        Assert.Equal(keys[0], await KeyAsync(app, planId));

        async Task Saved(Func<ClinicDbContext, Task> change)
        {
            await app.WithDbAsync(async db =>
            {
                await change(db);
                await db.SaveChangesAsync();
            });
            var key = await KeyAsync(app, planId);
            Assert.DoesNotContain(key, keys);
            keys.Add(key);
        }

        // The settings (the handouts part's contact, print size and units), the kit device of a trial (its name and
        // light in the handouts part), the visit (practitioner and date), the client (code and name).
        await Saved(async db => (await db.Settings.OrderBy(s => s.Id).FirstAsync()).ClinicContact = "Harbour Road 2 · 01 555 0199");
        await Saved(async db => (await db.KitDevices.SingleAsync(k => k.Code == "HM-08")).Name = "Hand magnifier +8 D, 75 mm, lit");
        await Saved(async db => (await db.Visits.SingleAsync(v => v.Plans.Any(p => p.Id == planId))).Practitioner = "A. Test Optometrist");
        await Saved(async db => (await db.Clients.SingleAsync(c => c.Code == "K-4")).Name = "Another Test Name");
    }

    [Fact]
    public async Task Two_plans_of_one_visit_never_share_a_body()
    {
        using var app = new ClinicApp(clock: new FixedClock(Now));
        using var browser = app.Browser();
        var first = await MadePlanAsync(app, browser, "K-5");
        var visitId = await app.WithDbAsync(db => db.Plans.Where(p => p.Id == first).Select(p => p.VisitId).SingleAsync());
        var made = await browser.SubmitAsync($"/Visits/{visitId}", new Dictionary<string, string>(), $"/Visits/{visitId}?handler=Plan");
        var second = int.Parse(made.Headers.Location!.OriginalString.Split('/')[^1], CultureInfo.InvariantCulture);
        Assert.NotEqual(first, second);
        await PageAsync(browser, first);
        Assert.Equal(HttpStatusCode.Redirect, (await PressAsync(browser, first, "(HM-08)", "Choose")).StatusCode);

        var page = await PageAsync(browser, second);

        Assert.Contains($"/Plans/{second}/Handout", page, StringComparison.Ordinal);
        Assert.DoesNotContain($"/Plans/{first}/", page, StringComparison.Ordinal);
        Assert.DoesNotContain($"planId={first}&", page, StringComparison.Ordinal);
        Assert.Contains(PlanReports.NothingChosenHelp, page, StringComparison.Ordinal);
        Assert.Contains("(HM-08) — chosen for the handout", await PageAsync(browser, first), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_cached_page_carries_one_fresh_antiforgery_token_per_browser_and_its_buttons_post_the_one_form()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        using var other = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-6");

        var firstView = await PageAsync(browser, planId);
        var otherView = await PageAsync(other, planId);

        // One form with one token in the page's own content; the layout's sign-out form (server pass) has its own.
        var main = Regex.Match(otherView, "<main.*</main>", RegexOptions.Singleline).Value;
        Assert.Single(Token().Matches(main));
        Assert.Single(Regex.Matches(main, "<form "));
        Assert.Contains("<form id=\"plan-choice\" method=\"post\"", main, StringComparison.Ordinal);
        // The second browser got the body from the cache, with its own token, not the first browser's.
        Assert.NotEqual(Token().Match(firstView).Value, Token().Match(main).Value);
        var buttons = Regex.Matches(main, "<button type=\"submit\" form=\"plan-choice\"[^>]*>");
        Assert.NotEmpty(buttons);
        Assert.All(buttons, b => Assert.Matches($"formaction=\"/Plans/{planId}\\?handler=Choose\"", b.Value));

        Assert.Equal(HttpStatusCode.Redirect, (await PressAsync(other, planId, "(HM-08)", "Choose")).StatusCode);
        var chosen = await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId));
        Assert.Equal(PlanOptionList.KitDevices, Assert.Single(chosen.Choices.Options).List);
    }

    [Fact]
    public async Task A_choice_naming_no_option_is_refused_with_a_message()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-7");
        var html = await PageAsync(browser, planId);

        foreach (var value in new[] { "", "0", "0:Options", "0:Goggles:1", "0:options:1", "-1:Options:0", "0:Options:1:2" })
        {
            var response = await browser.PostFormAsync($"/Plans/{planId}?handler=Choose", html, new Dictionary<string, string> { ["option"] = value });
            Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
            Assert.Contains(ChoosePlanOptionHandler.NoSuchOption, await PageAsync(browser, planId), StringComparison.Ordinal);
        }

        Assert.True((await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId))).Choices.IsEmpty);
    }

    [Fact]
    public async Task A_second_view_of_an_unchanged_plan_does_not_read_its_outputs()
    {
        var log = new FakeLogCollector();
        using var app = new ClinicApp(clock: new FixedClock(Now)) { LogCollector = log };
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "K-8");
        var first = await PageAsync(browser, planId);
        Assert.Contains(log.GetSnapshot(), r => r.Message.Contains("\"OutputsJson\"", StringComparison.Ordinal));
        log.Clear();

        var second = await PageAsync(browser, planId);

        var queries = log.GetSnapshot().Where(r => r.Message.Contains("SELECT", StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(queries);
        Assert.DoesNotContain(queries, r => r.Message.Contains("\"OutputsJson\"", StringComparison.Ordinal));
        Assert.Equal(WithoutToken(first), WithoutToken(second));
    }

    // The page as text (entities decoded), as the checks below read it.
    private static async Task<string> PageAsync(HttpClient browser, int planId)
    {
        var response = await browser.GetAsync(new Uri($"/Plans/{planId}", UriKind.Relative));
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        return WebUtility.HtmlDecode(await response.Content.ReadAsStringAsync());
    }

    // A trial of the plan for the mail goal, recorded with the trial form on 20 Nov 2026.
    private static async Task TrialAsync(HttpClient browser, int planId, string outcome, Dictionary<string, string> fields)
    {
        fields["Input.TrialDate"] = "2026-11-20";
        fields["Input.Task"] = "Mail";
        fields["Input.Outcome"] = outcome;
        Assert.Equal(HttpStatusCode.Redirect, (await browser.SubmitAsync($"/Trials/New?planId={planId}", fields)).StatusCode);
    }

    private static async Task<string> KeyAsync(ClinicApp app, int planId)
    {
        await using var scope = app.Services.CreateAsyncScope();
        var stamp = await scope.ServiceProvider.GetRequiredService<PlanDetailsHandler>().StampAsync(planId, CancellationToken.None);
        return stamp!.Key;
    }

    private static string WithoutToken(string html) => Token().Replace(html, "");

    [GeneratedRegex("name=\"__RequestVerificationToken\" type=\"hidden\" value=\"[^\"]*\"")]
    private static partial Regex Token();
}
