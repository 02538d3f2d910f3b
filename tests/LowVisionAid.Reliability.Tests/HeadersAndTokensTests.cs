using System.Net;
using LowVisionAid.Reliability.Tests.Support;

namespace LowVisionAid.Reliability.Tests;

/// <summary>Every page the app links to sends the security headers, has no inline script, and refuses a form post without its token.</summary>
public sealed class HeadersAndTokensTests
{
    [Fact]
    [Trait("Category", "Slow")]
    public async Task Every_page_sends_a_strict_content_security_policy_and_the_other_security_headers()
    {
        using var app = new ClinicApp("headers");
        using var client = app.NewClient();

        var pages = await Crawler.CrawlAsync(client);

        Assert.True(pages.Count >= 8, $"The crawl reached only {pages.Count} pages.");
        foreach (var (url, response, _) in pages)
        {
            var csp = string.Join(' ', response.Headers.GetValues("Content-Security-Policy"));
            Assert.Contains("frame-ancestors 'none'", csp, StringComparison.Ordinal);
            Assert.Contains("script-src 'self'", csp, StringComparison.Ordinal);
            Assert.DoesNotContain("unsafe-inline", csp, StringComparison.Ordinal);
            Assert.DoesNotContain("unsafe-eval", csp, StringComparison.Ordinal);
            Assert.Equal("nosniff", Assert.Single(response.Headers.GetValues("X-Content-Type-Options")));
            Assert.Equal("no-referrer", Assert.Single(response.Headers.GetValues("Referrer-Policy")));
            Assert.Equal("DENY", Assert.Single(response.Headers.GetValues("X-Frame-Options")));
            Assert.False(response.Headers.Contains("Server"), $"{url} names the server software.");
            if (response.Content.Headers.ContentType?.MediaType == "text/html")
            {
                Assert.True(response.Headers.CacheControl?.NoStore == true, $"{url} may be cached on a shared PC.");
            }
        }
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task No_page_has_inline_script_event_handlers_javascript_urls_or_inline_styles()
    {
        using var app = new ClinicApp("inline");
        using var client = app.NewClient();

        var pages = await Crawler.CrawlAsync(client);

        var violations = pages
            .Where(p => p.Response.Content.Headers.ContentType?.MediaType == "text/html")
            .SelectMany(p => Html.CspViolations(p.Body).Select(v => $"{p.Url}: {v}"))
            .ToList();
        Assert.True(violations.Count == 0, "Content the CSP blocks:\n" + string.Join('\n', violations));
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task Every_form_posted_without_its_antiforgery_token_is_refused_with_400()
    {
        using var app = new ClinicApp("tokens");
        using var client = app.NewClient();
        var pages = await Crawler.CrawlAsync(client);
        var forms = pages
            .Where(p => p.Response.StatusCode == HttpStatusCode.OK)
            .SelectMany(p => Html.Forms(p.Url, p.Body))
            .Where(f => f.Method == "POST")
            .DistinctBy(f => f.Action + "|" + string.Join(',', f.Fields.Select(x => x.Key)))
            .ToList();

        var accepted = new List<string>();
        foreach (var form in forms)
        {
            Assert.Contains(form.Fields, f => f.Key == FormClient.TokenField);
            var withoutToken = form.Fields.Where(f => f.Key != FormClient.TokenField).ToList();
            using var response = await client.PostWithTokenAsync(form.Action, token: null, withoutToken);
            if (response.StatusCode != HttpStatusCode.BadRequest)
            {
                accepted.Add($"{form.Page} → POST {form.Action}: {(int)response.StatusCode}");
            }
        }

        Assert.True(forms.Count >= 6, $"Only {forms.Count} forms were found: " + string.Join(", ", forms.Select(f => f.Action)));
        Assert.True(accepted.Count == 0, "Posts accepted without a token:\n" + string.Join('\n', accepted));
    }
}
