using System.Net;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Site;

/// <summary>The pages link a small icon of their own and it is served, so no browser asks for a missing /favicon.ico.</summary>
public sealed class FaviconTests
{
    [Fact]
    public async Task The_layout_links_the_icon_and_the_icon_is_served_as_svg()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var home = await browser.GetStringAsync(new Uri("/", UriKind.Relative));
        Assert.Contains("<link rel=\"icon\" href=\"/favicon.svg\" type=\"image/svg+xml\" />", home, StringComparison.Ordinal);

        using var icon = await browser.GetAsync(new Uri("/favicon.svg", UriKind.Relative));
        Assert.Equal(HttpStatusCode.OK, icon.StatusCode);
        Assert.Equal("image/svg+xml", icon.Content.Headers.ContentType?.MediaType);
        var svg = await icon.Content.ReadAsStringAsync();
        Assert.StartsWith("<svg xmlns=\"http://www.w3.org/2000/svg\"", svg, StringComparison.Ordinal);
        Assert.Contains("viewBox=\"0 0 32 32\"", svg, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("/Plans/1/Print?for=client")]
    [InlineData("/Plans/1/Print?for=clinician")]
    public async Task The_print_views_without_the_layout_link_the_icon_too(string path)
    {
        using var app = new ClinicApp(loadDemo: true);
        using var browser = app.Browser();

        var page = await browser.GetStringAsync(new Uri(path, UriKind.Relative));

        Assert.Contains("<link rel=\"icon\" href=\"/favicon.svg\" type=\"image/svg+xml\" />", page, StringComparison.Ordinal);
    }
}
