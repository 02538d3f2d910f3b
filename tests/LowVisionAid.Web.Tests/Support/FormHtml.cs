using System.Net;
using System.Text.RegularExpressions;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>Reads what a rendered form shows: one input by its id, or every field as a browser would post it untouched.</summary>
public static partial class FormHtml
{
    /// <summary>The whole &lt;input …&gt; tag with this id; fails the test when there is none.</summary>
    public static string Input(string html, string id)
    {
        var match = Regex.Match(html, $"<input[^>]*\\bid=\"{Regex.Escape(id)}\"[^>]*>", RegexOptions.None, TimeSpan.FromSeconds(1));
        Assert.True(match.Success, $"The page has no input with id {id}.");
        return match.Value;
    }

    /// <summary>The decoded value attribute of a tag, or null when it has none.</summary>
    public static string? Value(string tag)
    {
        var value = ValueAttribute().Match(tag);
        return value.Success ? WebUtility.HtmlDecode(value.Groups[1].Value) : null;
    }

    /// <summary>
    /// The visible fields as a browser posts them when the user changes nothing: text, date and number inputs with
    /// their value, ticked checkboxes, the selected option of each select and the text of each textarea.
    /// </summary>
    public static Dictionary<string, string> TextValues(string html)
    {
        var fields = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (Match input in VisibleInput().Matches(html))
        {
            var name = NameAttribute().Match(input.Value);
            var type = TypeAttribute().Match(input.Value).Groups[1].Value;
            if (!name.Success || type is "hidden" or "submit" or "radio" || (type == "checkbox" && !input.Value.Contains("checked", StringComparison.Ordinal)))
            {
                continue;
            }

            fields[WebUtility.HtmlDecode(name.Groups[1].Value)] = Value(input.Value) ?? "";
        }

        foreach (Match select in Select().Matches(html))
        {
            var selected = SelectedOption().Match(select.Groups["options"].Value);
            fields[WebUtility.HtmlDecode(select.Groups["name"].Value)] = selected.Success ? WebUtility.HtmlDecode(selected.Groups[1].Value) : "";
        }

        foreach (Match area in TextArea().Matches(html))
        {
            fields[WebUtility.HtmlDecode(area.Groups["name"].Value)] = WebUtility.HtmlDecode(area.Groups["text"].Value).TrimStart('\r', '\n');
        }

        return fields;
    }

    [GeneratedRegex("<input[^>]*>")]
    private static partial Regex VisibleInput();

    [GeneratedRegex("name=\"([^\"]*)\"")]
    private static partial Regex NameAttribute();

    [GeneratedRegex("type=\"([^\"]*)\"")]
    private static partial Regex TypeAttribute();

    [GeneratedRegex("value=\"([^\"]*)\"")]
    private static partial Regex ValueAttribute();

    [GeneratedRegex("<select[^>]*name=\"(?<name>[^\"]*)\"[^>]*>(?<options>.*?)</select>", RegexOptions.Singleline)]
    private static partial Regex Select();

    [GeneratedRegex("<option[^>]*selected=\"selected\"[^>]*value=\"([^\"]*)\"")]
    private static partial Regex SelectedOption();

    [GeneratedRegex("<textarea[^>]*name=\"(?<name>[^\"]*)\"[^>]*>(?<text>.*?)</textarea>", RegexOptions.Singleline)]
    private static partial Regex TextArea();
}
