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

    private static void AssertIsPng(string path)
    {
        var bytes = File.ReadAllBytes(path);
        Assert.True(bytes.Length > 1000, $"{path} is only {bytes.Length} bytes.");
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47 }, bytes[..4]);
    }
}
