namespace Decide.Core.Robustness;

/// <summary>The term one assessor gave one cell.</summary>
/// <param name="Assessor">Assessor id.</param>
/// <param name="Term">The rating-scale term code.</param>
public sealed record AssessorTerm(string Assessor, string Term);
