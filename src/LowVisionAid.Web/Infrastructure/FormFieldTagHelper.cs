using System.Globalization;
using Microsoft.AspNetCore.Mvc.ModelBinding;
using Microsoft.AspNetCore.Mvc.Rendering;
using Microsoft.AspNetCore.Mvc.ViewFeatures;
using Microsoft.AspNetCore.Razor.TagHelpers;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// One form field with its label, optional hint and the error beside it, tied together with
/// <c>aria-describedby</c>. The value shown is what the user typed (from model state) when the form comes back with errors.
/// <code>&lt;form-field asp-for="Input.Code" label="Client code" hint="The clinic's own code, e.g. HB-0042" /&gt;</code>
/// </summary>
[HtmlTargetElement("form-field", Attributes = "asp-for", TagStructure = TagStructure.WithoutEndTag)]
public sealed class FormFieldTagHelper(IHtmlGenerator generator) : TagHelper
{
    [HtmlAttributeName("asp-for")]
    public ModelExpression For { get; set; } = null!;

    [HtmlAttributeName("asp-items")]
    public IEnumerable<SelectListItem>? Items { get; set; }

    public string Label { get; set; } = "";

    public string? Hint { get; set; }

    /// <summary>text (default), textarea, select, checkbox, date, number or password (never filled in again).</summary>
    public string Kind { get; set; } = "text";

    public string? Autocomplete { get; set; }

    public string? Inputmode { get; set; }

    /// <summary>Suggestions offered as the user types (a <c>datalist</c> id on the page).</summary>
    public string? List { get; set; }

    [ViewContext]
    [HtmlAttributeNotBound]
    public ViewContext ViewContext { get; set; } = null!;

    public override void Process(TagHelperContext context, TagHelperOutput output)
    {
        ArgumentNullException.ThrowIfNull(output);
        var fullName = ViewContext.ViewData.TemplateInfo.GetFullHtmlFieldName(For.Name);
        var id = TagBuilder.CreateSanitizedId(fullName, generator.IdAttributeDotReplacement);
        var errors = ViewContext.ViewData.ModelState.TryGetValue(fullName, out var entry) ? entry.Errors : [];
        var hintId = id + "-hint";
        var errorId = id + "-error";

        var describedBy = new List<string>();
        if (!string.IsNullOrEmpty(Hint))
        {
            describedBy.Add(hintId);
        }

        if (errors.Count > 0)
        {
            describedBy.Add(errorId);
        }

        var attributes = new Dictionary<string, object?>(StringComparer.Ordinal);
        if (describedBy.Count > 0)
        {
            attributes["aria-describedby"] = string.Join(' ', describedBy);
        }

        if (errors.Count > 0)
        {
            attributes["aria-invalid"] = "true";
        }

        if (Autocomplete is not null)
        {
            attributes["autocomplete"] = Autocomplete;
        }

        if (Inputmode is not null)
        {
            attributes["inputmode"] = Inputmode;
        }

        if (List is not null)
        {
            attributes["list"] = List;
        }

        output.TagName = "div";
        output.TagMode = TagMode.StartTagAndEndTag;
        var look = Kind == "password" ? "text" : Kind;   // a password field looks like a text field
        output.Attributes.SetAttribute("class", errors.Count > 0 ? $"field field-{look} field-invalid" : $"field field-{look}");

        var label = new TagBuilder("label");
        label.Attributes["for"] = id;
        label.InnerHtml.Append(Label);

        var control = Kind switch
        {
            "textarea" => generator.GenerateTextArea(ViewContext, For.ModelExplorer, For.Name, rows: 4, columns: 0, attributes),
            "select" => generator.GenerateSelect(ViewContext, For.ModelExplorer, optionLabel: null, For.Name, Items ?? [], allowMultiple: false, attributes),
            "checkbox" => generator.GenerateCheckBox(ViewContext, For.ModelExplorer, For.Name, isChecked: null, attributes),
            "password" => generator.GeneratePassword(ViewContext, For.ModelExplorer, For.Name, value: null, attributes),
            _ => TextBox(attributes),
        };

        var content = output.Content;
        if (Kind == "checkbox")
        {
            content.AppendHtml(control);
            content.AppendHtml(generator.GenerateHiddenForCheckbox(ViewContext, For.ModelExplorer, For.Name));
            content.AppendHtml(label);
        }
        else
        {
            content.AppendHtml(label);
        }

        if (!string.IsNullOrEmpty(Hint))
        {
            var hint = new TagBuilder("p");
            hint.Attributes["id"] = hintId;
            hint.AddCssClass("field-hint");
            hint.InnerHtml.Append(Hint);
            content.AppendHtml(hint);
        }

        if (errors.Count > 0)
        {
            var error = new TagBuilder("p");
            error.Attributes["id"] = errorId;
            error.AddCssClass("field-error");
            var prefix = new TagBuilder("span");
            prefix.AddCssClass("visually-hidden");
            prefix.InnerHtml.Append("Error: ");
            error.InnerHtml.AppendHtml(prefix);
            error.InnerHtml.Append(string.Join(' ', errors.Select(e => e.ErrorMessage)));
            content.AppendHtml(error);
        }

        if (Kind != "checkbox")
        {
            content.AppendHtml(control);
        }
    }

