namespace Decide.Interchange.Results;

/// <summary>One criterion's share swept from 0 to 1, the others rescaled to keep the sum 1.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Name">Criterion name.</param>
/// <param name="Current">The criterion's current crisp share.</param>
/// <param name="Samples">The shares at which closeness is sampled for charts (0, 0.05, …, 1); empty when not swept.</param>
/// <param name="Series">Each alternative's closeness at <paramref name="Samples"/>.</param>
/// <param name="Reversals">Every share at which two alternatives swap order, ascending.</param>
/// <param name="Note">Why the criterion was not swept, when it was not.</param>
public sealed record SweepEntry(
    string Criterion,
    string Name,
    double Current,
    IReadOnlyList<double> Samples,
    IReadOnlyList<SweepSeriesEntry> Series,
    IReadOnlyList<SweepReversalEntry> Reversals,
    string? Note = null);
