using LowVisionAid.TestSupport;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>The values a browser would send for a form as it is shown (inputs, checked boxes, selected options, text areas).</summary>
public static class FormFields
{
    /// <summary>
    /// The first form whose attribute text (e.g. <c>method="post" action="/Clients/New"</c>) passes
    /// <paramref name="formFilter"/>; the layout's sign-out form (on every page when signed in) is never the form under test.
    /// </summary>
    public static List<KeyValuePair<string, string>> Read(string html, Func<string, bool>? formFilter = null)
    {
        var form = PageHtml.Forms(html)
            .Where(f => !f.Action.Equals("/Account/SignOut", StringComparison.Ordinal))
            .FirstOrDefault(f => formFilter?.Invoke(f.Attributes) ?? true)
            ?? throw new InvalidOperationException("No matching form on the page.");
        return [.. form.Fields];
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
}
