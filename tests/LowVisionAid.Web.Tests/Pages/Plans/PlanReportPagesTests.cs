using System.Diagnostics;
using System.Net;
using System.Text.Json;
using System.Text.RegularExpressions;
using LowVisionAid.Data.Entities;
using LowVisionAid.Reports;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Web.Handouts;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using UglyToad.PdfPig.Content;
using PigDocument = UglyToad.PdfPig.PdfDocument;

namespace LowVisionAid.Web.Tests.Pages.Plans;

/// <summary>
/// The handout, the summary and the print view of a saved plan, read back from what the app serves.
/// The stored plan holds the figures a +8 D hand magnifier gives, worked out from the cited formulas (derived):
/// working distance 1/F = 12.5 cm with the page at the focal point (methods.md §3.1); field y = D/(z·F) with
/// D = 75 mm and z = 25 cm + 1.5 cm to the entrance pupil, 0.075/(0.265 × 8) = 35.4 mm (§4.1), stored as the plan
/// page shows it, "3.5 cm"; letters of 1M print in view 35.4/(1.1 × 1.4544) = 22 (§4.2, k = 1.1 from memory).
/// </summary>
public sealed partial class PlanReportPagesTests
{
    private const string ClinicLine = "2 Quay Street, Port Example · 000 1111 2222 (invented) · desk@clinic.invalid";

    [Fact]
    public async Task The_handout_pdf_names_the_device_its_distances_every_caution_and_the_clinic_contact()
    {
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "H-1", TrialOutcome.Dispensed);
        using var browser = app.Browser();

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
    public async Task The_handout_body_is_set_in_the_embedded_hyperlegible_face_at_18_pt_or_more_on_one_to_six_pages()
    {
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "H-2", TrialOutcome.Loaned);
        using var browser = app.Browser();

        var pdf = Read(await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/Handout", UriKind.Relative)));

        // The only smaller text is the check line, printed at the 1M target: 8.31 pt (docs/reports.md).
        var body = pdf.Letters.Where(l => !string.IsNullOrWhiteSpace(l.Value) && l.PointSize > 9).ToList();
        Assert.NotEmpty(body);
        Assert.All(body, l => Assert.Contains("AtkinsonHyperlegible", (l.FontName ?? "").Replace(" ", "", StringComparison.Ordinal), StringComparison.Ordinal));
        Assert.All(body, l => Assert.True(l.PointSize >= 18 - 0.01, $"'{l.Value}' at {l.PointSize} pt"));
        Assert.InRange(pdf.Pages, 1, 6);
    }

