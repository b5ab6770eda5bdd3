namespace Decide.Interchange.Results;

/// <summary>The most critical criterion under one definition.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Pair">[leader, challenger]: the alternative ahead in the base ranking, then the one that overtakes it.</param>
/// <param name="Current">The criterion's current share.</param>
/// <param name="Weight">The share at which the reversal happens.</param>
/// <param name="Absolute">|weight − current|.</param>
/// <param name="Relative">The same change in percent of the current share.</param>
public sealed record MostCriticalCriterionEntry(
    string Criterion, IReadOnlyList<string> Pair, double Current, double Weight, double Absolute, double Relative);
