using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>Reflow at 320 CSS px (WCAG 1.4.10) and use at 200% zoom (1.4.4), in both schemes and text sizes.</summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class LayoutTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app), IClassFixture<AppServer>
{
    [Theory]
    [MemberData(nameof(SitePages.ReflowingPathsInBothSchemes), MemberType = typeof(SitePages))]
    public async Task Every_page_reflows_at_320_css_pixels_without_sideways_scrolling(string path, string heading, bool highContrast)
    {
        // Arrange: 320 × 256 CSS px is the WCAG reflow case (1280 px at 400%). Large text makes it harder still.
        var page = await NewPageAsync(320, 256, highContrast: highContrast, largeText: true);
        var chrome = new SiteChrome(page);

        // Act
        await page.GotoAsync(path);

        // Assert
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync(SitePages.HeadingPattern(heading));
        await Artifacts.ScreenshotAsync(page, $"reflow-320-{(path.Length == 0 ? "home" : path)}-{(highContrast ? "contrast" : "standard")}");
        Assert.False(await chrome.ScrollsSidewaysAsync(), $"/{path} scrolls sideways at 320 CSS px.");
        await AssertEveryNavigationLinkFitsAsync(page, chrome, 320);
    }

    [Theory]
    [MemberData(nameof(SitePages.Paths), MemberType = typeof(SitePages))]
    public async Task Every_page_is_usable_at_200_percent_zoom(string path, string heading)
    {
        // Arrange: browser zoom at 200% on a 1280 × 900 window lays the page out in 640 × 450 CSS px at twice the
        // pixel density, which is what this context emulates.
        var page = await NewPageAsync(640, 450, scale: 2);
        var chrome = new SiteChrome(page);

        // Act
        await page.GotoAsync(path);

        // Assert
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync(SitePages.HeadingPattern(heading));
        await Artifacts.ScreenshotAsync(page, $"zoom-200-{(path.Length == 0 ? "home" : path)}");
        Assert.False(await chrome.ScrollsSidewaysAsync(), $"/{path} scrolls sideways at 200% zoom.");
        await AssertEveryNavigationLinkFitsAsync(page, chrome, 640);
        var fontSize = await page.EvaluateAsync<double>("() => parseFloat(getComputedStyle(document.body).fontSize)");
        Assert.True(fontSize >= 18, $"Body text is {fontSize} CSS px; it should be at least 18 before zoom.");
    }

    [Fact]
    public async Task The_navigation_marks_the_current_section_for_screen_readers_and_by_more_than_colour()
    {
        // Arrange
        var chrome = new SiteChrome(Page);

        // Act
        await Page.GotoAsync("");

        // Assert: aria-current on Home only, and a bar under it (a border, not a colour change).
        await Assertions.Expect(chrome.NavigationLink("Home")).ToHaveAttributeAsync("aria-current", "page");
        await Assertions.Expect(chrome.Navigation.Locator("[aria-current]")).ToHaveCountAsync(1);
        var bar = await chrome.NavigationLink("Home").EvaluateAsync<string>("a => getComputedStyle(a).borderBottomStyle");
        Assert.Equal("solid", bar);

        await Page.GotoAsync("Display");
        await Assertions.Expect(chrome.Navigation.Locator("[aria-current]")).ToHaveCountAsync(0);
    }

    [Fact]
    public async Task A_calculated_plan_reflows_at_320_css_pixels_with_large_text()
    {
        // Arrange
        var page = await NewPageAsync(320, 256, highContrast: false, largeText: true);
        var calculator = new CalculatorPage(page);
        await calculator.GotoAsync();
        await calculator.FillAsync(distanceAcuity: "6/60", nearAcuity: "4M at 20 cm", targetPrint: "1M", workingDistance: "25 cm");

        // Act
        await calculator.Submit.ClickAsync();

        // Assert
        await Assertions.Expect(calculator.Flag).ToBeVisibleAsync();
        await Artifacts.ScreenshotAsync(page, "reflow-320-calculator-plan");
        Assert.False(await new SiteChrome(page).ScrollsSidewaysAsync(), "The calculator's plan scrolls sideways at 320 CSS px.");
    }

    private static async Task AssertEveryNavigationLinkFitsAsync(IPage page, SiteChrome chrome, int width)
    {
        var standalone = SitePages.WithoutSiteNavigation.Any(p => page.Url.EndsWith("/" + p, StringComparison.Ordinal));
        var links = await (standalone ? chrome.Main.GetByRole(AriaRole.Link) : chrome.Navigation.GetByRole(AriaRole.Link)).AllAsync();
        if (standalone)
        {
            Assert.NotEmpty(links);
        }
        else
        {
            Assert.Equal(6, links.Count);
        }

        foreach (var link in links)
        {
            var box = await link.BoundingBoxAsync();
            Assert.NotNull(box);
            Assert.True(box.X >= 0 && box.X + box.Width <= width + 1,
                $"The link '{await link.TextContentAsync()}' on {page.Url} runs off the {width} px window (x {box.X}, width {box.Width}).");
        }
    }
}
