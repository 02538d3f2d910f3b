using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;
using LowVisionAid.Data.Entities;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// A list long enough to come in pages (the client list with 60 more clients than the demo clinic's): its page links
/// pass the axe scan, reflow at 320 CSS px, and are reached and followed by the keyboard alone.
/// </summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class PagedListTests(BrowserSession browser, PagedListTests.LongListServer app)
    : BrowserTest(browser, app), IClassFixture<PagedListTests.LongListServer>
{
    /// <summary>Its own server: 60 invented clients would change the shared server's client list.</summary>
    public sealed class LongListServer : AppServer
    {
        public LongListServer()
        {
            _ = BaseAddress; // starts Kestrel and the demo clinic first
            WithDbAsync(async db =>
            {
                for (var n = 1; n <= 60; n++)
                {
                    db.Clients.Add(new Client { Code = $"PAGE-{n:00}" });
                }

                await db.SaveChangesAsync();
            }).GetAwaiter().GetResult();
        }
    }

    [Fact]
    public async Task The_client_list_pages_pass_the_axe_scan_and_reflow_at_320_css_pixels()
    {
        // Act
        await Page.GotoAsync("Clients");

        // Assert
        var pager = Page.GetByRole(AriaRole.Navigation, new() { Name = "Client list pages" });
        await Assertions.Expect(pager.GetByRole(AriaRole.Link, new() { Name = "Next page of client list pages" })).ToBeVisibleAsync();
        await AxeScan.AssertNoViolationsAsync(Page, "/Clients, first of two pages");
        var narrow = await NewPageAsync(320, 256, largeText: true);
        await narrow.GotoAsync("Clients?p=2");
        await Assertions.Expect(narrow.GetByRole(AriaRole.Link, new() { Name = "Previous page of client list pages" })).ToBeVisibleAsync();
        Assert.False(await new SiteChrome(narrow).ScrollsSidewaysAsync(), "/Clients?p=2 scrolls sideways at 320 CSS px.");
        await LayoutTests.AssertNothingRunsOffTheWindowAsync(narrow, "/Clients?p=2 at 320 CSS px");
    }

    [Fact]
    public async Task The_next_page_is_reached_and_followed_with_the_keyboard_alone()
    {
        // Arrange
        await Page.GotoAsync("Clients");
        var next = Page.GetByRole(AriaRole.Link, new() { Name = "Next page of client list pages" });

        // Act
        await new KeyboardOnly(Page).TabToAsync(next, limit: 120);
        await Page.Keyboard.PressAsync("Enter");

        // Assert
        await Assertions.Expect(Page).ToHaveURLAsync(new System.Text.RegularExpressions.Regex("/Clients\\?p=2$"));
        await Assertions.Expect(Page.GetByText("Page 2", new() { Exact = true })).ToBeVisibleAsync();
    }
}
