using LowVisionAid.TestSupport;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>
/// The real app in process (Production environment, so no developer error pages) over its own SQLite file in a temp
/// folder, with every log line captured. A fresh folder starts from the migrated template database
/// (<see cref="TemplateDatabase"/>); a folder the test prepared keeps the database it holds.
/// </summary>
public sealed class ClinicApp : ClinicHost
{
    public ClinicApp(string purpose, bool loadDemo = true, IReadOnlyDictionary<string, string?>? settings = null, TempFolder? data = null)
        : this(data ?? new TempFolder(purpose), ownsData: data is null, loadDemo, settings)
    {
    }

    private ClinicApp(TempFolder data, bool ownsData, bool loadDemo, IReadOnlyDictionary<string, string?>? settings)
        : base(data.Path)
    {
        Data = data;
        OwnsData = ownsData;
        LoadDemo = loadDemo;
        Settings = settings ?? new Dictionary<string, string?>();
        LogCollector = Logs.Collector;
    }

    public TempFolder Data { get; }

    public CapturedLogs Logs { get; } = new();

    private bool OwnsData { get; }

    public FormClient NewClient() => new(NewBrowserClient());

    public T Service<T>(Func<IServiceProvider, T> use)
    {
        ArgumentNullException.ThrowIfNull(use);
        using var scope = Services.CreateScope();
        return use(scope.ServiceProvider);
    }

    public async Task<T> ServiceAsync<T>(Func<IServiceProvider, Task<T>> use)
    {
        ArgumentNullException.ThrowIfNull(use);
        await using var scope = Services.CreateAsyncScope();
        return await use(scope.ServiceProvider);
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
