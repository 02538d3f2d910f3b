using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>Keyboard alone: the skip link, a visible focus on everything that takes it, forms sent by keyboard.</summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class KeyboardTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    private const string FocusIndicatorScript = """
        () => {
            const el = document.activeElement;
            if (!el || el === document.body) return null;
            const style = getComputedStyle(el);
            return { tag: el.tagName, text: (el.textContent || '').trim().slice(0, 40),
                     outlineStyle: style.outlineStyle, outlineWidth: parseFloat(style.outlineWidth),
                     boxShadow: style.boxShadow };
        }
        """;

    [Theory]
    [MemberData(nameof(SitePages.Paths), MemberType = typeof(SitePages))]
    public async Task The_first_tab_reaches_a_visible_skip_link_that_moves_focus_to_the_main_content(string path, string heading)
    {
        // Arrange
        var chrome = new SiteChrome(Page);
        await Page.GotoAsync(path);
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync(SitePages.HeadingPattern(heading));

        // Act
        await Page.Keyboard.PressAsync("Tab");

        // Assert: focused, and on screen (it is hidden above the page until it has focus).
        await Assertions.Expect(chrome.SkipLink).ToBeFocusedAsync();
        var box = await chrome.SkipLink.BoundingBoxAsync();
        Assert.NotNull(box);
        Assert.True(box.Y >= 0 && box.Height > 10, $"The focused skip link is off screen on /{path} (y {box.Y}).");
        await Artifacts.ScreenshotAsync(Page, $"keyboard-skip-link-{(path.Length == 0 ? "home" : path)}");

        await Page.Keyboard.PressAsync("Enter");
        Assert.Equal("main", await chrome.FocusedIdAsync());

        // The next Tab goes into the content, not back to the navigation.
        await Page.Keyboard.PressAsync("Tab");
        var inMain = await Page.EvaluateAsync<bool>("() => document.getElementById('main').contains(document.activeElement)");
        Assert.True(inMain, $"After the skip link, Tab did not move into the main content on /{path}.");
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public async Task Every_link_and_button_on_the_home_page_shows_a_focus_outline_when_tabbed_to(bool highContrast)
    {
        // Arrange
        await SitePages.UseDisplayAsync(Context, App.BaseAddress, highContrast, largeText: false);
        await Page.GotoAsync("");
        var focusable = await Page.Locator("a[href], button, input, select, textarea").CountAsync();

        // Act and assert: walk the whole tab order once.
        for (var i = 0; i < focusable; i++)
        {
            await Page.Keyboard.PressAsync("Tab");
            var focus = await Page.EvaluateAsync<FocusIndicator?>(FocusIndicatorScript);
            Assert.NotNull(focus);
            Assert.True(focus.OutlineStyle == "solid" && focus.OutlineWidth >= 3,
                $"'{focus.Text}' ({focus.Tag}) has no visible focus outline: {focus.OutlineStyle} {focus.OutlineWidth}px.");
            Assert.NotEqual("none", focus.BoxShadow);
        }

        await Artifacts.ScreenshotAsync(Page, $"keyboard-focus-last-{(highContrast ? "contrast" : "standard")}");
    }

    [Fact]
    public async Task Display_settings_can_be_chosen_and_saved_with_the_keyboard_alone()
    {
        // Arrange
        var display = new DisplaySettingsPage(Page);
        var chrome = new SiteChrome(Page);
        await Page.GotoAsync("");

        // Act: Tab to the display settings link and follow it.
        await TabUntilFocusedAsync(chrome.DisplaySettingsLink);
        await Page.Keyboard.PressAsync("Enter");
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync("Display settings");

        // Arrow keys move between the radio buttons of a group.
        await TabUntilFocusedAsync(display.StandardColours);
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(display.HighContrast).ToBeCheckedAsync();
        await Page.Keyboard.PressAsync("Tab");
        await Assertions.Expect(display.StandardText).ToBeFocusedAsync();
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(display.LargeText).ToBeCheckedAsync();
        await TabUntilFocusedAsync(display.Save);
        await Page.Keyboard.PressAsync("Enter");

        // Assert: back on the page the reader came from, drawn with the new settings.
        await Assertions.Expect(chrome.Heading).ToHaveTextAsync("LowVisionAid");
        var classes = await chrome.HtmlClassAsync();
        Assert.Contains("scheme-contrast", classes, StringComparison.Ordinal);
        Assert.Contains("text-large", classes, StringComparison.Ordinal);
        await Artifacts.ScreenshotAsync(Page, "keyboard-display-saved");
    }

    [Theory]
    [InlineData("Clients/New", "Input_Code", "", "Save client")]
    [InlineData("Visits/New?clientId=1", "Input_DistanceRight", "6/0", "Save visit")]
    [InlineData("Trials/New?planId=1", "Input_TrialDate", "", "Save trial")]
    [InlineData("Kit/New", "Input_Code", "", "Add device")]
    [InlineData("Calculator", "Input_DistanceAcuity", "6/0", "Work out the plan")]
    public async Task A_refused_form_puts_the_focus_on_the_one_error_summary_whose_links_lead_into_each_field(string path, string fieldId, string typed, string button)
    {
        // Arrange: one field left empty or mistyped.
        await Page.GotoAsync(path);
        await Page.Locator("#" + fieldId).FillAsync(typed);

        // Act: send the form from the keyboard.
        await Page.GetByRole(AriaRole.Button, new() { Name = button, Exact = true }).FocusAsync();
        await Page.Keyboard.PressAsync("Enter");

        // Assert: the summary (an alert with a heading) has the focus, and each of its links names a field on the page.
        var summary = Page.Locator(".error-summary");
        await Assertions.Expect(summary).ToHaveCountAsync(1);
        await Assertions.Expect(summary).ToHaveAttributeAsync("role", "alert");
        await Assertions.Expect(summary).ToBeFocusedAsync();
        await Assertions.Expect(summary.GetByRole(AriaRole.Heading, new() { Level = 2 })).ToHaveTextAsync(new System.Text.RegularExpressions.Regex("^There (is 1 problem|are [0-9]+ problems) to fix$"));
        var links = await summary.GetByRole(AriaRole.Link).AllAsync();
        Assert.NotEmpty(links);
        foreach (var link in links)
        {
            var target = (await link.GetAttributeAsync("href"))!.TrimStart('#');
            Assert.True(await Page.EvaluateAsync<bool>("id => document.getElementById(id) !== null", target), $"The summary on /{path} links to #{target}, which is not on the page.");
        }

        await Artifacts.ScreenshotAsync(Page, $"keyboard-error-summary-{path}", fullPage: false);

        // The first Tab reaches the first link, and Enter on it puts the focus in its field.
        await Page.Keyboard.PressAsync("Tab");
        await Assertions.Expect(links[0]).ToBeFocusedAsync();
        var firstTarget = (await links[0].GetAttributeAsync("href"))!.TrimStart('#');
        await Page.Keyboard.PressAsync("Enter");
        Assert.Equal(firstTarget, await new SiteChrome(Page).FocusedIdAsync());
    }

    private async Task TabUntilFocusedAsync(ILocator target, int limit = 40)
    {
        for (var i = 0; i < limit; i++)
        {
            await Page.Keyboard.PressAsync("Tab");
            if (await target.EvaluateAsync<bool>("el => el === document.activeElement"))
            {
                return;
            }
        }

        Assert.Fail($"Tab never reached {target} within {limit} presses.");
    }

    public sealed class FocusIndicator
    {
        public string Tag { get; set; } = "";

        public string Text { get; set; } = "";

        public string OutlineStyle { get; set; } = "";

        public double OutlineWidth { get; set; }

        public string BoxShadow { get; set; } = "";
    }
}
