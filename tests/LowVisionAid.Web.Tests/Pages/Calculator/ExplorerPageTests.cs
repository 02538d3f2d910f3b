using System.Net;
using System.Text.Json;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Calculator;

/// <summary>
/// The teaching explorer. Check values derived from the cited formulas: a +10 D hand magnifier with the page at its
/// focal point works at 1/F = 10 cm (methods.md §3.1); its 50 mm aperture at 25 cm from the spectacle plane
/// (+1.5 cm to the entrance pupil) gives a field 0.05/(0.265 × 10) = 18.9 mm (§4.1), holding
/// 18.87/(1.1 × 1.4544) = 11.8 letters of 1M print (§4.2, k = 1.1 from memory).
/// </summary>
public sealed class ExplorerPageTests
{
    [Fact]
    public async Task Submitting_the_form_without_script_shows_the_engines_figures()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var html = await browser.GetStringAsync(new Uri("/Calculator/Explorer?Power=10&EyeToLens=25", UriKind.Relative));

        Assert.Contains("<dd id=\"explorer-distance\">10 cm</dd>", html, StringComparison.Ordinal);
        Assert.Contains("<dd id=\"explorer-field\">19 mm</dd>", html, StringComparison.Ordinal);
        Assert.Contains("<dd id=\"explorer-letters\">12</dd>", html, StringComparison.Ordinal);
        Assert.Contains("/js/explorer.js", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_figures_endpoint_gives_the_same_figures_as_json()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var json = await browser.GetStringAsync(new Uri("/Calculator/Explorer?handler=Figures&Power=20&EyeToLens=25", UriKind.Relative));

        // +20 D: 1/F = 5 cm; field 0.05/(0.265 × 20) = 9.4 mm; 9.43/(1.1 × 1.4544) = 5.9 letters (derived, as above).
        using var doc = JsonDocument.Parse(json);
        Assert.Equal("5 cm", doc.RootElement.GetProperty("workingDistance").GetString());
        Assert.Equal("9 mm", doc.RootElement.GetProperty("field").GetString());
        Assert.Equal("6", doc.RootElement.GetProperty("letters").GetString());
    }

    [Fact]
    public async Task A_power_out_of_range_says_what_to_enter()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri("/Calculator/Explorer?handler=Figures&Power=0&EyeToLens=25", UriKind.Relative));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Contains("between 1 and 80 D", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }
}
