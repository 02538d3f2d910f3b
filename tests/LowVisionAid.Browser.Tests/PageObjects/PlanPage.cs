namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>A saved plan (Plans/{id}): per goal the required power, the estimates, the options and the cautions; then the trials.</summary>
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
}
