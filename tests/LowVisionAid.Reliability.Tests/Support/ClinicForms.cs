using System.Net;
using System.Text.RegularExpressions;
using LowVisionAid.TestSupport;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>The clinic's own forms, posted as a browser would.</summary>
public static partial class ClinicForms
{
    public static async Task<int> AddClientAsync(FormClient client, string code, string? name = null, string? yearOfBirth = null, string? notes = null)
    {
        using var response = await client.PostFormAsync("/Clients/New",
        [
            new("Input.Code", code), new("Input.Name", name ?? ""), new("Input.YearOfBirth", yearOfBirth ?? ""), new("Input.Notes", notes ?? ""),
        ]);
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.Redirect, $"Adding client {code} gave {(int)response.StatusCode}: {FormClient.Shorten(body)}");
        return int.Parse(ClientIdPattern().Match(response.Headers.Location!.OriginalString).Groups[1].Value, CultureInfo.InvariantCulture);
    }

    /// <summary>Records a visit through the visit form (as shown, with <paramref name="changes"/> typed in) and returns its id.</summary>
    public static async Task<int> AddVisitAsync(FormClient client, int clientId, params (string Name, string Value)[] changes)
    {
        var url = $"/Visits/New?clientId={clientId}";
        var page = await client.GetPageAsync(url);
        var fields = FormFields.Read(page, a => a.Contains("post", StringComparison.OrdinalIgnoreCase)).With(("Input.VisitDate", "2026-11-20")).With(changes);
        using var response = await client.PostWithTokenAsync(url, null, fields);
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.Redirect, $"Recording a visit gave {(int)response.StatusCode}: {Problems(body)}");
        return int.Parse(VisitIdPattern().Match(response.Headers.Location!.OriginalString).Groups[1].Value, CultureInfo.InvariantCulture);
    }

    /// <summary>The error summary and field errors of a page that came back with errors.</summary>
    public static string Problems(string html) => string.Join(" | ", PageHtml.Texts(html, ".field-error, .error-summary"));

    [GeneratedRegex("/Visits/([0-9]+)")]
    private static partial Regex VisitIdPattern();

    [GeneratedRegex("/Clients/([0-9]+)")]
    private static partial Regex ClientIdPattern();
}
