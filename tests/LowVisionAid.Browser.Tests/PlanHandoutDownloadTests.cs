using System.Text.RegularExpressions;
using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;
using LowVisionAid.Optics.Planning;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;
using PigDocument = UglyToad.PdfPig.PdfDocument;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// The handout and the clinician summary downloaded from a demo plan's page by their plain links, as a clinician
/// would, and read back with PdfPig. Demo plan 1 has the lit +12 D, 60 mm hand magnifier chosen for its medication
/// labels goal: with the page at the focal point its working distance is 1/F = 1/12 m = 8.3 cm, 3.3 inches
/// (methods.md §3.1, derived; shown to 0.1), held 25 cm from the eye (the planner's stated default).
/// </summary>
// Its own server: choosing an option in the browser changes a demo plan, which the shared server's other classes
// (the layout and scan tests of plan 3's "nothing chosen yet" page) must find unchanged.
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed partial class PlanHandoutDownloadTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app), IClassFixture<AppServer>
{
    private const string LitMagnifier = "Lit hand magnifier +12 D, 60 mm";
    private const string DemoPhone = "000 0000 0000 (invented)";

    [Fact]
    public async Task The_handout_downloaded_from_the_plan_page_names_the_device_its_distances_the_cautions_and_the_clinic()
    {
        var plan = new PlanPage(Page);
        await plan.GotoAsync(1);
        await Assertions.Expect(plan.Figure("(HM-12L)", "Working distance").First).ToHaveTextAsync("8.3 cm");

        var download = await Page.RunAndWaitForDownloadAsync(() => plan.HandoutLink.ClickAsync());

        Assert.EndsWith(".pdf", download.SuggestedFilename, StringComparison.OrdinalIgnoreCase);
        var text = await ReadAsync(download, "handout");
        Assert.Contains(LitMagnifier, text, StringComparison.OrdinalIgnoreCase);
        // DEMO-01 reads 4M at 40 cm: with the fluent reserve 2:1 (methods.md §2.3) she needs 8M, 8 × 1.4544 /
        // (0.35278 × 0.496) = 66 pt (derived, methods.md §1.3), more than paper holds: the short version at 48 pt,
        // distances in the clinic's unit only and the two safety lines for a lens (docs/reports.md).
        Assert.Contains("Lens to page: 8.3 cm", text, StringComparison.Ordinal);
        Assert.Contains("Eye to lens: 25 cm", text, StringComparison.Ordinal);
        HandoutDevice lens = new(LitMagnifier, "", "", [], [], HasLightOrBattery: true, Kind: Optics.Options.OptionKind.HandMagnifier);
        foreach (var caution in HandoutWording.ShortCautionsFor([lens]))
        {
            Assert.Contains(Spaces().Replace(caution, " "), text, StringComparison.Ordinal);
        }

        Assert.Contains(Web.Demo.DemoClinic.ClinicName, text, StringComparison.Ordinal);
        Assert.Contains(DemoPhone, text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_summary_downloaded_from_the_plan_page_holds_the_chosen_options_figures_the_trial_and_the_method_version()
    {
        var plan = new PlanPage(Page);
        await plan.GotoAsync(1);

        var download = await Page.RunAndWaitForDownloadAsync(() => plan.SummaryLink.ClickAsync());

        var text = await ReadAsync(download, "summary", mostPages: 8);
        Assert.Contains(LitMagnifier, text, StringComparison.Ordinal);
        Assert.Contains("Working distance", text, StringComparison.Ordinal);
        Assert.Contains("8.3 cm", text, StringComparison.Ordinal);
        Assert.Contains("Loaned", text, StringComparison.Ordinal);
        Assert.Contains(Planner.MethodVersion, text, StringComparison.Ordinal);
        Assert.Contains(DemoPhone, text, StringComparison.Ordinal);
        Assert.Contains(Spaces().Replace(ClinicianSummaryRenderer.StartingPointNote, " ")[..40], text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_plan_without_a_choice_explains_it_and_choosing_an_option_on_the_page_gives_its_handout()
    {
        // Demo plan 3 is left without a choice.
        var plan = new PlanPage(Page);
        await plan.GotoAsync(3);
        await plan.HandoutLink.ClickAsync();
        await Assertions.Expect(Page.GetByRole(AriaRole.Alert)).ToContainTextAsync(ReportMessages.NoChosenOption);

        await plan.GotoAsync(3);
        await plan.OpenAsync("(HM-20L)");
        await plan.Choose("(HM-20L)").First.ClickAsync();
        await Assertions.Expect(plan.Option("(HM-20L)").First).ToContainTextAsync("Chosen for the handout.");
        var download = await Page.RunAndWaitForDownloadAsync(() => plan.HandoutLink.ClickAsync());

        var text = await ReadAsync(download, "handout-chosen");
        // +20 D with the page at the focal point: 1/20 m = 5 cm, 1.97 inches (methods.md §3.1, derived).
        Assert.Contains("Lit hand magnifier +20 D, 45 mm", text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("Lens to page: 5 cm (2 inches)", text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_print_view_loads_the_handout_face_served_from_the_reports_assembly()
    {
        await Page.GotoAsync("Plans/1/Print?for=client");
        await Assertions.Expect(new SiteChrome(Page).Heading).ToHaveTextAsync("Your magnifier plan");

        // The regular and bold faces the stylesheet declares, fetched from /fonts and decoded by the browser.
        var loaded = await Page.EvaluateAsync<string[]>(
            "async () => { await document.fonts.load(\"18pt 'Atkinson Hyperlegible'\"); await document.fonts.load(\"bold 18pt 'Atkinson Hyperlegible'\"); await document.fonts.ready; " +
            "return [...document.fonts].filter(f => f.family.includes('Atkinson Hyperlegible')).map(f => f.weight + ':' + f.status); }");

        Assert.Contains("400:loaded", loaded);
        Assert.Contains("700:loaded", loaded);
        Assert.True(await Page.EvaluateAsync<bool>("() => document.fonts.check(\"18pt 'Atkinson Hyperlegible'\")"));
    }

    // Page bounds: the demo clinic prints handouts at 3M (25 pt body, about 16 lines a page), and demo plan 1's
    // handout holds two devices, each with its to-scale view, so it runs to about nine pages; twelve is the bound.
    private const int MostHandoutPages = 12;

    private static async Task<string> ReadAsync(IDownload download, string name, int mostPages = MostHandoutPages)
    {
        var path = Path.Combine(Path.GetTempPath(), $"lva-download-{name}-{Guid.NewGuid():N}.pdf");
        await download.SaveAsAsync(path);
        try
        {
            using var document = PigDocument.Open(path);
            Assert.InRange(document.NumberOfPages, 1, mostPages);
            // Each page's footer ("Page 2 of 8 · Client code DEMO-01") is taken out, so that a sentence running
            // onto the next page reads as one.
            var text = Footer().Replace(string.Join(' ', document.GetPages().SelectMany(p => p.GetWords()).Select(w => w.Text)), "");
            // Kept as a test artefact beside the screenshots, for reading when a check fails.
            var shot = await Artifacts.ScreenshotAsync(download.Page, $"download-{name}-page");
            await File.WriteAllTextAsync(Path.ChangeExtension(shot, ".txt"), text);
            return text;
        }
        finally
        {
            File.Delete(path);
        }
    }

    [GeneratedRegex(@"Page \d+ of \d+ · Client code \S+ ?")]
    private static partial Regex Footer();

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();
}
