namespace Decide.Interchange.Results;

/// <summary>A scored criterion's weight.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Name">Criterion name.</param>
/// <param name="Fuzzy">The fuzzy weight [l, m, u] used in the analysis.</param>
/// <param name="Crisp">The crisp share; all crisp shares sum to 1.</param>
/// <param name="Group">The criterion's group id, or null.</param>
/// <param name="GroupWeight">The group's fuzzy weight, or null.</param>
/// <param name="Local">The criterion's fuzzy weight within its group, or null.</param>
public sealed record WeightEntry(
    string Criterion,
    string Name,
    IReadOnlyList<double> Fuzzy,
    double Crisp,
    string? Group = null,
    IReadOnlyList<double>? GroupWeight = null,
    IReadOnlyList<double>? Local = null);
