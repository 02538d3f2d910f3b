using System.Globalization;
using System.Text;

namespace LowVisionAid.Load;

/// <summary>The results as Markdown, ready to paste into docs/performance.md.</summary>
public static class Report
{
    public static string Write(Options options, string app, string loadBefore, string loadAfter, TimeSpan emptyStart, IReadOnlyList<TimeSpan> demoStarts, IReadOnlyList<TimeSpan> scaleStarts,
        TimeSpan generated, long dbBytes, IReadOnlyList<CellResult> demo, IReadOnlyList<CellResult> scale, long demoPeak, long scalePeak)
    {
        ArgumentNullException.ThrowIfNull(options);
        var c = CultureInfo.InvariantCulture;
        var s = new StringBuilder();
        s.AppendLine(c, $"Run at {DateTime.UtcNow:yyyy-MM-dd HH:mm} UTC on {Environment.ProcessorCount} cores; load average before {loadBefore}, after {loadAfter}.");
        var made = options.Reuse && generated == TimeSpan.Zero ? "reused from an earlier run" : $"made in {generated.TotalSeconds:0} s";
        s.AppendLine(c, $"Synthetic clinic: {options.Size.Clients:N0} clients, {options.Size.Visits:N0} visits, {options.Size.Plans:N0} plans, {options.Size.Trials:N0} trials, {made} ({dbBytes / 1048576.0:0} MB). {options.Requests} requests per cell after 5 warm-up requests.");
        s.AppendLine(c, $"App: {app}.");
        s.AppendLine();
        s.AppendLine(c, $"Start to first page: empty folder (database made, demo loaded) {(emptyStart == TimeSpan.Zero ? "not measured (reused)" : Ms(emptyStart))}; existing demo database {string.Join(", ", demoStarts.Select(Ms))}; existing database at scale {string.Join(", ", scaleStarts.Select(Ms))}.");
        s.AppendLine(c, $"Peak working set: demo {demoPeak / 1048576.0:0} MB, at scale {scalePeak / 1048576.0:0} MB.");
        s.AppendLine();
        s.AppendLine("| Target | Clients at once | Demo p50 / p95 / p99 ms | Demo req/s | Scale p50 / p95 / p99 ms | Scale req/s | p95 scale ÷ demo | Bytes | Errors |");
        s.AppendLine("|---|---:|---:|---:|---:|---:|---:|---:|---:|");
        foreach (var d in demo)
        {
            var big = scale.Single(x => x.Target == d.Target && x.Concurrency == d.Concurrency);
            s.AppendLine(c, $"| {d.Target} | {d.Concurrency} | {d.P50Ms:0.0} / {d.P95Ms:0.0} / {d.P99Ms:0.0} | {d.PerSecond:0} | {big.P50Ms:0.0} / {big.P95Ms:0.0} / {big.P99Ms:0.0} | {big.PerSecond:0} | {big.P95Ms / Math.Max(d.P95Ms, 0.001):0.0} | {big.Bytes:N0} | {d.Errors + big.Errors} |");
        }

        return s.ToString();
    }

    private static string Ms(TimeSpan t) => t.TotalMilliseconds.ToString("0", CultureInfo.InvariantCulture) + " ms";
}
