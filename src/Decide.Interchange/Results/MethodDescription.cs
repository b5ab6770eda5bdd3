namespace Decide.Interchange.Results;

/// <summary>The method choices a results document rests on.</summary>
/// <param name="Weighting"><c>importance</c> or <c>pairwise</c>.</param>
/// <param name="Aggregation"><c>mean</c> or <c>geometric</c>.</param>
/// <param name="Ideal"><c>unit</c> or <c>extreme</c>.</param>
/// <param name="RandomIndexTable">The random-index table consistency ratios use (pairwise weighting only; otherwise null).</param>
public sealed record MethodDescription(string Weighting, string Aggregation, string Ideal, string? RandomIndexTable);
