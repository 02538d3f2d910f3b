using System.Net;
using LowVisionAid.TestSupport;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>A browser-like client: keeps cookies, GETs a form first and posts it back with its antiforgery token.</summary>
public sealed class FormClient(HttpClient http) : IDisposable
{
    public const string TokenField = PageHtml.TokenField;

    public HttpClient Http { get; } = http;

    public async Task<string> GetPageAsync(string url)
    {
        using var response = await Http.GetAsync(new Uri(url, UriKind.Relative));
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, $"GET {url} gave {(int)response.StatusCode}: {Shorten(body)}");
        return body;
    }

    /// <summary>GETs <paramref name="pageUrl"/>, then posts <paramref name="fields"/> with the page's token to the page (or <paramref name="handler"/>).</summary>
    public async Task<HttpResponseMessage> PostFormAsync(string pageUrl, IEnumerable<KeyValuePair<string, string>> fields, string? handler = null, string? postUrl = null)
    {
        var page = await GetPageAsync(pageUrl);
        var token = Token(page) ?? throw new InvalidOperationException($"No antiforgery token on {pageUrl}.");
        return await PostWithTokenAsync(postUrl ?? pageUrl, token, fields, handler);
    }

    public async Task<HttpResponseMessage> PostWithTokenAsync(string url, string? token, IEnumerable<KeyValuePair<string, string>> fields, string? handler = null)
    {
        var all = fields.ToList();
        if (token is not null)
        {
            all.Add(new(TokenField, token));
        }

        var target = handler is null ? url : url + (url.Contains('?', StringComparison.Ordinal) ? "&" : "?") + "handler=" + handler;
        using var content = new FormUrlEncodedContent(all);
        return await Http.PostAsync(new Uri(target, UriKind.Relative), content);
    }

    public static string? Token(string html) => PageHtml.Token(html);

    public static string Shorten(string text) => text.Length <= 600 ? text : text[..600] + "…";

    public void Dispose() => Http.Dispose();
}
