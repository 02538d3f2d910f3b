using System.Globalization;
using Microsoft.AspNetCore.Mvc.ViewFeatures;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>
/// One row of a repeated group of fields (a visit's goals, the settings' cost classes) is drawn by a partial whose
/// model is the row, with the view data made here: its fields then post as <c>Input.Goals[2].Task</c> while each
/// <c>asp-for</c> in the partial stays a plain member (<c>Task</c>), whose accessor ASP.NET Core compiles once and
/// keeps. An indexed <c>asp-for="Input.Goals[i].Task"</c> is compiled again on every render (about 1 ms each; the
/// visit form's 24 indexed fields, four goals and four reading speeds, made it 20 ms of processor time a request).
/// <code>&lt;partial name="_GoalRow" model="Model.Input.Goals[i]" view-data="FormRows.For(ViewData, nameof(VisitInput.Goals), i)" /&gt;</code>
/// </summary>
public static class FormRows
{
    /// <summary>The row's number counted from 1, for its labels ("Goal 2: task").</summary>
    public const string NumberKey = "FormRowNumber";

    /// <summary>View data for row <paramref name="index"/> of the collection <paramref name="collection"/> of the page's <c>Input</c>.</summary>
    public static ViewDataDictionary For(ViewDataDictionary page, string collection, int index)
    {
        ArgumentNullException.ThrowIfNull(page);
        var row = new ViewDataDictionary(page);
        row.TemplateInfo.HtmlFieldPrefix = page.TemplateInfo.GetFullHtmlFieldName(
            string.Create(CultureInfo.InvariantCulture, $"Input.{collection}[{index}]"));
        row[NumberKey] = index + 1;
        return row;
    }

    /// <summary>The row number <see cref="For"/> stored.</summary>
    public static int Number(ViewDataDictionary row)
    {
        ArgumentNullException.ThrowIfNull(row);
        return row[NumberKey] as int? ?? throw new InvalidOperationException("Draw a form row with the view data of FormRows.For.");
    }
}
