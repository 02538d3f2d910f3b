using Microsoft.Extensions.Logging;
using Microsoft.Extensions.Logging.Testing;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>
/// Every log line the app writes (the framework's fake log collector), each as one line: level, category, formatted
/// message, the structured values (a structured sink would store them), the scopes and the exception text.
/// </summary>
public sealed class CapturedLogs : ILoggerProvider
{
    private readonly FakeLoggerProvider _provider;

    public CapturedLogs()
    {
        _provider = new FakeLoggerProvider(Collector);
    }

    public FakeLogCollector Collector { get; } = new();

    public IReadOnlyCollection<string> Lines => Collector.GetSnapshot().Select(Line).ToList();

    /// <summary>The lines logged at Error or Critical.</summary>
    public IReadOnlyList<string> ErrorLines => Collector.GetSnapshot().Where(r => r.Level >= LogLevel.Error).Select(Line).ToList();

    /// <summary>Fails the test if any line was logged at Error or Critical, quoting the first.</summary>
    public void AssertNoError()
    {
        var errors = ErrorLines;
        Assert.True(errors.Count == 0, $"{errors.Count} error lines, e.g. {(errors.Count == 0 ? null : errors[0])}");
    }

    public ILogger CreateLogger(string categoryName) => _provider.CreateLogger(categoryName);

    public void Dispose() => _provider.Dispose();

    private static string Line(FakeLogRecord record)
    {
        var values = record.StructuredState is { } pairs ? string.Join("; ", pairs.Select(p => $"{p.Key}={p.Value}")) : "";
        var scopes = record.Scopes.Count == 0 ? "" : " scopes: " + string.Join("; ", record.Scopes);
        return $"{record.Level} {record.Category}: {record.Message} [{values}]{scopes} {record.Exception}";
    }
}
