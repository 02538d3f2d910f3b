using AngleSharp.Dom;
using AngleSharp.Html.Dom;
using AngleSharp.Html.Parser;
using LowVisionAid.TestSupport;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>Reads what a rendered form shows: one input by its id, or every field as a browser would post it untouched.</summary>
public static class FormHtml
{
    /// <summary>The whole &lt;input …&gt; tag with this id (as the parser serialises it); fails the test when there is none.</summary>
    public static string Input(string html, string id)
    {
        var input = PageHtml.ById(html, id) as IHtmlInputElement;
        Assert.True(input is not null, $"The page has no input with id {id}.");
        return input.OuterHtml;
    }

    /// <summary>The value attribute of a tag, or null when it has none.</summary>
    public static string? Value(string tag) =>
        new HtmlParser().ParseFragment(tag ?? "", PageHtml.Parse("").Body!).OfType<IElement>().FirstOrDefault()?.GetAttribute("value");

    /// <summary>
    /// The visible fields as a browser posts them when the user changes nothing: text, date and number inputs with
    /// their value, ticked checkboxes, the selected option of each select and the text of each textarea.
    /// </summary>
    public static Dictionary<string, string> TextValues(string html)
    {
        var fields = new Dictionary<string, string>(StringComparer.Ordinal);
        var document = PageHtml.Parse(html);
        foreach (var input in document.QuerySelectorAll<IHtmlInputElement>("input[name]"))
        {
            var type = input.GetAttribute("type") ?? "";
            if (type is "hidden" or "submit" or "radio" || (type == "checkbox" && !input.HasAttribute("checked")))
            {
                continue;
            }

            fields[input.Name!] = input.GetAttribute("value") ?? "";
        }

        foreach (var select in document.QuerySelectorAll<IHtmlSelectElement>("select[name]"))
        {
            fields[select.Name!] = select.Options.FirstOrDefault(o => o.HasAttribute("selected"))?.Value ?? "";
        }

        foreach (var area in document.QuerySelectorAll<IHtmlTextAreaElement>("textarea[name]"))
        {
            fields[area.Name!] = area.Value;
        }

        return fields;
    }
}
