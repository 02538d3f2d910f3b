using System.Diagnostics;
using System.Net;
using System.Text.Json;
using System.Text.RegularExpressions;
using LowVisionAid.Data.Entities;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Handouts;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using UglyToad.PdfPig.Content;
using PigDocument = UglyToad.PdfPig.PdfDocument;

namespace LowVisionAid.Web.Tests.Pages.Plans;

/// <summary>
/// The handout, the summary and the print view of a plan made as the app makes it: the visit typed into the visit
/// form, the plan made by the visit page's plan handler, the option chosen with the plan page's own form, and the
/// files read back from what the app serves. The visit asks for +8 D: distance 6/24 gives +4 D by Kestenbaum's rule
/// (CV-06, exact), +8 D with the 2:1 fluent reserve (derived as CV-07); 1.6M read at 40 cm for a 1M target at 2:1
/// gives an equivalent viewing distance of 0.40 × 1/(1.6 × 2) = 12.5 cm, +8 D (derived as CV-08). The kit's +8 D,
/// 75 mm hand magnifier then gives, by the cited formulas (derived): working distance 1/F = 12.5 cm with the page
/// at the focal point (methods.md §3.1); with the eye 25 cm from the lens (the planner's default), field
/// y = D/(z·F) = 0.075/(0.265 × 8) = 35.4 mm with z = 25 + 1.5 cm to the entrance pupil (§4.1, ±1 %), shown as
/// "3.5 cm"; letters of 1M in view 35.4/(1.1 × 1.4544) = 22.1, so 22 (§4.2, k = 1.1 from memory).
/// </summary>
public sealed partial class PlanReportPagesTests
{
    private const string ClinicLine = "2 Quay Street, Port Example · 000 1111 2222 (invented) · desk@clinic.invalid";

