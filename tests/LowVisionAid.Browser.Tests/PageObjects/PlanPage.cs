namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>A saved plan's page: its option cards with their choice buttons, and the handout and print links.</summary>
public sealed class PlanPage(IPage page)
{
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
