namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// Screenshots, in test-artifacts/screenshots/ at the repository root (git ignores it). A test names its steps with
/// <see cref="ScreenshotAsync"/>; the picture is taken only when the test fails (<see cref="BrowserTest"/> takes the
/// last named step's page then), or at every step when LVA_SCREENSHOTS=all (for looking the pages over).
/// </summary>
public static class Artifacts
{
    /// <summary>Set to "all" to save a screenshot at every named step, failing or not.</summary>
    public const string ScreenshotsVariable = "LVA_SCREENSHOTS";

    private static readonly Lazy<string> Screenshots = new(() =>
    {
        var folder = Path.Combine(FindRepositoryRoot(), "test-artifacts", "screenshots");
        Directory.CreateDirectory(folder);
        return folder;
    });

    // After a full-page capture chromium reports the page scrolled to its end to scripts, while input is still
    // hit-tested at the old scroll offset; the next click is then aimed from the wrong place (on a long form it lands
    // on the form, not on its button, and nothing is sent). Scrolling once for real, back to where the page was,
    // puts the two in step again.
    private const string RestoreScroll = """
        async ([x, y]) => {
            const frame = () => new Promise(resolve => requestAnimationFrame(() => resolve()));
            window.scrollTo(x, y === 0 ? 1 : y - 1);
            await frame();
            window.scrollTo(x, y);
            await frame();
        }
        """;

    private static (IPage Page, string Name, bool FullPage)? _lastStep;

    public static bool EveryStep => string.Equals(Environment.GetEnvironmentVariable(ScreenshotsVariable), "all", StringComparison.OrdinalIgnoreCase);

    /// <summary>
    /// Names a step and returns where its screenshot goes. The picture is saved now only when LVA_SCREENSHOTS=all;
    /// otherwise only if the test fails after this step. The page stays scrolled as it was.
    /// </summary>
    public static async Task<string> ScreenshotAsync(IPage page, string name, bool fullPage = true)
    {
        ArgumentNullException.ThrowIfNull(page);
        var path = PathFor(name);
        _lastStep = (page, name, fullPage);
        if (EveryStep)
        {
            await CaptureAsync(page, path, fullPage);
        }

        return path;
    }

    /// <summary>Forgets the last step (a new test starts).</summary>
    internal static void StartTest() => _lastStep = null;

    /// <summary>Saves a screenshot of the failing test's last named step's page (or <paramref name="fallback"/>).</summary>
    internal static async Task<string?> CaptureFailureAsync(IPage? fallback, string testClass)
    {
        var (page, name, fullPage) = _lastStep ?? (fallback!, testClass, true);
        if (page is null || page.IsClosed)
        {
            return null;
        }

        var path = PathFor("failed-" + name);
        try
        {
            await CaptureAsync(page, path, fullPage);
            return path;
        }
        catch (PlaywrightException)
        {
            // The page is gone with the failure (a crashed or closed context): nothing to picture.
            return null;
        }
    }

    private static string PathFor(string name)
    {
        var safe = string.Concat(name.Select(c => char.IsLetterOrDigit(c) || c is '-' or '_' ? c : '-'));
        return Path.Combine(Screenshots.Value, safe + ".png");
    }

    private static async Task CaptureAsync(IPage page, string path, bool fullPage)
    {
        var scroll = fullPage ? await page.EvaluateAsync<double[]>("() => [window.scrollX, window.scrollY]") : null;
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = path, FullPage = fullPage });
        if (scroll is not null)
        {
            await page.EvaluateAsync(RestoreScroll, scroll);
        }
    }

    private static string FindRepositoryRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "LowVisionAid.sln")))
            {
                return dir.FullName;
            }
        }

        return Directory.GetCurrentDirectory();
    }
}
