using System.Net;
using LowVisionAid.Reports.Fonts;
using LowVisionAid.Web.Tests.Support;

namespace LowVisionAid.Web.Tests.Pages.Plans;

/// <summary>The handout face served to the browser from the Reports assembly: the repository's one copy of the fonts.</summary>
public sealed class HandoutFontTests
{
    [Theory]
    [InlineData("AtkinsonHyperlegible-Regular.ttf")]
    [InlineData("AtkinsonHyperlegible-Bold.ttf")]
    [InlineData("AtkinsonHyperlegible-Italic.ttf")]
    [InlineData("AtkinsonHyperlegible-BoldItalic.ttf")]
    public async Task Each_face_is_served_byte_for_byte_as_the_file_the_pdfs_embed(string file)
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri("/fonts/" + file, UriKind.Relative));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("font/ttf", response.Content.Headers.ContentType?.MediaType);
        var served = await response.Content.ReadAsByteArrayAsync();
        Assert.Equal(await File.ReadAllBytesAsync(Path.Combine(RepositoryRoot(), "src", "LowVisionAid.Reports", "Fonts", file)), served);
        // A TrueType file starts with the version 1.0 tag 00 01 00 00.
        Assert.Equal(new byte[] { 0, 1, 0, 0 }, served[..4]);
    }

    [Fact]
    public async Task The_licence_is_served_beside_the_fonts()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var text = await browser.GetStringAsync(new Uri("/fonts/OFL.txt", UriKind.Relative));

        Assert.Contains("SIL OPEN FONT LICENSE Version 1.1", text, StringComparison.OrdinalIgnoreCase);
        Assert.Equal(HyperlegibleFont.LicenceText, text);
    }

    [Fact]
    public async Task An_unknown_font_file_is_not_found_and_the_web_project_keeps_no_copy_of_the_fonts()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri("/fonts/..%2Fappsettings.json", UriKind.Relative));

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
        var webFonts = Path.Combine(RepositoryRoot(), "src", "LowVisionAid.Web", "wwwroot", "fonts");
        Assert.False(Directory.Exists(webFonts) && Directory.EnumerateFiles(webFonts, "*.ttf").Any(), "a second copy of the fonts in " + webFonts);
    }

    private static string RepositoryRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "LowVisionAid.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("The repository root (LowVisionAid.sln) was not found.");
    }
}
