using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// The quick calculator in the browser. Check values are the published worked examples named beside each; the page
/// shows powers to 0.01 D and distances to 0.1 cm, which is the tolerance of each text comparison.
/// </summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class CalculatorTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    private const string Sustained = "Sustained reading: books, newspapers, letters";
    private const string SpotReserve = "Spot tasks: print just at the smallest size read (1:1)";

    [Fact]
    public async Task Baileys_worked_example_gives_an_equivalent_viewing_distance_of_6_4_cm()
    {
        // Bailey, "Prescribing magnification" (methods §2.2): 4M read at 32 cm, target 0.8M, no reserve →
        // EVD = 32 × 0.8 / 4 = 6.4 cm, Feq = 15.625 D (published; shown rounded to 15.63 D).
        var calculator = new CalculatorPage(Page);
        await calculator.GotoAsync();
        await calculator.Task(Sustained).CheckAsync();
        await calculator.Reserve(SpotReserve).CheckAsync();
        await calculator.FillAsync(nearAcuity: "4M at 32 cm", targetPrint: "0.8M", workingDistance: "25 cm");

        // Act
        await calculator.Submit.ClickAsync();

        // Assert
        var near = calculator.Estimate("Near-acuity method");
        await Assertions.Expect(near).ToContainTextAsync("15.63 D");
        await Assertions.Expect(near).ToContainTextAsync("6.4 cm");
        await Assertions.Expect(calculator.Plan).ToContainTextAsync("The options are worked out for +15.63 D");
        Assert.NotEmpty(await calculator.OptionHeadingsAsync());
        await Assertions.Expect(calculator.Plan.GetByText("A magnifying lens left in sunlight can focus it and start a fire", new() { Exact = false })).ToBeVisibleAsync();
        await Artifacts.ScreenshotAsync(Page, "calculator-bailey-example");
    }

    [Fact]
    public async Task Kestenbaums_rule_gives_10_D_for_6_60_and_the_typed_acuity_is_shown_as_understood()
    {
        // Kestenbaum and Sturman 1956 (methods §2.1): 6/60 (20/200) → +10 D, 2.5× relative to 25 cm (published).
        var calculator = new CalculatorPage(Page);
        await calculator.GotoAsync();
        await calculator.Task(Sustained).CheckAsync();
        await calculator.Reserve(SpotReserve).CheckAsync();
        await calculator.FillAsync(distanceAcuity: "20/200", targetPrint: "1M", workingDistance: "40 cm");

        // Act
        await calculator.Submit.ClickAsync();

        // Assert
        await Assertions.Expect(calculator.Plan).ToContainTextAsync("6/60 = 20/200 (1.00 logMAR)");
        var published = calculator.Estimate("Kestenbaum's rule as published");
        await Assertions.Expect(published).ToContainTextAsync("10.00 D");
        await Assertions.Expect(published).ToContainTextAsync("2.5× relative to 25 cm");
        await Assertions.Expect(calculator.Estimate("Kestenbaum's rule, for the target print")).ToContainTextAsync("10.00 D");
    }

    [Fact]
    public async Task Estimates_more_than_0_2_log_units_apart_are_flagged_in_words()
    {
        // Derived (methods §2.1, §2.2): 6/60 with target 1M at 1:1 → 10 D; 4M read at 20 cm → 4 / (0.20 × 1) = 20 D.
        // log10(20/10) = 0.30 > 0.2, so the pair is flagged.
        var calculator = new CalculatorPage(Page);
        await calculator.GotoAsync();
        await calculator.Task(Sustained).CheckAsync();
        await calculator.Reserve(SpotReserve).CheckAsync();
        await calculator.FillAsync(distanceAcuity: "6/60", nearAcuity: "4M at 20 cm", targetPrint: "1M", workingDistance: "25 cm");

        // Act
        await calculator.Submit.ClickAsync();

        // Assert
        await Assertions.Expect(calculator.Flag).ToBeVisibleAsync();
        await Assertions.Expect(calculator.Plan).ToContainTextAsync("asks for 2.0 times the power");
        await Assertions.Expect(calculator.Plan).ToContainTextAsync("0.30 log units apart");
        await Artifacts.ScreenshotAsync(Page, "calculator-disagreement");
        await Page.GetByRole(AriaRole.Heading, new() { Name = "Power needed, by method" }).EvaluateAsync("h => h.scrollIntoView()");
        await Artifacts.ScreenshotAsync(Page, "calculator-disagreement-view", fullPage: false);
        await Page.GetByRole(AriaRole.Heading, new() { Name = "Options, first choice first" }).EvaluateAsync("h => h.scrollIntoView()");
        await Artifacts.ScreenshotAsync(Page, "calculator-options-view", fullPage: false);
    }

    [Fact]
    public async Task Missing_and_mistyped_inputs_are_listed_at_the_top_and_beside_each_field_and_the_typing_is_kept()
    {
        // Arrange
        var calculator = new CalculatorPage(Page);
        await calculator.GotoAsync();
        await calculator.FillAsync(distanceAcuity: "6/0");

        // Act
        await calculator.Submit.ClickAsync();

        // Assert
        await Assertions.Expect(calculator.ErrorSummary).ToBeVisibleAsync();
        await Assertions.Expect(calculator.ErrorSummary.GetByRole(AriaRole.Link)).ToHaveCountAsync(3);
        await Assertions.Expect(calculator.ErrorSummary).ToContainTextAsync("Enter the print to be read");
        await Assertions.Expect(calculator.ErrorSummary).ToContainTextAsync("Enter the distance the client wants to work at");
        await Assertions.Expect(calculator.DistanceAcuity).ToHaveValueAsync("6/0");
        await Assertions.Expect(calculator.DistanceAcuity).ToHaveAttributeAsync("aria-invalid", "true");
        var described = await calculator.DistanceAcuity.GetAttributeAsync("aria-describedby");
        Assert.Contains("Input_DistanceAcuity-error", described, StringComparison.Ordinal);
        await Assertions.Expect(Page.Locator("#Input_DistanceAcuity-error")).ToContainTextAsync("Error:");
        await Assertions.Expect(calculator.Plan).ToHaveCountAsync(0);
        await Artifacts.ScreenshotAsync(Page, "calculator-errors");
    }

    [Fact]
    public async Task The_calculator_can_be_filled_in_and_sent_with_the_keyboard_alone()
    {
        // Arrange
        var calculator = new CalculatorPage(Page);
        await calculator.GotoAsync();

        // Act: skip link, then Tab through the form; arrow keys choose within a radio group, Space ticks a box.
        await Page.Keyboard.PressAsync("Tab");
        await Page.Keyboard.PressAsync("Enter");
        // Tab enters a radio group at its chosen button (sustained reading is the default).
        await TabToAsync(calculator.Task(Sustained));
        await Page.Keyboard.PressAsync("ArrowUp");
        await Assertions.Expect(calculator.Task("Spot reading: labels, prices, post")).ToBeCheckedAsync();
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(calculator.Task(Sustained)).ToBeCheckedAsync();
        // The reserve group starts at "the usual for the task"; two steps down is fluent reading (2:1).
        await Page.Keyboard.PressAsync("Tab");
        await Page.Keyboard.PressAsync("ArrowDown");
        await Page.Keyboard.PressAsync("ArrowDown");
        await Assertions.Expect(calculator.Reserve("Fluent reading")).ToBeCheckedAsync();
        await TabToAsync(calculator.NearAcuity);
        await Page.Keyboard.TypeAsync("4M at 32 cm");
        await Page.Keyboard.PressAsync("Tab");
        await Page.Keyboard.TypeAsync("0.8M");
        await Page.Keyboard.PressAsync("Tab");
        await Page.Keyboard.TypeAsync("25 cm");
        await Page.Keyboard.PressAsync("Enter");

        // Assert: Enter in a text box sends the form.
        // Bailey's example with a 2:1 reserve (derived): EVD 6.4 cm / 2 = 3.2 cm, Feq 31.25 D.
        await Assertions.Expect(calculator.Estimate("Near-acuity method")).ToContainTextAsync("31.25 D");
        await Assertions.Expect(calculator.Estimate("Near-acuity method")).ToContainTextAsync("3.2 cm");
    }

    private async Task TabToAsync(ILocator target, int limit = 60)
    {
        for (var i = 0; i < limit; i++)
        {
            if (await target.EvaluateAsync<bool>("el => el === document.activeElement"))
            {
                return;
            }

            await Page.Keyboard.PressAsync("Tab");
        }

        Assert.Fail($"Tab never reached {target} within {limit} presses.");
    }
}
