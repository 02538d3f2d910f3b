using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class ErrorPageTests(BrowserSession browser, AppServer app) : BrowserTest(browser, app)
{
    [Theory]
    [InlineData("no-such-page")]
    [InlineData("Calculator/nothing/here")]
    [InlineData("css/missing.css")]
    [InlineData("Clients/999999")]
    [InlineData("Plans/999999")]
    [InlineData("Visits/999999")]
    public async Task An_unknown_address_gives_the_friendly_not_found_page_with_status_404(string path)
    {
        // Act
        var response = await Page.GotoAsync(path);

        // Assert
        Assert.NotNull(response);
        Assert.Equal(404, response.Status);
        await Assertions.Expect(new SiteChrome(Page).Heading).ToHaveTextAsync("Page not found");
        await Assertions.Expect(Page.GetByRole(AriaRole.Link, new() { Name = "home page" })).ToBeVisibleAsync();
        var text = await Page.Locator("body").InnerTextAsync();
        Assert.DoesNotContain("Exception", text, StringComparison.Ordinal);
        Assert.DoesNotContain(" at ", text.Replace("at this address", "", StringComparison.Ordinal), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_api_answers_an_unknown_address_with_problem_details_not_a_page()
    {
        // Act
        var response = await Page.APIRequest.GetAsync("api/no-such-endpoint");

        // Assert
        Assert.Equal(404, response.Status);
        Assert.StartsWith("application/problem+json", response.Headers["content-type"], StringComparison.Ordinal);
        var body = await response.JsonAsync();
        Assert.Equal(404, body!.Value.GetProperty("status").GetInt32());
        Assert.Equal("Not Found", body.Value.GetProperty("title").GetString());
    }

    [Theory]
    [InlineData("GET")]
    [InlineData("POST")]
    public async Task A_fault_shows_the_something_went_wrong_page_without_any_technical_detail(string method)
    {
        // Act
        var response = await Page.APIRequest.FetchAsync(FaultInjection.SitePath.TrimStart('/'), new() { Method = method });

        // Assert
        Assert.Equal(500, response.Status);
        var html = await response.TextAsync();
        Assert.Contains("<h1>Something went wrong</h1>", html, StringComparison.Ordinal);
        Assert.DoesNotContain(FaultInjection.Secret, html, StringComparison.Ordinal);
        Assert.DoesNotContain("InvalidOperationException", html, StringComparison.Ordinal);
        Assert.DoesNotContain(".cs:line", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_fault_in_the_api_gives_problem_details_without_any_technical_detail()
    {
        // Act
        var response = await Page.APIRequest.GetAsync(FaultInjection.ApiPath.TrimStart('/'));

        // Assert
        Assert.Equal(500, response.Status);
        Assert.StartsWith("application/problem+json", response.Headers["content-type"], StringComparison.Ordinal);
        var text = await response.TextAsync();
        Assert.DoesNotContain(FaultInjection.Secret, text, StringComparison.Ordinal);
        Assert.DoesNotContain("InvalidOperationException", text, StringComparison.Ordinal);
        var body = await response.JsonAsync();
        Assert.Equal(500, body!.Value.GetProperty("status").GetInt32());
    }
}