    private TagBuilder TextBox(Dictionary<string, object?> attributes)
    {
        attributes["type"] = Kind switch
        {
            "date" => "date",
            _ => "text",
        };
        if (Kind == "number")
        {
            attributes.TryAdd("inputmode", "numeric");
        }

        attributes["spellcheck"] = "false";

        // The model's value must be passed: GenerateTextBox does not read it from the model explorer, so without it
        // every text box rendered value="" on a GET (posted-back values come from model state and still win).
        return generator.GenerateTextBox(ViewContext, For.ModelExplorer, For.Name, ValueText(For.Model), format: null, attributes);
    }

    /// <summary>
    /// The value as the control expects it: a date input takes only year-month-day (anything else shows as empty),
    /// so dates are written invariantly; other values are shown as they are held.
    /// </summary>
    internal static string? ValueText(object? model) => model switch
    {
        null => null,
        DateOnly date => date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
        DateTime dateTime => dateTime.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture),
        IFormattable formattable => formattable.ToString(null, CultureInfo.InvariantCulture),
        _ => model.ToString(),
    };
}

/// <summary>
/// The one summary of problems at the top of every form: a heading, then a list of every error in model state,
/// each linking to its field (ids follow the tag helpers' rule, Input.Goals[0].Detail → Input_Goals_0__Detail);
/// an error without a field (e.g. a conflict with another person's change) is listed without a link. It is an
/// alert, and it takes the focus when the page loads (<c>autofocus</c>, and wwwroot/js/site.js where a browser
/// ignores autofocus on a non-control), so a screen reader announces it and the keyboard starts from it.
/// Renders nothing when the form has no errors.
/// <code>&lt;error-summary note="Nothing was calculated. What you typed is kept below." /&gt;</code>
/// </summary>
[HtmlTargetElement("error-summary", TagStructure = TagStructure.WithoutEndTag)]
public sealed class ErrorSummaryTagHelper(IHtmlGenerator generator) : TagHelper
{
    private const string Id = "error-summary";

    /// <summary>An optional sentence under the list, e.g. what was not saved.</summary>
    public string? Note { get; set; }

    [ViewContext]
    [HtmlAttributeNotBound]
    public ViewContext ViewContext { get; set; } = null!;

    public override void Process(TagHelperContext context, TagHelperOutput output)
    {
        ArgumentNullException.ThrowIfNull(output);
        var failures = ViewContext.ViewData.ModelState
            .Where(kv => kv.Value is { Errors.Count: > 0 })
            .SelectMany(kv => kv.Value!.Errors.Select(e => (Key: kv.Key, e.ErrorMessage)))
            .ToList();
        if (failures.Count == 0)
        {
            output.SuppressOutput();
            return;
        }

        output.TagName = "div";
        output.TagMode = TagMode.StartTagAndEndTag;
        output.Attributes.SetAttribute("class", "error-summary");
        output.Attributes.SetAttribute("id", Id);
        output.Attributes.SetAttribute("role", "alert");
        output.Attributes.SetAttribute("aria-labelledby", Id + "-title");
        output.Attributes.SetAttribute("tabindex", "-1");
        output.Attributes.Add(new TagHelperAttribute("autofocus", null, HtmlAttributeValueStyle.Minimized));

        var title = new TagBuilder("h2");
        title.Attributes["id"] = Id + "-title";
        title.InnerHtml.Append(failures.Count == 1 ? "There is 1 problem to fix" : $"There are {failures.Count} problems to fix");
        output.Content.AppendHtml(title);

        var list = new TagBuilder("ul");
        foreach (var (key, message) in failures)
        {
            var item = new TagBuilder("li");
            if (key.Length > 0)
            {
                var link = new TagBuilder("a");
                link.Attributes["href"] = "#" + TagBuilder.CreateSanitizedId(key, generator.IdAttributeDotReplacement);
                link.InnerHtml.Append(message);
                item.InnerHtml.AppendHtml(link);
            }
            else
            {
                item.InnerHtml.Append(message);
            }

            list.InnerHtml.AppendHtml(item);
        }

        output.Content.AppendHtml(list);
        if (!string.IsNullOrEmpty(Note))
        {
            var note = new TagBuilder("p");
            note.InnerHtml.Append(Note);
            output.Content.AppendHtml(note);
        }
    }
}
