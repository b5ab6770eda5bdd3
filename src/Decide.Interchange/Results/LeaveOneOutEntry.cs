using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>The ranking without one assessor's judgements (ratings, importance ratings and comparisons).</summary>
/// <param name="Assessor">The assessor left out.</param>
/// <param name="Winner">The alternative ranked first without them; null (written, not left out) when no ranking is possible.</param>
/// <param name="Ranking">Alternative ids, best first (empty when no ranking is possible).</param>
/// <param name="WinnerChanged">True when the winner differs from the full panel's.</param>
/// <param name="Problem">Why no ranking is possible without them; left out when one is.</param>
public sealed record LeaveOneOutEntry(
    string Assessor,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] string? Winner,
    IReadOnlyList<string> Ranking,
    bool WinnerChanged,
    string? Problem);
