using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>Reflow at 320 CSS px (WCAG 1.4.10) and use at 200% zoom (1.4.4), in both schemes and text sizes.</summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class LayoutTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    [Theory]
    [MemberData(nameof(SitePages.PathsInBothSchemes), MemberType = typeof(SitePages))]
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
        await AssertNothingRunsOffTheWindowAsync(page, $"/{path} at 320 CSS px");
        await AssertEveryNavigationLinkFitsAsync(page, chrome, 320);
    }

    [Theory]
    [MemberData(nameof(SitePages.PathsInBothTextSizes), MemberType = typeof(SitePages))]
    public async Task Every_page_is_usable_at_200_percent_zoom(string path, string heading, bool largeText)
    {
        // Arrange: browser zoom at 200% on a 1280 × 900 window lays the page out in 640 × 450 CSS px at twice the
        // pixel density, which is what this context emulates; the larger-text setting on top of it too.
        var page = await NewPageAsync(640, 450, scale: 2, largeText: largeText);
        var chrome = new SiteChrome(page);

        // Act
        await page.GotoAsync(path);

        // Assert
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync(SitePages.HeadingPattern(heading));
        // The window only: a full-page capture of the long plan page at twice the density outlasts the timeout.
        await Artifacts.ScreenshotAsync(page, $"zoom-200-{(path.Length == 0 ? "home" : path)}-{(largeText ? "large" : "standard")}", fullPage: false);
        Assert.False(await chrome.ScrollsSidewaysAsync(), $"/{path} scrolls sideways at 200% zoom.");
        await AssertNothingRunsOffTheWindowAsync(page, $"/{path} at 200% zoom");
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
        await AssertNothingRunsOffTheWindowAsync(page, "The calculator's plan at 320 CSS px");
    }

    [Fact]
    public async Task A_figure_too_wide_for_320_css_pixels_scrolls_inside_its_own_region_reached_and_scrolled_by_the_keyboard()
    {
        // Arrange: the plan's trade-off pictures keep their drawn size on a narrow screen, so their labels stay readable.
        var page = await NewPageAsync(320, 256, largeText: true);
        await page.GotoAsync("Plans/1");
        await page.Locator("details.trade-offs > summary").ClickAsync();
        var region = page.Locator(".trade-off-picture").First;
        await Assertions.Expect(region).ToHaveAttributeAsync("role", "region");
        await Assertions.Expect(region).ToHaveAttributeAsync("tabindex", "0");
        await Assertions.Expect(region).ToHaveAttributeAsync("aria-label", new System.Text.RegularExpressions.Regex(@"\(picture\)$"));
        Assert.True(await region.EvaluateAsync<bool>("r => r.scrollWidth > r.clientWidth"), "The picture fits 320 px, so this test no longer checks a scrolling region.");

        // Act: from the figures' disclosure (opened above), one Tab reaches the picture; the arrow key scrolls it.
        await page.Locator("details.trade-offs > summary").FocusAsync();
        await page.Keyboard.PressAsync("Tab");
        await Assertions.Expect(region).ToBeFocusedAsync();
        var outline = await region.EvaluateAsync<string>("r => getComputedStyle(r).outlineStyle");
        for (var i = 0; i < 10; i++)
        {
            await page.Keyboard.PressAsync("ArrowRight");
        }

        // Assert: the region moved, the page did not, and its focus is drawn.
        await Artifacts.ScreenshotAsync(page, "reflow-320-plan-figure-scrolled", fullPage: false);
        Assert.True(await region.EvaluateAsync<double>("r => r.scrollLeft") > 0, "ArrowRight did not scroll the focused picture.");
        Assert.Equal(0, await page.EvaluateAsync<double>("() => window.scrollX"));
        Assert.Equal("solid", outline);
    }

    [Fact]
    public async Task The_overflow_check_catches_an_unlabelled_scroller_and_a_box_past_the_edge_but_not_a_declared_region()
    {
        // Arrange: a page that fits, then three wide boxes added to it.
        var page = await NewPageAsync(320, 256);
        await page.GotoAsync("");
        // Styles are set through the CSSOM: the CSP refuses inline style attributes.
        await page.EvaluateAsync("""
            () => {
                const main = document.getElementById('main');
                main.insertAdjacentHTML('beforeend',
                    '<div id="plain-scroller"><div>wide</div></div><p id="too-wide">wide</p>' +
                    '<div id="region" role="region" aria-label="Wide table" tabindex="0"><div>wide</div></div>');
                for (const id of ['plain-scroller', 'region']) {
                    const box = document.getElementById(id);
                    box.style.overflowX = 'auto';
                    box.firstElementChild.style.width = '600px';
                }
                document.getElementById('too-wide').style.width = '600px';
                document.getElementById('too-wide').style.maxWidth = 'none';
            }
            """);
        Assert.True(await page.EvaluateAsync<bool>("() => { const r = document.getElementById('region'); return r.scrollWidth > r.clientWidth; }"), "The region does not overflow, so this test checks nothing about it.");

        // Act
        var problems = await page.EvaluateAsync<string[]>(OverflowScript);

        // Assert
        Assert.Contains(problems, p => p.StartsWith("div#plain-scroller scrolls sideways", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("p#too-wide runs from", StringComparison.Ordinal));
        Assert.DoesNotContain(problems, p => p.Contains("#region", StringComparison.Ordinal));
    }

    /// <summary>
    /// No element reaches past either side of the window, unless it sits inside a region that scrolls on its own
    /// and that a keyboard can reach and a screen reader can name (role="region", tabindex="0", a label), or inside
    /// an element that clips it on purpose (the visually hidden text). Every element that scrolls sideways must be
    /// such a region. The document-width check alone misses content cut off by an unlabelled scroller.
    /// </summary>
    internal static async Task AssertNothingRunsOffTheWindowAsync(IPage page, string where)
    {
        var problems = await page.EvaluateAsync<string[]>(OverflowScript);
        Assert.True(problems.Length == 0, $"{where}: " + string.Join("; ", problems));
    }

    private const string OverflowScript = """
        () => {
            const width = document.documentElement.clientWidth;
            const describe = el => el.tagName.toLowerCase() + (el.id ? '#' + el.id : '') + [...el.classList].map(c => '.' + c).join('');
            const overflowX = el => getComputedStyle(el).overflowX;
            const scrolls = el => ['auto', 'scroll'].includes(overflowX(el));
            const clips = el => ['hidden', 'clip'].includes(overflowX(el));
            const isRegion = el => el.getAttribute('role') === 'region' && el.tabIndex === 0
                && (el.hasAttribute('aria-label') || el.hasAttribute('aria-labelledby'));
            const problems = [];
            for (const el of document.body.querySelectorAll('*')) {
                if (scrolls(el) && el.scrollWidth > el.clientWidth + 1 && !isRegion(el)) {
                    problems.push(describe(el) + ' scrolls sideways but is not a focusable, labelled region');
                }
                const box = el.getBoundingClientRect();
                if (box.width === 0 || box.height === 0 || (box.left >= -1 && box.right <= width + 1)) continue;
                let inside = false;
                for (let a = el.parentElement; a && a !== document.body; a = a.parentElement) {
                    if ((scrolls(a) && isRegion(a)) || clips(a)) { inside = true; break; }
                }
                if (!inside) {
                    problems.push(describe(el) + ' runs from x ' + Math.round(box.left) + ' to ' + Math.round(box.right)
                        + ' (' + (el.textContent || '').trim().slice(0, 40) + ')');
                }
            }
            return problems.slice(0, 8);
        }
        """;

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
