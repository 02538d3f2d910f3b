using System.Net;
using LowVisionAid.Data;
using LowVisionAid.Data.Access;
using LowVisionAid.Data.Entities;
using LowVisionAid.TestSupport;
using LowVisionAid.Web.Tests.Support;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Web.Tests.Security;

/// <summary>
/// The links to export, erasure, the admin pages and sign-out are shown to the roles that may use them and to no
/// one else, and a role that may not use a page is refused even when it types the address.
/// </summary>
public sealed class RoleLinksTests
{
    private const string Password = "a long test password";

    public static TheoryData<string, bool, bool> Roles() => new()
    {
        { ClinicRoles.Clinician, true, false },
        { ClinicRoles.Teacher, false, false },
        { ClinicRoles.Administrator, true, true },
    };

    [Theory]
    [MemberData(nameof(Roles))]
    public async Task The_client_page_shows_export_and_erase_only_to_roles_that_may_use_them(string role, bool exports, bool _)
    {
        using var app = new SignInApp();
        var clientId = await app.AddClientAsync("LNK-1");
        using var browser = await app.SignedInAsync(role);

        var page = await GetOkAsync(browser, $"/Clients/{clientId}");

        Assert.Equal(exports, page.Contains($"href=\"/Clients/{clientId}/Export\"", StringComparison.Ordinal));
        Assert.Equal(exports, page.Contains($"href=\"/Clients/{clientId}/Erase\"", StringComparison.Ordinal));
    }

