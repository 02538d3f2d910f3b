using LowVisionAid.Optics.Options;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

/// <summary>
/// The handouts of four invented clients with different print needs, read back through PdfPig: the body size
/// against the client's need, the task, the device's own text, the glasses, whole sentences and steps, no declined
/// device, and the tags a screen reader uses.
/// </summary>
public class HandoutForEachClientTests
{
    private const double MillimetresPerPoint = 25.4 / 72; // DTP point (Kuhn, "Metric typographic units")
    private const double MillimetresPerM = 1.4544;          // 1M x-height (Sloan; methods.md §1.2)
    // x-height ÷ em of the shipped Atkinson Hyperlegible Regular: OS/2 sxHeight 496 ÷ unitsPerEm 1000 (the font file).
    private const double FaceXHeightRatio = 0.496;

    private static readonly ClientHandoutRenderer Renderer = new(CultureInfo.InvariantCulture);

    public static TheoryData<string> Clients => SampleClients.Names;

    private static (ReportResult Result, PdfText Text) Render(SampleClients.Client client)
    {
        var result = Renderer.Render(client.Handout);
        Assert.True(result.Success, result.Error);
        Preview.Write("handout-" + client.Name, result.Content);
        return (result, PdfText.Read(result.Content));
    }

    // pt = M × 1.4544 / (0.35278 × r_x) (methods.md §1.3, derived).
    private static double PointsOf(double m) => m * MillimetresPerM / (MillimetresPerPoint * FaceXHeightRatio);

    [Theory]
    [MemberData(nameof(Clients))]
    public void The_body_text_is_at_least_the_print_the_client_needs_and_the_clinics_minimum(string name)
    {
        var client = SampleClients.Named(name);
        var (_, text) = Render(client);

        double needed = Math.Min(Math.Max(PointsOf(client.NeededM), 18), 48);
        double checkLine = ClientHandoutRenderer.PointsFor(client.Handout.TargetPrint);
        var body = text.Letters.Where(l => l.Value.Trim().Length > 0 && Math.Abs(l.PointSize - checkLine) > 0.01).ToList();
        var smallest = body.Min(l => l.PointSize);
        Assert.True(smallest >= needed - 0.01, $"{name}: smallest body letter {smallest:0.0} pt, needs {needed:0.0} pt");
    }

    [Fact]
    public void A_client_who_needs_more_than_paper_holds_gets_48_pt_a_note_for_the_clinician_and_other_forms()
    {
        // Cerys: 8M at 25 cm is 8 × 1.4544 / (0.35278 × 0.496) = 66.5 pt (derived), more than 48 pt.
        var client = SampleClients.Named("Cerys");
        var (result, text) = Render(client);

        Assert.True(PointsOf(8) > HandoutPrint.LargestOnPaper);
        var fit = HandoutPrint.Fit(client.Handout, CultureInfo.InvariantCulture);
        Assert.False(fit.FitsOnPaper);
        Assert.Equal(HandoutPrint.LargestOnPaper, fit.BodyPoints);
        var note = Assert.Single(result.Notices);
        Assert.Contains("8M", note, StringComparison.Ordinal);
        Assert.Contains(HandoutPrint.OtherFormats, note, StringComparison.Ordinal);
        Assert.Contains("large-print or audio alternatives", note, StringComparison.Ordinal);
        // Issue 11 re-layout: from 36 pt the handout is the short version and says so near the top (it used to print
        // the whole text at 48 pt, 25 pages for this client).
        Assert.True(fit.ShortText);
        Assert.True(text.Contains(HandoutWording.ShortOtherForm), text.Words);
    }

    [Fact]
    public void A_client_whose_need_is_below_the_clinics_minimum_gets_the_minimum()
    {
        // Ada: 1.6M is 1.6 × 1.4544 / (0.35278 × 0.496) = 13.3 pt (derived), below the clinic's 18 pt.
        var fit = HandoutPrint.Fit(SampleClients.Named("Ada").Handout, CultureInfo.InvariantCulture);

        Assert.Equal(18, fit.BodyPoints);
        Assert.True(fit.FitsOnPaper);
        Assert.Null(fit.ClinicianNote);
    }

