using LowVisionAid.Optics.Options;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Summaries;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

public class ClinicianSummaryRendererTests
{
    private static readonly ClinicianSummaryRenderer Renderer = new(CultureInfo.InvariantCulture);

    private static PdfText Read(ClinicianSummary model)
    {
        var result = Renderer.Render(model);
        Assert.True(result.Success, result.Error);
        return PdfText.Read(result.Content);
    }

    [Fact]
    public void Prints_every_input_and_each_method_estimate_with_its_equivalent_viewing_distance()
    {
        var model = SampleModels.Summary();

        var text = Read(model);

        foreach (var input in model.Inputs)
        {
            Assert.True(text.Contains(input.Label), input.Label);
            Assert.True(text.Contains(input.Value), input.Value);
        }

        // EVD = 1/Feq (Bailey 2004 notes; methods.md §2): +10 D → 10.0 cm, +20 D → 5.0 cm (CV-06, CV-08).
        Assert.True(text.Contains("Kestenbaum +10.00 D 10.0 cm"), text.Words);
        Assert.True(text.Contains("+20.00 D 5.0 cm"), text.Words);
        Assert.True(text.ContainsInCell("Differs from another estimate by more than 0.2 log units."), text.Words);
        Assert.True(text.Contains("not available"), text.Words);
        Assert.True(text.Contains("No reading-speed curve was measured"), text.Words);
    }

    [Fact]
    public void A_figure_the_caller_gives_under_the_summarys_own_label_is_printed_once_in_the_callers_words()
    {
        var model = SampleModels.Summary();
        var option = model.ChosenOptions[0] with
        {
            OtherFigures = [new OptionFigure("Working distance", "8.3 cm"), new OptionFigure("Depth of focus", "1.2 cm")],
        };

        var figures = new SummaryText().Figures(option);

        Assert.Equal("8.3 cm", Assert.Single(figures, f => f.Label == "Working distance").Value);
        Assert.Single(figures, f => f.Label == "Depth of focus");
        Assert.Single(figures, f => f.Label == "Equivalent power");
    }

    [Fact]
    public void A_distance_telescope_s_field_is_labelled_at_the_viewing_distance_and_printed_once()
    {
        // Common practice: a distance telescope's field is measured at what is viewed, not on a page. The plan page's
        // figures carry it under the same label, so the summary prints it once.
        var model = SampleModels.Summary();
        var option = model.ChosenOptions[0] with
        {
            Family = OptionKind.DistanceTelescope,
            OtherFigures = [new OptionFigure("Field at the viewing distance", "35 cm")],
        };

        var figures = new SummaryText().Figures(option);

        Assert.Equal("35 cm", Assert.Single(figures, f => f.Label == "Field at the viewing distance").Value);
        Assert.DoesNotContain(figures, f => f.Label == "Field on the page");
        Assert.Contains(new SummaryText().Figures(model.ChosenOptions[0]), f => f.Label == "Field on the page");
    }

    [Fact]
    public void Prints_every_figure_and_reason_of_each_chosen_option()
    {
        var model = SampleModels.Summary();

        var text = Read(model);

        var option = model.ChosenOptions[0];
        Assert.True(text.Contains("Equivalent power +12.00 D"), text.Words);
        // 8.3 cm = 3.27 in (1 in = 2.54 cm exactly), printed to 0.1 in.
        Assert.True(text.Contains("Working distance 8.3 cm (3.3 in)"), text.Words);
        Assert.True(text.Contains("Field on the page 55 mm"), text.Words);
        Assert.True(text.Contains("Letters in view 34"), text.Words);
        foreach (var figure in option.OtherFigures)
            Assert.True(text.Contains(figure.Label + " " + figure.Value), figure.Label);
        foreach (var line in option.Reasons.Concat(option.Cautions))
            Assert.True(text.Contains(line), line);
    }

    [Fact]
    public void Prints_trials_outcomes_the_method_version_clinic_and_the_starting_point_note()
    {
        var model = SampleModels.Summary();

        var text = Read(model);

        Assert.True(text.Contains("2027-03-09"), text.Words);
        foreach (var trial in model.Trials)
        {
            Assert.True(text.ContainsInCell(trial.Device), trial.Device);
            Assert.True(text.ContainsInCell(trial.Result), trial.Result);
            Assert.True(text.Contains(trial.Outcome), trial.Outcome);
        }

        Assert.True(text.Contains("Method version methods 2027.1"), text.Words);
        Assert.True(text.Contains("01632 960 418"), text.Words);
        Assert.True(text.Contains("Morwenna Tredinnick (HX-0042)"), text.Words);
        Assert.True(text.Contains(ClinicianSummaryRenderer.StartingPointNote), text.Words);
    }