    [Theory]
    [MemberData(nameof(Roles))]
    [Trait("Category", "Slow")]
    public async Task The_layout_shows_the_admin_section_only_to_administrators_and_names_who_is_signed_in(string role, bool _, bool administers)
    {
        using var app = new SignInApp();
        using var browser = await app.SignedInAsync(role);

        var page = await GetOkAsync(browser, "/");

        Assert.Equal(administers, page.Contains("aria-label=\"Administration\"", StringComparison.Ordinal));
        foreach (var admin in new[] { "/Admin/Users", "/Admin/Audit", "/Admin/Backup" })
        {
            Assert.Equal(administers, page.Contains($"href=\"{admin}\"", StringComparison.Ordinal));
        }

        Assert.Contains($"Signed in as <strong>{UserFor(role)}</strong>", page, StringComparison.Ordinal);
        Assert.Contains("action=\"/Account/SignOut\"", page, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Roles))]
    [Trait("Category", "Slow")]
    public async Task A_role_without_the_right_is_refused_export_erasure_and_admin_pages_even_by_typed_address(string role, bool exports, bool administers)
    {
        using var app = new SignInApp();
        var clientId = await app.AddClientAsync("LNK-2");
        using var browser = await app.SignedInAsync(role);
        var token = Forms.HiddenFields(await GetOkAsync(browser, "/"))["__RequestVerificationToken"];

        // Typed addresses (GET) and the forms' own posts, with a valid token
        foreach (var url in new[] { $"/Clients/{clientId}/Export", $"/Clients/{clientId}/Erase" })
        {
            await AssertAllowedAsync(browser, HttpMethod.Get, url, exports, token);
        }

        await AssertAllowedAsync(browser, HttpMethod.Post, $"/Clients/{clientId}/Export?handler=Json", exports, token);
        await AssertAllowedAsync(browser, HttpMethod.Post, $"/Clients/{clientId}/Export?handler=Csv", exports, token);
        foreach (var url in new[] { "/Admin/Users", "/Admin/Audit", "/Admin/Backup" })
        {
            await AssertAllowedAsync(browser, HttpMethod.Get, url, administers, token);
        }

        if (!exports)
        {
            // The erasure itself, posted with the right confirmation: refused, and the client is still there
            using var erase = await browser.PostAsync(new Uri($"/Clients/{clientId}/Erase", UriKind.Relative),
                new FormUrlEncodedContent(new Dictionary<string, string> { ["Confirmation"] = "LNK-2", ["__RequestVerificationToken"] = token }));
            Assert.Equal(HttpStatusCode.Redirect, erase.StatusCode);
            Assert.StartsWith("/Account/NotAllowed", PathOf(erase), StringComparison.Ordinal);
            await GetOkAsync(browser, $"/Clients/{clientId}");
        }
    }

    [Fact]
    [Trait("Category", TestServer.SqliteFileCategory)]   // sign-in cannot be off with a server database
    public async Task With_sign_in_off_the_person_at_the_PC_sees_every_link_and_no_sign_in_or_sign_out()
    {
        using var app = new ClinicApp();
        int clientId = 0;
        await app.WithDbAsync(async db =>
        {
            var client = new Client { Code = "LNK-OFF" };
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            clientId = client.Id;
        });
        using var browser = app.Browser();

        var page = await GetOkAsync(browser, $"/Clients/{clientId}");

        Assert.Contains($"href=\"/Clients/{clientId}/Export\"", page, StringComparison.Ordinal);
        Assert.Contains($"href=\"/Clients/{clientId}/Erase\"", page, StringComparison.Ordinal);
        Assert.Contains("href=\"/Admin/Users\"", page, StringComparison.Ordinal);
        Assert.DoesNotContain("Signed in as", page, StringComparison.Ordinal);
        Assert.DoesNotContain("href=\"/Account/SignIn\"", page, StringComparison.Ordinal);
    }

    [Fact]
    public async Task With_sign_in_on_a_visitor_sees_a_sign_in_link_and_no_admin_section()
    {
        using var app = new SignInApp();
        using var browser = app.Browser();

        var page = await GetOkAsync(browser, "/Account/SignIn");
        using var typed = await browser.GetAsync(new Uri("/Admin/Users", UriKind.Relative));

        Assert.Contains("href=\"/Account/SignIn\"", page, StringComparison.Ordinal);
        Assert.DoesNotContain("aria-label=\"Administration\"", page, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.Redirect, typed.StatusCode);
        Assert.StartsWith("/Account/SignIn", PathOf(typed), StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_sign_out_button_in_the_layout_signs_out()
    {
        using var app = new SignInApp();
        using var browser = await app.SignedInAsync(ClinicRoles.Clinician);
        var home = await GetOkAsync(browser, "/");

        using var signOut = await browser.PostFormAsync("/Account/SignOut", home, new Dictionary<string, string>());
        using var after = await browser.GetAsync(new Uri("/Clients", UriKind.Relative));

        Assert.Equal(HttpStatusCode.Redirect, signOut.StatusCode);
        Assert.Equal(HttpStatusCode.Redirect, after.StatusCode);
        Assert.StartsWith("/Account/SignIn", PathOf(after), StringComparison.Ordinal);
    }

    // A redirect's target path, whether the server wrote it absolute or relative.
    private static string PathOf(HttpResponseMessage response) =>
        response.Headers.Location is { IsAbsoluteUri: true } absolute ? absolute.PathAndQuery : response.Headers.Location?.OriginalString ?? "";

    private static string UserFor(string role) => "test." + role.ToLowerInvariant();

    private static async Task<string> GetOkAsync(HttpClient browser, string url)
    {
        using var response = await browser.GetAsync(new Uri(url, UriKind.Relative));
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, $"GET {url} gave {(int)response.StatusCode}");
        return body;
    }

    private static async Task AssertAllowedAsync(HttpClient browser, HttpMethod method, string url, bool allowed, string token)
    {
        using var request = new HttpRequestMessage(method, new Uri(url, UriKind.Relative));
        if (method == HttpMethod.Post)
        {
            request.Content = new FormUrlEncodedContent(new Dictionary<string, string> { ["__RequestVerificationToken"] = token });
        }

        using var response = await browser.SendAsync(request);
        if (allowed)
        {
            Assert.True(response.StatusCode == HttpStatusCode.OK, $"{method} {url} gave {(int)response.StatusCode}");
        }
        else
        {
            Assert.True(response.StatusCode == HttpStatusCode.Redirect, $"{method} {url} gave {(int)response.StatusCode}");
            Assert.StartsWith("/Account/NotAllowed", PathOf(response), StringComparison.Ordinal);
        }
    }

    /// <summary>The app with sign-in required on loopback, one account per role, over its own SQLite file.</summary>
    private sealed class SignInApp : WebApplicationFactory<Program>
    {
        private readonly string _data = Path.Combine(Path.GetTempPath(), "lowvisionaid-tests", Guid.NewGuid().ToString("N"));

        public HttpClient Browser() => CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });

        public async Task<int> AddClientAsync(string code)
        {
            await using var scope = Services.CreateAsyncScope();
            var db = scope.ServiceProvider.GetRequiredService<ClinicDbContext>();
            var client = new Client { Code = code };
            db.Clients.Add(client);
            await db.SaveChangesAsync();
            return client.Id;
        }

        public async Task<HttpClient> SignedInAsync(string role)
        {
            await using (var scope = Services.CreateAsyncScope())
            {
                var users = scope.ServiceProvider.GetRequiredService<UserManager<IdentityUser>>();
                var user = new IdentityUser(UserFor(role));
                Assert.True((await users.CreateAsync(user, Password)).Succeeded);
                Assert.True((await users.AddToRoleAsync(user, role)).Succeeded);
            }

            var browser = Browser();
            using var signIn = await browser.SubmitAsync("/Account/SignIn", new Dictionary<string, string> { ["Input.UserName"] = UserFor(role), ["Input.Password"] = Password });
            Assert.Equal(HttpStatusCode.Redirect, signIn.StatusCode);
            return browser;
        }

        protected override void ConfigureWebHost(IWebHostBuilder builder)
        {
            builder.UseSetting("DataFolder", _data);
            builder.UseSetting("LoadDemoClinic", "false");
            builder.UseSetting("Access:RequireSignIn", "true");
            builder.UseEnvironment("Production");
        }

        protected override void Dispose(bool disposing)
        {
            base.Dispose(disposing);
            SqliteConnection.ClearAllPools();
            if (Directory.Exists(_data))
            {
                Directory.Delete(_data, recursive: true);
            }
        }
    }
}