    [Fact]
    public void The_print_needed_moves_with_the_reading_distance_and_uses_the_fluent_reserve_on_the_threshold()
    {
        // Dai: 2.0M at 40 cm × 2 (fluent reserve, methods.md §2.3) = 4.0M at 40 cm; the same angle at 25 cm is
        // 4.0 × 25/40 = 2.5M (methods.md §1.2: M = d × angle).
        var needed = HandoutPrint.Needed(SampleClients.Named("Dai").Handout.Reader);

        Assert.NotNull(needed);
        Assert.Equal(2.5, needed.Value.M, 6);
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void Each_device_is_printed_with_its_own_task_and_declined_devices_never_appear(string name)
    {
        var client = SampleClients.Named(name);
        var (result, text) = Render(client);

        foreach (var device in client.Handout.Devices)
        {
            if (device.TrialDeclined)
            {
                Assert.DoesNotContain(device.Name, text.Words, StringComparison.OrdinalIgnoreCase);
                Assert.Contains(result.Notices, n => n.Contains(device.Name, StringComparison.Ordinal) && n.Contains("declined", StringComparison.Ordinal));
            }
            else
            {
                Assert.True(text.Contains("Use it for: " + device.Task), text.Words);
            }
        }

        Assert.DoesNotContain("book or magazine", text.Words, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void A_handout_whose_every_device_was_declined_is_refused()
    {
        var handout = SampleClients.Named("Bryn").Handout;
        var result = Renderer.Render(handout with { Devices = [handout.Devices[0]] });

        Assert.False(result.Success);
        Assert.Equal(ReportMessages.OnlyDeclinedDevices, result.Error);
    }

    [Theory]
    [InlineData("Ada", "Glasses: These are your reading glasses for this task: +4.00 D.")]
    [InlineData("Bryn", "Glasses: Wear reading glasses of +3.00 D with it.")]
    [InlineData("Cerys", "Glasses: reading glasses of +4.00 D.")] // short version at 48 pt (was the full sentence)
    [InlineData("Dai", "Glasses: Wear your distance glasses if you have them, not reading glasses.")]
    [InlineData("Elin", "Glasses: your distance glasses, or none.")]
    [InlineData("Fflur", "Glasses: The telescope is fitted to glasses made for you. Wear them only while you sit and look.")]
    [InlineData("Fflur", "Glasses: Wear reading glasses of +2.50 D to see the screen clearly at the distance given.")]
    public void States_the_glasses_each_device_needs(string name, string glasses)
    {
        // A screen at 25 cm needs 1/0.25 m = +4.00 D without accommodation (methods.md §1.2, Colenbrander's D).
        var (_, text) = Render(SampleClients.Named(name));

        Assert.True(text.Contains(glasses), text.Words);
        Assert.DoesNotContain("the glasses the clinic told you", text.Words, StringComparison.Ordinal);
    }

    [Fact]
    public void A_video_magnifier_gets_no_lens_care_no_sunlight_warning_and_no_page_holding_step()
    {
        // At the clinic's 18 pt (full text): Cerys' own need gives the short version, checked on its own.
        var cerys = SampleClients.Named("Cerys");
        var (_, text) = Render(cerys with { Handout = cerys.Handout with { Reader = null } });

        Assert.False(text.Contains(HandoutWording.SunlightFire));
        Assert.False(text.Contains(HandoutWording.NoSunViewing));
        Assert.DoesNotContain("lens", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("hold the page", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.True(text.Contains(HandoutWording.LightOrBattery), text.Words);
        Assert.True(text.Contains(HandoutWording.SuddenChange), text.Words);
        foreach (var care in DeviceWording.Care(OptionKind.VideoMagnifier))
            Assert.True(text.Contains(care), care);
    }

    [Theory]
    [InlineData("Ada")]
    [InlineData("Bryn")]
    [InlineData("Dai")]
    public void A_device_with_a_lens_gets_the_sunlight_fire_warning_and_lens_care(string name)
    {
        var (_, text) = Render(SampleClients.Named(name));

        Assert.True(text.Contains(HandoutWording.SunlightFire), text.Words);
        Assert.True(text.Contains(DeviceWording.Care(OptionKind.HandMagnifier)[0]), text.Words);
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void Says_what_is_seen_at_once_in_letters_never_as_a_width_across_the_page(string name)
    {
        var client = SampleClients.Named(name);
        var (_, text) = Render(client);

        Assert.DoesNotContain(" across ", text.Words, StringComparison.Ordinal);
        if (HandoutPrint.Fit(client.Handout, CultureInfo.InvariantCulture).ShortText)
            return; // the short version leaves the view out
        foreach (var view in client.Handout.Devices.Where(d => !d.TrialDeclined).Select(d => d.View).OfType<HandoutView>())
        {
            var words = view.LettersInView >= HandoutWording.WholeLine
                ? "you see a whole line of print of this size or more at once"
                : $"you see about {view.LettersInView} letters of this size at once";
            Assert.True(text.Contains(words), text.Words);
        }
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void Every_step_list_item_and_sentence_is_whole_on_one_page(string name)
    {
        var client = SampleClients.Named(name);
        var (_, text) = Render(client);
        var devices = client.Handout.Devices.Where(d => !d.TrialDeclined).ToList();
        bool brief = HandoutPrint.Fit(client.Handout, CultureInfo.InvariantCulture).ShortText;

        // Steps and list items are kept whole on their page (none here is taller than a page).
        var steps = brief
            ? HandoutWording.ShortCautionsFor(devices)
            : devices.SelectMany(d => d.HowToUse)
                .Concat(HandoutWording.CautionsFor(devices))
                .Concat(client.Handout.Light).Concat(client.Handout.Practice).Concat(client.Handout.IfItStopsHelping);
        foreach (var step in steps)
            Assert.True(text.OnOnePage(step), $"{name}: step or item split across pages: {step}");
        // Running text may go on over a page break, but only between sentences.
        var paragraphs = brief
            ? devices.Select(d => "Glasses: " + DeviceWording.ShortGlasses(d.Kind, d.ReadingAdd, CultureInfo.InvariantCulture) + ".").Append(HandoutWording.ShortOtherForm)
            : devices.Select(d => "What it is: " + d.WhatItIs).Concat(devices.Select(d => DeviceWording.Glasses(d.Kind, d.ReadingAdd, CultureInfo.InvariantCulture)).OfType<string>().Select(g => "Glasses: " + g));
        foreach (var sentence in paragraphs.SelectMany(p => System.Text.RegularExpressions.Regex.Split(p, @"(?<=[.!?])\s+")))
            Assert.True(text.OnOnePage(sentence), $"{name}: sentence split across pages: {sentence}");
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void No_page_ends_on_a_heading_and_the_last_page_is_not_nearly_empty(string name)
    {
        var client = SampleClients.Named(name);
        var (_, text) = Render(client);
        string[] headings = ["Stay safe", "Light", "Practice", "Looking after it", "If it stops helping", "Distances to keep", "How to use it", "Check your print size"];

        foreach (var page in text.PageWords.SkipLast(1))
            Assert.False(headings.Any(h => page.EndsWith(h, StringComparison.Ordinal)), $"{name}: a page ends on a heading: …{page[^Math.Min(80, page.Length)..]}");
        // At 48 pt (a client who needs more than paper holds) a page holds about nine lines and the contact block
        // alone is taller than that; the clinician is told to offer other forms, so the fill is not checked there.
        if (text.PageCount > 1 && HandoutPrint.Fit(client.Handout, CultureInfo.InvariantCulture).FitsOnPaper)
            Assert.True(text.LastPageUsed >= 0.25, $"{name}: the last page's text reaches only {text.LastPageUsed:P0} down the page");
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void The_line_at_the_target_size_is_on_the_page_of_its_heading_and_explanation(string name)
    {
        var client = SampleClients.Named(name);
        var (_, text) = Render(client);
        if (HandoutPrint.Fit(client.Handout, CultureInfo.InvariantCulture).ShortText)
            return; // the short version has no check line

        var page = Assert.Single(text.PageWords, p => p.Contains("Check your print size", StringComparison.Ordinal));
        Assert.Contains(PdfText.Normalise(HandoutWording.TargetSizeLine), page, StringComparison.Ordinal);
        Assert.Contains("If it gets harder to read, call the clinic.", page, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void Never_points_above_or_below_on_the_page(string name)
    {
        var (_, text) = Render(SampleClients.Named(name));

        Assert.DoesNotContain("below", text.Words, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("shown above", text.Words, StringComparison.OrdinalIgnoreCase);
    }

    [Theory]
    [InlineData("Ada", 4)]
    [InlineData("Dai", 6)]
    public void One_or_two_devices_at_the_clinics_18_pt_fit_in_a_few_pages(string name, int most)
    {
        // At 18 pt (Ada: one device; Dai at 18 pt instead of his 21 pt: two devices) on A4 or Letter.
        var handout = SampleClients.Named(name).Handout with { Reader = null };
        var result = Renderer.Render(handout);

        Assert.True(result.PageCount <= most, $"{name}: {result.PageCount} pages");
    }

    [Fact]
    public void The_window_shows_words_with_their_spaces_at_the_plans_count()
    {
        // Dai's hand magnifier: 22 characters of 1M in a 35.4 mm field (k = 1.1, methods.md §4.2).
        var client = SampleClients.Named("Dai");
        var (_, text) = Render(client);
        double size = ClientHandoutRenderer.PointsFor(Optics.Quantities.PrintSize.FromM(1.0));

        var window = text.Letters.Where(l => Math.Abs(l.PointSize - size) < 0.01).GroupBy(l => Math.Round(l.StartBaseLine.Y, 1)).First().OrderBy(l => l.StartBaseLine.X).ToList();
        double pitch = 1.1 * MillimetresPerM / MillimetresPerPoint;
        var placed = new char[22];
        Array.Fill(placed, ' ');
        foreach (var letter in window)
            placed[(int)Math.Round((letter.StartBaseLine.X - window[0].StartBaseLine.X) / pitch)] = letter.Value[0];
        var shown = new string(placed).TrimEnd();

        Assert.Equal(HandoutWording.ViewPhrase[..22].TrimEnd(), shown);
        Assert.Contains(" ", shown, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Clients))]
    public void Is_tagged_for_screen_readers_with_language_title_headings_lists_and_a_described_figure(string name)
    {
        var client = SampleClients.Named(name);
        var tags = PdfTags.Read(Renderer.Render(client.Handout).Content);

        Assert.True(tags.Marked);
        Assert.Equal("en", tags.Language);
        Assert.True(tags.DisplaysTitle);
        Assert.Equal("Your magnifier plan, client " + client.Handout.ClientCode, tags.Title);
        Assert.Equal("H1", tags.Elements.First(e => e.Type.StartsWith('H')).Type);
        Assert.Contains("H2", tags.Types);
        Assert.Contains("P", tags.Types);
        Assert.Contains("L", tags.Types);
        Assert.Contains("LI", tags.Types);
        Assert.Contains("LBody", tags.Types);
        if (!HandoutPrint.Fit(client.Handout, CultureInfo.InvariantCulture).ShortText
            && client.Handout.Devices.Any(d => d.View is not null && !d.TrialDeclined && d.View.LettersInView < HandoutWording.WholeLine))
            Assert.Contains(tags.Elements, e => e.Type == "Figure" && e.Alt is { Length: > 0 } alt && alt.StartsWith("Through it you see", StringComparison.Ordinal));
    }

    [Fact]
    public void The_tags_follow_the_reading_order_of_the_page()
    {
        var tags = PdfTags.Read(Renderer.Render(SampleClients.Named("Dai").Handout).Content);
        var headings = tags.Elements.Where(e => e.Type is "H1" or "H2").ToList();

        Assert.Equal("H1", headings[0].Type);
        // Title, two devices, then Stay safe, Light, Practice, Looking after it, If it stops helping, the check line, contact.
        Assert.Equal(1 + 2 + 7, headings.Count);
    }
}
