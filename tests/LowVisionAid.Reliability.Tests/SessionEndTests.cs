using System.Net;
using LowVisionAid.Data.Access;
using LowVisionAid.Reliability.Tests.Support;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests;

/// <summary>
/// A copy of a sign-in cookie (taken from the browser, or from a shared PC) stops working when its session ends on
/// the server: after signing out, after a password change, and after an administrator disables the account.
/// </summary>
public sealed class SessionEndTests
{
    private const string CookieName = "LowVisionAid.SignIn";

    [Fact]
    public async Task A_copied_sign_in_cookie_is_refused_after_signing_out()
    {
        using var app = new ClinicApp("session-signout", settings: Accounts.SignInOn);
        using var admin = app.NewClient();
        await Accounts.CreateFirstAdministratorAsync(admin);
        var copied = await SignInAndCopyCookieAsync(admin, Accounts.AdminName, Accounts.AdminPassword);
        using var thief = RawClient(app);
        Assert.Equal(HttpStatusCode.OK, await StatusWithAsync(thief, copied, "/Admin/Users"));

        using (var signOut = await admin.PostFormAsync("/", [], postUrl: "/Account/SignOut"))
        {
            Assert.Equal(HttpStatusCode.Redirect, signOut.StatusCode);
        }

        Assert.Equal(HttpStatusCode.Redirect, await StatusWithAsync(thief, copied, "/Admin/Users"));
    }

    [Fact]
    public async Task A_copied_sign_in_cookie_is_refused_after_the_password_is_changed_and_the_changer_stays_signed_in()
    {
        using var app = new ClinicApp("session-password", settings: Accounts.SignInOn);
        using var admin = app.NewClient();
        await Accounts.CreateFirstAdministratorAsync(admin);
        var copied = await SignInAndCopyCookieAsync(admin, Accounts.AdminName, Accounts.AdminPassword);
        using var thief = RawClient(app);
        Assert.Equal(HttpStatusCode.OK, await StatusWithAsync(thief, copied, "/Admin/Users"));

        using var change = await admin.PostFormAsync("/Account/ChangePassword",
            [new("Input.CurrentPassword", Accounts.AdminPassword), new("Input.NewPassword", "a new and longer password")]);
        var body = WebUtility.HtmlDecode(await change.Content.ReadAsStringAsync());

        Assert.Contains(LowVisionAid.Web.Pages.Account.ChangePasswordModel.Changed, body, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.Redirect, await StatusWithAsync(thief, copied, "/Admin/Users"));
        await admin.GetPageAsync("/Admin/Users");
        using var fresh = app.NewClient();
        using var oldPassword = await Accounts.SignInAsync(fresh, Accounts.AdminName, Accounts.AdminPassword);
        using var newPassword = await Accounts.SignInAsync(fresh, Accounts.AdminName, "a new and longer password");
        Assert.Equal(HttpStatusCode.OK, oldPassword.StatusCode);
        Assert.Equal(HttpStatusCode.Redirect, newPassword.StatusCode);
    }

    [Fact]
    [Trait("Category", "Slow")]
    public async Task A_copied_sign_in_cookie_is_refused_after_an_administrator_disables_the_account()
    {
        using var app = new ClinicApp("session-disable", settings: Accounts.SignInOn);
        using var admin = app.NewClient();
        await Accounts.CreateFirstAdministratorAsync(admin);
        await Accounts.AddAccountAsync(admin, "c.clinician", "clinician password 1", ClinicRoles.Clinician);
        using var clinician = app.NewClient();
        var copied = await SignInAndCopyCookieAsync(clinician, "c.clinician", "clinician password 1");
        using var thief = RawClient(app);
        Assert.Equal(HttpStatusCode.OK, await StatusWithAsync(thief, copied, "/Clients"));
        var id = await app.ServiceAsync(async sp => (await sp.GetRequiredService<UserManager<IdentityUser>>().FindByNameAsync("c.clinician"))!.Id);

        using var disable = await admin.PostFormAsync("/Admin/Users", [], postUrl: "/Admin/Users?id=" + Uri.EscapeDataString(id) + "&handler=Disable");
        var body = WebUtility.HtmlDecode(await disable.Content.ReadAsStringAsync());

        Assert.Contains("Account c.clinician disabled", body, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.Redirect, await StatusWithAsync(thief, copied, "/Clients"));
        Assert.Equal(HttpStatusCode.Redirect, (await clinician.Http.GetAsync(new Uri("/Clients", UriKind.Relative))).StatusCode);
        using var again = await Accounts.SignInAsync(app.NewClient(), "c.clinician", "clinician password 1");
        Assert.Equal(HttpStatusCode.OK, again.StatusCode);
    }

    private static async Task<string> SignInAndCopyCookieAsync(FormClient client, string name, string password)
    {
        using var response = await Accounts.SignInAsync(client, name, password);
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var setCookie = response.Headers.GetValues("Set-Cookie").Single(c => c.StartsWith(CookieName + "=", StringComparison.Ordinal));
        return setCookie.Split(';')[0];
    }

    private static HttpClient RawClient(ClinicApp app) =>
        app.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = false });

    private static async Task<HttpStatusCode> StatusWithAsync(HttpClient client, string cookie, string url)
    {
        using var request = new HttpRequestMessage(HttpMethod.Get, new Uri(url, UriKind.Relative));
        request.Headers.Add("Cookie", cookie);
        using var response = await client.SendAsync(request);
        return response.StatusCode;
    }
}
