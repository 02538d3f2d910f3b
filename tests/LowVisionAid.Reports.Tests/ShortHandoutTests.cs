using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

/// <summary>
/// Very large print (from <see cref="HandoutPrint.ShortTextFrom"/>): the handout holds the essentials in a handful of
/// pages, and the clinician is told, in the result and in the summary, to offer large-print or audio alternatives.
/// </summary>
public class ShortHandoutTests
{
    private static readonly ClientHandoutRenderer Renderer = new(CultureInfo.InvariantCulture);

    // pt = M × 1.4544 / (0.35278 × 0.496) = M × 8.312 (methods.md §1.3 with the shipped face's x-height ratio, derived).
    [Theory]
    [InlineData(4.2, 35, false)] // 4.2 × 8.312 = 34.9 pt, printed at 35 pt: the full text
    [InlineData(4.5, 38, true)]  // 4.5 × 8.312 = 37.4 pt, printed at 38 pt: the short version
    [InlineData(8.0, 48, true)]  // 66.5 pt, more than paper holds: 48 pt, the short version
    public void From_36_pt_the_handout_is_the_short_version_and_the_clinician_is_told_to_offer_other_forms(double criticalM, double body, bool brief)
    {
        var reader = new HandoutReader(Distance.FromCentimetres(40), Distance.FromCentimetres(40), CriticalPrint: PrintSize.FromM(criticalM));

        var fit = HandoutPrint.Fit(reader, ClientHandout.DefaultBodyPoints, CultureInfo.InvariantCulture);

        Assert.Equal(body, fit.BodyPoints);
        Assert.Equal(brief, fit.ShortText);
        if (brief)
            Assert.Contains("large-print or audio alternatives", fit.ClinicianNote, StringComparison.Ordinal);
        else
            Assert.Null(fit.ClinicianNote);
    }

    [Fact]
    public void Two_magnifiers_at_48_pt_fit_in_a_handful_of_pages_with_the_essentials()
    {
        // Elin needs 8M (66 pt): before the re-layout the same handout ran to 38 pages on the demo clinic's first plan.
        var client = SampleClients.Named("Elin");
        var result = Renderer.Render(client.Handout);
        Assert.True(result.Success, result.Error);
        Preview.Write("handout-Elin-short", result.Content);
        var text = PdfText.Read(result.Content);

        Assert.True(result.PageCount <= 5, $"{result.PageCount} pages");
        foreach (var device in client.Handout.Devices)
        {
            Assert.True(text.Contains("Use it for: " + device.Task), device.Task);
            Assert.Contains(device.Name, text.Words, StringComparison.OrdinalIgnoreCase);
        }

        // One unit on A4 (the short version saves the line the inches take at 48 pt).
        Assert.True(text.Contains("Lens to page: 5 cm"), text.Words);
        Assert.True(text.Contains("Lens to page: 8.3 cm"), text.Words);
        Assert.True(text.Contains("Eye to lens: 25 cm"), text.Words);
        Assert.DoesNotContain("inches", text.Words, StringComparison.Ordinal);
        Assert.True(text.Contains(HandoutWording.ShortSun), text.Words);
        Assert.True(text.Contains(HandoutWording.ShortDoNotMove), text.Words);
        Assert.True(text.Contains("Phone: " + client.Handout.Clinic.Phone), text.Words);
        Assert.True(text.Contains(HandoutWording.ShortOtherForm), text.Words);
        // The rest is in the full text the clinic offers in other forms.
        Assert.DoesNotContain("How to use it", text.Words, StringComparison.Ordinal);
        Assert.DoesNotContain("Practice", text.Words, StringComparison.Ordinal);
        Assert.False(text.Contains(HandoutWording.SeeingThingsNotThere));
        Assert.Contains(result.Notices, n => n.Contains(HandoutPrint.OtherFormats, StringComparison.Ordinal));
    }

    [Fact]
    public void On_letter_paper_the_short_version_gives_inches_and_feet()
    {
        // 8.3 cm / 2.54 = 3.27 in; 25 cm = 9.84 in (1 in = 2.54 cm exactly).
        var handout = SampleClients.Named("Elin").Handout with { Paper = PaperSize.Letter };
        var text = PdfText.Read(Renderer.Render(handout).Content);

        Assert.True(text.Contains("Lens to page: 3.3 inches"), text.Words);
        Assert.True(text.Contains("Eye to lens: 9.8 inches"), text.Words);
        Assert.DoesNotContain(" cm", text.Words, StringComparison.Ordinal);
    }

    [Fact]
    public void No_page_of_the_short_version_is_less_than_a_third_full_but_the_last()
    {
        var result = Renderer.Render(SampleClients.Named("Elin").Handout);
        using var document = UglyToad.PdfPig.PdfDocument.Open(result.Content.ToArray());

        foreach (var page in document.GetPages().SkipLast(1))
        {
            // Text bottom (above the footer, the lowest line) measured from the top, as a share of the page.
            var words = page.GetWords().ToList();
            double footer = words.Min(w => w.BoundingBox.Bottom);
            double lowest = words.Where(w => w.BoundingBox.Bottom > footer + 3).Min(w => w.BoundingBox.Bottom);
            Assert.True((page.Height - lowest) / page.Height >= 1.0 / 3, $"page {page.Number} is nearly empty");
        }
    }

    [Fact]
    public void The_summary_tells_the_clinician_the_handout_size_and_to_offer_other_forms()
    {
        var reader = SampleClients.Named("Elin").Handout.Reader;
        var result = new ClinicianSummaryRenderer(CultureInfo.InvariantCulture).Render(SampleModels.Summary() with { HandoutReader = reader });
        var text = PdfText.Read(result.Content);

        Assert.True(text.Contains("Client handout"), text.Words);
        // 4.0M at 40 cm × 2:1 = 8M (methods.md §2.3), 66.5 pt (derived above).
        Assert.True(text.Contains("This client needs print of about 8M (66 pt) at 40 cm"), text.Words);
        Assert.True(text.Contains(HandoutPrint.OtherFormats), text.Words);
    }

    [Fact]
    public void The_summary_states_an_ordinary_handout_size_without_the_offer()
    {
        // Ada: 0.8M at 40 cm × 2:1 = 1.6M, 13.3 pt (derived): printed at the clinic's 18 pt.
        var reader = SampleClients.Named("Ada").Handout.Reader;
        var text = PdfText.Read(new ClinicianSummaryRenderer(CultureInfo.InvariantCulture).Render(SampleModels.Summary() with { HandoutReader = reader }).Content);

        Assert.True(text.Contains("Printed at 18 pt"), text.Words);
        Assert.False(text.Contains(HandoutPrint.OtherFormats));
    }
}
