using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;

namespace LowVisionAid.TestSupport;

/// <summary>A form as a browser would send it untouched: its method, where it posts, and its fields in order.</summary>
public sealed record PageForm(string Method, string Action, string Attributes, IReadOnlyList<KeyValuePair<string, string>> Fields);

/// <summary>Reads the app's rendered pages with a real HTML5 parser (AngleSharp): fields, forms, links, tokens.</summary>
public static class PageHtml
{
    public const string TokenField = "__RequestVerificationToken";

    public static IHtmlDocument Parse(string html) => new HtmlParser().ParseDocument(html ?? "");

    /// <summary>The element with this id, or null.</summary>
    public static IElement? ById(string html, string id) => Parse(html).GetElementById(id);

    /// <summary>The name and value of every hidden input on the page (the last of a repeated name wins).</summary>
    public static Dictionary<string, string> HiddenFields(string html)
    {
        var fields = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var input in Parse(html).QuerySelectorAll<IHtmlInputElement>("input[type=hidden][name]"))
        {
            fields[input.Name!] = input.GetAttribute("value") ?? "";
        }

        return fields;
    }

    /// <summary>The page's antiforgery token, or null when it renders none.</summary>
    public static string? Token(string html) =>
        Parse(html).QuerySelector<IHtmlInputElement>($"input[name={TokenField}]")?.GetAttribute("value") is { Length: > 0 } token ? token : null;

    /// <summary>Every same-site link target (href starting with /), without its #fragment.</summary>
    public static IEnumerable<string> Links(string html) =>
        Parse(html).QuerySelectorAll("[href]")
            .Select(a => a.GetAttribute("href")!)
            .Where(href => href.StartsWith('/') && !href.StartsWith("//", StringComparison.Ordinal))
            .Select(href => href.Split('#')[0])
            .Where(href => href.Length > 0)
            .ToList();

    /// <summary>Every form on the page, with the values a browser sends when the user changes nothing.</summary>
    public static IReadOnlyList<PageForm> Forms(string html) =>
        Parse(html).Forms.Select(form => new PageForm(
            (form.GetAttribute("method") ?? "get").ToUpperInvariant(),
            form.GetAttribute("action") ?? "",
            string.Join(' ', form.Attributes.Select(a => $"{a.Name}=\"{a.Value}\"")),
            Submitted(form))).ToList();

    /// <summary>
    /// What a browser sends for a form left as shown: named inputs (not buttons or files; checkboxes and radios only
    /// when checked, a checkbox without a value as "on"), each select's chosen option (the first when none is
    /// marked selected) and each textarea's text.
    /// </summary>
    public static List<KeyValuePair<string, string>> Submitted(IHtmlFormElement form)
    {
        ArgumentNullException.ThrowIfNull(form);
        var fields = new List<KeyValuePair<string, string>>();
        foreach (var element in form.Elements)
        {
            switch (element)
            {
                case IHtmlInputElement input when !string.IsNullOrEmpty(input.Name):
                    var type = input.Type.ToLowerInvariant();
                    if (type is "submit" or "button" or "file" or "image" or "reset" || (type is "checkbox" or "radio" && !input.IsChecked))
                    {
                        continue;
                    }

                    fields.Add(new(input.Name!, input.GetAttribute("value") ?? (type is "checkbox" or "radio" ? "on" : "")));
                    break;
                case IHtmlSelectElement select when !string.IsNullOrEmpty(select.Name):
                    var chosen = select.Options.FirstOrDefault(o => o.HasAttribute("selected")) ?? (select.Options.Length > 0 ? select.Options[0] : null);
                    fields.Add(new(select.Name!, chosen?.Value ?? ""));
                    break;
                case IHtmlTextAreaElement area when !string.IsNullOrEmpty(area.Name):
                    fields.Add(new(area.Name!, area.Value));
                    break;
            }
        }

        return fields;
    }

    /// <summary>Inline script, event-handler attributes, javascript: URLs and inline styles: what the CSP forbids.</summary>
    public static IEnumerable<string> CspViolations(string html)
    {
        var document = Parse(html);
        foreach (var script in document.Scripts.Where(s => !s.HasAttribute("src")))
        {
            yield return "inline <script>: " + Shorten(script.OuterHtml);
        }

        foreach (var element in document.All)
        {
            foreach (var attribute in element.Attributes)
            {
                if (attribute.Name.StartsWith("on", StringComparison.OrdinalIgnoreCase))
                {
                    yield return "event-handler attribute: " + Shorten(element.OuterHtml);
                }
                else if (attribute.Name is "href" or "src" or "action" && attribute.Value.TrimStart().StartsWith("javascript:", StringComparison.OrdinalIgnoreCase))
                {
                    yield return "javascript: URL: " + Shorten(element.OuterHtml);
                }
                else if (attribute.Name == "style")
                {
                    yield return "inline style attribute: " + Shorten(element.OuterHtml);
                }
            }

            if (element.LocalName == "style")
            {
                yield return "inline <style>: " + Shorten(element.OuterHtml);
            }
        }
    }

    /// <summary>The visible text of the elements matching <paramref name="selector"/>, whitespace collapsed.</summary>
    public static IReadOnlyList<string> Texts(string html, string selector) =>
        Parse(html).QuerySelectorAll(selector).Select(e => string.Join(' ', e.TextContent.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries))).ToList();

    private static string Shorten(string s) => s.Length <= 120 ? s : s[..120] + "…";
}
