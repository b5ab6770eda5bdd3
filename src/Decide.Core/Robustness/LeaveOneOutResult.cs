namespace Decide.Core.Robustness;

/// <summary>The ranking without one assessor's judgements (their ratings, importance ratings and comparisons).</summary>
/// <param name="Assessor">The assessor left out.</param>
/// <param name="Winner">The alternative ranked first without them; null when the ranking could not be computed.</param>
/// <param name="Ranking">Alternative ids best first.</param>
/// <param name="WinnerChanged">True when the winner differs from the full panel's.</param>
/// <param name="Problem">Why no ranking exists without them (for example a cell only they rated), else null.</param>
public sealed record LeaveOneOutResult(
    string Assessor, string? Winner, IReadOnlyList<string> Ranking, bool WinnerChanged, string? Problem = null);

/// <summary>The ranking with one alternative removed (a late disqualification or withdrawal).</summary>
/// <param name="Alternative">The alternative removed.</param>
/// <param name="Ranking">The remaining alternatives, best first.</param>
/// <param name="Reversals">Pairs of remaining alternatives whose order differs from the full ranking.</param>
public sealed record WithoutAlternativeResult(string Alternative, IReadOnlyList<string> Ranking, IReadOnlyList<OrderReversal> Reversals);

/// <summary>Two alternatives whose order changed.</summary>
/// <param name="WasAhead">Ahead in the full ranking.</param>
/// <param name="NowAhead">Ahead after the change.</param>
public sealed record OrderReversal(string WasAhead, string NowAhead);
