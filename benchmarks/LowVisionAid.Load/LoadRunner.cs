using System.Diagnostics;
using System.Net;
using System.Text;

namespace LowVisionAid.Load;

/// <summary>A request the harness repeats: a page, a search, the API or a download.</summary>
public sealed record Target(string Name, string Path, string? JsonBody = null);

/// <summary>What one target gave at one level of concurrency.</summary>
public sealed record CellResult(string Target, int Concurrency, int Requests, int Errors, double P50Ms, double P95Ms, double P99Ms, double PerSecond, long WorkingSetBytes, long Bytes);

/// <summary>
/// Bounded load on loopback only: for each target and each concurrency, a few warm-up requests, then a fixed number
/// of requests shared by that many workers, each timed from send to the last byte read.
/// </summary>
public static class LoadRunner
{
    public static async Task<List<CellResult>> RunAsync(AppProcess app, IReadOnlyList<Target> targets, IReadOnlyList<int> concurrency, int requests, Action<string> progress)
    {
        ArgumentNullException.ThrowIfNull(app);
        if (!IPAddress.IsLoopback(IPAddress.Parse(app.Address.Host)))
        {
            throw new InvalidOperationException("Load is only ever sent to 127.0.0.1.");
        }

        using var handler = new SocketsHttpHandler { MaxConnectionsPerServer = 64, AllowAutoRedirect = false };
        using var client = new HttpClient(handler) { BaseAddress = app.Address, Timeout = TimeSpan.FromSeconds(60) };
        var results = new List<CellResult>();
        foreach (var target in targets)
        {
            foreach (var workers in concurrency)
            {
                for (var i = 0; i < 5; i++)
                {
                    await SendAsync(client, target);
                }

                var times = new double[requests];
                var errors = 0;
                long bytes = 0;
                var next = -1;
                var wall = Stopwatch.StartNew();
                await Task.WhenAll(Enumerable.Range(0, workers).Select(async _ =>
                {
                    int n;
                    while ((n = Interlocked.Increment(ref next)) < requests)
                    {
                        var one = Stopwatch.StartNew();
                        var (ok, length) = await SendAsync(client, target);
                        times[n] = one.Elapsed.TotalMilliseconds;
                        Interlocked.Add(ref bytes, length);
                        if (!ok)
                        {
                            Interlocked.Increment(ref errors);
                        }
                    }
                }));
                wall.Stop();
                Array.Sort(times);
                var cell = new CellResult(target.Name, workers, requests, errors, Percentile(times, 0.50), Percentile(times, 0.95), Percentile(times, 0.99),
                    requests / wall.Elapsed.TotalSeconds, app.WorkingSet, bytes / requests);
                results.Add(cell);
                progress($"{target.Name} at {workers}: p50 {cell.P50Ms:0.0} ms, p95 {cell.P95Ms:0.0} ms, {cell.PerSecond:0} /s, {cell.Errors} errors");
            }
        }

        return results;
    }

    private static async Task<(bool Ok, long Length)> SendAsync(HttpClient client, Target target)
    {
        using var request = new HttpRequestMessage(target.JsonBody is null ? HttpMethod.Get : HttpMethod.Post, target.Path);
        if (target.JsonBody is not null)
        {
            request.Content = new StringContent(target.JsonBody, Encoding.UTF8, "application/json");
        }

        using var response = await client.SendAsync(request, HttpCompletionOption.ResponseContentRead);
        var body = await response.Content.ReadAsByteArrayAsync();
        return (response.StatusCode == HttpStatusCode.OK, body.LongLength);
    }

    // Nearest-rank percentile of sorted values.
    private static double Percentile(double[] sorted, double p) =>
        sorted.Length == 0 ? 0 : sorted[Math.Clamp((int)Math.Ceiling(p * sorted.Length) - 1, 0, sorted.Length - 1)];
}
