using Microsoft.Extensions.Logging;

namespace Decide.Web.Tests.Security;

/// <summary>
/// A logger provider that keeps every entry the service writes, at every level: the formatted message, the values
/// of its template, the exception and the scopes, as one text per entry.
/// </summary>
public sealed class CapturedLogs : ILoggerProvider
{
    private readonly List<string> _entries = [];

    /// <summary>Everything logged so far.</summary>
    public IReadOnlyList<string> Entries
    {
        get
        {
            lock (_entries)
            {
                return [.. _entries];
            }
        }
    }

    public ILogger CreateLogger(string categoryName) => new Logger(this, categoryName);

    public void Dispose()
    {
    }

    private void Add(string entry)
    {
        lock (_entries)
        {
            _entries.Add(entry);
        }
    }

    private sealed class Logger(CapturedLogs logs, string category) : ILogger
    {
        public IDisposable BeginScope<TState>(TState state) where TState : notnull
        {
            logs.Add($"{category} scope: {Describe(state)}");
            return NoScope.Instance;
        }

        public bool IsEnabled(LogLevel logLevel) => logLevel != LogLevel.None;

        public void Log<TState>(LogLevel logLevel, EventId eventId, TState state, Exception? exception, Func<TState, Exception?, string> formatter)
        {
            logs.Add($"{logLevel} {category}[{eventId.Id}]: {formatter(state, exception)} | {Describe(state)} | {exception}");
        }

        /// <summary>The state's text and, for structured state, every value by name.</summary>
        private static string Describe(object? state) =>
            state is IEnumerable<KeyValuePair<string, object?>> values
                ? string.Join("; ", values.Select(v => $"{v.Key}={v.Value}"))
                : state?.ToString() ?? "";
    }

    private sealed class NoScope : IDisposable
    {
        public static readonly NoScope Instance = new();

        public void Dispose()
        {
        }
    }
}
