using System.Xml.Linq;
using CsCheck;
using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Fonts;

namespace LowVisionAid.Reports.Tests;

public class TradeOffFiguresTests
{
    private static readonly XNamespace S = "http://www.w3.org/2000/svg";
    private static readonly TradeOffFigures Figures = new(CultureInfo.InvariantCulture);

    // Engine outputs for an invented plan; the figures must draw exactly these values.
    private static readonly FigureOption[] Options =
    [
        new("Hand magnifier, +12 D", Power.FromDioptres(12), Distance.FromCentimetres(8.3), Distance.FromMillimetres(55), 34),
        new("Stand magnifier, +20 D", Power.FromDioptres(20), Distance.FromCentimetres(3.3), Distance.FromMillimetres(30), 19),
        new("Spectacle add, +10 D", Power.FromDioptres(10), Distance.FromCentimetres(10), Distance.FromMillimetres(120), 75),
        new("Near telescope 3× with +4 D cap", Power.FromDioptres(12), Distance.FromCentimetres(25), Distance.FromMillimetres(5), 3),
    ];

    private static readonly PrintSize Target = PrintSize.FromM(1.0);

    private static IEnumerable<TradeOffFigure> AllFigures() =>
    [
        Figures.PowerAgainstDistanceAndField(Options),
        Figures.LettersInView(Options, Target),
        Figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(4), Target, AcuityReserve.Fluent, Distance.FromCentimetres(40))),
    ];

    private static int LettersDrawn(XElement svg, int option) => svg.Descendants(S + "g")
        .Single(g => (string?)g.Attribute("data-option") == option.ToString(CultureInfo.InvariantCulture))
        .Descendants(S + "text").Count(t => (string?)t.Attribute("class") == TradeOffFigures.LetterClass);

    [Fact]
    public void Each_window_draws_exactly_the_engine_letter_count()
    {
        var svg = XElement.Parse(Figures.LettersInView(Options, Target).Svg);

        for (int i = 0; i < Options.Length; i++)
            Assert.Equal(Options[i].LettersInView, LettersDrawn(svg, i + 1));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public void Any_letter_count_from_the_engine_is_drawn_exactly()
    {
        var option = Gen.Select(Gen.Int[0, 400], Gen.Double[5, 300], Gen.Double[2, 60], (letters, fieldMm, power) =>
            new FigureOption("Option", Power.FromDioptres(power), Distance.FromCentimetres(100 / power), Distance.FromMillimetres(fieldMm), letters));

        Gen.Select(option.Array[1, 6], Gen.Double[0.4, 8]).Sample((options, targetM) =>
        {
            var svg = XElement.Parse(Figures.LettersInView(options, PrintSize.FromM(targetM)).Svg);
            for (int i = 0; i < options.Length; i++)
                Assert.Equal(options[i].LettersInView, LettersDrawn(svg, i + 1));
        }, iter: 200);
    }

    [Fact]
    public void The_windows_and_letters_share_one_scale()
    {
        // To scale: window width ÷ field and letter x-height ÷ target x-height (1M = 1.4544 mm, CV-03) give the same px per mm.
        var svg = XElement.Parse(Figures.LettersInView(Options, Target).Svg);

        var windows = svg.Descendants(S + "g").Where(g => g.Attribute("data-option") is not null)
            .Select(g => double.Parse((string)g.Element(S + "rect")!.Attribute("width")!, CultureInfo.InvariantCulture)).ToList();
        double scale = windows[0] / 55.0;
        for (int i = 0; i < Options.Length; i++)
            Assert.Equal(Options[i].Field.Millimetres * scale, windows[i], 0.02);
        var fontSize = svg.Descendants(S + "g").First(g => g.Attribute("font-size") is not null).Attribute("font-size")!;
        double xHeightPx = double.Parse((string)fontSize, CultureInfo.InvariantCulture) * HyperlegibleFont.XHeightRatio.Value;
        Assert.Equal(1.4544, xHeightPx / scale, 0.005);
    }

    [Fact]
    public void Every_figure_has_a_title_a_description_and_role_img_labelled_by_them()
    {
        foreach (var figure in AllFigures())
        {
            var svg = XElement.Parse(figure.Svg);
            Assert.Equal("img", (string?)svg.Attribute("role"));
            var title = svg.Element(S + "title");
            var desc = svg.Element(S + "desc");
            Assert.NotNull(title);
            Assert.NotNull(desc);
            Assert.Equal(figure.Title, title.Value);
            Assert.Equal(figure.Description, desc.Value);
            Assert.Equal($"{figure.Id}-title {figure.Id}-desc", (string?)svg.Attribute("aria-labelledby"));
            Assert.Equal(figure.Id + "-title", (string?)title.Attribute("id"));
            Assert.Equal(figure.Id + "-desc", (string?)desc.Attribute("id"));
        }
    }

    [Fact]
    public void Markup_in_option_names_is_escaped_and_the_svg_stays_well_formed()
    {
        var hostile = new FigureOption("<script>alert('x')</script> & \"lens\"", Power.FromDioptres(8), Distance.FromCentimetres(12.5), Distance.FromMillimetres(60), 5);

        foreach (var figure in new[] { Figures.PowerAgainstDistanceAndField([hostile]), Figures.LettersInView([hostile], Target) })
        {
            var doc = XDocument.Parse(figure.Svg);
            Assert.DoesNotContain(doc.Descendants(), e => e.Name.LocalName == "script");
            Assert.Contains("&lt;script&gt;", figure.Svg, StringComparison.Ordinal);
            Assert.Contains(hostile.Name, doc.Root!.Element(S + "desc")!.Value, StringComparison.Ordinal);
            Assert.StartsWith("1. " + hostile.Name, figure.Table.Rows[0][0], StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Every_text_has_at_least_7_to_1_contrast_with_the_background()
    {
        // WCAG 2.x relative luminance and contrast ratio (1.4.6 Contrast (Enhanced) asks for 7:1).
        foreach (var figure in AllFigures())
        {
            var svg = XElement.Parse(figure.Svg);
            var background = (string)svg.Element(S + "rect")!.Attribute("fill")!;
            foreach (var text in svg.Descendants(S + "text"))
                Assert.True(Contrast((string)text.Attribute("fill")!, background) >= 7, $"{figure.Id}: '{text.Value}'");
        }
    }

    [Fact]
    public void Options_are_told_apart_by_shape_and_number_not_colour()
    {
        var figure = Figures.PowerAgainstDistanceAndField(Options);
        var svg = XElement.Parse(figure.Svg);

        var markers = svg.Descendants(S + "path").Where(p => p.Attribute("data-option") is not null).ToList();
        Assert.Equal(2 * Options.Length, markers.Count); // one in each panel
        Assert.Single(markers.Select(m => (string?)m.Attribute("stroke")).Distinct());
        var shapes = Enumerable.Range(0, 10).Select(i => figure.Table.Rows.Count > i ? figure.Table.Rows[i][1] : null).Where(s => s is not null).ToList();
        Assert.Equal(shapes.Count, shapes.Distinct().Count());
        var labels = svg.Descendants(S + "text").Select(t => t.Value).ToList();
        for (int i = 1; i <= Options.Length; i++)
            Assert.Equal(2, labels.Count(l => l == i.ToString(CultureInfo.InvariantCulture)));
    }

    [Fact]
    public void The_power_table_matches_the_options_passed_in()
    {
        var table = Figures.PowerAgainstDistanceAndField(Options).Table;

        Assert.Equal(["Option", "Marker", "Equivalent power (D)", "Working distance (cm)", "Field (mm)", "Letters in view"], table.Columns);
        Assert.Equal(Options.Length, table.Rows.Count);
        Assert.Equal(["1. Hand magnifier, +12 D", "filled circle", "+12.00", "8.3", "55", "34"], table.Rows[0]);
        Assert.Equal(["4. Near telescope 3× with +4 D cap", "filled diamond", "+12.00", "25.0", "5", "3"], table.Rows[3]);
    }

    [Fact]
    public void The_window_table_matches_the_options_and_flags_fewer_than_4_letters()
    {
        // Fluent reading needs at least 4 characters in view (Whittaker and Lovie-Kitchin 1993; methods.md §4.3).
        var table = Figures.LettersInView(Options, Target).Table;

        Assert.Equal(Options.Select(o => o.LettersInView.ToString(CultureInfo.InvariantCulture)), table.Rows.Select(r => r[2]));
        Assert.Equal(Options.Select(o => o.Field.Millimetres.ToString("0", CultureInfo.InvariantCulture)), table.Rows.Select(r => r[1]));
        Assert.Equal("possible", table.Rows[0][3]);
        Assert.StartsWith("unlikely", table.Rows[3][3], StringComparison.Ordinal);
    }

    [Fact]
    public void The_ladder_shows_threshold_target_and_the_reserve_size_from_cv_08()
    {
        // CV-08 (methods.md §6, derived): 4M read at 40 cm, target 1M, reserve 2:1 → comfortable size 8M, i.e. the
        // target must look 8 times as large as at 40 cm (Feq 20 D = 8 × 2.5 D).
        var figure = Figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(4), Target, AcuityReserve.Fluent, Distance.FromCentimetres(40)));

        Assert.Equal(["Target print", "1.0M", "1.45"], figure.Table.Rows[0]);
        Assert.Equal(["Smallest print read at 40.0 cm", "4.0M", "5.82"], figure.Table.Rows[1]);
        Assert.Equal(["Comfortable size (reserve 2:1)", "8.0M", "11.64"], figure.Table.Rows[2]);
        Assert.Equal("8 times", figure.Table.Rows[3][1]);
        var labels = XElement.Parse(figure.Svg).Descendants(S + "text").Select(t => t.Value).ToList();
        Assert.Contains("Target print: 1.0M", labels);
        Assert.Contains("Smallest print read at 40.0 cm: 4.0M", labels);
        Assert.Contains(labels, l => l.StartsWith("Comfortable size: 8.0M", StringComparison.Ordinal));
    }

    [Fact]
    public void Ladder_marks_are_filled_with_three_different_patterns()
    {
        var svg = XElement.Parse(Figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(2), Target, AcuityReserve.Spot)).Svg);

        var fills = svg.Descendants(S + "rect").Select(r => (string?)r.Attribute("fill")).Where(f => f?.StartsWith("url(", StringComparison.Ordinal) == true).ToList();
        Assert.Equal(3, fills.Count);
        Assert.Equal(3, fills.Distinct().Count());
        var patterns = svg.Descendants(S + "pattern").Select(p => "url(#" + (string?)p.Attribute("id") + ")");
        Assert.All(fills, f => Assert.Contains(f, patterns));
    }

    [Fact]
    public void Ladder_rungs_carry_the_r10_preferred_numbers()
    {
        // ISO 3 R10 series, the 0.1 log-unit size steps of letter charts (ISO 8596; methods.md §1.5).
        var svg = XElement.Parse(Figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(4), Target, AcuityReserve.Fluent)).Svg);

        var rungs = svg.Descendants(S + "text").Where(t => (string?)t.Attribute("text-anchor") == "end").Select(t => t.Value).ToList();
        Assert.Equal(["12.5M", "10.0M", "8.0M", "6.3M", "5.0M", "4.0M", "3.15M", "2.5M", "2.0M", "1.6M", "1.25M", "1.0M", "0.8M"], rungs);
    }

    [Fact]
    public void Ladder_labels_stay_apart_when_the_reserve_is_1_to_1()
    {
        // With a 1:1 reserve the comfortable size equals the threshold, so their marks share a rung.
        var svg = XElement.Parse(Figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(2), Target, AcuityReserve.Spot)).Svg);

        var labelYs = svg.Descendants(S + "text").Where(t => t.Value.Contains(": ", StringComparison.Ordinal) && t.Attribute("text-anchor") is null)
            .Select(t => double.Parse((string)t.Attribute("y")!, CultureInfo.InvariantCulture)).Order().ToList();
        Assert.Equal(3, labelYs.Count);
        Assert.All(labelYs.Zip(labelYs.Skip(1)), pair => Assert.True(pair.Second - pair.First >= 22, $"{pair.First} and {pair.Second}"));
    }

    [Fact]
    public void A_bad_id_or_no_options_is_refused_with_a_message_saying_what_to_pass()
    {
        var noOptions = Assert.Throws<ArgumentException>(() => Figures.PowerAgainstDistanceAndField([]));
        Assert.Contains("at least one option", noOptions.Message, StringComparison.Ordinal);
        var badId = Assert.Throws<ArgumentException>(() => Figures.LettersInView(Options, Target, "1 bad\"id"));
        Assert.Contains("must start with a letter", badId.Message, StringComparison.Ordinal);
    }

    private static double Contrast(string foreground, string background)
    {
        double a = Luminance(foreground), b = Luminance(background);
        return (Math.Max(a, b) + 0.05) / (Math.Min(a, b) + 0.05);
    }

    private static double Luminance(string hex)
    {
        double Channel(int offset)
        {
            double c = Convert.ToInt32(hex.Substring(offset, 2), 16) / 255.0;
            return c <= 0.04045 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
        }

        return (0.2126 * Channel(1)) + (0.7152 * Channel(3)) + (0.0722 * Channel(5));
    }
}
