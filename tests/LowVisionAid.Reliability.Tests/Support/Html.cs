using AngleSharp.Html.Dom;
using LowVisionAid.TestSupport;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>A form found on a page: where it posts and the fields it sends.</summary>
public sealed record HtmlForm(string Page, string Method, string Action, IReadOnlyList<KeyValuePair<string, string>> Fields);

/// <summary>The app's own pages read for crawling (links and forms) and for what the CSP forbids, with a real HTML parser.</summary>
public static class Html
{
    public static IEnumerable<string> Links(string html) => PageHtml.Links(html);

    /// <summary>Each form with every named field (inputs, selects, text areas, buttons), valued as rendered or "x".</summary>
    public static IEnumerable<HtmlForm> Forms(string page, string html)
    {
        foreach (var form in PageHtml.Parse(html).Forms)
        {
            var action = form.GetAttribute("action");
            var fields = form.Elements
                .Where(e => e is IHtmlInputElement or IHtmlSelectElement or IHtmlTextAreaElement or IHtmlButtonElement)
                .Where(e => !string.IsNullOrEmpty(e.GetAttribute("name")))
                .Select(e => new KeyValuePair<string, string>(e.GetAttribute("name")!, e.GetAttribute("value") ?? "x"))
                .ToList();
            yield return new HtmlForm(page, (form.GetAttribute("method") ?? "GET").ToUpperInvariant(), string.IsNullOrEmpty(action) ? page : action, fields);
        }
    }

    /// <summary>The value of attribute <paramref name="name"/> in a tag's attribute text (e.g. <c>type="text" name="x"</c>), or null.</summary>
    public static string? Attribute(string attributes, string name) =>
        PageHtml.Parse($"<body><span {attributes}></span></body>").Body?.FirstElementChild?.GetAttribute(name);

    /// <inheritdoc cref="PageHtml.CspViolations"/>
    public static IEnumerable<string> CspViolations(string html) => PageHtml.CspViolations(html);
}
