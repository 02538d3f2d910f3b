using System.Text.Encodings.Web;
using Microsoft.AspNetCore.Mvc.Rendering;
using Microsoft.AspNetCore.Mvc.ViewFeatures;
using Microsoft.AspNetCore.Razor.TagHelpers;

namespace LowVisionAid.Web.Forms;

/// <summary>
/// A labelled text box with its hint and its error beside it:
/// <c>&lt;text-field for="Input.Acuity" label="Distance acuity" hint="For example 6/60" /&gt;</c>.
/// The input is described by the hint and the error, marked invalid when it has one, and keeps what was typed.
/// Errors start with the word "Error:" so they are not told by colour alone.
/// </summary>
[HtmlTargetElement("text-field", TagStructure = TagStructure.WithoutEndTag)]
public sealed class TextFieldTagHelper : TagHelper
{
    /// <summary>The bound property.</summary>
    [HtmlAttributeName("for")]
    public ModelExpression For { get; set; } = null!;

    /// <summary>The visible label.</summary>
    public string Label { get; set; } = "";

    /// <summary>A short example of what to type, shown under the label.</summary>
    public string? Hint { get; set; }

    /// <summary>A unit shown after the box (e.g. "cm").</summary>
    public string? Suffix { get; set; }

    /// <summary>The input's inputmode (e.g. "decimal"); text by default.</summary>
    public string? InputMode { get; set; }

    /// <summary>Adds "(required)" to the label.</summary>
    public bool Required { get; set; }

    /// <summary>The width class: "short", "medium" or "long".</summary>
    public string Width { get; set; } = "medium";

    [ViewContext]
    [HtmlAttributeNotBound]
    public ViewContext ViewContext { get; set; } = null!;

    public override void Process(TagHelperContext context, TagHelperOutput output)
    {
        ArgumentNullException.ThrowIfNull(output);
        var name = For.Name;
        var id = TagBuilder.CreateSanitizedId(name, "_");
        var state = ViewContext.ViewData.ModelState.TryGetValue(name, out var entry) ? entry : null;
        var error = state?.Errors.FirstOrDefault()?.ErrorMessage;
        var value = state?.AttemptedValue ?? Convert.ToString(For.Model, System.Globalization.CultureInfo.CurrentCulture) ?? "";
        var hintId = id + "-hint";
        var errorId = id + "-error";
        var enc = HtmlEncoder.Default;

        output.TagName = "div";
        output.TagMode = TagMode.StartTagAndEndTag;
        output.Attributes.SetAttribute("class", error is null ? "field" : "field field-has-error");

        var html = new System.Text.StringBuilder();
        html.Append("<label for=\"").Append(enc.Encode(id)).Append("\">").Append(enc.Encode(Label));
        if (Required)
        {
            html.Append(" <span class=\"required\">(required)</span>");
        }

        html.Append("</label>");
        var describedBy = new List<string>();
        if (!string.IsNullOrEmpty(Hint))
        {
            html.Append("<p class=\"hint\" id=\"").Append(enc.Encode(hintId)).Append("\">").Append(enc.Encode(Hint)).Append("</p>");
            describedBy.Add(hintId);
        }

        if (!string.IsNullOrEmpty(Suffix))
        {
            describedBy.Add(id + "-unit");
        }

        if (error is not null)
        {
            html.Append("<p class=\"field-error-message\" id=\"").Append(enc.Encode(errorId)).Append("\"><strong>Error:</strong> ")
                .Append(enc.Encode(error)).Append("</p>");
            describedBy.Add(errorId);
        }

        html.Append("<span class=\"input-row\"><input class=\"input input-").Append(enc.Encode(Width)).Append("\" type=\"text\" id=\"")
            .Append(enc.Encode(id)).Append("\" name=\"").Append(enc.Encode(name)).Append("\" value=\"").Append(enc.Encode(value))
            .Append("\" autocomplete=\"off\" spellcheck=\"false\"");
        if (!string.IsNullOrEmpty(InputMode))
        {
            html.Append(" inputmode=\"").Append(enc.Encode(InputMode)).Append('"');
        }

        if (Required)
        {
            html.Append(" aria-required=\"true\"");
        }

        if (describedBy.Count > 0)
        {
            html.Append(" aria-describedby=\"").Append(enc.Encode(string.Join(' ', describedBy))).Append('"');
        }

        if (error is not null)
        {
            html.Append(" aria-invalid=\"true\"");
        }

        html.Append(" />");
        if (!string.IsNullOrEmpty(Suffix))
        {
            html.Append("<span class=\"suffix\" id=\"").Append(enc.Encode(id + "-unit")).Append("\">").Append(enc.Encode(Suffix)).Append("</span>");
        }

        html.Append("</span>");
        output.Content.SetHtmlContent(html.ToString());
    }
}
