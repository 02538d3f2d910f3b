using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class DisplaySettingsTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    [Fact]
    public async Task High_contrast_and_large_text_apply_to_every_page_after_they_are_saved()
    {
        // Arrange
        var display = new DisplaySettingsPage(Page);
        var chrome = new SiteChrome(Page);
        await display.GotoAsync();
        var standardSize = await RootFontSizeAsync();

        // Act
        await display.ChooseAsync(highContrast: true, largeText: true);

        // Assert: the page confirms it, and another page is drawn the same way.
        await Assertions.Expect(display.Saved).ToBeVisibleAsync();
        await Page.GotoAsync("no-such-page");
        Assert.Contains("scheme-contrast", await chrome.HtmlClassAsync(), StringComparison.Ordinal);
        var background = await Page.EvaluateAsync<string>("() => getComputedStyle(document.body).backgroundColor");
        Assert.Equal("rgb(0, 0, 0)", background);
        var largeSize = await RootFontSizeAsync();
        Assert.True(largeSize >= standardSize * 1.2, $"Large text is {largeSize} px against {standardSize} px standard.");
        await Artifacts.ScreenshotAsync(Page, "display-contrast-large-not-found");
    }

    [Fact]
    public async Task Standard_settings_can_be_restored_after_high_contrast()
    {
        // Arrange
        var display = new DisplaySettingsPage(Page);
        await display.GotoAsync();
        await display.ChooseAsync(highContrast: true, largeText: true);

        // Act
        await display.ChooseAsync(highContrast: false, largeText: false);

        // Assert
        await Assertions.Expect(display.StandardColours).ToBeCheckedAsync();
        await Assertions.Expect(display.StandardText).ToBeCheckedAsync();
        var classes = await new SiteChrome(Page).HtmlClassAsync();
        Assert.Equal("scheme-standard text-standard", classes);
    }

    [Fact]
    public async Task A_value_no_option_offers_is_refused_with_a_message_beside_the_choice()
    {
        // Arrange
        var display = new DisplaySettingsPage(Page);
        await display.GotoAsync();
        await display.LargeText.EvaluateAsync("radio => { radio.value = 'Huge'; }");
        await display.LargeText.CheckAsync();

        // Act
        await display.Save.ClickAsync();

        // Assert: the summary links to the group, the message is beside it, nothing was remembered.
        var summaryLink = Page.GetByRole(AriaRole.Alert).GetByRole(AriaRole.Link, new() { Name = "Choose standard or large text." });
        await Assertions.Expect(summaryLink).ToHaveAttributeAsync("href", "#Text");
        await Assertions.Expect(Page.GetByText("Error: Choose standard or large text.")).ToBeVisibleAsync();
        var cookies = await Context.CookiesAsync();
        Assert.DoesNotContain(cookies, cookie => cookie.Name == "lva-display");
    }

    private Task<double> RootFontSizeAsync() =>
        Page.EvaluateAsync<double>("() => parseFloat(getComputedStyle(document.documentElement).fontSize)");
}