    [Fact]
    [Trait("Category", "Slow")]
    public async Task The_handout_pdf_names_the_device_its_distances_every_caution_and_the_clinic_contact()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "H-1");
        await TrialAsync(app, browser, planId, "Loaned");

        var response = await browser.GetAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(ReportResult.PdfContentType, response.Content.Headers.ContentType?.MediaType);
        var pdf = Read(await response.Content.ReadAsByteArrayAsync());
        Assert.Contains("Hand magnifier +8 D, 75 mm", pdf.Text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("Lens to page: 12.5 cm (4.9 inches)", pdf.Text, StringComparison.Ordinal);   // 12.5 cm / 2.54 = 4.92 in
        Assert.Contains("Eye to lens: 25 cm (9.8 inches)", pdf.Text, StringComparison.Ordinal);
        foreach (var caution in HandoutWording.Cautions)
        {
            Assert.Contains(Normalise(caution), pdf.Text, StringComparison.Ordinal);
        }

        Assert.Contains("Harbour Test Clinic (invented)", pdf.Text, StringComparison.Ordinal);
        Assert.Contains("000 1111 2222 (invented)", pdf.Text, StringComparison.Ordinal);
        Assert.Contains("desk@clinic.invalid", pdf.Text, StringComparison.Ordinal);
        Assert.Contains("Next visit: Friday 18 December 2026", pdf.Text, StringComparison.Ordinal);
        Assert.Contains(HandoutWording.TargetSizeLine, pdf.Text, StringComparison.Ordinal);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task The_handout_body_is_set_in_the_embedded_hyperlegible_face_at_the_clients_print_need()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "H-2");

        var pdf = Read(await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative)));

        // The client read 1.6M at 40 cm; with the fluent reserve 2:1 (methods.md §2.3) she needs 3.2M at 40 cm, and
        // pt = M × 1.4544 / (0.35278 × 0.496) (methods.md §1.3; 0.496 = sxHeight/unitsPerEm of the shipped face) gives
        // 26.6 pt (derived). Before issue 11 the body was 18 pt whatever the client read; now it follows her.
        // The only smaller text is the check line, printed at the 1M target: 8.31 pt (docs/reports.md).
        var body = pdf.Letters.Where(l => !string.IsNullOrWhiteSpace(l.Value) && l.PointSize > 9).ToList();
        Assert.NotEmpty(body);
        Assert.All(body, l => Assert.Contains("AtkinsonHyperlegible", (l.FontName ?? "").Replace(" ", "", StringComparison.Ordinal), StringComparison.Ordinal));
        Assert.All(body, l => Assert.True(l.PointSize >= 26.6 - 0.01, $"'{l.Value}' at {l.PointSize} pt"));
        Assert.InRange(pdf.Pages, 1, 9);
    }

    [Fact]
    public async Task The_handout_draws_what_the_client_sees_at_once_with_the_letters_the_plan_counted()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "H-3");

        var pdf = Read(await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative)));

        // The engine's count as the plan stored it, and the derived check value (22, see the class notes).
        var stored = await app.WithDbAsync(db => db.Plans.Where(p => p.Id == planId).Select(p => p.OutputsJson).SingleAsync());
        var kit = Web.Plans.PlanJson.Read<Web.Plans.TypedPlan>(stored).Goals[0].KitDevices.Single(o => o.Option.KitDeviceId == "HM-08");
        var counted = (int)Math.Round(kit.Option.CharactersInView!.Value);
        Assert.Equal(22, counted);
        Assert.Contains(Normalise(HandoutWording.ViewText(counted, drawn: true)), pdf.Text, StringComparison.Ordinal);
        double target = ClientHandoutRenderer.PointsFor(Optics.Quantities.PrintSize.FromM(1.0));
        var drawn = pdf.Letters.Count(l => !string.IsNullOrWhiteSpace(l.Value) && Math.Abs(l.PointSize - target) < 0.01)
            - HandoutWording.TargetSizeLine.Count(c => c != ' ');
        // The window draws words with their spaces: the count is of character places, spaces left empty.
        Assert.Equal(HandoutWording.ViewPhrase[..counted].Count(c => c != ' '), drawn);
    }

    [Fact]
    public async Task The_summary_pdf_holds_the_inputs_the_estimates_every_figure_the_trials_and_the_method_version()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "S-1");
        await TrialAsync(app, browser, planId, "Dispensed");

        var response = await browser.GetAsync(new Uri($"/Plans/{planId}/Summary", UriKind.Relative));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var pdf = Read(await response.Content.ReadAsByteArrayAsync());
        Assert.Contains(LowVisionAid.Optics.Planning.Planner.MethodVersion, pdf.Text, StringComparison.Ordinal);
        Assert.Contains("Preferred working distance", pdf.Text, StringComparison.Ordinal);
        // Table cells wrap within their column, so words of one cell may be read between other cells' words.
        AssertWords("Kestenbaum's rule, for the target print and reserve", pdf.Text);
        Assert.Contains("Field on the page", pdf.Text, StringComparison.Ordinal);
        Assert.Contains("Gives the required magnification.", pdf.Text, StringComparison.Ordinal);
        AssertWords("1M; Reads the bills now", pdf.Text);
        Assert.Contains("Dispensed", pdf.Text, StringComparison.Ordinal);
        Assert.Contains("000 1111 2222 (invented)", pdf.Text, StringComparison.Ordinal);
        Assert.InRange(pdf.Pages, 1, 8);
    }

    [Theory]
    [InlineData("Handout")]
    [InlineData("Summary")]
    [InlineData("Print?for=client")]
    [InlineData("Print?for=clinician")]
    [Trait("Category", "Slow")]
    public async Task A_plan_without_a_chosen_option_explains_that_on_screen_instead_of_giving_a_pdf(string page)
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await MadePlanAsync(app, browser, "N-1");
        await TrialAsync(app, browser, planId, "Declined");

        var response = await browser.GetAsync(new Uri($"/Plans/{planId}/{page}", UriKind.Relative));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/html", response.Content.Headers.ContentType?.MediaType);
        var html = WebUtility.HtmlDecode(await response.Content.ReadAsStringAsync());
        Assert.Contains(ReportMessages.NoChosenOption, html, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("Handout")]
    [InlineData("Summary")]
    [InlineData("Print")]
    public async Task An_unknown_plan_gives_not_found(string page)
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri($"/Plans/9999/{page}", UriKind.Relative));

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_handout_regenerated_from_the_stored_plan_has_identical_text()
    {
        using var app = new ClinicApp();
        using var first = app.Browser();
        var planId = await ChosenPlanAsync(app, first, "R-1");
        var before = Read(await first.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative)));

        // A later request, from another client, after the app has served other pages.
        using var second = app.Browser();
        await second.GetAsync(new Uri($"/Plans/{planId}/Print?for=clinician", UriKind.Relative));
        var after = Read(await second.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative)));

        Assert.Equal(before.Text, after.Text);
        Assert.Equal(before.Pages, after.Pages);
    }

    [Fact]
    public async Task The_client_print_view_shows_the_handout_wording_and_the_check_line_at_the_target_size()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "P-1");

        var html = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}/Print?for=client", UriKind.Relative)));

        Assert.Contains("/css/print.css", html, StringComparison.Ordinal);
        Assert.Contains("Lens to page: 12.5 cm (4.9 in)", html, StringComparison.Ordinal);
        foreach (var caution in HandoutWording.Cautions)
        {
            Assert.Contains(caution, html, StringComparison.Ordinal);
        }

        // 1M in the shipped face: 1.4544 / (0.35278 × 0.496) = 8.31 pt (docs/reports.md, derived).
        var size = FontSize().Match(html);
        Assert.True(size.Success, "the check line's font-size");
        Assert.Equal(ClientHandoutRenderer.PointsFor(Optics.Quantities.PrintSize.FromM(1.0)), double.Parse(size.Groups[1].Value, CultureInfo.InvariantCulture), 3);
        Assert.Equal(8.31, double.Parse(size.Groups[1].Value, CultureInfo.InvariantCulture), 2);
        Assert.DoesNotContain("style=", html, StringComparison.Ordinal);
        // Every word of the line is drawn at that size, in order (one SVG per word, so the line wraps on a phone).
        var words = CheckWords().Matches(html).Select(m => m.Groups[2].Value).ToList();
        Assert.Equal(HandoutWording.TargetSizeLine.Split(' '), words);
        Assert.All(CheckWords().Matches(html), m => Assert.Equal(size.Groups[1].Value, m.Groups[1].Value));
    }

    [Fact]
    public async Task The_client_print_view_sets_its_body_at_the_size_the_pdf_uses_for_this_reader()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "P-7");

        var html = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}/Print?for=client", UriKind.Relative)));

        // She read 1.6M at 40 cm; at the fluent reserve 2:1 (methods.md §2.3) she needs 3.2M at 40 cm, which in the
        // handout face is 3.2 × 1.4544 / (0.35278 × 0.496) = 26.6 pt (methods.md §1.3, derived): 27 pt, the full text.
        Assert.Contains("<body class=\"print-client body-27\">", html, StringComparison.Ordinal);
        Assert.DoesNotContain(HandoutWording.ShortOtherForm, html, StringComparison.Ordinal);
        Assert.DoesNotContain("For the clinician:", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_client_print_view_is_the_short_version_at_48_pt_when_paper_cannot_hold_the_print_she_needs()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        // 4M read at 40 cm: at the fluent reserve 2:1 (methods.md §2.3) she needs 8M at 40 cm, 8 × 1.4544 /
        // (0.35278 × 0.496) = 66.5 pt (methods.md §1.3, derived), more than the 48 pt a line of words on paper holds.
        var planId = await MadePlanAsync(app, browser, "P-8", visit => visit["Input.NearThreshold"] = "4M");
        Assert.Equal(HttpStatusCode.Redirect, (await ChooseAsync(browser, planId, 0, PlanText.Kind(Optics.Options.OptionKind.HandMagnifier))).StatusCode);

        var html = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}/Print?for=client", UriKind.Relative)));
        var pdf = Read(await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative)));

        // The same version as the PDF: the short text at 48 pt, headings the body size in bold.
        Assert.Contains("<body class=\"print-client body-48 short-text\">", html, StringComparison.Ordinal);
        Assert.Contains(HandoutWording.ShortOtherForm, html, StringComparison.Ordinal);
        Assert.Contains("Ask the clinic for the full sheet", pdf.Text, StringComparison.Ordinal);
        // A lens: the one sunlight line of the short text, not the full text's list of cautions.
        Assert.Contains(HandoutWording.ShortSun, html, StringComparison.Ordinal);
        Assert.DoesNotContain(HandoutWording.SunlightFire, html, StringComparison.Ordinal);
        Assert.DoesNotContain("How to use it", html, StringComparison.Ordinal);
        // Distances in one unit (A4: centimetres), as in the PDF.
        Assert.Matches(new Regex(@"<p>Lens to page: [0-9.]+ cm</p>"), html);
        // The clinician is told why, on the screen only (the print tools do not print).
        Assert.Contains("For the clinician:", html, StringComparison.Ordinal);
        Assert.Contains("66 pt", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_clinician_print_view_shows_the_figures_with_their_tables_and_the_letters_the_plan_counted()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "P-2");

        var html = await browser.GetStringAsync(new Uri($"/Plans/{planId}/Print?for=clinician", UriKind.Relative));

        Assert.Equal(3, Regex.Count(html, "<svg[^>]*role=\"img\""));
        Assert.Equal(3, Regex.Count(html, "<table class=\"trade-off-table stack-narrow\">"));
        // The window holds exactly the letters the stored plan counted (22).
        Assert.Equal(22, Regex.Count(html, "class=\"" + Reports.Figures.TradeOffFigures.LetterClass + "\""));
        Assert.Contains(LowVisionAid.Optics.Planning.Planner.MethodVersion, html, StringComparison.Ordinal);
        Assert.DoesNotContain("style=", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_clinician_print_view_has_the_pdfs_sections_acuity_as_typed_and_reasons_for_and_against()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "P-9");

        var html = WebUtility.HtmlDecode(await browser.GetStringAsync(new Uri($"/Plans/{planId}/Print?for=clinician", UriKind.Relative)));
        var pdf = Read(await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/Summary", UriKind.Relative)));

        // Each eye as typed (Records.VisitForm: right 6/60, left 20/400; both 6/24 here) and as read: logMAR is
        // −log10 of the decimal acuity (methods.md §1.1, Bailey & Lovie 1976): 6/60 → 1.00, 20/400 → log10 20 = 1.30,
        // 6/24 → log10 4 = 0.60 (derived).
        Assert.Matches(new Regex(@"<th scope=""row"">Right eye \(distance\)</th>\s*<td>6/60</td>\s*<td>logMAR 1.00</td>"), html);
        Assert.Matches(new Regex(@"<th scope=""row"">Left eye \(distance\)</th>\s*<td>20/400</td>\s*<td>logMAR 1.30</td>"), html);
        Assert.Matches(new Regex(@"<th scope=""row"">Both eyes \(distance\)</th>\s*<td>6/24</td>\s*<td>logMAR 0.60</td>"), html);
        // Near: 1.6M at 40 cm is logMAR log10(1.6 / 0.4) = 0.60 (methods.md §1.2, derived).
        Assert.Contains("1.6M at 40.0 cm (15.7 in), logMAR 0.60", html, StringComparison.Ordinal);
        Assert.Contains("logMAR 0.60", pdf.Text, StringComparison.Ordinal);
        // Each estimate with the reserve it used in its own column: the fluent 2:1 (methods.md §2.3) for Kestenbaum's
        // rule for the target print, not "none" beside a basis that says 2:1.
        Assert.Matches(new Regex(@"<th scope=""row"">Kestenbaum's rule, for the target print and reserve</th>\s*<td>[^<]+</td>\s*<td>[^<]+</td>\s*<td>2:1</td>"), html);
        Assert.DoesNotContain("; reserve 2:1", html, StringComparison.Ordinal);
        // The sections in the PDF's words, and every reason labelled for or against, as in the PDF.
        foreach (var heading in new[] { "Acuity", "Equivalent power by method", "Chosen option", "Trials and outcomes" })
        {
            Assert.Contains($"<h2>{heading}</h2>", html, StringComparison.Ordinal);
            Assert.Contains(heading, pdf.Text, StringComparison.Ordinal);
        }

        var reasons = Regex.Matches(html, "<h4>Reasons</h4><ul>(.*?)</ul>", RegexOptions.Singleline).Select(m => m.Groups[1].Value).ToList();
        Assert.NotEmpty(reasons);
        Assert.All(Regex.Matches(string.Concat(reasons), "<li>(.*?)</li>"), li => Assert.Matches("^(For|Against): ", li.Groups[1].Value));
    }

    [Fact]
    public void The_clinic_contact_line_is_split_into_phone_email_and_address()
    {
        var settings = Demo.DemoClinic.DefaultSettings("Harbour Test Clinic (invented)", hasDemoData: false);
        settings.ClinicContact = ClinicLine;

        var contact = StoredPlanReader.Contact(settings);

        Assert.Equal(new ClinicContact("Harbour Test Clinic (invented)", "000 1111 2222 (invented)", "desk@clinic.invalid", "2 Quay Street, Port Example"), contact);
    }

    // A4 is 210 × 297 mm (ISO 216); at 60 dots per inch that is 496.1 × 701.6 px (derived: mm / 25.4 × 60), and
    // poppler rounds each side to a whole pixel. An office printer cannot print the outer 5 mm or so of a sheet (common
    // practice); the handout's margin is 54 pt (19 mm) and the summary's 50 pt (17.6 mm), so nothing may be drawn in
    // the outer 5 mm (12 px at 60 dpi), while the page must carry ink (dark pixels) inside.
    [Theory]
    [InlineData("Handout")]
    [InlineData("Summary")]
    [Trait("Category", "Slow")]
    public async Task A_second_pdf_reader_draws_every_page_on_a4_with_ink_inside_the_printable_area(string kind)
    {
        var pdftoppm = (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator)
            .Select(d => Path.Combine(d, "pdftoppm")).FirstOrDefault(File.Exists);
        Assert.True(pdftoppm is not null, "pdftoppm (Debian poppler-utils) is missing; scripts/test.sh installs it.");
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var planId = await ChosenPlanAsync(app, browser, "A-1");
        var folder = ArtefactFolder();
        var pdfPath = Path.Combine(folder, $"plan-{kind.ToLowerInvariant()}.pdf");
        await File.WriteAllBytesAsync(pdfPath, await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/{kind}", UriKind.Relative)));

        // Act: poppler (an independent reader) draws every page in grey at 60 dpi; it reports any syntax error.
        var prefix = Path.Combine(folder, $"plan-{kind.ToLowerInvariant()}");
        foreach (var stale in Directory.GetFiles(folder, Path.GetFileName(prefix) + "-*.pgm"))
        {
            File.Delete(stale);
        }

        var start = new ProcessStartInfo(pdftoppm!) { RedirectStandardError = true, ArgumentList = { "-gray", "-r", "60", pdfPath, prefix } };
        using var process = Process.Start(start)!;
        var complaints = await process.StandardError.ReadToEndAsync();
        await process.WaitForExitAsync();

        // Assert
        Assert.Equal(0, process.ExitCode);
        Assert.True(complaints.Length == 0, "poppler complained: " + complaints);
        var pages = Directory.GetFiles(folder, Path.GetFileName(prefix) + "-*.pgm");
        using var document = PigDocument.Open(pdfPath);
        Assert.Equal(document.NumberOfPages, pages.Length);
        foreach (var page in pages)
        {
            var (width, height, pixels) = ReadGreyMap(await File.ReadAllBytesAsync(page));
            Assert.InRange(width, 496, 497);
            Assert.InRange(height, 701, 702);
            const int Edge = 12;
            var inkAtEdge = 0;
            var inkInside = 0;
            for (var y = 0; y < height; y++)
            {
                for (var x = 0; x < width; x++)
                {
                    if (pixels[(y * width) + x] < 128)
                    {
                        var atEdge = x < Edge || y < Edge || x >= width - Edge || y >= height - Edge;
                        inkAtEdge += atEdge ? 1 : 0;
                        inkInside += atEdge ? 0 : 1;
                    }
                }
            }

            Assert.True(inkAtEdge == 0, $"{Path.GetFileName(page)} has {inkAtEdge} dark pixels in the outer 5 mm a printer cannot print.");
            Assert.True(inkInside > 500, $"{Path.GetFileName(page)} is nearly blank ({inkInside} dark pixels).");
        }
    }

    /// <summary>A binary PGM (P5, 8-bit grey): its size and its pixels, row by row.</summary>
    private static (int Width, int Height, byte[] Pixels) ReadGreyMap(byte[] file)
    {
        var position = 0;
        string Next()
        {
            while (char.IsWhiteSpace((char)file[position]))
            {
                position++;
            }

            var from = position;
            while (!char.IsWhiteSpace((char)file[position]))
            {
                position++;
            }

            return System.Text.Encoding.ASCII.GetString(file, from, position - from);
        }

        Assert.Equal("P5", Next());
        var width = int.Parse(Next(), CultureInfo.InvariantCulture);
        var height = int.Parse(Next(), CultureInfo.InvariantCulture);
        Assert.Equal("255", Next());
        position++;
        return (width, height, file[position..(position + (width * height))]);
    }

    /// <summary>
    /// The clinic settings and kit (set up directly, as a clinic would have them), then a client, a visit typed into
    /// the visit form and a plan made by the visit page's plan handler. Returns the plan's id.
    /// </summary>
    internal static async Task<int> MadePlanAsync(ClinicApp app, HttpClient browser, string code, Action<Dictionary<string, string>>? visitChanges = null)
    {
        await app.WithDbAsync(async db =>
        {
            var settings = Demo.DemoClinic.DefaultSettings("Harbour Test Clinic (invented)", hasDemoData: false);
            settings.ClinicContact = ClinicLine;
            settings.HandoutPrintSize = Optics.Quantities.PrintSize.FromM(1.5);   // 12.5 pt, so the body stays at the 18 pt floor
            db.Settings.Add(settings);
            db.KitDevices.Add(new KitDevice { Code = "HM-08", Name = "Hand magnifier +8 D, 75 mm", Kind = Optics.Kit.DeviceKind.HandMagnifier, Power = Optics.Quantities.Power.FromDioptres(8), Aperture = Optics.Quantities.Distance.FromMillimetres(75) });
            await db.SaveChangesAsync();
        });
        var clientId = await app.ClientAsync(code);
        var visit = Records.VisitForm();
        visit["Input.DistanceBoth"] = "6/24";
        visit["Input.NearThreshold"] = "1.6M";
        visit["Input.Goals[0].Task"] = "Mail";
        visit["Input.Goals[0].Detail"] = "bills";
        visit.Remove("Input.ReadingSpeeds[0].PrintSize");
        visit.Remove("Input.ReadingSpeeds[0].WordsPerMinute");
        visitChanges?.Invoke(visit);
        var created = await browser.SubmitAsync($"/Visits/New?clientId={clientId}", visit);
        Assert.Equal(HttpStatusCode.Redirect, created.StatusCode);
        var visitUrl = created.Headers.Location!.OriginalString;
        var made = await browser.SubmitAsync(visitUrl, new Dictionary<string, string>(), visitUrl + "?handler=Plan");
        Assert.Equal(HttpStatusCode.Redirect, made.StatusCode);
        return int.Parse(made.Headers.Location!.OriginalString.Split('/')[^1], CultureInfo.InvariantCulture);
    }

    /// <summary>A made plan with the kit's +8 D hand magnifier chosen for the handout on the plan page.</summary>
    private static async Task<int> ChosenPlanAsync(ClinicApp app, HttpClient browser, string code)
    {
        var planId = await MadePlanAsync(app, browser, code);
        var chosen = await PressAsync(browser, planId, "(HM-08)", "Choose");
        Assert.Equal(HttpStatusCode.Redirect, chosen.StatusCode);
        return planId;
    }

    /// <summary>
    /// Presses the choice button (handler Choose or Clear) of the option card whose heading contains
    /// <paramref name="heading"/>, as the browser would: the button names the page's one choice form, and posts that
    /// form (its antiforgery token) to the button's own action with the button's option value.
    /// </summary>
    internal static async Task<HttpResponseMessage> PressAsync(HttpClient browser, int planId, string heading, string handler)
    {
        var html = await browser.GetStringAsync(new Uri($"/Plans/{planId}", UriKind.Relative));
        var card = Cards().Matches(html).Select(m => m.Value).FirstOrDefault(c => WebUtility.HtmlDecode(c).Contains(heading, StringComparison.Ordinal));
        Assert.True(card is not null, $"no option card for {heading}");
        return await PressCardAsync(browser, html, card!, handler);
    }

    /// <summary>Presses the choice button of one option card of a fetched plan page (see <see cref="PressAsync"/>).</summary>
    internal static async Task<HttpResponseMessage> PressCardAsync(HttpClient browser, string pageHtml, string card, string? handler = null)
    {
        var button = ChoiceButton().Match(card);
        Assert.True(button.Success, "the card's choice button");
        string Attribute(string name) => WebUtility.HtmlDecode(Regex.Match(button.Value, $" {name}=\"([^\"]*)\"").Groups[1].Value);
        var action = Attribute("formaction");
        if (handler is not null)
        {
            Assert.Contains("handler=" + handler, action, StringComparison.Ordinal);
        }

        var form = Regex.Match(pageHtml, $"<form id=\"{Attribute("form")}\"[^>]*>(.*?)</form>", RegexOptions.Singleline);
        Assert.True(form.Success, "the page's choice form named by the button");
        return await browser.PostFormAsync(action, form.Value, new Dictionary<string, string> { [Attribute("name")] = Attribute("value") });
    }

    /// <summary>Records a trial with the trial form, as the plan page's trial link does.</summary>
    private static async Task TrialAsync(ClinicApp app, HttpClient browser, int planId, string outcome)
    {
        var kitId = await app.WithDbAsync(db => db.KitDevices.Where(k => k.Code == "HM-08").Select(k => k.Id).SingleAsync());
        var response = await browser.SubmitAsync($"/Trials/New?planId={planId}", new Dictionary<string, string>
        {
            ["Input.TrialDate"] = "2026-11-20",
            ["Input.KitDeviceId"] = kitId.ToString(CultureInfo.InvariantCulture),
            ["Input.Task"] = "Mail",
            ["Input.Result"] = "1M",
            ["Input.ClientComment"] = "Reads the bills now",
            ["Input.Outcome"] = outcome,
            ["Input.FollowUpDue"] = "2026-12-18",
        });
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
    }

    private static string ArtefactFolder()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LowVisionAid.sln")))
        {
            dir = dir.Parent;
        }

        // One folder per database: the SQLite and server runs of this suite may overlap (scripts/test.sh's two lanes).
        var path = Path.Combine(dir?.FullName ?? Path.GetTempPath(), "test-artifacts", "handouts", TestServer.Provider.ToString().ToLowerInvariant());
        Directory.CreateDirectory(path);
        return path;
    }

    internal sealed record PdfRead(string Text, IReadOnlyList<Letter> Letters, int Pages);

    internal static PdfRead Read(byte[] pdf)
    {
        using var document = PigDocument.Open(pdf);
        var words = new List<string>();
        var letters = new List<Letter>();
        foreach (var page in document.GetPages())
        {
            words.AddRange(page.GetWords().Select(w => w.Text));
            letters.AddRange(page.Letters);
        }

        // Each page's footer ("Page 2 of 4 · Client code H-1") is taken out, so a sentence running onto the next
        // page reads as one.
        return new PdfRead(Footer().Replace(string.Join(' ', words), ""), letters, document.NumberOfPages);
    }

    private static void AssertWords(string cell, string text)
    {
        var words = text.Split(' ');
        foreach (var word in cell.Split(' '))
        {
            Assert.Contains(word, words);
        }
    }

    private static string Normalise(string text) => Spaces().Replace(text, " ").Trim();

    [GeneratedRegex(@"\s+")]
    private static partial Regex Spaces();

    [GeneratedRegex(@"Page \d+ of \d+ · Client code \S+ ?")]
    private static partial Regex Footer();

    [GeneratedRegex("<svg class=\"check-word\"[^>]*><text [^>]*font-size=\"([0-9.]+)\"[^>]*>([^<]*)</text>")]
    private static partial Regex CheckWords();

    [GeneratedRegex("<details class=\"option\".*?</details>", RegexOptions.Singleline)]
    private static partial Regex Cards();

    [GeneratedRegex("<button type=\"submit\" form=[^>]*>")]
    private static partial Regex ChoiceButton();

    [GeneratedRegex("<text [^>]*font-size=\"([0-9.]+)\"[^>]*>" + "Can<")]
    private static partial Regex FontSize();
}
