using System.Text.RegularExpressions;
using LowVisionAid.Browser.Tests.Infrastructure;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// A form sent after the skip link: the address then ends in #main, and a form that posted to the address as shown
/// carried it into the answer, so the browser moved the focus to main instead of the error summary. Every form now
/// names its page; here each refused form must still put the focus on its summary.
/// </summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed partial class SkipLinkFormTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    [Theory]
    [InlineData("Visits/New?clientId=1", "Input_DistanceRight", "6/0", "Save visit")]
    [InlineData("Visits/New?clientId=1", "Input_DistanceRight", "6/0", "Check readings")]
    [InlineData("Visits/1/Edit", "Input_DistanceRight", "6/0", "Save visit")]
    [InlineData("Visits/1/Edit", "Input_DistanceRight", "6/0", "Check readings")]
    [InlineData("Settings", "Input_SpotReserve", "abc", "Save settings")]
    [InlineData("Trials/New?planId=1", "Input_TrialDate", "", "Save trial")]
    [InlineData("Kit/New", "Input_Code", "", "Add device")]
    [InlineData("Calculator", "Input_DistanceAcuity", "6/0", "Work out the plan")]
    [InlineData("Clients/1/Edit", "Input_Code", "", "Save client")]
    public async Task After_the_skip_link_a_refused_form_still_puts_the_focus_on_its_error_summary(string path, string fieldId, string typed, string button)
    {
        // Arrange: the page as the skip link leaves it, with #main in the address.
        var address = path + "#main";
        await Page.GotoAsync(address);
        Assert.EndsWith("#main", Page.Url, StringComparison.Ordinal);
        await Page.Locator("#" + fieldId).FillAsync(typed);

        // Act: send the form from the keyboard.
        await Page.GetByRole(AriaRole.Button, new() { Name = button, Exact = true }).FocusAsync();
        await Page.Keyboard.PressAsync("Enter");

        // Assert: the answer is the form back with one summary, which has the focus; the address lost the fragment.
        var summary = Page.Locator(".error-summary");
        await Assertions.Expect(summary).ToHaveCountAsync(1);
        await Assertions.Expect(summary).ToBeFocusedAsync();
        await Assertions.Expect(Page).ToHaveURLAsync(NoFragment());
        Assert.NotEqual("main", await Page.EvaluateAsync<string>("() => document.activeElement.id"));
        await Artifacts.ScreenshotAsync(Page, $"skip-link-error-summary-{path}-{button}", fullPage: false);
    }

    [GeneratedRegex("^[^#]*$")]
    private static partial Regex NoFragment();
}
