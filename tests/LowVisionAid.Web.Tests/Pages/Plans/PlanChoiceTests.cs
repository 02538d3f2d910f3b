using System.Net;
using LowVisionAid.Data.Entities;
using LowVisionAid.Reports;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using static LowVisionAid.Web.Tests.Pages.Plans.PlanReportPagesTests;

namespace LowVisionAid.Web.Tests.Pages.Plans;

/// <summary>
/// The clinician's choice of an option for the handout, made with the plan page's own forms, on a plan made by the
/// app from a typed visit (the visit of <see cref="PlanReportPagesTests"/>: +8 D needed, the kit's +8 D hand
/// magnifier listed). The rule: for each goal the explicit choice wins; a goal without one falls back to the options
/// whose trial ended dispensed, loaned or ordered.
/// </summary>
public sealed class PlanChoiceTests
{
    private const string KitMagnifier = "Hand magnifier +8 D, 75 mm";
    private const string Spectacles = "Reading spectacles (high add)";

    [Fact]
    public async Task Choosing_an_option_stores_the_choice_apart_from_the_outputs_and_writes_an_audit_line()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "C-1");
        var before = await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId));
        var auditBefore = await PlanChangesAsync(app, planId);

        var response = await PressAsync(browser, planId, "(HM-08)", "Choose");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.StartsWith($"/Plans/{planId}#goal-0-kit-", response.Headers.Location!.OriginalString, StringComparison.Ordinal);
        var after = await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId));
        var choice = Assert.Single(after.Choices.Options);
        Assert.Equal(0, choice.Goal);
        Assert.Equal(PlanOptionList.KitDevices, choice.List);
        var snapshot = PlanJson.Read<TypedPlan>(after.OutputsJson);
        Assert.Equal("HM-08", snapshot.Goals[0].KitDevices[choice.Index].Option.KitDeviceId);
        Assert.NotNull(after.ChosenUtc);
        // The outputs stay exactly as made: same text, byte for byte, and still what the planner gives for the inputs.
        Assert.Equal(before.OutputsJson, after.OutputsJson);
        Assert.Equal(before.InputsJson, after.InputsJson);
        Assert.Equal(PlanJson.Write(PlanBuilder.Build(PlanJson.Read<PlanInputs>(after.InputsJson))), after.OutputsJson);
        Assert.Equal(auditBefore + 1, await PlanChangesAsync(app, planId));

        var page = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative)));
        Assert.Contains("Chosen for the handout.", page, StringComparison.Ordinal);
        Assert.Contains($"{KitMagnifier}, for Letters and bills (bills) (chosen for the handout)", page, StringComparison.Ordinal);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task The_explicit_choice_wins_over_a_dispensed_trial_and_clearing_it_falls_back_to_the_trial()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "C-2");
        await DispenseKitMagnifierAsync(app, browser, planId);
        Assert.Contains(KitMagnifier, await HandoutTextAsync(browser, planId), StringComparison.OrdinalIgnoreCase);

        Assert.Equal(HttpStatusCode.Redirect, (await PressAsync(browser, planId, Spectacles, "Choose")).StatusCode);
        var chosen = await HandoutTextAsync(browser, planId);
        Assert.Contains(Spectacles, chosen, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(KitMagnifier, chosen, StringComparison.OrdinalIgnoreCase);

        Assert.Equal(HttpStatusCode.Redirect, (await PressAsync(browser, planId, Spectacles, "Clear")).StatusCode);
        var cleared = await HandoutTextAsync(browser, planId);
        Assert.Contains(KitMagnifier, cleared, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(Spectacles, cleared, StringComparison.OrdinalIgnoreCase);
        Assert.True((await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId))).Choices.IsEmpty);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Choosing_another_option_for_the_same_goal_replaces_the_first_choice()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "C-3");

        await PressAsync(browser, planId, "(HM-08)", "Choose");
        await PressAsync(browser, planId, Spectacles, "Choose");

        var plan = await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId));
        var choice = Assert.Single(plan.Choices.Options);
        Assert.Equal(PlanOptionList.Options, choice.List);
        Assert.Equal(Spectacles, PlanText.Kind(PlanJson.Read<TypedPlan>(plan.OutputsJson).Goals[0].Options[choice.Index].Option.Kind));
        var text = await HandoutTextAsync(browser, planId);
        Assert.Contains(Spectacles, text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(KitMagnifier, text, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Clearing_the_only_choice_of_a_plan_without_trials_brings_back_the_explanation()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "C-4");
        await PressAsync(browser, planId, "(HM-08)", "Choose");

        await PressAsync(browser, planId, "(HM-08)", "Clear");

        var response = await browser.GetAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative));
        Assert.Equal("text/html", response.Content.Headers.ContentType?.MediaType);
        Assert.Contains(ReportMessages.NoChosenOption, WebUtility.HtmlDecode(await response.Content.ReadAsStringAsync()), StringComparison.Ordinal);
        var page = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative)));
        Assert.Contains(Web.Handouts.PlanReports.NothingChosenHelp, page, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_choice_of_an_option_the_plan_does_not_have_is_refused_with_a_message_and_nothing_is_stored()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "C-5");
        var auditBefore = await PlanChangesAsync(app, planId);
        var html = await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative));

        var response = await browser.PostFormAsync($"/Plans/{planId}?handler=Choose", html, new Dictionary<string, string>
        {
            ["option"] = new PlanOptionRef(0, PlanOptionList.KitDevices, 99).Key,
        });

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var page = WebUtility.HtmlDecode(await browser.GetStringAsync(response.Headers.Location));
        Assert.Contains(ChoosePlanOptionHandler.NoSuchOption, page, StringComparison.Ordinal);
        Assert.True((await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId))).Choices.IsEmpty);
        Assert.Equal(auditBefore, await PlanChangesAsync(app, planId));
    }

    [Fact]
    public async Task A_choice_without_the_antiforgery_token_is_refused()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "C-6");
        using var form = new FormUrlEncodedContent(new Dictionary<string, string> { ["option"] = new PlanOptionRef(0, PlanOptionList.KitDevices, 0).Key });

        var response = await browser.PostAsync(new Uri($"/Plans/{planId}?handler=Choose", UriKind.Relative), form);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.True((await app.WithDbAsync(db => db.Plans.AsNoTracking().SingleAsync(p => p.Id == planId))).Choices.IsEmpty);
    }

    [Fact]
    public async Task The_demo_plans_have_a_choice_except_the_third_which_shows_the_explanation()
    {
        using var app = new ClinicApp(loadDemo: true);
        using var browser = app.Browser();

        var plans = await app.WithDbAsync(db => db.Plans.AsNoTracking().OrderBy(p => p.Id).ToListAsync());

        Assert.Equal(4, plans.Count);
        Assert.All(new[] { plans[0], plans[1], plans[3] }, p => Assert.False(p.Choices.IsEmpty));
        Assert.True(plans[2].Choices.IsEmpty);
        // The first client's medication labels: the lit magnifier she has on loan.
        var first = PlanJson.Read<TypedPlan>(plans[0].OutputsJson);
        var labels = plans[0].Choices.ForGoal(1)!.Value;
        Assert.Equal(PlanOptionList.KitDevices, labels.List);
        Assert.Equal("HM-12L", first.Goals[1].KitDevices[labels.Index].Option.KitDeviceId);
        var handout = await browser.GetAsync(new Uri($"/Plans/{plans[0].Id}/Handout", UriKind.Relative));
        Assert.Equal(ReportResult.PdfContentType, handout.Content.Headers.ContentType?.MediaType);
        var none = await browser.GetAsync(new Uri($"/Plans/{plans[2].Id}/Handout", UriKind.Relative));
        Assert.Contains(ReportMessages.NoChosenOption, WebUtility.HtmlDecode(await none.Content.ReadAsStringAsync()), StringComparison.Ordinal);
    }

    private static async Task<string> HandoutTextAsync(HttpClient browser, int planId)
    {
        var response = await browser.GetAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative));
        Assert.Equal(ReportResult.PdfContentType, response.Content.Headers.ContentType?.MediaType);
        return Read(await response.Content.ReadAsByteArrayAsync()).Text;
    }

    private static async Task DispenseKitMagnifierAsync(ClinicApp app, HttpClient browser, int planId)
    {
        var kitId = await app.WithDbAsync(db => db.KitDevices.Where(k => k.Code == "HM-08").Select(k => k.Id).SingleAsync());
        var response = await browser.SubmitAsync($"/Trials/New?planId={planId}", new Dictionary<string, string>
        {
            ["Input.TrialDate"] = "2026-11-20",
            ["Input.KitDeviceId"] = kitId.ToString(CultureInfo.InvariantCulture),
            ["Input.Task"] = "Mail",
            ["Input.Outcome"] = "Dispensed",
        });
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
    }

    // The audit lines are read with plain SQL: they live in the clinic database, whichever context maps them.
    private static Task<int> PlanChangesAsync(ClinicApp app, int planId) =>
        app.WithDbAsync(db => db.Database
            .SqlQuery<int>($"SELECT COUNT(*) AS \"Value\" FROM \"AuditEntries\" WHERE \"RecordType\" = 'Plan' AND \"Action\" = 'Changed' AND \"RecordId\" = {planId}")
            .SingleAsync());
}
