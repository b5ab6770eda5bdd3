using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>
/// The most critical criterion for the top rank (pairs led by the winner) and for any rank, each by absolute and by
/// relative change. Each is written as null, not left out, when no single change of weight reverses such a pair.
/// </summary>
/// <param name="TopAbsolute">For the top rank, by absolute change.</param>
/// <param name="TopRelative">For the top rank, by relative change.</param>
/// <param name="AnyAbsolute">For any rank, by absolute change.</param>
/// <param name="AnyRelative">For any rank, by relative change.</param>
public sealed record MostCriticalEntry(
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? TopAbsolute,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? TopRelative,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? AnyAbsolute,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? AnyRelative);
