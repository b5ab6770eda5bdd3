namespace Decide.Interchange.Results;

/// <summary>One alternative's closeness along a weight sweep.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Closeness">Closeness at each sampled share.</param>
public sealed record SweepSeriesEntry(string Alternative, IReadOnlyList<double> Closeness);
