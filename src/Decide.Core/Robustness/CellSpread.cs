namespace Decide.Core.Robustness;

/// <summary>How far apart the assessors' terms lie on one cell of the decision matrix.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criterion">Linguistic criterion id.</param>
/// <param name="Spread">
/// The highest step minus the lowest step among the terms given, counted on the rating scale (0 = all gave the same
/// term; on a seven-term scale, "Good" against "Medium poor" is 3).
/// </param>
/// <param name="Terms">Each assessor who rated the cell and the term they gave, in panel order.</param>
public sealed record CellSpread(string Alternative, string Criterion, int Spread, IReadOnlyList<AssessorTerm> Terms);
