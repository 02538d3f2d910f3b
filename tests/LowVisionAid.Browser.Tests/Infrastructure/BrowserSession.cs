namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// One headless Debian chromium for the whole run, driven by Playwright. Never downloads a browser: if chromium
/// is missing, every browser test fails with a message saying how to install it.
/// </summary>
public sealed class BrowserSession : IAsyncLifetime
{
    /// <summary>The browser used unless LVA_CHROMIUM names another executable.</summary>
    public const string DefaultExecutable = "/usr/bin/chromium";

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
        var executable = Environment.GetEnvironmentVariable("LVA_CHROMIUM") is { Length: > 0 } configured ? configured : DefaultExecutable;
        if (!File.Exists(executable))
        {
            throw new InvalidOperationException(
                $"Chromium was not found at {executable}. Install Debian's package (apt-get install -y chromium) or set " +
                "LVA_CHROMIUM to a chromium executable. The browser tests never download a browser.");
        }

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
