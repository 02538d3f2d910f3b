using LowVisionAid.Optics.Quantities;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Reports.Handouts;
using LowVisionAid.Reports.Summaries;
using LowVisionAid.Reports.Tests.Support;

namespace LowVisionAid.Reports.Tests;

/// <summary>Renders each PDF's first page to PNG in test-artifacts/reports/ for a visual check.</summary>
public class ReportPreviewTests
{
    [NeedsPdftoppmFact]
    public void The_handout_first_page_renders_to_a_png()
    {
        var result = new ClientHandoutRenderer(CultureInfo.InvariantCulture).Render(SampleModels.Handout());

        var png = Artifacts.RenderFirstPage(Artifacts.Write("handout-a4-18pt.pdf", result.Content));

        AssertIsPng(png);
    }

    [NeedsPdftoppmFact]
    public void The_24_pt_letter_handout_first_page_renders_to_a_png()
    {
        var result = new ClientHandoutRenderer(CultureInfo.InvariantCulture).Render(SampleModels.Handout(24, PaperSize.Letter));

        var png = Artifacts.RenderFirstPage(Artifacts.Write("handout-letter-24pt.pdf", result.Content));

        AssertIsPng(png);
    }

    [NeedsPdftoppmFact]
    public void The_clinician_summary_first_page_renders_to_a_png()
    {
        var result = new ClinicianSummaryRenderer(CultureInfo.InvariantCulture).Render(SampleModels.Summary());

        var png = Artifacts.RenderFirstPage(Artifacts.Write("summary-a4.pdf", result.Content));

        AssertIsPng(png);
    }

    [Fact]
    public void The_three_figures_are_written_as_svg_files_and_one_html_page_with_their_tables()
    {
        var figures = new TradeOffFigures(CultureInfo.InvariantCulture);
        FigureOption[] options =
        [
            new("Hand magnifier, +12 D", Power.FromDioptres(12), Distance.FromCentimetres(8.3), Distance.FromMillimetres(55), 34),
            new("Stand magnifier, +20 D", Power.FromDioptres(20), Distance.FromCentimetres(3.3), Distance.FromMillimetres(30), 19),
            new("Near telescope 3× with +4 D cap", Power.FromDioptres(12), Distance.FromCentimetres(25), Distance.FromMillimetres(5), 3),
        ];
        TradeOffFigure[] all =
        [
            figures.PowerAgainstDistanceAndField(options, "power"),
            figures.LettersInView(options, PrintSize.FromM(1), "window"),
            figures.PrintSizeLadder(new PrintLadderData(PrintSize.FromM(4), PrintSize.FromM(1), AcuityReserve.Fluent, Distance.FromCentimetres(40)), "ladder"),
        ];

        var page = new System.Text.StringBuilder("<!doctype html><html lang=\"en\"><meta charset=\"utf-8\"><title>Figures</title><body>");
        foreach (var figure in all)
        {
            File.WriteAllText(Path.Combine(Artifacts.Directory, figure.Id + ".svg"), figure.Svg);
            page.Append("<figure>").Append(figure.Svg).Append("<table><caption>").Append(System.Net.WebUtility.HtmlEncode(figure.Table.Caption)).Append("</caption><tr>");
            foreach (var column in figure.Table.Columns)
                page.Append("<th>").Append(System.Net.WebUtility.HtmlEncode(column)).Append("</th>");
            foreach (var row in figure.Table.Rows)
                page.Append("<tr>").AppendJoin(string.Empty, row.Select(c => "<td>" + System.Net.WebUtility.HtmlEncode(c) + "</td>")).Append("</tr>");
            page.Append("</table></figure>");
        }

        var html = Path.Combine(Artifacts.Directory, "figures.html");
        File.WriteAllText(html, page.Append("</body></html>").ToString());

        Assert.All(all, f => Assert.True(File.Exists(Path.Combine(Artifacts.Directory, f.Id + ".svg"))));
        Assert.Equal(3, System.Text.RegularExpressions.Regex.Count(File.ReadAllText(html), "<svg "));
    }

    private static void AssertIsPng(string path)
    {
        var bytes = File.ReadAllBytes(path);
        Assert.True(bytes.Length > 1000, $"{path} is only {bytes.Length} bytes.");
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);
    }
}
