using CsCheck;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

public class ClientHandoutRendererTests
{
    private const double MillimetresPerPoint = 25.4 / 72; // DTP point, 1/72 in (Kuhn, "Metric typographic units")
    private static readonly ClientHandoutRenderer Renderer = new(CultureInfo.InvariantCulture);

    private static PdfText Read(ClientHandout model)
    {
        var result = Renderer.Render(model);
        Assert.True(result.Success, result.Error);
        return PdfText.Read(result.Content);
    }

    [Fact]
    public void Prints_the_device_its_task_and_its_distances_in_cm_and_inches()
    {
        var text = Read(SampleModels.Handout());

        Assert.True(text.Contains("Your hand magnifier with a light, +12 D"), text.Words);
        Assert.True(text.Contains("What it is: A round lens with a handle and a small lamp. It makes print look bigger."), text.Words);
        Assert.True(text.Contains("Use it for: Reading letters, bills and labels at the kitchen table"), text.Words);
        // 8 cm = 3.15 in and 5 cm = 1.97 in: 1 in = 2.54 cm exactly (international inch, 1959); printed to 0.1 in.
        Assert.True(text.Contains("Lens above the page: 8 cm (3.1 inches)"), text.Words);
        Assert.True(text.Contains("Your eye above the lens: 5 cm (2 inches)"), text.Words);
        Assert.True(text.Contains("2. Put the lens flat on the page, then lift it slowly until the print is clear."), text.Words);
    }

    [Fact]
    public void Prints_every_caution_including_the_charging_caution_for_a_device_with_a_light()
    {
        var text = Read(SampleModels.Handout());

        Assert.Equal(7, HandoutWording.Cautions.Count);
        foreach (var caution in HandoutWording.Cautions)
            Assert.True(text.Contains(caution), "Missing caution: " + caution);
        Assert.True(text.Contains(HandoutWording.LightOrBattery));
    }

