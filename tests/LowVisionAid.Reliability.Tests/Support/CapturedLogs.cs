using System.Collections.Concurrent;
using Microsoft.Extensions.Logging;

namespace LowVisionAid.Reliability.Tests.Support;

/// <summary>Every log line the app writes, with its category, formatted message and exception text.</summary>
public sealed class CapturedLogs : ILoggerProvider
{
    private readonly ConcurrentQueue<string> _lines = new();

    public IReadOnlyCollection<string> Lines => _lines;

    public ILogger CreateLogger(string categoryName) => new Logger(categoryName, _lines);

    public void Dispose()
    {
    }

    private sealed class Logger(string category, ConcurrentQueue<string> lines) : ILogger
    {
        public IDisposable? BeginScope<TState>(TState state)
            where TState : notnull
        {
            lines.Enqueue($"{category} scope: {state}");
            return null;
        }

        public bool IsEnabled(LogLevel logLevel) => true;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            // The state's structured values are included too, since a structured sink would store them.
            var values = state is IEnumerable<KeyValuePair<string, object?>> pairs ? string.Join("; ", pairs.Select(p => $"{p.Key}={p.Value}")) : "";
            lines.Enqueue($"{logLevel} {category}: {formatter(state, exception)} [{values}] {exception}");
        }
    }
}
