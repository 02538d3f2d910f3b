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

    /// <summary>Saves a full-page screenshot under a readable name and returns its path.</summary>
    public static async Task<string> ScreenshotAsync(IPage page, string name, bool fullPage = true)
    {
        ArgumentNullException.ThrowIfNull(page);
        var safe = string.Concat(name.Select(c => char.IsLetterOrDigit(c) || c is '-' or '_' ? c : '-'));
        var path = Path.Combine(Screenshots.Value, safe + ".png");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = path, FullPage = fullPage });
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
