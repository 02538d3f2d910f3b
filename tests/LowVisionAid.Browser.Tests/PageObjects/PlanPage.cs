namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>
/// A saved plan (Plans/{id}): per goal the required power and reserve, one comparison table of the options, each
/// option in full in a disclosure (details/summary) with its choice button, the estimates in a disclosure; then the
/// trials, and the handout and print links.
/// </summary>
public sealed class PlanPage(IPage page)
{
    private const string RecordTrialLink = "Record a trial";

    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Level = 1 });

    /// <summary>The section of goal <paramref name="line"/> (from 1), named by its heading.</summary>
    public ILocator Goal(int line) => page.Locator($"section.goal-plan[aria-labelledby=\"goal-{line - 1}\"]");

    /// <summary>The required power beside its term in a goal's facts.</summary>
    public ILocator RequiredPower(int line) => Goal(line).Locator("dt:text-is(\"Required power\") + dd");

    /// <summary>The estimates table of a goal (inside its closed disclosure, so found by its place, not its role).</summary>
    public ILocator Estimates(int line) => Goal(line).Locator("details.estimates table");

    /// <summary>
    /// Opens a goal's estimates disclosure so its rows can be read by role, without moving the focus (the keyboard flow
    /// goes on from where it was; opening a disclosure by keyboard is checked in <c>PlanPageLayoutTests</c>).
    /// </summary>
    public Task OpenEstimatesAsync(int line) => Goal(line).Locator("details.estimates").EvaluateAsync("d => { d.open = true; }");

    /// <summary>The comparison table of a goal: a row per option.</summary>
    public ILocator Comparison(int line) => Goal(line).GetByRole(AriaRole.Table, new() { Name = $"Goal {line} options compared", Exact = false });

    /// <summary>The ranked options (not the kit devices) of a goal, each a disclosure.</summary>
    public ILocator Options(int line) => Goal(line).Locator($"details.option[id^=\"goal-{line - 1}-option-\"]");

    /// <summary>The summary line of the first-ranked option of a goal.</summary>
    public ILocator FirstOptionHeading(int line) => page.Locator($"#goal-{line - 1}-option-0 > summary");

    public ILocator Trials => page.GetByRole(AriaRole.Table, new() { Name = "Devices tried" });

    public ILocator RecordTrial => page.GetByRole(AriaRole.Link, new() { Name = RecordTrialLink, Exact = true });

    public const string HandoutLinkName = "Client handout (large-print PDF)";
    public const string SummaryLinkName = "Clinician summary (PDF)";

    public Task GotoAsync(int planId) => page.GotoAsync($"Plans/{planId}");

    public ILocator HandoutLink => page.GetByRole(AriaRole.Link, new() { Name = HandoutLinkName, Exact = true });

    public ILocator SummaryLink => page.GetByRole(AriaRole.Link, new() { Name = SummaryLinkName, Exact = true });

    /// <summary>The option whose summary line contains <paramref name="name"/> (a kit device's name or code, or a kind).</summary>
    public ILocator Option(string name) =>
        page.Locator("details.option").Filter(new() { Has = page.Locator("summary", new() { HasTextString = name }) });

    /// <summary>
    /// Opens an option's disclosure (its full figures, posture, reasons and buttons) when it is closed, as a user does:
    /// first its goal's "Each option in full" list, then the option.
    /// </summary>
    public async Task OpenAsync(string name)
    {
        var option = Option(name).First;
        var list = option.Locator("xpath=ancestor::details[contains(@class, 'options-in-full')]");
        if (await list.GetAttributeAsync("open") is null)
        {
            await list.Locator(":scope > summary").ClickAsync();
        }

        if (await option.GetAttributeAsync("open") is null)
        {
            await option.Locator("summary").ClickAsync();
        }
    }

    /// <summary>The "Choose for the handout" button of an option card.</summary>
    public ILocator Choose(string name) => Option(name).GetByRole(AriaRole.Button, new() { Name = "Choose for the handout" });

    /// <summary>A figure of an option card, as the plan shows it (e.g. "Working distance").</summary>
    public ILocator Figure(string name, string label) =>
        Option(name).Locator("tr").Filter(new() { Has = page.Locator($"th:text-is(\"{label}\")") }).Locator("td");
}
