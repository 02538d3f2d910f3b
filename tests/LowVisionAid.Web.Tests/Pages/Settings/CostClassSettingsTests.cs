using System.Net;
using LowVisionAid.Optics.Options;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Settings;

/// <summary>
/// Case: Mr B, 70, one useful eye, 6/60, reads 4M at 40 cm with his +2.50 add and wants to read medication labels (1M)
/// in good light, with no tremor and no need for free hands. Spot reading uses 1:1 on the threshold (methods §2.3), so
/// the near-acuity method needs 4 × 1 / (0.40 × 1) = +10 D (derived, methods §2.2): a spectacle add, a hand magnifier
/// and a stand magnifier each give it in a practical form. In the documented rule order (Ranking.cs: applicable,
/// suits the task, meets the power, practical, letters in view, simplicity; no tremor, hands-free, contrast, long
/// reading or both-eyes rule concerns him) the three plain lenses tie until the cost class decides (common practice).
/// </summary>
public sealed class CostClassSettingsTests
{
    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_cost_class_changed_on_the_settings_page_reorders_the_next_plan()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var clientId = await app.ClientAsync("C-1");
        var visit = Records.VisitForm();
        visit["Input.Goals[0].Task"] = "MedicationLabels";
        visit["Input.UsefulEyes"] = "RightOnly";
        visit["Input.HomeLighting"] = "Good";
        visit.Remove("Input.ReadingSpeeds[0].PrintSize");
        visit.Remove("Input.ReadingSpeeds[0].WordsPerMinute");
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", visit);
        Assert.Equal(HttpStatusCode.Redirect, created.StatusCode);
        var visitUrl = created.Headers.Location!.OriginalString;

        // With the core's defaults (spectacle add medium; hand and stand magnifiers low) the add comes after both lenses.
        var before = await PlanAsync(app, browser, visitUrl);
        Assert.Equal("+10.00 D", PlanText.Power(before.RequiredPower!.Value));
        Assert.True(Position(before, OptionKind.SpectacleAdd) > Position(before, OptionKind.HandMagnifier));
        Assert.True(Position(before, OptionKind.SpectacleAdd) > Position(before, OptionKind.StandMagnifier));
        Assert.Contains("Costs more.", Reasons(before, OptionKind.SpectacleAdd));

        // The clinic makes spectacle adds low cost and hand and stand magnifiers high cost.
        var settingsPage = await browser.GetStringAsync(new Uri("/Settings", UriKind.Relative));
        var typed = FormHtml.TextValues(settingsPage);
        typed[CostField(settingsPage, OptionKind.SpectacleAdd)] = nameof(CostClass.Low);
        typed[CostField(settingsPage, OptionKind.HandMagnifier)] = nameof(CostClass.High);
        typed[CostField(settingsPage, OptionKind.StandMagnifier)] = nameof(CostClass.High);
        var saved = await browser.PostFormAsync("/Settings", settingsPage, typed);
        Assert.Equal(HttpStatusCode.Redirect, saved.StatusCode);
        var stored = await app.WithDbAsync(db => db.Settings.SingleAsync());
        Assert.Equal(3, stored.CostClasses.Count);
        Assert.Equal(CostClass.High, stored.CostClasses[OptionKind.HandMagnifier]);

        // A new plan puts the add above both magnifiers, for its cost.
        var after = await PlanAsync(app, browser, visitUrl);
        Assert.True(Position(after, OptionKind.SpectacleAdd) < Position(after, OptionKind.HandMagnifier));
        Assert.True(Position(after, OptionKind.SpectacleAdd) < Position(after, OptionKind.StandMagnifier));
        Assert.Contains("Low cost.", Reasons(after, OptionKind.SpectacleAdd));
        Assert.Contains("Costs more.", Reasons(after, OptionKind.HandMagnifier));

        // The settings page shows the clinic's choice back.
        var again = await browser.GetStringAsync(new Uri("/Settings", UriKind.Relative));
        Assert.Equal(nameof(CostClass.Low), FormHtml.TextValues(again)[CostField(again, OptionKind.SpectacleAdd)]);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Saving_the_settings_unchanged_keeps_every_cost_class_at_the_cores_default()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var page = await browser.GetStringAsync(new Uri("/Settings", UriKind.Relative));

        var saved = await browser.PostFormAsync("/Settings", page, FormHtml.TextValues(page));

        Assert.Equal(HttpStatusCode.Redirect, saved.StatusCode);
        Assert.Empty((await app.WithDbAsync(db => db.Settings.SingleAsync())).CostClasses);
    }

    private static async Task<PlannedGoal> PlanAsync(ClinicApp app, HttpClient browser, string visitUrl)
    {
        var planned = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");
        Assert.Equal(HttpStatusCode.Redirect, planned.StatusCode);
        var plan = await app.WithDbAsync(db => db.Plans.OrderByDescending(p => p.Id).FirstAsync());
        return Assert.Single(PlanJson.Read<TypedPlan>(plan.OutputsJson).Goals);
    }

    private static int Position(PlannedGoal goal, OptionKind kind) =>
        Assert.Single(goal.Options, o => o.Option.Kind == kind && o.Option.KitDeviceId is null).Position;

    private static List<string> Reasons(PlannedGoal goal, OptionKind kind) =>
        [.. Assert.Single(goal.Options, o => o.Option.Kind == kind && o.Option.KitDeviceId is null).Reasons.Select(r => r.Text)];

    // The select that goes with the hidden field naming the kind, e.g. Input.Costs[4].Kind = SpectacleAdd → Input.Costs[4].Cost.
    private static string CostField(string html, OptionKind kind)
    {
        var hidden = PageHtml.HiddenFields(html).Single(f => f.Key.StartsWith("Input.Costs[", StringComparison.Ordinal) && f.Value == kind.ToString());
        return hidden.Key.Replace(".Kind", ".Cost", StringComparison.Ordinal);
    }
}
