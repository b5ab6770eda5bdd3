namespace Decide.Interchange.Results;

/// <summary>The ranking with one alternative removed (a late disqualification or a withdrawal).</summary>
/// <param name="Alternative">The alternative removed.</param>
/// <param name="Ranking">The remaining alternatives, best first.</param>
/// <param name="Reversals">Pairs of remaining alternatives whose order differs from the full ranking.</param>
public sealed record WithoutAlternativeEntry(string Alternative, IReadOnlyList<string> Ranking, IReadOnlyList<OrderReversalEntry> Reversals);
