using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class AccessibilityScanTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    [Theory]
    [MemberData(nameof(SitePages.PathsInBothSchemes), MemberType = typeof(SitePages))]
    public async Task Every_page_passes_the_axe_scan_in_both_colour_schemes(string path, string heading, bool highContrast)
    {
        // Arrange
        await SitePages.UseDisplayAsync(Context, App.BaseAddress, highContrast, largeText: false);

        // Act
        await Page.GotoAsync(path);

        // Assert
        await Assertions.Expect(new SiteChrome(Page).Heading).ToHaveTextAsync(SitePages.HeadingPattern(heading));
        await Artifacts.ScreenshotAsync(Page, $"scan-{(path.Length == 0 ? "home" : path)}-{(highContrast ? "contrast" : "standard")}");
        await AxeScan.AssertNoViolationsAsync(Page, $"/{path} ({(highContrast ? "high contrast" : "standard colours")})");
    }

    [Fact]
    public async Task The_display_settings_form_with_an_error_passes_the_axe_scan()
    {
        // Arrange: a value no radio button offers, as a tampered or stale form would send.
        var display = new DisplaySettingsPage(Page);
        await display.GotoAsync();
        await display.HighContrast.EvaluateAsync("radio => { radio.value = 'Purple'; }");
        await display.HighContrast.CheckAsync();

        // Act
        await display.Save.ClickAsync();

        // Assert
        await Assertions.Expect(Page.GetByRole(AriaRole.Alert)).ToContainTextAsync("Choose standard colours or high contrast.");
        await Assertions.Expect(Page.GetByText("Error: Choose standard colours or high contrast.")).ToBeVisibleAsync();
        await Artifacts.ScreenshotAsync(Page, "scan-display-error");
        await AxeScan.AssertNoViolationsAsync(Page, "/Display with an error");
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public async Task The_calculator_with_a_plan_and_with_errors_passes_the_axe_scan(bool highContrast)
    {
        // Arrange
        await SitePages.UseDisplayAsync(Context, App.BaseAddress, highContrast, largeText: false);
        var calculator = new CalculatorPage(Page);
        var scheme = highContrast ? "contrast" : "standard";

        // Act and assert: the form sent with mistakes ...
        await calculator.GotoAsync();
        await calculator.FillAsync(distanceAcuity: "6/0", workingDistance: "far");
        await calculator.Submit.ClickAsync();
        await Assertions.Expect(calculator.ErrorSummary).ToBeVisibleAsync();
        await Artifacts.ScreenshotAsync(Page, $"scan-calculator-errors-{scheme}");
        await AxeScan.AssertNoViolationsAsync(Page, $"/Calculator with errors ({scheme})");

        // ... and with a plan, its flag and its option details open.
        await calculator.FillAsync(distanceAcuity: "6/60", nearAcuity: "4M at 20 cm", targetPrint: "1M", workingDistance: "25 cm");
        await calculator.Submit.ClickAsync();
        await Assertions.Expect(calculator.Flag).ToBeVisibleAsync();
        foreach (var summary in await Page.Locator("details > summary").AllAsync())
        {
            await summary.ClickAsync();
        }

        await Artifacts.ScreenshotAsync(Page, $"scan-calculator-plan-{scheme}");
        await AxeScan.AssertNoViolationsAsync(Page, $"/Calculator with a plan ({scheme})");
    }
}
