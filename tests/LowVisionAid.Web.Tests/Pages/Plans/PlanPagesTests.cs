using System.Net;
using System.Text.Encodings.Web;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Plans;

public partial class PlanPagesTests
{
    [Fact]
    public async Task A_plan_shows_the_required_power_by_each_method_side_by_side_compared_like_with_like()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var visitUrl = await NewVisitAsync(app, browser, "P-1");

        var response = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var html = await browser.GetStringAsync(response.Headers.Location);
        // The visit: distance acuity 0.1 decimal (6/60), 4M read at 40 cm, goal newspaper 1M, fluent reserve 2:1.
        // Kestenbaum 6/60 → +10 D (CV-06, Kestenbaum and Sturman 1956, exact); with 2:1 → +20 D (CV-07, derived, exact);
        // near method 4M at 40 cm for 1M at 2:1 → +20 D, EVD 5 cm (CV-08, Bailey/Lovie-Kitchin, derived, exact).
        // Methods §2.6 (corrected 2026-12-03): the +10 D threshold figure is shown for reference outside the comparison,
        // and +20 D against +20 D agree. (Before, this plan was flagged as disagreeing: the issue declares that wrong.)
        Assert.Contains("For reference, not compared: Kestenbaum&#x27;s rule as published (1M at threshold, no reserve) gives &#x2B;10.00 D", html, StringComparison.Ordinal);
        Assert.Matches(@"Kestenbaum&#x27;s rule, for the target print and reserve</th><td data-label=""Equivalent power"">&#x2B;20.00 D</td>", html);
        Assert.Matches(@"Near-acuity method \(equivalent viewing distance\)</th><td data-label=""Equivalent power"">&#x2B;20.00 D</td><td data-label=""Equivalent viewing distance"">5 cm</td>", html);
        Assert.Contains("The methods agree within 0.2 log units.", html, StringComparison.Ordinal);
        Assert.DoesNotContain("The methods disagree", html, StringComparison.Ordinal);
        // Which reserve was used, and why (fluent 2:1: Cheong, Lovie-Kitchin and Bowers 2002).
        Assert.Contains("Reserve used: 2:1.", html, StringComparison.Ordinal);
        // The starting-point caution leads the cautions box once (it was both the box's lead and its first point).
        var startingPoint = HtmlEncoder.Default.Encode(Caution.StartingPoint.Text);
        Assert.Equal(1, (html.Length - html.Replace(startingPoint, "", StringComparison.Ordinal).Length) / startingPoint.Length);
        Assert.Contains(HtmlEncoder.Default.Encode(Caution.NeverAtTheSun.Text), html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_saved_plan_keeps_its_inputs_version_and_outputs_and_rebuilds_to_the_same_output()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var visitUrl = await NewVisitAsync(app, browser, "P-2");
        await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");

        var plan = await app.WithDbAsync(db => db.Plans.SingleAsync());

        Assert.Equal(Planner.MethodVersion, plan.MethodVersion);
        var inputs = PlanJson.Read<PlanInputs>(plan.InputsJson);
        Assert.Equal("Newspaper", Assert.Single(inputs.Goals).Task.ToString());
        Assert.Equal(PlanJson.Write(PlanBuilder.Build(inputs)), plan.OutputsJson);
    }

    [Fact]
    public async Task A_saved_plan_shows_as_it_was_made_after_the_visit_changes()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var visitUrl = await NewVisitAsync(app, browser, "P-3");
        var made = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");
        var before = await browser.GetStringAsync(made.Headers.Location);

        // Act: change the near acuity on the visit after the plan was made.
        var edit = Records.VisitForm();
        edit["Input.NearThreshold"] = "8M";
        var saved = await browser.SubmitAsync(visitUrl + "/Edit", edit);
        Assert.Equal(HttpStatusCode.Redirect, saved.StatusCode);

        var after = await browser.GetStringAsync(made.Headers.Location);
        // The choice forms carry a fresh antiforgery token on every request; everything else is the same.
        Assert.Equal(WithoutTokens(before), WithoutTokens(after));
        Assert.Contains("Choose for the handout", after, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_matching_kit_device_is_listed_and_its_trial_link_preselects_it()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var kitId = await app.KitDeviceAsync("HM-20T", "Test hand magnifier +20 D", dioptres: 20);
        var visitUrl = await NewVisitAsync(app, browser, "P-4");
        var made = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");

        var html = await browser.GetStringAsync(made.Headers.Location);
        var planId = await app.WithDbAsync(db => db.Plans.Select(p => p.Id).SingleAsync());
        Assert.Contains("Test hand magnifier &#x2B;20 D (HM-20T)", html, StringComparison.Ordinal);
        Assert.Contains($"/Trials/New?planId={planId}&amp;kit=HM-20T", html, StringComparison.Ordinal);

        var form = await browser.GetStringAsync(new Uri($"/Trials/New?planId={planId}&kit=HM-20T", UriKind.Relative));
        Assert.Contains($"<option selected=\"selected\" value=\"{kitId}\">", form, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_visit_without_goals_gets_no_plan_and_says_what_to_add()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var clientId = await app.ClientAsync("P-5");
        var form = Records.VisitForm();
        form.Remove("Input.Goals[0].Task");
        form.Remove("Input.Goals[0].TargetPrint");
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", form);
        var visitUrl = created.Headers.Location!.OriginalString;

        var response = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var page = await browser.GetStringAsync(response.Headers.Location);
        Assert.Contains(HtmlEncoder.Default.Encode(MakePlanHandler.NoGoals), page, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.Plans.CountAsync()));
    }

    [Fact]
    public async Task An_unknown_plan_is_not_found()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri("/Plans/31337", UriKind.Relative));

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }

    [Fact]
    public async Task The_demo_clinic_comes_with_plans_made_by_the_planner()
    {
        using var app = new ClinicApp(loadDemo: true);

        var plans = await app.WithDbAsync(db => db.Plans.ToListAsync());

        Assert.NotEmpty(plans);
        Assert.All(plans, p => Assert.Equal(PlanJson.Write(PlanBuilder.Build(PlanJson.Read<PlanInputs>(p.InputsJson))), p.OutputsJson));
    }

    private static string WithoutTokens(string html) => Token().Replace(html, "");

    [System.Text.RegularExpressions.GeneratedRegex("name=\"__RequestVerificationToken\" type=\"hidden\" value=\"[^\"]*\"")]
    private static partial System.Text.RegularExpressions.Regex Token();

    private static async Task<string> NewVisitAsync(ClinicApp app, HttpClient browser, string code)
    {
        var clientId = await app.ClientAsync(code);
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", Records.VisitForm());
        Assert.Equal(HttpStatusCode.Redirect, created.StatusCode);
        return created.Headers.Location!.OriginalString;
    }
}