    [Fact]
    public async Task The_summary_pdf_holds_the_inputs_the_estimates_every_figure_the_trials_and_the_method_version()
    {
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "S-1", TrialOutcome.Dispensed);
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri($"/Plans/{planId}/Summary", UriKind.Relative));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var pdf = Read(await response.Content.ReadAsByteArrayAsync());
        Assert.Contains("2026.12.1", pdf.Text, StringComparison.Ordinal);
        Assert.Contains("Preferred working distance", pdf.Text, StringComparison.Ordinal);
        // Table cells wrap within their column, so words of one cell may be read between other cells' words.
        AssertWords("Kestenbaum's rule with reserve", pdf.Text);
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
    public async Task A_plan_without_a_chosen_option_explains_that_on_screen_instead_of_giving_a_pdf(string page)
    {
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "N-1", TrialOutcome.Declined);
        using var browser = app.Browser();

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
    public async Task A_handout_regenerated_from_the_stored_plan_has_identical_text()
    {
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "R-1", TrialOutcome.Ordered);
        using var first = app.Browser();
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
        var planId = await StoredPlanAsync(app, "P-1", TrialOutcome.Dispensed);
        using var browser = app.Browser();

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
    }

    [Fact]
    public async Task The_clinician_print_view_shows_the_figures_with_their_tables_and_the_letters_the_plan_counted()
    {
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "P-2", TrialOutcome.Dispensed);
        using var browser = app.Browser();

        var html = await browser.GetStringAsync(new Uri($"/Plans/{planId}/Print?for=clinician", UriKind.Relative));

        Assert.Equal(3, Regex.Count(html, "<svg[^>]*role=\"img\""));
        Assert.Equal(3, Regex.Count(html, "<table class=\"trade-off-table stack-narrow\">"));
        // The window holds exactly the letters the stored plan counted (22).
        Assert.Equal(22, Regex.Count(html, "class=\"" + Reports.Figures.TradeOffFigures.LetterClass + "\""));
        Assert.Contains("2026.12.1", html, StringComparison.Ordinal);
        Assert.DoesNotContain("style=", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_clinic_contact_line_is_split_into_phone_email_and_address()
    {
        var settings = Demo.DemoClinic.DefaultSettings("Harbour Test Clinic (invented)", hasDemoData: false);
        settings.ClinicContact = ClinicLine;

        var contact = StoredPlanReader.Contact(settings);

        Assert.Equal(new ClinicContact("Harbour Test Clinic (invented)", "000 1111 2222 (invented)", "desk@clinic.invalid", "2 Quay Street, Port Example"), contact);
    }

    [Fact]
    public async Task The_first_page_of_each_pdf_is_rendered_to_png_as_a_test_artefact()
    {
        var pdftoppm = (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator)
            .Select(d => Path.Combine(d, "pdftoppm")).FirstOrDefault(File.Exists);
        Assert.True(pdftoppm is not null, "pdftoppm (Debian poppler-utils) is missing; scripts/test.sh installs it.");
        using var app = new ClinicApp();
        var planId = await StoredPlanAsync(app, "A-1", TrialOutcome.Dispensed);
        using var browser = app.Browser();
        var folder = ArtefactFolder();

        foreach (var kind in new[] { "Handout", "Summary" })
        {
            var pdfPath = Path.Combine(folder, $"plan-{kind.ToLowerInvariant()}.pdf");
            await File.WriteAllBytesAsync(pdfPath, await browser.GetByteArrayAsync(new Uri($"/Plans/{planId}/{kind}", UriKind.Relative)));
            var prefix = Path.Combine(folder, $"plan-{kind.ToLowerInvariant()}-1");
            using var process = Process.Start(new ProcessStartInfo(pdftoppm!) { ArgumentList = { "-png", "-r", "60", "-f", "1", "-l", "1", "-singlefile", pdfPath, prefix } })!;
            await process.WaitForExitAsync();

            Assert.Equal(0, process.ExitCode);
            Assert.True(new FileInfo(prefix + ".png").Length > 1000, prefix + ".png");
        }
    }

    /// <summary>
    /// A client, a visit and a plan stored as the plan page stores it (inputs and outputs as JSON), with one trial
    /// of the kit's +8 D hand magnifier that ended with <paramref name="outcome"/> and a follow-up booked.
    /// </summary>
    private static Task<int> StoredPlanAsync(ClinicApp app, string code, TrialOutcome outcome) =>
        app.WithDbAsync(async db =>
        {
            var settings = Demo.DemoClinic.DefaultSettings("Harbour Test Clinic (invented)", hasDemoData: false);
            settings.ClinicContact = ClinicLine;
            settings.HandoutPrintSize = Optics.Quantities.PrintSize.FromM(1.5);   // 12.5 pt, so the body stays at the 18 pt floor
            db.Settings.Add(settings);
            var kit = new KitDevice { Code = "HM-08", Name = "Hand magnifier +8 D, 75 mm", Kind = Optics.Kit.DeviceKind.HandMagnifier, Power = Optics.Quantities.Power.FromDioptres(8), Aperture = Optics.Quantities.Distance.FromMillimetres(75) };
            db.KitDevices.Add(kit);
            var client = new Client { Code = code };
            var visit = new Visit { VisitDate = new DateOnly(2026, 11, 20), Practitioner = "A. Example (invented)" };
            var plan = new Plan { MethodVersion = "2026.12.1", InputsJson = Inputs, OutputsJson = Outputs, CreatedUtc = new DateTime(2026, 11, 20, 10, 0, 0, DateTimeKind.Utc) };
            plan.Trials.Add(new Trial
            {
                TrialDate = new DateOnly(2026, 11, 20),
                KitDevice = kit,
                DeviceDescription = "Hand magnifier +8 D, 75 mm (HM-08)",
                Task = GoalTask.Mail,
                ResultText = "1M",
                ClientComment = "Reads the bills now",
                Outcome = outcome,
                FollowUpDue = new DateOnly(2026, 12, 18),
            });
            visit.Plans.Add(plan);
            client.Visits.Add(visit);
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return plan.Id;
        });

    private static readonly string Inputs = JsonSerializer.Serialize(new
    {
        VisitId = 1,
        DistanceLogMar = 1.0,
        NearThresholdM = 4.0,
        NearTestDistanceMetres = 0.4,
        WorkingDistanceMetres = 0.25,
        UsefulEyes = 2,
        HandsFree = false,
        Tremor = false,
        SpotReserve = 1.0,
        FluentReserve = 2.0,
        SustainedReserve = 3.0,
        CharacterPitch = 1.1,
        Imperial = false,
        Goals = new[] { new { Task = "Mail", Detail = "bills", TargetText = "1M", TargetM = 1.0 } },
    });

    private static readonly string Outputs = JsonSerializer.Serialize(new
    {
        MethodVersion = "2026.12.1",
        Goals = new[]
        {
            new
            {
                Title = "Letters and bills (bills)",
                Target = "1M",
                Task = "Sustained reading",
                RequiredPower = "+8.00 D",
                Estimates = new[] { new { Method = "Kestenbaum's rule with reserve", EquivalentPower = "+8.00 D", ViewingDistance = "12.5 cm", Magnification = "2.0× (re 25 cm)", Reserve = "2:1", LogUnits = "0.90" } },
                MethodsDisagree = false,
                Options = Array.Empty<object>(),
                KitDevices = new[]
                {
                    new
                    {
                        Position = 1,
                        Kind = "Hand magnifier",
                        KitCode = "HM-08",
                        KitName = "Hand magnifier +8 D, 75 mm",
                        Usable = true,
                        Notes = Array.Empty<string>(),
                        Figures = new[]
                        {
                            new { Label = "Power needed", Value = "+8.00 D" },
                            new { Label = "Power given", Value = "+8.00 D (enough)" },
                            new { Label = "Working distance", Value = "12.5 cm" },
                            new { Label = "Eye to lens", Value = "25 cm" },
                            new { Label = "Field on the page", Value = "3.5 cm" },
                            new { Label = "Letters in view", Value = "22" },
                        },
                        Reasons = new[] { new { Text = "Gives the required magnification.", InFavour = true } },
                    },
                },
                Cautions = new[] { new { Id = "sunlight-fire", Text = "A magnifying lens left in sunlight can focus it and start a fire." } },
            },
        },
    });

    private static string ArtefactFolder()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "LowVisionAid.sln")))
        {
            dir = dir.Parent;
        }

        var path = Path.Combine(dir?.FullName ?? Path.GetTempPath(), "test-artifacts", "handouts");
        Directory.CreateDirectory(path);
        return path;
    }

    private sealed record PdfRead(string Text, IReadOnlyList<Letter> Letters, int Pages);

    private static PdfRead Read(byte[] pdf)
    {
        using var document = PigDocument.Open(pdf);
        var words = new List<string>();
        var letters = new List<Letter>();
        foreach (var page in document.GetPages())
        {
            words.AddRange(page.GetWords().Select(w => w.Text));
            letters.AddRange(page.Letters);
        }

        return new PdfRead(string.Join(' ', words), letters, document.NumberOfPages);
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

    [GeneratedRegex("<text [^>]*font-size=\"([0-9.]+)\"[^>]*>" + "Can you read")]
    private static partial Regex FontSize();
}
