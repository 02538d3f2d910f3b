namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>A saved plan (Plans/{id}): per goal the required power, the estimates, the options with their choice buttons and the cautions; then the trials, and the handout and print links.</summary>
public sealed class PlanPage(IPage page)
{
    private const string RecordTrialLink = "Record a trial";

    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Level = 1 });

    /// <summary>The section of goal <paramref name="line"/> (from 1), named by its heading.</summary>
    public ILocator Goal(int line) => page.Locator($"section.goal-plan[aria-labelledby=\"goal-{line - 1}\"]");

    /// <summary>The strong figure under "Required power" in a goal's section.</summary>
    public ILocator RequiredPower(int line) => Goal(line).Locator("h3:text-is(\"Required power\") + p");

    public ILocator Estimates(int line) => Goal(line).GetByRole(AriaRole.Table, new() { Name = "The required power by each method, side by side" });

    /// <summary>The ranked options (not the kit devices) of a goal.</summary>
    public ILocator Options(int line) => Goal(line).Locator($"article.option[aria-labelledby^=\"goal-{line - 1}-option-\"]");

    /// <summary>The heading of the first-ranked option of a goal.</summary>
    public ILocator FirstOptionHeading(int line) => page.Locator($"#goal-{line - 1}-option-0");

    public ILocator Trials => page.GetByRole(AriaRole.Table, new() { Name = "Devices tried" });

    public ILocator RecordTrial => page.GetByRole(AriaRole.Link, new() { Name = RecordTrialLink, Exact = true });

    public const string HandoutLinkName = "Client handout (large-print PDF)";
    public const string SummaryLinkName = "Clinician summary (PDF)";

    public Task GotoAsync(int planId) => page.GotoAsync($"Plans/{planId}");

    public ILocator HandoutLink => page.GetByRole(AriaRole.Link, new() { Name = HandoutLinkName, Exact = true });

    public ILocator SummaryLink => page.GetByRole(AriaRole.Link, new() { Name = SummaryLinkName, Exact = true });

    /// <summary>The option card whose heading contains <paramref name="name"/> (a kit device's name or code, or a kind).</summary>
    public ILocator Option(string name) =>
        page.Locator("article.option").Filter(new() { Has = page.GetByRole(AriaRole.Heading, new() { Name = name }) });

    /// <summary>The "Choose for the handout" button of an option card.</summary>
    public ILocator Choose(string name) => Option(name).GetByRole(AriaRole.Button, new() { Name = "Choose for the handout" });

    /// <summary>A figure of an option card, as the plan shows it (e.g. "Working distance").</summary>
    public ILocator Figure(string name, string label) =>
        Option(name).Locator("tr").Filter(new() { Has = page.GetByRole(AriaRole.Rowheader, new() { Name = label, Exact = true }) }).Locator("td");
}
