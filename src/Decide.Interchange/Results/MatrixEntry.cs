namespace Decide.Interchange.Results;

/// <summary>One cell of the decision matrix.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Aggregated">The panel's fuzzy rating [l, m, u] (crisp for a numeric criterion).</param>
/// <param name="Weighted">Normalised and weighted [l, m, u].</param>
/// <param name="Raters">How many assessors' ratings went into it (0 for a numeric criterion).</param>
/// <param name="Declined">Who declined the cell and why.</param>
/// <param name="Moderated">
/// The term the panel agreed on when it moderated the cell (<see cref="Aggregated"/> is then that term's value), or
/// null; left out of the document when null.
/// </param>
public sealed record MatrixEntry(
    string Alternative,
    string Criterion,
    IReadOnlyList<double> Aggregated,
    IReadOnlyList<double> Weighted,
    int Raters,
    IReadOnlyList<DeclinedEntry> Declined,
    string? Moderated = null);
