using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>
/// The real app in process (Production environment, so no developer error pages) over its own SQLite file in a temp
/// folder, with every log line captured.
/// </summary>
public sealed class ClinicApp : WebApplicationFactory<Program>
{
    private readonly bool _loadDemo;
    private readonly IReadOnlyDictionary<string, string?> _settings;

    public ClinicApp(string purpose, bool loadDemo = true, IReadOnlyDictionary<string, string?>? settings = null, TempFolder? data = null)
    {
        _loadDemo = loadDemo;
        _settings = settings ?? new Dictionary<string, string?>();
        OwnsData = data is null;
        Data = data ?? new TempFolder(purpose);
    }

    public TempFolder Data { get; }

    public CapturedLogs Logs { get; } = new();

    private bool OwnsData { get; }

    public FormClient NewClient() => new(CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true }));

    public T Service<T>(Func<IServiceProvider, T> use)
    {
        using var scope = Services.CreateScope();
        return use(scope.ServiceProvider);
    }

    public async Task<T> ServiceAsync<T>(Func<IServiceProvider, Task<T>> use)
    {
        await using var scope = Services.CreateAsyncScope();
        return await use(scope.ServiceProvider);
    }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseEnvironment("Production");
        builder.UseSetting("DataFolder", Data.Path);
        builder.UseSetting("LoadDemoClinic", _loadDemo ? "true" : "false");
        foreach (var (key, value) in _settings)
        {
            builder.UseSetting(key, value);
        }

        // Only the capture sees every line (Debug and up, above the app's appsettings.json levels; the privacy pin on
        // the framework's request lines still holds); the console stays quiet so the runs stay fast.
        foreach (var category in new[] { "Default", "LowVisionAid", "Microsoft.AspNetCore", "Microsoft.EntityFrameworkCore" })
        {
            builder.UseSetting("Logging:LogLevel:" + category, "Debug");
        }

        builder.ConfigureLogging(logging =>
        {
            logging.ClearProviders();
            logging.SetMinimumLevel(LogLevel.Debug);
            logging.AddProvider(Logs);
        });
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing && OwnsData)
        {
            Data.Dispose();
        }
    }
}
