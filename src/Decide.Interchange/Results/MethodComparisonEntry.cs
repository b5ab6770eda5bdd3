using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>The ranking under another reasonable method, compared with the main one.</summary>
/// <param name="Method"><c>aggregation:geometric</c>, <c>aggregation:mean</c>, <c>ideal:extreme</c>, <c>ideal:unit</c> or <c>weighted-total</c> (the weighted total of scores on the rating scale).</param>
/// <param name="Description">The method in words.</param>
/// <param name="Ranking">Alternative ids, best first; empty when the method is not applicable.</param>
/// <param name="Scores">The method's score of each alternative, in the order of <paramref name="Ranking"/>.</param>
/// <param name="KendallTau">Kendall's tau-b against the main closeness (1 = same order); null (written) when undefined.</param>
/// <param name="SameWinner">True when the same alternative ranks first as in the main ranking; false when not applicable.</param>
/// <param name="Note">"not applicable: " and the reason, when the method cannot be applied to this evaluation; else left out.</param>
public sealed record MethodComparisonEntry(
    string Method,
    string Description,
    IReadOnlyList<string> Ranking,
    IReadOnlyList<double> Scores,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? KendallTau,
    bool SameWinner,
    string? Note);
