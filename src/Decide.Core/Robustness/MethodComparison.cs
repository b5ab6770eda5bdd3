namespace Decide.Core.Robustness;

/// <summary>The ranking under another reasonable method, compared with the main one.</summary>
/// <param name="Method">Which method: <c>aggregation:geometric</c>, <c>aggregation:mean</c>, <c>ideal:extreme</c>, <c>ideal:unit</c> or <c>weighted-sum</c>.</param>
/// <param name="Description">The method in words.</param>
/// <param name="Ranking">Alternative ids best first.</param>
/// <param name="Scores">The method's score per alternative, in the order of <paramref name="Ranking"/>.</param>
/// <param name="KendallTau">Kendall's tau-b between this method's scores and the main closeness (1 = same order); null when undefined.</param>
/// <param name="SameWinner">True when the first-ranked alternative is the same as the main ranking's.</param>
public sealed record MethodComparison(
    string Method, string Description, IReadOnlyList<string> Ranking, IReadOnlyList<double> Scores, double? KendallTau, bool SameWinner);
