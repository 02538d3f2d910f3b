using System.Net;
using LowVisionAid.TestSupport;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>
/// Posts a form the way a browser does: GET the page first (the client keeps the antiforgery cookie), then post
/// every hidden field it rendered (the token, a record's version) together with what the test types.
/// </summary>
public static class Forms
{
    public static async Task<HttpResponseMessage> SubmitAsync(this HttpClient client, string formUrl, IReadOnlyDictionary<string, string> typed, string? postUrl = null)
    {
        ArgumentNullException.ThrowIfNull(client);
        ArgumentNullException.ThrowIfNull(typed);
        var page = await client.GetAsync(new Uri(formUrl, UriKind.Relative));
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        var html = await page.Content.ReadAsStringAsync();
        return await client.PostFormAsync(postUrl ?? formUrl, html, typed);
    }

    /// <summary>Posts with the hidden fields of an already fetched page (for two people editing at once).</summary>
    public static async Task<HttpResponseMessage> PostFormAsync(this HttpClient client, string postUrl, string pageHtml, IReadOnlyDictionary<string, string> typed)
    {
        ArgumentNullException.ThrowIfNull(client);
        ArgumentNullException.ThrowIfNull(typed);
        var fields = HiddenFields(pageHtml);
        foreach (var (name, value) in typed)
        {
            fields[name] = value;
        }

        using var content = new FormUrlEncodedContent(fields);
        return await client.PostAsync(new Uri(postUrl, UriKind.Relative), content);
    }

    public static Dictionary<string, string> HiddenFields(string html) => PageHtml.HiddenFields(html);
}
