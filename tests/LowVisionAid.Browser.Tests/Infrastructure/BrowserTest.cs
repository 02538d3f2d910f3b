namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// A browser test: a fresh browser context (own cookies, pinned locale and time zone) on the collection's server.
/// Concrete classes carry <c>[Collection(BrowserTestGroup.Name)]</c> and <c>[Trait("Category", "Browser")]</c>.
/// When the test fails, the page of its last named step (<see cref="Artifacts.ScreenshotAsync"/>) is saved.
/// </summary>
public abstract class BrowserTest(BrowserSession browser, AppServer app) : IAsyncLifetime
{
    private readonly List<IBrowserContext> _extraContexts = [];
    private IBrowserContext? _context;
    private IPage? _page;
    private int _failuresBefore;

    protected BrowserSession Browser { get; } = browser;

    protected AppServer App { get; } = app;

    protected IBrowserContext Context => _context ?? throw new InvalidOperationException("Not initialised.");

    protected IPage Page => _page ?? throw new InvalidOperationException("Not initialised.");

    public async Task InitializeAsync()
    {
        Artifacts.StartTest();
        _failuresBefore = FailureWatch.Count;
        _context = await Browser.NewContextAsync(App.BaseAddress);
        _page = await _context.NewPageAsync();
    }

    public async Task DisposeAsync()
    {
        if (FailureWatch.Count > _failuresBefore)
        {
            await Artifacts.CaptureFailureAsync(_page, GetType().Name);
        }

        foreach (var context in _extraContexts)
        {
            await context.DisposeAsync();
        }

        if (_context is not null)
        {
            await _context.DisposeAsync();
        }
    }

    /// <summary>A separate context with its own window size and pixel ratio (for reflow and zoom checks), closed after the test.</summary>
    protected async Task<IPage> NewPageAsync(int width, int height, float scale = 1, bool highContrast = false, bool largeText = false)
    {
        var context = await Browser.NewContextAsync(App.BaseAddress, width, height, scale);
        _extraContexts.Add(context);
        await SitePages.UseDisplayAsync(context, App.BaseAddress, highContrast, largeText);
        return await context.NewPageAsync();
    }
}
