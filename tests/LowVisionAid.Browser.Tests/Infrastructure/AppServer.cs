using System.Net;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// The app on real Kestrel at 127.0.0.1 on a free port, with its own data folder (and so its own SQLite file) in a
/// temp folder. One per test class (<c>IClassFixture&lt;AppServer&gt;</c>), so classes never share records.
/// </summary>
public sealed class AppServer : WebApplicationFactory<Program>
{
    private readonly string _dataFolder = Path.Combine(Path.GetTempPath(), "lva-browser-" + Guid.NewGuid().ToString("N"));
    private Uri? _baseAddress;

    public AppServer()
    {
        Directory.CreateDirectory(_dataFolder);
        UseKestrel(options => options.Listen(IPAddress.Loopback, 0));
    }

    /// <summary>The folder that holds this server's database.</summary>
    public string DataFolder => _dataFolder;

    /// <summary>The address the browser should open, e.g. http://127.0.0.1:41234/.</summary>
    public Uri BaseAddress
    {
        get
        {
            if (_baseAddress is null)
            {
                StartServer();
                var addresses = Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()!.Addresses;
                _baseAddress = new Uri(addresses.First(a => a.StartsWith("http://127.0.0.1:", StringComparison.Ordinal)) + "/");
            }

            return _baseAddress;
        }
    }

    /// <summary>An absolute address on this server.</summary>
    public Uri Url(string relative) => new(BaseAddress, relative.TrimStart('/'));

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        // Not Development: the friendly error pages are what a clinic sees, so they are what we test.
        builder.UseEnvironment("Testing");
        // Tells Program.cs an address is configured, so it does not claim the default port 5080.
        builder.UseSetting("urls", "http://127.0.0.1:0");
        // The clinic's data folder (the web branch's ClinicDataSetup.DataFolderKey): this class's own SQLite file.
        builder.UseSetting("DataFolder", _dataFolder);
        builder.ConfigureServices(services => services.AddSingleton<IStartupFilter, FaultInjection>());
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        if (disposing)
        {
            try
            {
                Directory.Delete(_dataFolder, recursive: true);
            }
            catch (IOException)
            {
                // A file still open on a slow file system; the temp folder is cleaned by the OS.
            }
        }
    }
}
