using System.Collections.Concurrent;

namespace Decide.Load;

/// <summary>Latencies and failures of each kind of request, collected from every simulated assessor.</summary>
public sealed class LatencyLog
{
    private readonly ConcurrentDictionary<string, ConcurrentBag<double>> _latencies = new(StringComparer.Ordinal);
    private readonly ConcurrentDictionary<string, ConcurrentBag<string>> _errors = new(StringComparer.Ordinal);

    public void Add(string operation, double milliseconds) =>
        _latencies.GetOrAdd(operation, _ => []).Add(milliseconds);

    public void Fail(string operation, string reason) => _errors.GetOrAdd(operation, _ => []).Add(reason);

    public int ErrorCount => _errors.Values.Sum(e => e.Count);

    public IEnumerable<string> Errors => _errors.SelectMany(e => e.Value.Select(r => $"{e.Key}: {r}"));

    /// <summary>Count, throughput and percentiles (nearest rank) of one kind of request.</summary>
    public OperationFigures Figures(string operation, TimeSpan elapsed)
    {
        var sorted = (_latencies.TryGetValue(operation, out var bag) ? bag.ToArray() : []).Order().ToArray();
        var errors = _errors.TryGetValue(operation, out var e) ? e.Count : 0;
        return new OperationFigures(operation, sorted.Length, errors, sorted.Length / elapsed.TotalSeconds,
            Percentile(sorted, 0.50), Percentile(sorted, 0.95), Percentile(sorted, 0.99), sorted.Length == 0 ? 0 : sorted[^1]);
    }

    public IEnumerable<string> Operations => _latencies.Keys.Union(_errors.Keys).Order(StringComparer.Ordinal);

    private static double Percentile(double[] sorted, double p) =>
        sorted.Length == 0 ? 0 : sorted[Math.Clamp((int)Math.Ceiling(p * sorted.Length) - 1, 0, sorted.Length - 1)];
}

/// <summary>The figures of one kind of request.</summary>
public sealed record OperationFigures(
    string Operation, int Count, int Errors, double PerSecond, double P50, double P95, double P99, double Max);
