namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// One headless Debian chromium for the whole run, driven by Playwright. Never downloads a browser: if chromium
/// is missing, every browser test fails with a message saying how to install it.
/// </summary>
/// <remarks>
/// The default is Debian's <c>chromium-headless-shell</c>: the same chromium (source package and version) built as
/// the headless shell, which draws a page only when asked instead of compositing frames as the full browser's
/// headless mode does. The suite's checks (axe rules, reflow, 200 % zoom, keyboard) run in the same Blink either way;
/// the shell took the accessibility scans from 96 to 61 s and the whole suite from 5 min 9 s to 2 min 24 s
/// (docs/performance.md). Without the shell the full browser is used.
/// </remarks>
public sealed class BrowserSession : IAsyncLifetime
{
    /// <summary>The browsers tried in order unless LVA_CHROMIUM names another executable: the headless shell, then the full browser.</summary>
    public static readonly IReadOnlyList<string> DefaultExecutables = ["/usr/bin/chromium-headless-shell", "/usr/bin/chromium"];

    private static readonly string[] LaunchArgs =
    [
        "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
        "--disable-background-networking", "--disable-component-update", "--disable-sync",
    ];

    private IPlaywright? _playwright;
    private IBrowser? _browser;

    public IBrowser Browser => _browser ?? throw new InvalidOperationException("The browser has not started.");

    public async Task InitializeAsync()
    {
        var candidates = Environment.GetEnvironmentVariable("LVA_CHROMIUM") is { Length: > 0 } configured ? [configured] : DefaultExecutables;
        var executable = candidates.FirstOrDefault(File.Exists) ?? throw new InvalidOperationException(
            $"Chromium was not found at {string.Join(" or ", candidates)}. Install Debian's package (apt-get install -y " +
            "chromium-headless-shell) or set LVA_CHROMIUM to a chromium executable. The browser tests never download a browser.");

        // Keep Playwright from looking for (or fetching) its own browser builds.
        Environment.SetEnvironmentVariable("PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD", "1");
        _playwright = await Playwright.CreateAsync();
        _browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = executable,
            Headless = true,
            Args = LaunchArgs,
        });
    }

    public async Task DisposeAsync()
    {
        if (_browser is not null)
        {
            await _browser.DisposeAsync();
        }

        _playwright?.Dispose();
    }

    /// <summary>
    /// A fresh context (its own cookies) with the locale and time zone pinned, so dates and numbers render the same
    /// on every machine.
    /// </summary>
    public async Task<IBrowserContext> NewContextAsync(Uri baseAddress, int width = 1280, int height = 900, float scale = 1)
    {
        var context = await Browser.NewContextAsync(new BrowserNewContextOptions
        {
            BaseURL = baseAddress.ToString(),
            Locale = "en-GB",
            TimezoneId = "Europe/London",
            ViewportSize = new ViewportSize { Width = width, Height = height },
            DeviceScaleFactor = scale,
            ReducedMotion = ReducedMotion.Reduce,
        });
        context.SetDefaultTimeout(15_000);
        return context;
    }
}

[CollectionDefinition(Name)]
public sealed class BrowserTestGroup : ICollectionFixture<BrowserSession>, ICollectionFixture<AppServer>
{
    /// <summary>Every browser test class joins this collection, so they share one chromium and one app server and run one at a time.</summary>
    public const string Name = "Browser";
}
