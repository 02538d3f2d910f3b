namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>One client's page (Clients/{id}): the facts, the visits and the trials.</summary>
public sealed class ClientPage(IPage page)
{
    private const string RecordVisitLink = "Record a visit";
    private const string EditLink = "Edit the client's details";

    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Level = 1 });

    public ILocator Facts => page.Locator("dl.facts");

    public ILocator RecordVisit => page.GetByRole(AriaRole.Link, new() { Name = RecordVisitLink, Exact = true });

    public ILocator Edit => page.GetByRole(AriaRole.Link, new() { Name = EditLink, Exact = true });

    /// <summary>The value beside a term of the facts list, e.g. "Year of birth".</summary>
    public ILocator Fact(string term) => Facts.Locator($"dt:text-is(\"{term}\") + dd");

    public ILocator Visits => page.GetByRole(AriaRole.Table, new() { Name = "Visits, latest first" });

    public ILocator Trials => page.GetByRole(AriaRole.Table, new() { Name = "Devices tried, latest first" });
}
