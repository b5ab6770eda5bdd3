namespace Decide.Reports.Content;

/// <summary>A person on the panel.</summary>
/// <param name="Name">Full name.</param>
/// <param name="Role">Chair, assessor, facilitator, commercial evaluator, observer, approver…</param>
/// <param name="AssessorCode">The assessor id used in the evaluation, if this person rates; null otherwise.</param>
/// <param name="Weight">Their weight in aggregation, if they rate.</param>
/// <param name="DeclarationSignedAt">When they signed the conflict-of-interest and confidentiality declaration; null if not signed or not recorded.</param>
/// <param name="Conflicts">Interests declared and the measure taken ("none declared", "recused from …").</param>
public sealed record MemberOnRecord(
    string Name, string Role, string? AssessorCode, double? Weight, DateTimeOffset? DeclarationSignedAt, string? Conflicts);
