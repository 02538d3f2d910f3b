using System.Net;
using System.Text.RegularExpressions;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>The values a browser would send for a form as it is shown (inputs, checked boxes, selected options, text areas).</summary>
public static partial class FormFields
{
    public static List<KeyValuePair<string, string>> Read(string html, Func<string, bool>? formFilter = null)
    {
        // The page's own form posts back to the page (no action); with sign-in on, the layout's sign-out form comes first.
        var matching = FormPattern().Matches(html).Where(m => formFilter?.Invoke(m.Groups[1].Value) ?? true).ToList();
        var form = matching.FirstOrDefault(m => Html.Attribute(m.Groups[1].Value, "action") is null) ?? matching.FirstOrDefault()
            ?? throw new InvalidOperationException("No matching form on the page.");
        var body = form.Groups[2].Value;
        var fields = new List<KeyValuePair<string, string>>();
        foreach (Match input in InputPattern().Matches(body))
        {
            var attributes = input.Groups[1].Value;
            var type = Html.Attribute(attributes, "type") ?? "text";
            if (Html.Attribute(attributes, "name") is not { } name || type is "submit" or "button" or "file" || (type is "checkbox" or "radio" && !attributes.Contains("checked", StringComparison.Ordinal)))
            {
                continue;
            }

            fields.Add(new(name, Html.Attribute(attributes, "value") ?? (type == "checkbox" ? "on" : "")));
        }

        foreach (Match select in SelectPattern().Matches(body))
        {
            if (Html.Attribute(select.Groups[1].Value, "name") is not { } name)
            {
                continue;
            }

            var options = OptionPattern().Matches(select.Groups[2].Value);
            var chosen = options.FirstOrDefault(o => o.Groups[1].Value.Contains("selected", StringComparison.Ordinal)) ?? options.FirstOrDefault();
            fields.Add(new(name, chosen is null ? "" : Html.Attribute(chosen.Groups[1].Value, "value") ?? WebUtility.HtmlDecode(chosen.Groups[2].Value)));
        }

        foreach (Match area in TextAreaPattern().Matches(body))
        {
            if (Html.Attribute(area.Groups[1].Value, "name") is { } name)
            {
                fields.Add(new(name, WebUtility.HtmlDecode(area.Groups[2].Value).TrimStart('\r', '\n')));
            }
        }

        return fields;
    }

    /// <summary>Replaces (or adds) the named fields' values.</summary>
    public static List<KeyValuePair<string, string>> With(this List<KeyValuePair<string, string>> fields, params (string Name, string Value)[] changes)
    {
        ArgumentNullException.ThrowIfNull(fields);
        foreach (var (name, value) in changes)
        {
            fields.RemoveAll(f => f.Key == name);
            fields.Add(new(name, value));
        }

        return fields;
    }

    [GeneratedRegex("<form\\b([^>]*)>(.*?)</form>", RegexOptions.Singleline | RegexOptions.IgnoreCase)]
    private static partial Regex FormPattern();

    [GeneratedRegex("<input\\b([^>]*)>", RegexOptions.IgnoreCase)]
    private static partial Regex InputPattern();

    [GeneratedRegex("<select\\b([^>]*)>(.*?)</select>", RegexOptions.Singleline | RegexOptions.IgnoreCase)]
    private static partial Regex SelectPattern();

    [GeneratedRegex("<option\\b([^>]*)>(.*?)</option>", RegexOptions.Singleline | RegexOptions.IgnoreCase)]
    private static partial Regex OptionPattern();

    [GeneratedRegex("<textarea\\b([^>]*)>(.*?)</textarea>", RegexOptions.Singleline | RegexOptions.IgnoreCase)]
    private static partial Regex TextAreaPattern();
}
