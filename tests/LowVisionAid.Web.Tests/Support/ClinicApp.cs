using LowVisionAid.Data;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Web.Tests.Support;

/// <summary>
/// The app over its own SQLite file in a fresh temporary folder, migrated at start as in production.
/// The demo clinic is off unless a test asks for it, so each test sees only the records it makes. A test that
/// depends on today's date passes its own clock.
/// </summary>
public sealed class ClinicApp(bool loadDemo = false, TimeProvider? clock = null) : WebApplicationFactory<Program>
{
    public string DataFolder { get; } = Path.Combine(Path.GetTempPath(), "lowvisionaid-tests", Guid.NewGuid().ToString("N"));

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting("DataFolder", DataFolder);
        builder.UseSetting("LoadDemoClinic", loadDemo ? "true" : "false");
        builder.UseEnvironment("Production");
        if (clock is not null)
        {
            builder.ConfigureTestServices(services => services.AddSingleton(clock));
        }
    }

    /// <summary>A client that keeps cookies (for antiforgery) and does not follow redirects.</summary>
    public HttpClient Browser() => CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });

    public async Task<T> WithDbAsync<T>(Func<ClinicDbContext, Task<T>> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        await using var scope = Services.CreateAsyncScope();
        return await work(scope.ServiceProvider.GetRequiredService<ClinicDbContext>());
    }

    public async Task WithDbAsync(Func<ClinicDbContext, Task> work)
    {
        ArgumentNullException.ThrowIfNull(work);
        await using var scope = Services.CreateAsyncScope();
        await work(scope.ServiceProvider.GetRequiredService<ClinicDbContext>());
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        SqliteConnection.ClearAllPools();
        if (Directory.Exists(DataFolder))
        {
            Directory.Delete(DataFolder, recursive: true);
        }
    }
}
