namespace Decide.Interchange.Results;

/// <summary>The most critical criterion under one definition: one reversal, in both measures.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Pair">[leader, challenger]: the alternative ahead in the base ranking, then the one that overtakes it.</param>
/// <param name="Current">The criterion's current share.</param>
/// <param name="Weight">The share at which the reversal happens.</param>
/// <param name="Absolute">|weight − current|.</param>
/// <param name="Relative">The same change in percent of the current share.</param>
/// <param name="Delta">
/// Triantaphyllou &amp; Sánchez's δ = (current − weight)/(1 − weight) for this reversal (signed, positive lowers the
/// weight); left out when the criterion's weight alone would have to exceed 1.
/// </param>
/// <param name="DeltaRelative">δ in percent of the current weight (signed); left out with <paramref name="Delta"/>.</param>
public sealed record MostCriticalCriterionEntry(
    string Criterion, IReadOnlyList<string> Pair, double Current, double Weight, double Absolute, double Relative,
    double? Delta, double? DeltaRelative);
