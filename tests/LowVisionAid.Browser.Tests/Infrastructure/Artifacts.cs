namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>Where screenshots go: test-artifacts/screenshots/ at the repository root (git ignores it).</summary>
public static class Artifacts
{
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

    /// <summary>Saves a full-page screenshot under a readable name and returns its path; the page stays scrolled as it was.</summary>
    public static async Task<string> ScreenshotAsync(IPage page, string name, bool fullPage = true)
    {
        ArgumentNullException.ThrowIfNull(page);
        var safe = string.Concat(name.Select(c => char.IsLetterOrDigit(c) || c is '-' or '_' ? c : '-'));
        var path = Path.Combine(Screenshots.Value, safe + ".png");
        var scroll = fullPage ? await page.EvaluateAsync<double[]>("() => [window.scrollX, window.scrollY]") : null;
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = path, FullPage = fullPage });
        if (scroll is not null)
        {
            await page.EvaluateAsync(RestoreScroll, scroll);
        }

        return path;
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
