using System.Text.RegularExpressions;
using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// The clinic's main flow in a real browser, by mouse: a new client, a visit, a plan made from it, a trial with a
/// dispensed device and a follow-up date, and that follow-up in the list of follow-ups due. Each step checks what
/// the next page shows (the saved values read back), and leaves a screenshot under test-artifacts/screenshots.
/// </summary>
/// <remarks>
/// Check values (each page prints powers to 0.01 D and logMAR to 0.01, which is the tolerance of each comparison):
/// 6/60 is logMAR 1.00 and 20/400 is logMAR 1.30 (methods.md CV-01 and the §1.1 table, Bailey and Lovie 1976);
/// 4M read at 40 cm is logMAR 1.00 (CV-05, Colenbrander); for newspaper print (1M) with the fluent 2:1 reserve the
/// near-acuity method gives 20 D at an equivalent viewing distance of 5 cm (CV-08, derived) and Kestenbaum's rule
/// with the same reserve gives 20 D from 6/60 (CV-07, derived).
/// </remarks>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class MainFlowTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Fact]
    public async Task A_new_client_is_seen_planned_trialled_and_booked_for_follow_up_and_each_page_shows_what_was_saved()
    {
        // Arrange: dates relative to today, as the clinic would type them.
        var flow = new FlowData("FLOW-01");
        var chrome = new SiteChrome(Page);
        var posts = RecordPosts();

        // Step 1: a new client.
        var clientForm = new ClientFormPage(Page);
        await clientForm.GotoNewAsync();
        await clientForm.Code.FillAsync(flow.ClientCode);
        await clientForm.YearOfBirth.FillAsync("1948");
        await clientForm.Notes.FillAsync("Invented client for the browser test.");
        await Artifacts.ScreenshotAsync(Page, "main-flow-1-client-form");
        await clientForm.Save.ClickAsync();

        var client = new ClientPage(Page);
        await Assertions.Expect(client.Heading).ToHaveTextAsync($"Client {flow.ClientCode}");
        await Assertions.Expect(client.Fact("Year of birth")).ToHaveTextAsync("1948");
        await Assertions.Expect(client.Fact("Notes")).ToHaveTextAsync("Invented client for the browser test.");
        await Assertions.Expect(Page.GetByText("No visit recorded yet.")).ToBeVisibleAsync();
        await Artifacts.ScreenshotAsync(Page, "main-flow-1-client-saved");

        // Step 2: a visit. The form opens with today's date already in the date field.
        await client.RecordVisit.ClickAsync();
        var visitForm = new VisitFormPage(Page);
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync($"Record a visit for {flow.ClientCode}");
        await Assertions.Expect(visitForm.Date).ToHaveValueAsync(flow.Today.ToString("yyyy-MM-dd", Invariant));
        await visitForm.Date.FillAsync(flow.VisitDate.ToString("yyyy-MM-dd", Invariant));
        await visitForm.Practitioner.FillAsync(flow.Practitioner);
        await visitForm.DistanceRight.FillAsync("6/60");
        await visitForm.DistanceLeft.FillAsync("20/400");
        await visitForm.DistanceBoth.FillAsync("6/60");
        await visitForm.NearThreshold.FillAsync("4M");
        await visitForm.NearTestDistance.FillAsync("40 cm");
        await visitForm.WorkingDistance.FillAsync("25 cm");
        await visitForm.GoalTask(1).SelectOptionAsync("Newspaper");
        await visitForm.GoalTargetPrint(1).FillAsync("1M");
        await Artifacts.ScreenshotAsync(Page, "main-flow-2-visit-form");
        await visitForm.Save.ClickAsync();

        var visit = new VisitPage(Page);
        await Page.WaitForLoadStateAsync();
        Assert.True(
            posts.Any(p => p.StartsWith("POST /Visits/New?clientId=", StringComparison.Ordinal) && p.EndsWith(" 302", StringComparison.Ordinal)),
            $"Save visit did not save: {string.Join("; ", posts)}; the page says: {await FirstProblemAsync()}");
        await Assertions.Expect(Page).ToHaveURLAsync(new Regex(@"/Visits/\d+$", RegexOptions.None, TimeSpan.FromSeconds(1)));
        await AssertVisitSavedAsync(visit, flow);
        await Artifacts.ScreenshotAsync(Page, "main-flow-2-visit-saved");

        // Step 3: a plan built from that visit.
        await visit.MakePlan.ClickAsync();
        var plan = new PlanPage(Page);
        await AssertPlanAsync(plan, flow);
        await Artifacts.ScreenshotAsync(Page, "main-flow-3-plan");

        // Step 4: a trial of a device, dispensed, with a follow-up booked.
        await plan.RecordTrial.ClickAsync();
        var trial = new TrialFormPage(Page);
        await Assertions.Expect(trial.Heading).ToHaveTextAsync($"Record a trial for {flow.ClientCode}");
        await Assertions.Expect(trial.Date).ToHaveValueAsync(flow.Today.ToString("yyyy-MM-dd", Invariant));
        await trial.Device.FillAsync(flow.Device);
        await trial.Task.SelectOptionAsync("Newspaper");
        await trial.Result.FillAsync("1M");
        await trial.Comment.FillAsync(flow.Comment);
        await trial.Outcome.SelectOptionAsync("Dispensed");
        await trial.FollowUp.FillAsync(flow.FollowUp.ToString("yyyy-MM-dd", Invariant));
        await Artifacts.ScreenshotAsync(Page, "main-flow-4-trial-form");
        await trial.Save.ClickAsync();

        await AssertTrialSavedAsync(plan, flow);
        await Artifacts.ScreenshotAsync(Page, "main-flow-4-trial-saved");

        // Step 5: the follow-up is in the list of follow-ups due.
        await chrome.NavigationLink("Follow-ups due").ClickAsync();
        await AssertFollowUpListedAsync(new FollowUpsPage(Page), flow);
        await Artifacts.ScreenshotAsync(Page, "main-flow-5-follow-ups");

        // And the client's page now lists the visit and the trial.
        await Page.GotoAsync($"Clients/{flow.ClientId}");
        await Assertions.Expect(client.Visits).ToContainTextAsync(Shown(flow.VisitDate));
        await Assertions.Expect(client.Visits).ToContainTextAsync(flow.Practitioner);
        await Assertions.Expect(client.Trials).ToContainTextAsync(flow.Device);
        await Assertions.Expect(client.Trials).ToContainTextAsync("Dispensed");
        await Assertions.Expect(client.Trials).ToContainTextAsync("Due " + Shown(flow.FollowUp));
    }

    /// <summary>The dates and texts of one run through the flow, and the record numbers it finds on the way.</summary>
    internal sealed class FlowData(string clientCode)
    {
        public string ClientCode { get; } = clientCode;

        public DateOnly Today { get; } = DateOnly.FromDateTime(DateTime.Now);

        public DateOnly VisitDate { get; set; } = DateOnly.FromDateTime(DateTime.Now).AddDays(-3);

        public DateOnly FollowUp { get; set; } = DateOnly.FromDateTime(DateTime.Now).AddDays(28);

        public string Practitioner { get; } = "Dr Invented Example";

        public string Device { get; } = "+20 D lit hand magnifier";

        public string Comment { get; } = "Reads the paper's columns with it";

        public string ClientId { get; set; } = "";

        public string PlanId { get; set; } = "";
    }

    /// <summary>Dates as the pages print them (day, short month, year).</summary>
    internal static string Shown(DateOnly date) => date.ToString("d MMM yyyy", Invariant);

    internal static async Task AssertVisitSavedAsync(VisitPage visit, FlowData flow)
    {
        await Assertions.Expect(visit.Heading).ToHaveTextAsync($"Visit of {Shown(flow.VisitDate)} for {flow.ClientCode}");
        await Assertions.Expect(visit.Fact("Practitioner")).ToHaveTextAsync(flow.Practitioner);
        await AssertReadingAsync(visit, "Distance acuity, right eye", "6/60", "1.00");
        await AssertReadingAsync(visit, "Distance acuity, left eye", "20/400", "1.30");
        await AssertReadingAsync(visit, "Distance acuity, both eyes", "6/60", "1.00");
        await AssertReadingAsync(visit, "Near acuity", "4M at 40 cm", "1.00");
        await AssertReadingAsync(visit, "Preferred working distance", "25 cm", null);
        await AssertReadingAsync(visit, "Goal 1: target print", "1M", null);
        await Assertions.Expect(visit.Goals).ToHaveTextAsync("Newspaper: target 1M");
        var clientHref = await visit.Heading.GetByRole(AriaRole.Link).GetAttributeAsync("href");
        flow.ClientId = clientHref!.Split('/')[^1];
    }

    internal static async Task AssertPlanAsync(PlanPage plan, FlowData flow)
    {
        await Assertions.Expect(plan.Heading).ToHaveTextAsync($"Plan for {flow.ClientCode}");
        await Assertions.Expect(plan.Heading.Page.GetByText($"the visit of {Shown(flow.VisitDate)}")).ToBeVisibleAsync();
        await Assertions.Expect(plan.Goal(1).GetByRole(AriaRole.Heading, new() { Level = 2 })).ToHaveTextAsync("Goal 1: Newspaper, target 1M");
        await Assertions.Expect(plan.RequiredPower(1)).ToContainTextAsync("20.00 D");
        await plan.OpenEstimatesAsync(1);
        var estimates = plan.Estimates(1);
        await Assertions.Expect(EstimateRow(estimates, "Near-acuity method (equivalent viewing distance)")).ToContainTextAsync("20.00 D");
        await Assertions.Expect(EstimateRow(estimates, "Near-acuity method (equivalent viewing distance)")).ToContainTextAsync("5 cm");
        await Assertions.Expect(EstimateRow(estimates, "Kestenbaum's rule, for the target print and reserve")).ToContainTextAsync("20.00 D");
        Assert.True(await plan.Options(1).CountAsync() >= 1, "The plan shows no option for the newspaper goal.");
        await Assertions.Expect(plan.FirstOptionHeading(1)).ToHaveTextAsync(new Regex(@"^1\. ", RegexOptions.None, TimeSpan.FromSeconds(1)));
        await Assertions.Expect(plan.Options(1).First).ToContainTextAsync("Power needed");
        await Assertions.Expect(plan.Heading.Page.GetByText("No trial recorded yet.")).ToBeVisibleAsync();
        flow.PlanId = plan.Heading.Page.Url.Split('/')[^1].Split('#')[0];
    }

    internal static async Task AssertTrialSavedAsync(PlanPage plan, FlowData flow)
    {
        await Assertions.Expect(plan.Heading.Page).ToHaveURLAsync(new Regex($@"/Plans/{flow.PlanId}#trial-\d+$", RegexOptions.None, TimeSpan.FromSeconds(1)));
        var row = plan.Trials.GetByRole(AriaRole.Row).Filter(new() { HasText = flow.Device });
        await Assertions.Expect(row).ToHaveCountAsync(1);
        await Assertions.Expect(row.GetByRole(AriaRole.Rowheader)).ToHaveTextAsync(Shown(flow.Today));
        await Assertions.Expect(row).ToContainTextAsync($"1M — “{flow.Comment}”");
        await Assertions.Expect(row).ToContainTextAsync("Dispensed");
        await Assertions.Expect(row).ToContainTextAsync("Due " + Shown(flow.FollowUp));
    }

    internal static async Task AssertFollowUpListedAsync(FollowUpsPage followUps, FlowData flow)
    {
        var row = followUps.Row(flow.ClientCode);
        await Assertions.Expect(row).ToHaveCountAsync(1);
        await Assertions.Expect(row.GetByRole(AriaRole.Rowheader)).ToHaveTextAsync(Shown(flow.FollowUp));
        await Assertions.Expect(row).ToContainTextAsync("Upcoming");
        await Assertions.Expect(row.GetByRole(AriaRole.Link, new() { Name = flow.Device })).ToHaveAttributeAsync("href", $"/Plans/{flow.PlanId}");
    }

    private static async Task AssertReadingAsync(VisitPage visit, string label, string typed, string? logMar)
    {
        var row = visit.Reading(label);
        await Assertions.Expect(row).ToHaveCountAsync(1);
        var cells = row.GetByRole(AriaRole.Cell);
        await Assertions.Expect(cells.Nth(0)).ToHaveTextAsync(typed);
        if (logMar is not null)
        {
            await Assertions.Expect(cells.Nth(2)).ToHaveTextAsync(logMar);
        }
    }

    private static ILocator EstimateRow(ILocator table, string method) =>
        table.GetByRole(AriaRole.Row).Filter(new() { Has = table.Page.GetByRole(AriaRole.Rowheader, new() { Name = method, Exact = true }) });

    /// <summary>Each form post the page sends and the status it got ("POST /path?query 302"), to show a save reached the server.</summary>
    private List<string> RecordPosts()
    {
        var posts = new List<string>();
        Page.Response += (_, response) =>
        {
            if (response.Request.Method == "POST")
            {
                posts.Add($"POST {new Uri(response.Url).PathAndQuery} {response.Status.ToString(Invariant)}");
            }
        };
        return posts;
    }

    private async Task<string> FirstProblemAsync()
    {
        var summary = Page.Locator(".error-summary");
        return await summary.CountAsync() > 0 ? await summary.InnerTextAsync() : "(no error summary)";
    }
}
