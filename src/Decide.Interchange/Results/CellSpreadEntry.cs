namespace Decide.Interchange.Results;

/// <summary>A cell whose assessors' terms lie far apart.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criterion">Linguistic criterion id.</param>
/// <param name="Spread">Highest minus lowest step of the terms given, on the rating scale.</param>
/// <param name="Terms">Assessor id → the term code they gave, in panel order.</param>
public sealed record CellSpreadEntry(string Alternative, string Criterion, int Spread, IReadOnlyDictionary<string, string> Terms);
