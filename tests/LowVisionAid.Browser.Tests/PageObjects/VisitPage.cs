namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>One saved visit (Visits/{id}): the facts, each measurement as read, the goals and the plans.</summary>
public sealed class VisitPage(IPage page)
{
    private const string MakePlanButton = "Make a plan from this visit";

    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Level = 1 });

    public ILocator Facts => page.Locator("dl.facts");

    public ILocator Fact(string term) => Facts.Locator($"dt:text-is(\"{term}\") + dd");

    public ILocator ReadBack => page.GetByRole(AriaRole.Region, new() { Name = "How the measurements were read" });

    /// <summary>The row of the read-back table for one measurement (its row header, e.g. "Distance acuity, right eye").</summary>
    public ILocator Reading(string label) =>
        ReadBack.GetByRole(AriaRole.Row).Filter(new() { Has = page.GetByRole(AriaRole.Rowheader, new() { Name = label, Exact = true }) });

    public ILocator Goals => page.Locator("h2:text-is(\"Goals\") + ul");

    public ILocator MakePlan => page.GetByRole(AriaRole.Button, new() { Name = MakePlanButton });
}
