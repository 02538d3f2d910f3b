using System.Net;
using System.Text.RegularExpressions;

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

    [GeneratedRegex("/Clients/([0-9]+)")]
    private static partial Regex ClientIdPattern();
}
