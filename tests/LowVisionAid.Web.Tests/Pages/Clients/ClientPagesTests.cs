using System.Net;
using LowVisionAid.Web.Pages.Clients;
using LowVisionAid.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;

namespace LowVisionAid.Web.Tests.Pages.Clients;

public class ClientPagesTests
{
    [Fact]
    public async Task A_new_client_is_saved_and_the_browser_is_sent_to_their_page()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Clients/New", new Dictionary<string, string>
        {
            ["Input.Code"] = "T-0001",
            ["Input.Name"] = "",
            ["Input.YearOfBirth"] = "1950",
            ["Input.Notes"] = "Wants to read recipes.",
        });

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var saved = await app.WithDbAsync(db => db.Clients.SingleAsync(c => c.Code == "T-0001"));
        Assert.Equal($"/Clients/{saved.Id}", response.Headers.Location?.OriginalString);
        Assert.Null(saved.Name);
        Assert.Equal(1950, saved.YearOfBirth);
        var page = await browser.GetStringAsync(new Uri($"/Clients/{saved.Id}", UriKind.Relative));
        Assert.Contains("Client T-0001", page, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_form_with_errors_saves_nothing_keeps_the_typing_and_links_the_summary_to_the_field()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.SubmitAsync("/Clients/New", new Dictionary<string, string>
        {
            ["Input.Code"] = "",
            ["Input.Name"] = "Typed name",
            ["Input.YearOfBirth"] = "19x8",
        });

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var html = await response.Content.ReadAsStringAsync();
        Assert.Contains("role=\"alert\"", html, StringComparison.Ordinal);
        Assert.Contains("<a href=\"#Input_Code\">", html, StringComparison.Ordinal);
        Assert.Contains("aria-describedby=\"Input_YearOfBirth-hint Input_YearOfBirth-error\"", html, StringComparison.Ordinal);
        Assert.Contains("value=\"Typed name\"", html, StringComparison.Ordinal);
        Assert.Contains("value=\"19x8\"", html, StringComparison.Ordinal);
        Assert.Equal(0, await app.WithDbAsync(db => db.Clients.CountAsync()));
    }

    [Fact]
    public async Task A_code_already_in_use_is_refused_beside_the_code_field()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        var fields = new Dictionary<string, string> { ["Input.Code"] = "T-0002" };
        await browser.SubmitAsync("/Clients/New", fields);

        var second = await browser.SubmitAsync("/Clients/New", new Dictionary<string, string> { ["Input.Code"] = "t-0002" });

        var html = await second.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, second.StatusCode);
        Assert.Contains(WebUtility.HtmlEncode(NewClientHandler.CodeTaken), html, StringComparison.Ordinal);
        Assert.Equal(1, await app.WithDbAsync(db => db.Clients.CountAsync()));
    }

    [Fact]
    public async Task Posting_without_the_antiforgery_token_is_refused()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        using var content = new FormUrlEncodedContent(new Dictionary<string, string> { ["Input.Code"] = "T-0003" });

        var response = await browser.PostAsync(new Uri("/Clients/New", UriKind.Relative), content);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal(0, await app.WithDbAsync(db => db.Clients.CountAsync()));
    }

    [Fact]
    public async Task Search_finds_clients_by_part_of_the_code_or_the_name()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();
        await browser.SubmitAsync("/Clients/New", new Dictionary<string, string> { ["Input.Code"] = "RIV-17", ["Input.Name"] = "Alma Test" });
        await browser.SubmitAsync("/Clients/New", new Dictionary<string, string> { ["Input.Code"] = "OAK-03" });

        var byCode = await browser.GetStringAsync(new Uri("/Clients?q=riv", UriKind.Relative));
        var byName = await browser.GetStringAsync(new Uri("/Clients?q=alma", UriKind.Relative));
        var wildcard = await browser.GetStringAsync(new Uri("/Clients?q=%25", UriKind.Relative));

        Assert.Contains("RIV-17", byCode, StringComparison.Ordinal);
        Assert.DoesNotContain("OAK-03", byCode, StringComparison.Ordinal);
        Assert.Contains("RIV-17", byName, StringComparison.Ordinal);
        Assert.Contains("No client matches that search.", wildcard, StringComparison.Ordinal);
    }

    [Fact]
    public async Task An_unknown_client_id_is_not_found()
    {
        using var app = new ClinicApp();
        using var browser = app.Browser();

        var response = await browser.GetAsync(new Uri("/Clients/4242", UriKind.Relative));

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
    }
}
