namespace Decide.Interchange.Results;

/// <summary>
/// How the ranking responds to changes of weights, ratings, panel, bid set and method (the <c>sensitivity</c>
/// section). Diagnostic only: nothing in it changes the ranking.
/// </summary>
/// <param name="Sweeps">One-at-a-time weight sweeps, one per scored criterion, in criterion order.</param>
/// <param name="CriticalChanges">The smallest change of one criterion's share that reverses each pair, and the most critical criteria.</param>
/// <param name="Draws">Monte Carlo draws of the rank acceptability analysis (0 when it was skipped).</param>
/// <param name="Seed">Seed of the draws: the same seed gives the same numbers.</param>
/// <param name="AcceptabilityWeights">Where the draws' weights came from: <c>fuzzy</c> or <c>uniform</c>.</param>
/// <param name="Acceptability">Rank acceptability per alternative, in input order (empty when no draws were made).</param>
/// <param name="CentralWeights">The mean weights of the draws each alternative wins, for every alternative that wins any.</param>
/// <param name="LeaveOneOut">The ranking without each assessor, in panel order.</param>
/// <param name="WithoutAlternative">The ranking without each alternative, in input order (empty with fewer than three).</param>
/// <param name="Methods">The ranking under other reasonable methods.</param>
public sealed record SensitivitySection(
    IReadOnlyList<SweepEntry> Sweeps,
    CriticalChangesEntry CriticalChanges,
    int Draws,
    ulong Seed,
    string AcceptabilityWeights,
    IReadOnlyList<AcceptabilityEntry> Acceptability,
    IReadOnlyList<CentralWeightsEntry> CentralWeights,
    IReadOnlyList<LeaveOneOutEntry> LeaveOneOut,
    IReadOnlyList<WithoutAlternativeEntry> WithoutAlternative,
    IReadOnlyList<MethodComparisonEntry> Methods);
