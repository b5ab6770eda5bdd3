namespace Decide.Core.Robustness;

/// <summary>An alternative's closeness coefficient and rank in one ranking.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Closeness">CC = d⁻/(d⁺ + d⁻), in [0, 1].</param>
/// <param name="Rank">1 = best; alternatives whose closeness ties share the better rank (1, 2, 2, 4).</param>
public sealed record AlternativeCloseness(string Alternative, double Closeness, int Rank);
