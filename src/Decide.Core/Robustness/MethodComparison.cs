namespace Decide.Core.Robustness;

/// <summary>The ranking under another reasonable method, compared with the main one.</summary>
/// <param name="Method">Which method: <c>aggregation:geometric</c>, <c>aggregation:mean</c>, <c>ideal:extreme</c>, <c>ideal:unit</c> or <c>weighted-total</c>.</param>
/// <param name="Description">The method in words.</param>
/// <param name="Ranking">Alternative ids best first; empty when the method is not applicable.</param>
/// <param name="Scores">The method's score per alternative, in the order of <paramref name="Ranking"/>.</param>
/// <param name="KendallTau">Kendall's tau-b between this method's scores and the main closeness (1 = same order); null when undefined or not applicable.</param>
/// <param name="SameWinner">True when the first-ranked alternative is the same as the main ranking's; false when not applicable.</param>
/// <param name="Note">
/// Null when the method applies; otherwise "not applicable: " and the reason (for example, the geometric mean
/// refuses a rating scale with a term of value 0).
/// </param>
public sealed record MethodComparison(
    string Method, string Description, IReadOnlyList<string> Ranking, IReadOnlyList<double> Scores, double? KendallTau, bool SameWinner,
    string? Note = null)
{
    /// <summary>True when the method could be applied to this evaluation.</summary>
    public bool Applicable => Note is null;
}
