using System.Net;
using System.Text.RegularExpressions;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>A form found on a page: where it posts and the fields it sends.</summary>
public sealed record HtmlForm(string Page, string Method, string Action, IReadOnlyList<KeyValuePair<string, string>> Fields);

/// <summary>Just enough HTML reading to crawl the app's own pages (links and forms), not a general parser.</summary>
public static partial class Html
{
    public static IEnumerable<string> Links(string html) =>
        HrefPattern().Matches(html).Select(m => WebUtility.HtmlDecode(m.Groups[1].Value));

    public static IEnumerable<HtmlForm> Forms(string page, string html)
    {
        foreach (Match form in FormPattern().Matches(html))
        {
            var attributes = form.Groups[1].Value;
            var method = Attribute(attributes, "method")?.ToUpperInvariant() ?? "GET";
            var action = Attribute(attributes, "action");
            var fields = new List<KeyValuePair<string, string>>();
            foreach (Match field in FieldPattern().Matches(form.Groups[2].Value))
            {
                if (Attribute(field.Groups[2].Value, "name") is { } name)
                {
                    fields.Add(new(name, Attribute(field.Groups[2].Value, "value") ?? "x"));
                }
            }

            yield return new HtmlForm(page, method, string.IsNullOrEmpty(action) ? page : action, fields);
        }
    }

    public static string? Attribute(string attributes, string name)
    {
        var match = Regex.Match(attributes, $"\\b{name}=\"([^\"]*)\"", RegexOptions.IgnoreCase, TimeSpan.FromSeconds(1));
        return match.Success ? WebUtility.HtmlDecode(match.Groups[1].Value) : null;
    }

    /// <summary>Inline script, event-handler attributes, javascript: URLs and inline styles: what the CSP forbids.</summary>
    public static IEnumerable<string> CspViolations(string html)
    {
        foreach (Match m in InlineScriptPattern().Matches(html))
        {
            yield return "inline <script>: " + Shorten(m.Value);
        }

        foreach (Match m in EventHandlerPattern().Matches(html))
        {
            yield return "event-handler attribute: " + Shorten(m.Value);
        }

        foreach (Match m in JavascriptUrlPattern().Matches(html))
        {
            yield return "javascript: URL: " + Shorten(m.Value);
        }

        foreach (Match m in StyleAttributePattern().Matches(html))
        {
            yield return "inline style attribute: " + Shorten(m.Value);
        }

        foreach (Match m in StyleElementPattern().Matches(html))
        {
            yield return "inline <style>: " + Shorten(m.Value);
        }
    }

    private static string Shorten(string s) => s.Length <= 120 ? s : s[..120] + "…";

    [GeneratedRegex("href=\"(/[^\"#]*)\"")]
    private static partial Regex HrefPattern();

    [GeneratedRegex("<form\\b([^>]*)>(.*?)</form>", RegexOptions.Singleline | RegexOptions.IgnoreCase)]
    private static partial Regex FormPattern();

    [GeneratedRegex("<(input|select|textarea|button)\\b([^>]*)>", RegexOptions.IgnoreCase)]
    private static partial Regex FieldPattern();

    [GeneratedRegex("<script\\b(?![^>]*\\bsrc=)[^>]*>", RegexOptions.IgnoreCase)]
    private static partial Regex InlineScriptPattern();

    [GeneratedRegex("<[a-z][^>]*\\son[a-z]+\\s*=", RegexOptions.IgnoreCase)]
    private static partial Regex EventHandlerPattern();

    [GeneratedRegex("(href|src|action)\\s*=\\s*\"\\s*javascript:", RegexOptions.IgnoreCase)]
    private static partial Regex JavascriptUrlPattern();

    [GeneratedRegex("<[a-z][^>]*\\sstyle\\s*=", RegexOptions.IgnoreCase)]
    private static partial Regex StyleAttributePattern();

    [GeneratedRegex("<style\\b", RegexOptions.IgnoreCase)]
    private static partial Regex StyleElementPattern();
}