    [Fact]
    public void The_cautions_name_fire_from_sunlight_walking_stairs_driving_the_practitioner_and_sudden_change()
    {
        // The issue's four cautions, looked for by their key words so that rewording cannot drop one.
        var text = Read(SampleModels.Handout()).Words;

        Assert.Contains("sunlight", text, StringComparison.Ordinal);
        Assert.Contains("start a fire", text, StringComparison.Ordinal);
        Assert.Contains("Do not walk, use stairs or drive while you are looking through it", text, StringComparison.Ordinal);
        Assert.Contains("supports the advice of your eye-care practitioner. It does not replace it.", text, StringComparison.Ordinal);
        Assert.Contains("See an eye-care practitioner promptly if your sight changes suddenly", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Leaves_out_the_charging_caution_when_no_device_has_a_light_or_battery()
    {
        var text = Read(SampleModels.Handout(devices: [SampleModels.StandMagnifier]));

        Assert.False(text.Contains(HandoutWording.LightOrBattery));
        Assert.True(text.Contains(HandoutWording.SunlightFire));
    }

    [Fact]
    public void Prints_the_clinic_contact_the_client_and_the_follow_up_date()
    {
        var text = Read(SampleModels.Handout());

        Assert.True(text.Contains("Phone: 01632 960 418"), text.Words);
        Assert.True(text.Contains("Email: reception@harbourside-clinic.example"), text.Words);
        Assert.True(text.Contains("Address: 4 Quay Street, Porthaven"), text.Words);
        Assert.True(text.Contains("Harbourside Low Vision Clinic"), text.Words);
        Assert.True(text.Contains("For: Morwenna Tredinnick (client code HX-0042)"), text.Words);
        Assert.True(text.Contains("Next visit: Tuesday 20 April 2027"), text.Words);
    }

    [Fact]
    public void Prints_the_code_only_when_no_name_is_given()
    {
        var text = Read(SampleModels.Handout() with { ClientName = null });

        Assert.True(text.Contains("Client code: HX-0042"), text.Words);
        Assert.DoesNotContain("Tredinnick", text.Words, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(18.0, PaperSize.A4)]
    [InlineData(18.0, PaperSize.Letter)]
    [InlineData(24.0, PaperSize.A4)]
    [InlineData(24.0, PaperSize.Letter)]
    public void Sets_every_letter_but_the_check_line_in_the_embedded_hyperlegible_face_at_the_body_size_or_more(double body, PaperSize paper)
    {
        var text = Read(SampleModels.Handout(body, paper));

        Assert.All(text.Letters, l => Assert.Matches(@"^[A-Z]{6}\+Atkinson Hyperlegible( Regular|,Bold)$", l.FontName));
        var small = text.Letters.Where(l => l.PointSize < body - 0.01).ToList();
        // A six-letter subset tag before the name marks an embedded subset (PDF 1.7, 9.6.4).
        // Only the check line (1M here, about 8.3 pt) is set below the body size.
        Assert.Equal(HandoutWording.TargetSizeLine.Replace(" ", string.Empty, StringComparison.Ordinal), string.Concat(small.Select(l => l.Value)).Replace(" ", string.Empty, StringComparison.Ordinal));
        Assert.Contains(text.Letters, l => Math.Abs(l.PointSize - body) < 0.01);
    }

    [Fact]
    public void Every_letter_is_black_for_the_highest_contrast_on_white_paper()
    {
        var text = Read(SampleModels.Handout());

        Assert.All(text.Letters, l =>
        {
            var (r, g, b) = l.Color.ToRGBValues();
            Assert.Equal((0.0, 0.0, 0.0), (r, g, b));
        });
    }

    [Fact]
    public void Embeds_the_font_in_the_file()
    {
        var result = Renderer.Render(SampleModels.Handout());

        using var document = UglyToad.PdfPig.PdfDocument.Open(result.Content.ToArray());
        var page = document.GetPage(1);
        var fontNames = page.Letters.Select(l => l.FontName).Distinct().ToList();
        Assert.NotEmpty(fontNames);
        // An embedded TrueType font program sits in a FontFile2 stream (PDF 1.7, 9.9).
        Assert.Contains("/FontFile2", System.Text.Encoding.Latin1.GetString(result.Content.Span), StringComparison.Ordinal);
    }

    [Fact]
    public void States_its_title_author_and_paper_size()
    {
        var a4 = Renderer.Render(SampleModels.Handout());
        var letter = Renderer.Render(SampleModels.Handout(paper: PaperSize.Letter));

        using var document = UglyToad.PdfPig.PdfDocument.Open(a4.Content.ToArray());
        Assert.Equal("Your magnifier plan, client HX-0042", document.Information.Title);
        Assert.Equal("Harbourside Low Vision Clinic", document.Information.Author);
        // A4 is 210 × 297 mm = 595.3 × 841.9 pt; Letter is 8.5 × 11 in = 612 × 792 pt (ISO 216; ANSI/ASME Y14.1).
        var page = document.GetPage(1);
        Assert.Equal(595.3, page.Width, 0.5);
        Assert.Equal(841.9, page.Height, 0.5);
        using var us = UglyToad.PdfPig.PdfDocument.Open(letter.Content.ToArray());
        Assert.Equal(612, us.GetPage(1).Width, 0.5);
        Assert.Equal(792, us.GetPage(1).Height, 0.5);
    }

    [Theory]
    [InlineData(18.0, PaperSize.A4, 1, 2, 5)]
    [InlineData(24.0, PaperSize.Letter, 1, 3, 7)]
    [InlineData(24.0, PaperSize.A4, 2, 3, 9)]
    public void Page_count_stays_within_bounds(double body, PaperSize paper, int devices, int fewest, int most)
    {
        var list = devices == 1 ? new[] { SampleModels.HandMagnifier } : [SampleModels.HandMagnifier, SampleModels.StandMagnifier];
        var result = Renderer.Render(SampleModels.Handout(body, paper, devices: list));

        Assert.InRange(result.PageCount, fewest, most);
        var text = PdfText.Read(result.Content);
        Assert.Equal(result.PageCount, text.PageCount);
        Assert.Equal(Enumerable.Range(1, result.PageCount).Select(p => $"Page {p} of {result.PageCount} · Client code HX-0042"), text.Footers);
    }

    [Fact]
    public void Regenerating_the_same_plan_gives_identical_text_and_sizes()
    {
        var model = SampleModels.Handout(24);

        var first = Read(model);
        var second = Read(model with { Devices = [.. model.Devices] });

        Assert.Equal(first.Words, second.Words);
        Assert.Equal(first.Letters.Select(l => (l.Value, Math.Round(l.PointSize, 3))), second.Letters.Select(l => (l.Value, Math.Round(l.PointSize, 3))));
    }

    [Theory]
    [InlineData(0.8)]
    [InlineData(1.0)]
    [InlineData(1.6)]
    [InlineData(2.0)]
    public void The_check_line_x_height_matches_the_target_print_size(double targetM)
    {
        // 1M = 1.4544 mm of x-height (Sloan 1959; methods.md §1.2, CV-03). The x of the check line is measured from
        // its glyph outline as PdfPig reads it. Tolerance ±1 %, well inside the 5 % size tolerance ISO 10938:2016 allows
        // for chart optotypes. Targets up to 2M are set below the 18 pt body, which is how the line is found.
        var text = Read(SampleModels.Handout(targetM: targetM));

        var xs = text.Letters.Where(l => l.PointSize < 18 && l.Value == "x").ToList();
        Assert.NotEmpty(xs);
        foreach (var x in xs)
        {
            double measuredMm = x.BoundingBox.Height * MillimetresPerPoint;
            Assert.InRange(measuredMm, 0.99 * 1.4544 * targetM, 1.01 * 1.4544 * targetM);
        }
    }

    [Theory]
    [InlineData(0.4)]
    [InlineData(10.0)]
    public void The_check_line_prints_whole_at_the_smallest_and_largest_targets(double targetM)
    {
        // 10M is about 83 pt, wider than the page: the line wraps but keeps every word.
        var result = Renderer.Render(SampleModels.Handout(targetM: targetM));
        var text = PdfText.Read(result.Content);

        Assert.True(text.Contains(HandoutWording.TargetSizeLine), text.Words);
        double expectedPoints = ClientHandoutRenderer.PointsFor(PrintSize.FromM(targetM));
        Assert.Equal(HandoutWording.TargetSizeLine.Count(c => c != ' '), text.Letters.Count(l => l.Value != " " && Math.Abs(l.PointSize - expectedPoints) < 0.01));
    }

    [Fact]
    public void The_x_height_ratio_read_from_the_font_matches_the_x_drawn_in_the_pdf()
    {
        // sxHeight/unitsPerEm from the OS/2 table against the outline of 'x' measured in a rendered page (±1 %).
        var text = Read(SampleModels.Handout());

        var x = text.Letters.First(l => l.Value == "x" && !(l.FontName ?? string.Empty).Contains("Bold", StringComparison.Ordinal));
        Assert.Equal(HyperlegibleFont.XHeightRatio.Value, x.BoundingBox.Height / x.PointSize, 0.005);
    }

    [Fact]
    public void Converts_1M_to_points_through_the_face_ratio()
    {
        // CV-30 (methods.md §1.3, derived): 1M is 8.25 pt at r_x 0.50, so 8.25 × 0.50 / r_x at the face's own ratio.
        double expected = 8.25 * 0.50 / HyperlegibleFont.XHeightRatio.Value;

        Assert.Equal(expected, ClientHandoutRenderer.PointsFor(PrintSize.FromM(1.0)), 0.05);
    }

    [Fact]
    public void A_plan_with_no_chosen_option_gives_the_no_option_message_and_no_document()
    {
        var result = Renderer.Render(SampleModels.Handout(devices: []));

        Assert.False(result.Success);
        Assert.Equal(ReportMessages.NoChosenOption, result.Error);
        Assert.True(result.Content.IsEmpty);
        Assert.Null(result.FileName);
        Assert.Equal(0, result.PageCount);
    }

    [Theory]
    [InlineData(12.0)]
    [InlineData(17.9)]
    [InlineData(60.0)]
    [InlineData(double.NaN)]
    public void A_body_size_outside_18_to_48_pt_is_refused(double body)
    {
        var result = Renderer.Render(SampleModels.Handout(body));

        Assert.Equal(ReportMessages.BodySizeOutOfRange, result.Error);
        Assert.True(result.Content.IsEmpty);
    }

    [Fact]
    public void Missing_client_code_clinic_phone_or_a_device_name_are_refused_with_their_messages()
    {
        var model = SampleModels.Handout();

        Assert.Equal(ReportMessages.NoClientCode, Renderer.Render(model with { ClientCode = " " }).Error);
        Assert.Equal(ReportMessages.NoClinicContact, Renderer.Render(model with { Clinic = model.Clinic with { Phone = "" } }).Error);
        Assert.Equal(ReportMessages.UnnamedDevice, Renderer.Render(model with { Devices = [SampleModels.HandMagnifier with { Name = "" }] }).Error);
        Assert.Equal(ReportMessages.TargetOutOfRange, Renderer.Render(SampleModels.Handout(targetM: 0.2)).Error);
    }

    [Fact]
    public void A_successful_render_is_a_pdf_with_a_safe_file_name()
    {
        var result = Renderer.Render(SampleModels.Handout() with { ClientCode = "HX/0042 ä" });

        Assert.True(result.Success);
        Assert.Equal("handout-HX-0042--.pdf", result.FileName);
        Assert.Equal("%PDF-"u8.ToArray(), result.Content.Span[..5].ToArray());
    }

    [Fact]
    public void Renders_the_same_text_from_many_threads_at_once()
    {
        // The font resolver is installed once per process, whichever thread gets there first.
        var model = SampleModels.Handout();
        var texts = new string[8];

        Parallel.For(0, texts.Length, i => texts[i] = PdfText.Read(new ClientHandoutRenderer(CultureInfo.InvariantCulture).Render(model).Content).Words);

        Assert.All(texts, t => Assert.Equal(texts[0], t));
    }

    [Fact]
    public void Prints_central_european_letters_in_the_same_face_and_a_base_letter_for_one_the_face_lacks()
    {
        // The shipped faces have Ł and ę but no Ŵ (U+0174): PDFsharp would drop it silently, so it prints as W.
        var text = Read(SampleModels.Handout() with { ClientName = "Siân Łęcka-Ŵynne" });

        Assert.True(text.Contains("For: Siân Łęcka-Wynne (client code HX-0042)"), text.Words);
        Assert.Equal(2, text.Letters.Count(l => l.Value is "Ł" or "ę"));
        Assert.All(text.Letters.Where(l => l.Value is "Ł" or "ę"), l => Assert.Contains("Atkinson Hyperlegible", l.FontName, StringComparison.Ordinal));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public void Wrapping_never_loses_or_reorders_a_word()
    {
        var word = Gen.String[Gen.Char['a', 'z'], 1, 12];
        var sentence = word.Array[1, 40].Select(w => string.Join(' ', w));

        Gen.Select(sentence.Array[1, 6], Gen.Int[0, 2].Select(i => new[] { 18.0, 24.0, 35.0 }[i])).Sample((lines, body) =>
        {
            var model = SampleModels.Handout(body) with { Practice = lines };
            var text = Read(model);
            foreach (var line in lines)
                Assert.True(text.Contains(line), line);
        }, iter: 15, threads: 1);
    }

    [Fact]
    public void Formats_numbers_and_dates_in_the_culture_it_is_given()
    {
        var result = new ClientHandoutRenderer(CultureInfo.GetCultureInfo("fr-FR")).Render(SampleModels.Handout());

        var text = PdfText.Read(result.Content);
        Assert.True(text.Contains("Lens above the page: 8 cm (3,1 inches)"), text.Words);
    }

    [Fact]
    public void Draws_the_view_through_the_device_to_size_with_the_plans_letter_count_and_says_it_in_words()
    {
        // Derived (methods.md §4.1–4.2): a +8 D, 75 mm lens 25 cm from the eye (+1.5 cm to the entrance pupil) shows
        // 0.075/(0.265 × 8) = 35.4 mm of the page, holding 35.4/(1.1 × 1.4544) = 22 characters of 1M (k = 1.1 from memory).
        // The window now draws words with their spaces (22 character places, spaces left empty) and says the view in
        // letters, not as a width across the page (issue 11: a width misleads with a central scotoma).
        var device = SampleModels.HandMagnifier with { View = new HandoutView(Distance.FromMillimetres(35.4), 22, PrintSize.FromM(1.0)) };
        var text = Read(SampleModels.Handout(devices: [device]));

        Assert.True(text.Contains(HandoutWording.ViewHeading), text.Words);
        Assert.True(text.Contains(HandoutWording.ViewText(22, drawn: true)), text.Words);
        double target = ClientHandoutRenderer.PointsFor(PrintSize.FromM(1.0));
        var atTarget = text.Letters.Where(l => l.Value != " " && Math.Abs(l.PointSize - target) < 0.01).ToList();
        var phrase = ClientHandoutRenderer.ViewLetters[..22];
        int glyphs = phrase.Count(c => c != ' ');
        Assert.Equal(glyphs + HandoutWording.TargetSizeLine.Count(c => c != ' '), atTarget.Count);
        // The window comes first (the device section precedes the check line): its letters on one baseline, placed
        // every 1.1 x-heights (1.1 × 1.4544 mm = 1.60 mm, ±1 %) from the first, all inside the 35.4 mm window.
        var window = atTarget.Take(glyphs).ToList();
        Assert.Equal(phrase.Replace(" ", string.Empty, StringComparison.Ordinal), string.Concat(window.Select(l => l.Value)));
        Assert.All(window, l => Assert.Equal(window[0].StartBaseLine.Y, l.StartBaseLine.Y, 2));
        int lastPlace = phrase.TrimEnd().Length - 1;
        double pitchMm = (window[^1].StartBaseLine.X - window[0].StartBaseLine.X) / lastPlace * MillimetresPerPoint;
        Assert.Equal(1.1 * 1.4544, pitchMm, 1.1 * 1.4544 * 0.01);
        Assert.True((window[^1].EndBaseLine.X - window[0].StartBaseLine.X) * MillimetresPerPoint <= 35.4);
    }

    [Fact]
    public void A_view_wider_than_the_sheet_is_said_in_words_and_not_drawn()
    {
        var device = SampleModels.HandMagnifier with { View = new HandoutView(Distance.FromCentimetres(25), 156, PrintSize.FromM(1.0)) };
        var text = Read(SampleModels.Handout(devices: [device]));

        Assert.True(text.Contains(HandoutWording.ViewText(156, drawn: false)), text.Words);
        double target = ClientHandoutRenderer.PointsFor(PrintSize.FromM(1.0));
        Assert.Equal(HandoutWording.TargetSizeLine.Count(c => c != ' '), text.Letters.Count(l => l.Value != " " && Math.Abs(l.PointSize - target) < 0.01));
    }
}
