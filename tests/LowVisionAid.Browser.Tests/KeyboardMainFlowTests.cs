using System.Text.RegularExpressions;
using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// The main flow of <see cref="MainFlowTests"/> by keyboard alone: no click and no fill. Tab, Shift+Tab and the skip
/// link move the focus, typing goes through the keyboard, Enter or Space sends a form or follows a link, and the
/// arrow keys choose in a list. After each step the focus must show and be where a keyboard user expects it. One
/// deliberate mistake (a three-digit year of birth) checks that the error summary takes the focus, that its link and
/// the field's own message can be reached, and that what was typed is kept. The check values are those of
/// <see cref="MainFlowTests"/>.
/// </summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class KeyboardMainFlowTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    [Fact]
    public async Task The_main_flow_can_be_done_with_the_keyboard_alone_and_the_focus_shows_at_every_step()
    {
        // Arrange: the visit keeps the date the form offers (today). The follow-up falls on a day whose number is
        // its month's (12 December, 3 March…), so the digits typed read the same in day-month and month-day order,
        // whichever the browser's date field uses.
        var flow = new MainFlowTests.FlowData("KEY-01");
        flow.VisitDate = flow.Today;
        flow.FollowUp = DayEqualToMonthAfter(flow.Today.AddDays(7));
        var keys = new KeyboardOnly(Page);
        var chrome = new SiteChrome(Page);
        await Page.GotoAsync("");

        // Step 1: from the home page to a new client, by the main navigation.
        await keys.TabToAsync(chrome.NavigationLink("Clients"));
        await Page.Keyboard.PressAsync("Enter");
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync("Clients");
        await keys.SkipToMainAsync();
        await keys.TabToAsync(Page.GetByRole(AriaRole.Link, new() { Name = "Add a client", Exact = true }));
        await Page.Keyboard.PressAsync("Enter");

        var clientForm = new ClientFormPage(Page);
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync("Add a client");
        await keys.SkipToMainAsync();
        await keys.TabOnceToAsync(clientForm.Code);
        await Page.Keyboard.TypeAsync(flow.ClientCode);
        await keys.TabOnceToAsync(clientForm.Name);
        await keys.TabOnceToAsync(clientForm.YearOfBirth);
        await Page.Keyboard.TypeAsync("194");
        await keys.TabOnceToAsync(clientForm.Notes);
        await Page.Keyboard.TypeAsync("Invented client for the keyboard test.");
        await keys.TabOnceToAsync(clientForm.Save);
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-1-client-form", fullPage: false);
        await Page.Keyboard.PressAsync("Enter");

        // The deliberate mistake: the summary has the focus, its link names the field, the field keeps the typing.
        await Assertions.Expect(clientForm.ErrorSummary).ToBeFocusedAsync();
        await KeyboardOnly.AssertFocusVisibleAsync(clientForm.ErrorSummary);
        await Assertions.Expect(clientForm.ErrorSummary).ToContainTextAsync("Type the year of birth as four digits");
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-1-client-error", fullPage: false);
        var summaryLink = clientForm.ErrorSummary.GetByRole(AriaRole.Link);
        await keys.TabOnceToAsync(summaryLink);
        await Assertions.Expect(summaryLink).ToHaveAttributeAsync("href", "#Input_YearOfBirth");
        await keys.TabOnceToAsync(clientForm.Code);
        await Assertions.Expect(clientForm.Code).ToHaveValueAsync(flow.ClientCode);
        await keys.TabOnceToAsync(clientForm.Name);
        await keys.TabOnceToAsync(clientForm.YearOfBirth);
        await Assertions.Expect(clientForm.YearOfBirth).ToHaveValueAsync("194");
        await Assertions.Expect(clientForm.YearOfBirth).ToHaveAttributeAsync("aria-invalid", "true");
        await Assertions.Expect(clientForm.YearOfBirth).ToHaveAccessibleDescriptionAsync(new Regex("Error: Type the year of birth as four digits", RegexOptions.None, TimeSpan.FromSeconds(1)));
        await Assertions.Expect(Page.Locator("#Input_YearOfBirth-error")).ToBeVisibleAsync();
        await keys.ReplaceAsync("1948");
        await keys.TabOnceToAsync(clientForm.Notes);
        await Assertions.Expect(clientForm.Notes).ToHaveValueAsync("Invented client for the keyboard test.");
        await keys.TabOnceToAsync(clientForm.Save);
        await Page.Keyboard.PressAsync("Space");

        var client = new ClientPage(Page);
        await Assertions.Expect(client.Heading).ToHaveTextAsync($"Client {flow.ClientCode}");
        await Assertions.Expect(client.Fact("Year of birth")).ToHaveTextAsync("1948");
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-1-client-saved", fullPage: false);

        // Step 2: a visit, keeping the date the form offers.
        await keys.SkipToMainAsync();
        await keys.TabToAsync(client.RecordVisit);
        await Page.Keyboard.PressAsync("Enter");
        var visitForm = new VisitFormPage(Page);
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync($"Record a visit for {flow.ClientCode}");
        await keys.SkipToMainAsync();
        await keys.TabToAsync(visitForm.Date);
        await Assertions.Expect(visitForm.Date).ToHaveValueAsync(flow.Today.ToString("yyyy-MM-dd", Invariant));
        await TypeIntoAsync(keys, visitForm.Practitioner, flow.Practitioner);
        await TypeIntoAsync(keys, visitForm.DistanceRight, "6/60");
        await TypeIntoAsync(keys, visitForm.DistanceLeft, "20/400");
        await TypeIntoAsync(keys, visitForm.DistanceBoth, "6/60");
        await TypeIntoAsync(keys, visitForm.NearThreshold, "4M");
        await TypeIntoAsync(keys, visitForm.NearTestDistance, "40 cm");
        await TypeIntoAsync(keys, visitForm.WorkingDistance, "25 cm");
        // The task list starts at "No task on this line"; Newspaper is the next choice.
        await keys.TabToAsync(visitForm.GoalTask(1));
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(visitForm.GoalTask(1)).ToHaveValueAsync("Newspaper");
        await TypeIntoAsync(keys, visitForm.GoalTargetPrint(1), "1M");
        await keys.TabToAsync(visitForm.Save);
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-2-visit-form", fullPage: false);
        await Page.Keyboard.PressAsync("Enter");

        var visit = new VisitPage(Page);
        await Assertions.Expect(Page).ToHaveURLAsync(new Regex(@"/Visits/\d+$", RegexOptions.None, TimeSpan.FromSeconds(1)));
        await MainFlowTests.AssertVisitSavedAsync(visit, flow);
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-2-visit-saved", fullPage: false);

        // Step 3: the plan, by Space on the button.
        await keys.SkipToMainAsync();
        await keys.TabToAsync(visit.MakePlan);
        await Page.Keyboard.PressAsync("Space");
        var plan = new PlanPage(Page);
        await MainFlowTests.AssertPlanAsync(plan, flow);
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-3-plan", fullPage: false);

        // Step 4: the trial.
        await keys.SkipToMainAsync();
        await keys.TabToAsync(plan.RecordTrial, limit: 400);
        await Page.Keyboard.PressAsync("Enter");
        var trial = new TrialFormPage(Page);
        await Assertions.Expect(trial.Heading).ToHaveTextAsync($"Record a trial for {flow.ClientCode}");
        await keys.SkipToMainAsync();
        await keys.TabToAsync(trial.Date);
        await Assertions.Expect(trial.Date).ToHaveValueAsync(flow.Today.ToString("yyyy-MM-dd", Invariant));
        await TypeIntoAsync(keys, trial.Device, flow.Device);
        await keys.TabToAsync(trial.Task);
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(trial.Task).ToHaveValueAsync("Newspaper");
        await TypeIntoAsync(keys, trial.Result, "1M");
        await TypeIntoAsync(keys, trial.Comment, flow.Comment);
        await keys.TabToAsync(trial.Outcome);
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(trial.Outcome).ToHaveValueAsync("Dispensed");
        await keys.TabToAsync(trial.FollowUp);
        await Page.Keyboard.TypeAsync(flow.FollowUp.ToString("MMdd", Invariant) + flow.FollowUp.ToString("yyyy", Invariant));
        await Assertions.Expect(trial.FollowUp).ToHaveValueAsync(flow.FollowUp.ToString("yyyy-MM-dd", Invariant));
        await keys.TabToAsync(trial.Save);
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-4-trial-form", fullPage: false);
        await Page.Keyboard.PressAsync("Enter");

        await MainFlowTests.AssertTrialSavedAsync(plan, flow);
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-4-trial-saved", fullPage: false);

        // Step 5: back up the page to the main navigation, and on to the follow-ups due.
        await keys.TabToAsync(chrome.NavigationLink("Follow-ups due"), limit: 400, backwards: true);
        await Page.Keyboard.PressAsync("Enter");
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync("Follow-ups due");
        await MainFlowTests.AssertFollowUpListedAsync(new FollowUpsPage(Page), flow);
        await keys.SkipToMainAsync();
        await keys.TabToAsync(new FollowUpsPage(Page).Row(flow.ClientCode).GetByRole(AriaRole.Link, new() { Name = flow.ClientCode, Exact = true }));
        await Artifacts.ScreenshotAsync(Page, "keyboard-flow-5-follow-ups", fullPage: false);
    }

    private static async Task TypeIntoAsync(KeyboardOnly keys, ILocator field, string text)
    {
        await keys.TabToAsync(field);
        await field.Page.Keyboard.TypeAsync(text);
        await Assertions.Expect(field).ToHaveValueAsync(text);
    }

    /// <summary>The first date on or after <paramref name="from"/> whose day number equals its month number.</summary>
    private static DateOnly DayEqualToMonthAfter(DateOnly from)
    {
        for (var date = from; ; date = date.AddDays(1))
        {
            if (date.Day == date.Month)
            {
                return date;
            }
        }
    }
}