    [Fact]
    public void Prints_the_trade_off_tables_it_is_given()
    {
        var figures = new TradeOffFigures(CultureInfo.InvariantCulture);
        var ladder = figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(4), PrintSize.FromM(1), AcuityReserve.Fluent, Distance.FromCentimetres(40)));

        var text = Read(SampleModels.Summary() with { FigureTables = [ladder.Table] });

        Assert.True(text.Contains(ladder.Table.Caption), text.Words);
        foreach (var cell in ladder.Table.Rows.SelectMany(r => r).Where(c => c.Length > 0))
            Assert.True(text.ContainsInCell(cell), cell);
    }

    [Fact]
    public void Is_set_in_normal_print_in_the_embedded_hyperlegible_face()
    {
        var text = Read(SampleModels.Summary());

        Assert.All(text.Letters, l => Assert.Matches(@"^[A-Z]{6}\+Atkinson Hyperlegible( Regular|,Bold)$", l.FontName));
        var bodyLetters = text.Letters.Count(l => Math.Abs(l.PointSize - ClinicianSummaryRenderer.BodyPoints) < 0.01);
        Assert.True(bodyLetters > text.Letters.Count / 2, $"{bodyLetters} of {text.Letters.Count} letters at {ClinicianSummaryRenderer.BodyPoints} pt");
        Assert.All(text.Letters, l => Assert.InRange(l.PointSize, 10, 18));
    }

    [Fact]
    public void Page_count_stays_within_bounds_even_with_many_options()
    {
        var model = SampleModels.Summary();
        var many = Enumerable.Range(1, 6).Select(i => model.ChosenOptions[0] with { Name = "Option " + i.ToString(CultureInfo.InvariantCulture) }).ToList();

        var one = Renderer.Render(model);
        var six = Renderer.Render(model with { ChosenOptions = many });

        Assert.InRange(one.PageCount, 1, 3);
        Assert.InRange(six.PageCount, 2, 8);
        Assert.Equal(six.PageCount, PdfText.Read(six.Content).PageCount);
        Assert.True(PdfText.Read(six.Content).Contains("Option 6"));
    }

    [Fact]
    public void Regenerating_the_same_record_gives_identical_text()
    {
        var model = SampleModels.Summary();

        Assert.Equal(Read(model).Words, Read(model with { Trials = [.. model.Trials] }).Words);
    }

    [Fact]
    public void No_chosen_option_or_no_method_version_gives_a_message_and_no_document()
    {
        var none = Renderer.Render(SampleModels.Summary(chosen: []));
        var noVersion = Renderer.Render(SampleModels.Summary() with { MethodVersion = "" });

        Assert.Equal(ReportMessages.NoChosenOption, none.Error);
        Assert.True(none.Content.IsEmpty);
        Assert.Equal(ReportMessages.NoMethodVersion, noVersion.Error);
        Assert.True(noVersion.Content.IsEmpty);
    }

    // An invented record with every part the summary can hold (inputs only; the checks below are cited or derived).
    private static ClinicianSummary Full() => SampleModels.Summary() with
    {
        Inputs = [new SummaryInput("Target print", "1.0M (newsprint)"), new SummaryInput("Task", "Reading medicine labels")],
        Eyes =
        [
            new EyeAcuity("Right eye", "6/60", Acuity.FromSnellen(6, 60)),
            new EyeAcuity("Left eye", "CF at 1 m", null),
        ],
        Near = new NearAcuityRecord("3.2M at 25 cm", PrintSize.FromM(3.2), Distance.FromCentimetres(25)),
        ReadingCurve = new ReadingCurveRecord(
            Distance.FromCentimetres(25),
            [
                new(PrintSize.FromM(8), 118), new(PrintSize.FromM(6.3), 121), new(PrintSize.FromM(5), 119),
                new(PrintSize.FromM(4), 112), new(PrintSize.FromM(3.2), 84), new(PrintSize.FromM(2.5), 41),
            ],
            PrintSize.FromM(4),
            120),
        Estimates =
        [
            new MethodEstimate("Kestenbaum", Power.FromDioptres(10), "Distance acuity 6/60"),
            new MethodEstimate("Near threshold with reserve", Power.FromDioptres(25.6), "3.2M at 25 cm, target 1.0M", Reserve: AcuityReserve.Fluent),
            new MethodEstimate("Critical print size", Power.FromDioptres(16), "Critical print size 4.0M at 25 cm, target 1.0M"),
        ],
        ChosenOptions =
        [
            SampleModels.Summary().ChosenOptions[0] with
            {
                Task = "Reading medicine labels",
                WeighedReasons = [new OptionReason("Gives the power needed with the 2:1 reserve.", true), new OptionReason("Short working distance of 8 cm.", false)],
            },
        ],
    };

    [Fact]
    public void Prints_each_eyes_acuity_as_typed_and_as_read_and_the_near_acuity()
    {
        var text = Read(Full());

        // 6/60: logMAR = log10(60/6) = 1.00 (methods.md §1.1, derived).
        Assert.True(text.Contains("Right eye (distance) 6/60 logMAR 1.00"), text.Words);
        Assert.True(text.Contains("Left eye (distance) CF at 1 m not a chart acuity"), text.Words);
        // 3.2M at 25 cm: logMAR = log10(3.2/0.25) = 1.11 (Colenbrander; methods.md §1.2, derived).
        Assert.True(text.ContainsInCell("3.2M at 25 cm 3.2M at 25.0 cm (9.8 in), logMAR 1.11"), text.Words);
    }

    [Fact]
    public void Prints_the_reading_curve_results_points_and_a_described_plot()
    {
        var model = Full();
        var result = Renderer.Render(model);
        var text = PdfText.Read(result.Content);
        var tags = PdfTags.Read(result.Content);

        // 4.0M at 25 cm: logMAR = log10(4/0.25) = 1.20 (methods.md §1.2, derived).
        Assert.True(text.ContainsInCell("Critical print size 4.0M at 25.0 cm (9.8 in) (logMAR 1.20); maximum reading speed 120 words a minute."), text.Words);
        Assert.True(text.Contains("8.0M 1.51 118"), text.Words); // log10(8/0.25) = 1.505
        Assert.Contains(tags.Elements, e => e.Type == "Figure" && e.Alt is { } alt && alt.Contains("maximum reading speed 120", StringComparison.Ordinal));
    }

    [Fact]
    public void Prints_each_estimate_with_its_reserve_and_the_reasons_labelled_for_or_against()
    {
        var text = Read(Full());

        Assert.True(text.Contains("+25.60 D 3.9 cm 2:1"), text.Words); // EVD = 1/25.6 D = 3.9 cm
        Assert.True(text.Contains("Kestenbaum +10.00 D 10.0 cm none"), text.Words);
        Assert.True(text.Contains("For: Gives the power needed with the 2:1 reserve."), text.Words);
        Assert.True(text.Contains("Against: Short working distance of 8 cm."), text.Words);
        Assert.True(text.Contains("Hand magnifier with a light, +12 D (for Reading medicine labels)"), text.Words);
    }

    [Fact]
    public void Is_tagged_with_language_title_headings_and_tables_with_header_cells()
    {
        var tags = PdfTags.Read(Renderer.Render(Full()).Content);

        Assert.True(tags.Marked);
        Assert.Equal("en", tags.Language);
        Assert.True(tags.DisplaysTitle);
        Assert.Equal("Clinician summary, client HX-0042", tags.Title);
        Assert.Equal("H1", tags.Elements.First(e => e.Type.StartsWith('H')).Type);
        foreach (var type in new[] { "H2", "Table", "TR", "TH", "TD", "L", "LI" })
            Assert.Contains(type, tags.Types);
    }

    [Fact]
    public void The_last_page_is_never_a_page_of_a_few_lines()
    {
        var model = Full();
        foreach (var options in new[] { 1, 2, 3, 4 })
        {
            var many = Enumerable.Range(1, options).Select(i => model.ChosenOptions[0] with { Name = "Option " + i.ToString(CultureInfo.InvariantCulture) }).ToList();
            var result = Renderer.Render(model with { ChosenOptions = many });
            Preview.Write("summary-" + options.ToString(CultureInfo.InvariantCulture), result.Content);
            var text = PdfText.Read(result.Content);
            if (text.PageCount > 1)
                Assert.True(text.LastPageUsed >= 0.2, $"{options} options: the last page's text reaches only {text.LastPageUsed:P0} down the page");
        }
    }
}
