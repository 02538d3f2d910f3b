namespace LowVisionAid.Browser.Tests.PageObjects;

/// <summary>What every page shares: the skip link, the main navigation, the display settings link, the main region.</summary>
public sealed class SiteChrome(IPage page)
{
    private const string SkipLinkName = "Skip to main content";
    private const string NavigationName = "Main";
    private const string DisplayLinkName = "Display settings";
    private const string MainSelector = "main#main";

    public ILocator SkipLink => page.GetByRole(AriaRole.Link, new() { Name = SkipLinkName });

    public ILocator Navigation => page.GetByRole(AriaRole.Navigation, new() { Name = NavigationName });

    public ILocator NavigationLink(string name) => Navigation.GetByRole(AriaRole.Link, new() { Name = name, Exact = true });

    public ILocator DisplaySettingsLink => page.GetByRole(AriaRole.Banner).GetByRole(AriaRole.Link, new() { Name = DisplayLinkName, Exact = true });

    public ILocator Main => page.Locator(MainSelector);

    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Level = 1 });

    /// <summary>The classes on the html element, where the display settings are applied.</summary>
    public async Task<string> HtmlClassAsync() => await page.Locator("html").GetAttributeAsync("class") ?? "";

    /// <summary>The id of the element that has focus ("" when none has one).</summary>
    public Task<string> FocusedIdAsync() => page.EvaluateAsync<string>("() => document.activeElement ? document.activeElement.id : ''");

    /// <summary>True when the page is wider than the window, i.e. the reader would have to scroll sideways.</summary>
    public Task<bool> ScrollsSidewaysAsync() =>
        page.EvaluateAsync<bool>("() => document.documentElement.scrollWidth > document.documentElement.clientWidth + 1");
}
