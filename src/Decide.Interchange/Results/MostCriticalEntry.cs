using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>
/// The most critical criteria. The first four as Triantaphyllou &amp; Sánchez (1997) define them, by the change δ of
/// one weight alone: for the top rank (pairs led by the winner) and for any rank, each by absolute |δ| and by
/// relative |δ| / current (the paper's PT and PA). The last two by the change of share, which is what the screens and
/// the summary show. Each is written as null, not left out, when no single change of weight reverses such a pair.
/// </summary>
/// <param name="TopAbsolute">For the top rank, by |δ|.</param>
/// <param name="TopRelative">For the top rank, by |δ| in percent of the weight.</param>
/// <param name="AnyAbsolute">For any rank, by |δ|.</param>
/// <param name="AnyRelative">For any rank, by |δ| in percent of the weight.</param>
/// <param name="TopShare">For the top rank, by |weight − current|: the share a criterion must reach.</param>
/// <param name="AnyShare">For any rank, by |weight − current|.</param>
public sealed record MostCriticalEntry(
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? TopAbsolute,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? TopRelative,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? AnyAbsolute,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? AnyRelative,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? TopShare,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] MostCriticalCriterionEntry? AnyShare);
