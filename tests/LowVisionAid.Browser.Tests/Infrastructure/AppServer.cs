using System.Net;
using LowVisionAid.TestSupport;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Browser.Tests.Infrastructure;

/// <summary>
/// The app on real Kestrel at 127.0.0.1 on a free port, with its own data folder (its own SQLite file, copied from
/// the migrated template) and the demo clinic. One per collection: every class in <see cref="BrowserTestGroup"/>
/// shares it, so each test makes records with codes of its own and never changes the demo clinic's. A class that
/// still declares <c>IClassFixture&lt;AppServer&gt;</c> gets a server of its own.
/// </summary>
public sealed class AppServer : ClinicHost
{
    private Uri? _baseAddress;

    public AppServer()
    {
        // Not Development: the friendly error pages are what a clinic sees, so they are what we test.
        EnvironmentName = "Testing";
        LoadDemo = true;
        // Tells Program.cs an address is configured, so it does not claim the default port 5080.
        Settings = new Dictionary<string, string?> { ["urls"] = "http://127.0.0.1:0" };
        UseKestrel(options => options.Listen(IPAddress.Loopback, 0));
    }

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
        ArgumentNullException.ThrowIfNull(builder);
        base.ConfigureWebHost(builder);
        builder.ConfigureServices(services => services.AddSingleton<IStartupFilter, FaultInjection>());
    }
}
