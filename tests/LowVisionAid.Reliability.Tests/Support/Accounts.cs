using System.Net;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>Creating accounts and signing in through the app's own pages.</summary>
public static class Accounts
{
    public const string AdminName = "admin.one";
    public const string AdminPassword = "correct horse battery";

    public static readonly IReadOnlyDictionary<string, string?> SignInOn = new Dictionary<string, string?> { ["Access:RequireSignIn"] = "true" };

    public static async Task CreateFirstAdministratorAsync(FormClient client)
    {
        using var response = await client.PostFormAsync("/Admin/FirstRun", [new("Input.UserName", AdminName), new("Input.Password", AdminPassword)]);
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
    }

    public static async Task AddAccountAsync(FormClient admin, string name, string password, string role)
    {
        using var response = await admin.PostFormAsync("/Admin/Users", [new("Input.UserName", name), new("Input.Password", password), new("Input.Role", role)], handler: "Add");
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK && body.Contains($"Account {name} created.", StringComparison.Ordinal), FormClient.Shorten(body));
    }

    public static async Task<HttpResponseMessage> SignInAsync(FormClient client, string name, string password) =>
        await client.PostFormAsync("/Account/SignIn", [new("Input.UserName", name), new("Input.Password", password)]);
}

public static class UriExtensions
{
    /// <summary>The path and query of a redirect target, whether the server wrote it absolute or relative.</summary>
    public static string PathAndQuery(this Uri location)
    {
        ArgumentNullException.ThrowIfNull(location);
        return location.IsAbsoluteUri ? location.PathAndQuery : location.OriginalString;
    }
}
