using System.Diagnostics;
using System.Net;
using System.Net.Sockets;

namespace LowVisionAid.Load;

/// <summary>
/// The app as a clinic runs it: its own process (the published build of LowVisionAid.Web), on 127.0.0.1 and a free
/// port, on a given data folder, in the Production environment. Stopped with SIGINT (a clean shutdown), killed if
/// it has not stopped within ten seconds.
/// </summary>
public sealed class AppProcess : IAsyncDisposable
{
    private readonly Process _process;

    private AppProcess(Process process, Uri address, TimeSpan startUp)
    {
        _process = process;
        Address = address;
        StartUp = startUp;
    }

    public Uri Address { get; }

    /// <summary>From starting the process to the first page answered (GET /).</summary>
    public TimeSpan StartUp { get; }

    /// <summary>The process's working set now, in bytes.</summary>
    public long WorkingSet
    {
        get
        {
            _process.Refresh();
            return _process.WorkingSet64;
        }
    }

    /// <summary>The largest working set the process has had, in bytes.</summary>
    public long PeakWorkingSet
    {
        get
        {
            _process.Refresh();
            return _process.PeakWorkingSet64;
        }
    }

    // The content root, where wwwroot is: a published app's own folder; for a build in bin/Release/net10.0, the
    // project folder, as `dotnet run` uses.
    private static string ContentRoot(string webDll)
    {
        var folder = Path.GetDirectoryName(Path.GetFullPath(webDll))!;
        return Directory.Exists(Path.Combine(folder, "wwwroot")) ? folder : Path.GetFullPath(Path.Combine(folder, "..", "..", ".."));
    }

    public static async Task<AppProcess> StartAsync(string webDll, string dataFolder, bool loadDemo)
    {
        var port = FreeLoopbackPort();
        var address = new Uri($"http://127.0.0.1:{port}/");
        var info = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = ContentRoot(webDll),
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in new[] { webDll, "--urls", address.ToString().TrimEnd('/'), "--DataFolder", dataFolder, "--LoadDemoClinic", loadDemo ? "true" : "false" })
        {
            info.ArgumentList.Add(arg);
        }

        info.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        info.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        var clock = Stopwatch.StartNew();
        var process = Process.Start(info) ?? throw new InvalidOperationException("dotnet did not start.");
        process.OutputDataReceived += (_, _) => { };
        process.ErrorDataReceived += (_, _) => { };
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        using var client = new HttpClient { Timeout = TimeSpan.FromSeconds(5) };
        while (clock.Elapsed < TimeSpan.FromMinutes(3))
        {
            if (process.HasExited)
            {
                throw new InvalidOperationException($"The app stopped at start with exit code {process.ExitCode}.");
            }

            try
            {
                using var response = await client.GetAsync(address);
                if (response.StatusCode == HttpStatusCode.OK)
                {
                    return new AppProcess(process, address, clock.Elapsed);
                }
            }
            catch (HttpRequestException)
            {
                // Not listening yet.
            }

            await Task.Delay(10);
        }

        process.Kill(entireProcessTree: true);
        throw new TimeoutException("The app did not answer within three minutes.");
    }

    public async ValueTask DisposeAsync()
    {
        if (!_process.HasExited)
        {
            using (var interrupt = Process.Start("kill", ["-INT", _process.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)]))
            {
                await interrupt.WaitForExitAsync();
            }

            using var wait = new CancellationTokenSource(TimeSpan.FromSeconds(10));
            try
            {
                await _process.WaitForExitAsync(wait.Token);
            }
            catch (OperationCanceledException)
            {
                _process.Kill(entireProcessTree: true);
                await _process.WaitForExitAsync();
            }
        }

        _process.Dispose();
    }

    private static int FreeLoopbackPort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }
}
