using LowVisionAid.Browser.Tests.Infrastructure;
using LowVisionAid.Browser.Tests.PageObjects;

namespace LowVisionAid.Browser.Tests;

/// <summary>
/// The pages only a signed-in user reaches (changing one's own password) and the account list as an administrator
/// sees it with another account on it (its Disable and Unlock buttons): the same axe scan, 320 px reflow and 200 %
/// zoom checks as every other page (WCAG 2.2 AA, 1.4.4 and 1.4.10), on a server that requires sign-in.
/// </summary>
[Collection(BrowserTestGroup.Name)]
[Trait("Category", "Browser")]
public sealed class SignedInPagesTests(BrowserSession browser, SignedInPagesTests.SignInServer app)
    : BrowserTest(browser, app), IClassFixture<SignedInPagesTests.SignInServer>
{
    private const string AdminName = "admin.scan";
    private const string AdminPassword = "a long enough password";

    /// <summary>Its own server with sign-in required and no accounts yet (the first run makes the administrator).</summary>
    public sealed class SignInServer : AppServer
    {
        public SignInServer() => Settings = new Dictionary<string, string?>(Settings) { ["Access:RequireSignIn"] = "true" };

        private readonly SemaphoreSlim _once = new(1, 1);
        private bool _accountsMade;

        /// <summary>Makes the administrator and a clinician account once, through the app's own pages.</summary>
        public async Task MakeAccountsOnceAsync(IPage page)
        {
            await _once.WaitAsync();
            try
            {
                if (_accountsMade)
                {
                    return;
                }

                await page.GotoAsync("Admin/FirstRun");
                await page.GetByLabel("User name").FillAsync(AdminName);
                await page.GetByLabel("Password", new() { Exact = true }).FillAsync(AdminPassword);
                await page.GetByRole(AriaRole.Button, new() { Name = "Create administrator" }).ClickAsync();
                await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Level = 1 })).ToHaveTextAsync("Users");
                await page.GetByLabel("User name").FillAsync("t.teacher");
                await page.GetByLabel("Password", new() { Exact = true }).FillAsync("another long password");
                await page.GetByLabel("Role").SelectOptionAsync("Teacher");
                await page.GetByRole(AriaRole.Button, new() { Name = "Add account" }).ClickAsync();
                await Assertions.Expect(page.GetByText("Account t.teacher created.")).ToBeVisibleAsync();
                _accountsMade = true;
            }
            finally
            {
                _once.Release();
            }
        }

        protected override void Dispose(bool disposing)
        {
            if (disposing)
            {
                _once.Dispose();
            }

            base.Dispose(disposing);
        }
    }

    public static TheoryData<string, string, bool> Pages() => new()
    {
        { "Account/ChangePassword", "Change password", false },
        { "Account/ChangePassword", "Change password", true },
        { "Admin/Users", "Users", false },
        { "Admin/Users", "Users", true },
    };

    [Theory]
    [MemberData(nameof(Pages))]
    public async Task A_signed_in_page_passes_the_axe_scan_in_both_colour_schemes(string path, string heading, bool highContrast)
    {
        // Arrange
        await SignInAsync(Page);
        await SitePages.UseDisplayAsync(Context, App.BaseAddress, highContrast, largeText: false);

        // Act
        await Page.GotoAsync(path);

        // Assert
        await Assertions.Expect(new SiteChrome(Page).Heading).ToHaveTextAsync(heading);
        if (path == "Admin/Users")
        {
            await Assertions.Expect(Page.GetByRole(AriaRole.Button, new() { Name = "Disable t.teacher" })).ToBeVisibleAsync();
            // The account in use is not offered a button that would only be refused.
            await Assertions.Expect(Page.GetByRole(AriaRole.Button, new() { Name = "Disable " + AdminName })).ToHaveCountAsync(0);
        }

        await Artifacts.ScreenshotAsync(Page, $"scan-{path}-{(highContrast ? "contrast" : "standard")}");
        await AxeScan.AssertNoViolationsAsync(Page, $"/{path} signed in ({(highContrast ? "high contrast" : "standard colours")})");
    }

    [Fact]
    public async Task The_password_change_form_with_its_errors_passes_the_axe_scan_and_names_both_mistakes()
    {
        // Arrange
        await SignInAsync(Page);
        await Page.GotoAsync("Account/ChangePassword");

        // Act: nothing typed in the current password, a new one too short.
        await Page.GetByLabel("New password").FillAsync("short");
        await Page.GetByRole(AriaRole.Button, new() { Name = "Change password" }).ClickAsync();

        // Assert
        var summary = Page.GetByRole(AriaRole.Alert);
        await Assertions.Expect(summary).ToContainTextAsync("Type your current password.");
        await Assertions.Expect(summary).ToContainTextAsync("at least 10 characters");
        // A password box is as large as every other text box (it had the browser's small default).
        var box = await Page.GetByLabel("New password").BoundingBoxAsync();
        var nameBox = await Page.GetByLabel("Current password").BoundingBoxAsync();
        Assert.True(box is { Height: >= 40 } && nameBox is { Height: >= 40 }, $"Password boxes are {box?.Height} and {nameBox?.Height} CSS px tall; text boxes are at least 44 (2.75rem).");
        await Artifacts.ScreenshotAsync(Page, "scan-change-password-errors");
        await AxeScan.AssertNoViolationsAsync(Page, "/Account/ChangePassword with errors");
    }

    [Theory]
    [InlineData("Account/ChangePassword", "Change password")]
    [InlineData("Admin/Users", "Users")]
    public async Task A_signed_in_page_reflows_at_320_css_pixels_and_works_at_200_percent_zoom(string path, string heading)
    {
        foreach (var (width, height, scale, name) in new[] { (320, 256, 1f, "320 CSS px with large text"), (640, 450, 2f, "200% zoom") })
        {
            // Arrange
            var page = await NewPageAsync(width, height, scale, largeText: width == 320);
            await SignInAsync(page);
            var chrome = new SiteChrome(page);

            // Act
            await page.GotoAsync(path);

            // Assert
            await Assertions.Expect(chrome.Heading).ToHaveTextAsync(heading);
            await Artifacts.ScreenshotAsync(page, $"layout-{path}-{width}", fullPage: false);
            Assert.False(await chrome.ScrollsSidewaysAsync(), $"/{path} scrolls sideways at {name}.");
            await LayoutTests.AssertNothingRunsOffTheWindowAsync(page, $"/{path} at {name}");
        }
    }

    private async Task SignInAsync(IPage page)
    {
        await ((SignInServer)App).MakeAccountsOnceAsync(page);
        await page.GotoAsync("Account/SignIn");
        if (await page.GetByRole(AriaRole.Heading, new() { Level = 1 }).TextContentAsync() != "Sign in")
        {
            return;
        }

        await page.GetByLabel("User name").FillAsync(AdminName);
        await page.GetByLabel("Password", new() { Exact = true }).FillAsync(AdminPassword);
        await page.GetByRole(AriaRole.Button, new() { Name = "Sign in" }).ClickAsync();
        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Level = 1 })).Not.ToHaveTextAsync("Sign in");
    }
}
