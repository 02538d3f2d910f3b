namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// A browser test: a fresh browser context (own cookies, pinned locale and time zone) on the class's own server.
/// Concrete classes carry <c>[Collection(BrowserTestGroup.Name)]</c> and <c>[Trait("Category", "Browser")]</c>.
/// </summary>
public abstract class BrowserTest(BrowserSession browser, AppServer app) : IAsyncLifetime
{
    private IBrowserContext? _context;
    private IPage? _page;

    protected BrowserSession Browser { get; } = browser;

    protected AppServer App { get; } = app;

    protected IBrowserContext Context => _context ?? throw new InvalidOperationException("Not initialised.");

    protected IPage Page => _page ?? throw new InvalidOperationException("Not initialised.");

    public async Task InitializeAsync()
    {
        _context = await Browser.NewContextAsync(App.BaseAddress);
        _page = await _context.NewPageAsync();
    }

    public async Task DisposeAsync()
    {
        if (_context is not null)
        {
            await _context.DisposeAsync();
        }
    }

    /// <summary>A separate context with its own window size and pixel ratio (for reflow and zoom checks).</summary>
    protected async Task<IPage> NewPageAsync(int width, int height, float scale = 1, bool highContrast = false, bool largeText = false)
    {
        var context = await Browser.NewContextAsync(App.BaseAddress, width, height, scale);
        await SitePages.UseDisplayAsync(context, App.BaseAddress, highContrast, largeText);
        return await context.NewPageAsync();
    }
}
