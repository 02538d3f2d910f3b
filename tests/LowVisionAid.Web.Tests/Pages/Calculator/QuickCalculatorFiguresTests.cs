using System.Net;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using LowVisionAid.Reports.Figures;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Calculator;

/// <summary>
/// The quick calculator's trade-off figures. The plan: 4M read at 40 cm, target 1M, fluent reserve 2:1, so the
/// near method asks for an equivalent viewing distance of 5 cm, +20 D (CV-08, derived, exact). A +20 D hand
/// magnifier's 50 mm lens (the planner's stated default aperture) 25 cm from the spectacle plane, +1.5 cm to the
/// entrance pupil, gives a field 0.05/(0.265 × 20) = 9.43 mm (methods.md §4.1, derived, ±1 %), which holds
/// 9.43/(1.1 × 1.4544) = 5.9 letters of 1M: 5 whole letters (§4.2, k = 1.1 from memory).
/// </summary>
public sealed partial class QuickCalculatorFiguresTests
{
    private static readonly Dictionary<string, string> Bailey = new()
    {
        ["Input.Task"] = "SustainedReading",
        ["Input.Reserve"] = "Fluent",
        ["Input.NearAcuity"] = "4M at 40 cm",
        ["Input.TargetPrint"] = "1M",
        ["Input.WorkingDistance"] = "25 cm",
    };

    [Fact]
    public async Task A_calculated_plan_shows_the_three_trade_off_figures_each_with_its_table()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Calculator", Bailey);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var html = await response.Content.ReadAsStringAsync();
        Assert.Equal(3, SvgFigure().Count(html));
        Assert.Equal(3, Regex.Count(html, "<table class=\"trade-off-table[ \"]"));
        Assert.Contains("id=\"calculator-power\"", html, StringComparison.Ordinal);
        Assert.Contains("id=\"calculator-window\"", html, StringComparison.Ordinal);
        Assert.Contains("id=\"calculator-ladder\"", html, StringComparison.Ordinal);
        Assert.Contains("href=\"/Calculator/Explorer\"", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_window_figure_holds_the_letters_the_engine_counted_for_each_option()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var html = WebUtility.HtmlDecode(await (await browser.SubmitAsync("/Calculator", Bailey)).Content.ReadAsStringAsync());

        var svg = XElement.Parse(WindowFigure().Match(html).Value);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var windows = svg.Elements(ns + "g").Where(g => g.Attribute("data-option") is not null).ToList();
        Assert.NotEmpty(windows);
        foreach (var window in windows)
        {
            var label = window.Elements(ns + "text").First().Value;   // e.g. "4. Hand magnifier: 5 letters"
            var drawn = window.Descendants(ns + "text").Count(t => (string?)t.Attribute("class") == TradeOffFigures.LetterClass);
            var name = label[(label.IndexOf(". ", StringComparison.Ordinal) + 2)..label.LastIndexOf(':')];
            // The option's own "Letters in view" on the page: the engine's count in whole letters.
            var shown = OptionLetters(html, name);
            Assert.Equal(shown, drawn);
        }

        var hand = windows.Single(w => w.Elements(ns + "text").First().Value.Contains("Hand magnifier", StringComparison.Ordinal));
        Assert.Equal(5, hand.Descendants(ns + "text").Count(t => (string?)t.Attribute("class") == TradeOffFigures.LetterClass));
    }

    [Fact]
    public async Task The_calculator_links_to_the_explorer_before_any_plan()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var html = await browser.GetStringAsync(new Uri("/Calculator", UriKind.Relative));

        Assert.Contains("<a href=\"/Calculator/Explorer\">magnifier explorer</a>", html, StringComparison.Ordinal);
        Assert.Equal(0, SvgFigure().Count(html));
    }

    private static int OptionLetters(string html, string name)
    {
        var at = html.IndexOf(". " + name + "</h4>", StringComparison.Ordinal);
        Assert.True(at >= 0, "no option card for " + name);
        var letters = LettersInView().Match(html, at);
        Assert.True(letters.Success, "no letters in view for " + name);
        return int.Parse(letters.Groups[1].Value, CultureInfo.InvariantCulture);
    }

    [GeneratedRegex("<svg[^>]*role=\"img\"")]
    private static partial Regex SvgFigure();

    [GeneratedRegex("<svg[^>]*id=\"calculator-window\".*?</svg>", RegexOptions.Singleline)]
    private static partial Regex WindowFigure();

    [GeneratedRegex("<dt>Letters in view</dt><dd>([0-9]+)</dd>")]
    private static partial Regex LettersInView();
}
