using System.Diagnostics;
using System.Net;
using System.Net.Sockets;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>
/// The built app started as a real process on 127.0.0.1 (a free port) over its own data folder, reached over loopback.
/// Only ever loopback: the app refuses anything else without Access:AllowLan.
/// </summary>
public sealed class AppProcess : IDisposable
{
    private const int KeptLines = 200;
    private readonly Process _process;
    private readonly Queue<string> _lastLines = new();
    private readonly List<(string Text, TaskCompletionSource Seen)> _watches = [];
    private bool _disposed;

    private readonly string _readyPath;

    private AppProcess(Process process, Uri address, string readyPath)
    {
        _process = process;
        Address = address;
        _readyPath = readyPath;
    }

    public Uri Address { get; }

    public bool HasExited => _process.HasExited;

    public static string WebAssemblyPath()
    {
        var testFolder = AppContext.BaseDirectory;                         // …/tests/X/bin/<Configuration>/net10.0/
        var configuration = new DirectoryInfo(testFolder).Parent!.Name;    // Debug or Release
        var root = new DirectoryInfo(testFolder);
        while (root is not null && !File.Exists(Path.Combine(root.FullName, "LowVisionAid.sln")))
        {
            root = root.Parent;
        }

        var dll = Path.Combine(root!.FullName, "src", "LowVisionAid.Web", "bin", configuration, "net10.0", "LowVisionAid.Web.dll");
        return File.Exists(dll) ? dll : throw new FileNotFoundException("Build the web app first (dotnet build).", dll);
    }

    public static int FreeLoopbackPort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    /// <summary>
    /// Starts the app; <paramref name="waitUntilReady"/> polls GET <paramref name="readyPath"/> until it answers 200 (at
    /// most <paramref name="timeout"/>). <paramref name="environment"/> adds settings as environment variables (such as
    /// <c>Database__ConnectionString</c>, whose password must not appear on a command line).
    /// </summary>
    public static async Task<AppProcess> StartAsync(
        string dataFolder, bool loadDemo, TimeSpan timeout, bool waitUntilReady = true, IReadOnlyDictionary<string, string>? environment = null, string readyPath = "/")
    {
        var dll = WebAssemblyPath();
        var port = FreeLoopbackPort();
        var address = new Uri($"http://127.0.0.1:{port}");
        var start = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = Path.GetDirectoryName(Path.GetDirectoryName(Path.GetDirectoryName(Path.GetDirectoryName(dll))))!,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in new[] { dll, "--urls", address.ToString().TrimEnd('/'), "--DataFolder", dataFolder, "--LoadDemoClinic", loadDemo ? "true" : "false", "--Logging:LogLevel:Default", "Warning" })
        {
            start.ArgumentList.Add(arg);
        }

        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        start.Environment["DOTNET_gcServer"] = "0";
        foreach (var (name, value) in environment ?? new Dictionary<string, string>())
        {
            start.Environment[name] = value;
        }

        // Both pipes are always read to the end: an unread pipe fills and blocks the app's next write to its console.
        var process = Process.Start(start)!;
        var app = new AppProcess(process, address, readyPath);
        process.OutputDataReceived += (_, e) => app.Received(e.Data);
        process.ErrorDataReceived += (_, e) => app.Received(e.Data);
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
        if (waitUntilReady)
        {
            try
            {
                await app.WaitUntilReadyAsync(timeout);
            }
            catch
            {
                app.Dispose();   // a start that never answered is killed, not left running after the test
                throw;
            }
        }

        return app;
    }

    /// <summary>
    /// Runs the app with <paramref name="args"/> (after the data folder) until it exits by itself, at most
    /// <paramref name="timeout"/> (then it is killed and the result says so): for starts that must refuse.
    /// </summary>
    public static async Task<(int? ExitCode, string Output)> RunToExitAsync(string dataFolder, IEnumerable<string> args, TimeSpan timeout)
    {
        var dll = WebAssemblyPath();
        var start = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = Path.GetDirectoryName(dll)!,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in new[] { dll, "--DataFolder", dataFolder }.Concat(args))
        {
            start.ArgumentList.Add(arg);
        }

        start.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        using var limit = new CancellationTokenSource(timeout);
        try
        {
            await process.WaitForExitAsync(limit.Token);
        }
        catch (OperationCanceledException)
        {
            process.Kill(entireProcessTree: true);
            await process.WaitForExitAsync();
            return (null, await output + await error);
        }

        return (process.ExitCode, await output + await error);
    }

    public async Task WaitUntilReadyAsync(TimeSpan timeout)
    {
        using var http = new HttpClient { BaseAddress = Address, Timeout = TimeSpan.FromSeconds(5) };
        var deadline = DateTime.UtcNow + timeout;
        while (DateTime.UtcNow < deadline)
        {
            if (_process.HasExited)
            {
                throw new InvalidOperationException($"The app exited with code {_process.ExitCode} while starting. Its last output:\n{LastOutput()}");
            }

            try
            {
                using var response = await http.GetAsync(new Uri(_readyPath, UriKind.Relative));
                if (response.StatusCode == HttpStatusCode.OK)
                {
                    return;
                }
            }
            catch (HttpRequestException)
            {
            }
            catch (TaskCanceledException)
            {
            }

            await Task.Delay(100);
        }

        throw new TimeoutException($"The app did not answer on {Address} within {timeout}. Its last output:\n{LastOutput()}");
    }

    /// <summary>Waits (at most <paramref name="timeout"/>) until the app writes a line containing <paramref name="text"/>.</summary>
    public async Task<bool> WaitForOutputAsync(string text, TimeSpan timeout)
    {
        var seen = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        lock (_lastLines)
        {
            if (HasWritten(text))
            {
                return true;
            }

            _watches.Add((text, seen));
        }

        return await Task.WhenAny(seen.Task, Task.Delay(timeout)) == seen.Task;
    }

    /// <summary>Whether the app has written a line containing <paramref name="text"/> (among its last lines kept).</summary>
    public bool HasWritten(string text)
    {
        lock (_lastLines)
        {
            return _lastLines.Any(l => l.Contains(text, StringComparison.Ordinal));
        }
    }

    /// <summary>The app's last lines on its console (standard output and error), oldest first.</summary>
    public string LastOutput()
    {
        lock (_lastLines)
        {
            return _lastLines.Count == 0 ? "(nothing)" : string.Join('\n', _lastLines.TakeLast(40));
        }
    }

    private void Received(string? line)
    {
        if (line is null)
        {
            return;
        }

        lock (_lastLines)
        {
            _lastLines.Enqueue(line);
            if (_lastLines.Count > KeptLines)
            {
                _lastLines.Dequeue();
            }

            foreach (var watch in _watches.Where(w => line.Contains(w.Text, StringComparison.Ordinal)).ToList())
            {
                watch.Seen.TrySetResult();
                _watches.Remove(watch);
            }
        }
    }

    public FormClient NewClient()
    {
        var handler = new HttpClientHandler { AllowAutoRedirect = false, UseCookies = true, CookieContainer = new CookieContainer() };
        return new FormClient(new HttpClient(handler, disposeHandler: true) { BaseAddress = Address, Timeout = TimeSpan.FromSeconds(30) });
    }

    /// <summary>SIGKILL: no shutdown code runs, as when the power goes or the process is killed.</summary>
    public void Kill()
    {
        if (_disposed)
        {
            return;
        }

        if (!_process.HasExited)
        {
            _process.Kill(entireProcessTree: true);
        }

        _process.WaitForExit(10_000);
    }

    public void Dispose()
    {
        Kill();
        _disposed = true;
        _process.Dispose();
    }
}
