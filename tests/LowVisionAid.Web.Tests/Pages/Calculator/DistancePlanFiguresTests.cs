using System.Net;
using AngleSharp.Dom;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Calculator;

/// <summary>
/// The quick calculator's figures for a distance plan: 6/60 to 6/12 for television at 3 m. The magnification needed is
/// MAR 10′ ÷ 2′ = 5× (methods §3.5, derived); sitting nearer brings it to 60 cm, and a 6× Keplerian telescope set for far
/// would ask the eye for +13.53 D at 3 m (derived in the optics tests from L′ = M²L/(1 − dML)). A distance telescope's
/// field is at what is viewed, not on a page, and its focusing is turned on the telescope, not worn as an add (common
/// practice).
/// </summary>
public sealed class DistancePlanFiguresTests
{
    private static readonly Dictionary<string, string> Television = new()
    {
        ["Input.Task"] = "DistanceViewing",
        ["Input.DistanceAcuity"] = "6/60",
        ["Input.GoalDistanceAcuity"] = "6/12",
        ["Input.WorkingDistance"] = "3 m",
        ["Input.Age"] = "40",
    };

    [Fact]
    public async Task A_telescope_s_field_is_at_the_viewing_distance_its_focusing_its_own_and_no_option_counts_letters_on_a_page()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Calculator", Television);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var page = PageHtml.Parse(await response.Content.ReadAsStringAsync());
        var cards = page.QuerySelectorAll("ol.options > li").ToList();
        var telescope = Assert.Single(cards, c => Heading(c).EndsWith("Hand-held distance telescope", StringComparison.Ordinal));
        Assert.Contains("focus it for 3 m (+13.53 D from its far setting)", telescope.TextContent, StringComparison.Ordinal);
        Assert.Equal("+13.53 D", Figure(telescope, "Focusing from its far setting"));
        Assert.NotNull(Figure(telescope, "Field at the viewing distance"));
        var nearer = Assert.Single(cards, c => Heading(c).EndsWith("Moving closer", StringComparison.Ordinal));
        Assert.Contains("Sit at 60 cm instead of 3 m", nearer.TextContent, StringComparison.Ordinal);
        Assert.All(cards, c =>
        {
            var labels = c.QuerySelectorAll("dl.figures > dt").Select(dt => dt.TextContent).ToList();
            Assert.DoesNotContain("Field on the page", labels);
            Assert.DoesNotContain("Letters in view", labels);
        });
    }

    private static string Heading(IElement card) => card.QuerySelector("h4")?.TextContent.Trim() ?? "";

    private static string? Figure(IElement card, string label) =>
        card.QuerySelectorAll("dl.figures > dt").FirstOrDefault(dt => dt.TextContent == label)?.NextElementSibling?.TextContent;
}
