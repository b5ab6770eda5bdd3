namespace Decide.Core.Robustness;

/// <summary>
/// One assessor set against the panel: the ranking fuzzy TOPSIS gives when their own ratings replace the panel's
/// aggregate wherever they rated, and how far their ratings lie from the aggregate.
/// </summary>
/// <param name="Assessor">Assessor id.</param>
/// <param name="Closeness">
/// Each alternative's closeness and rank under this assessor's ratings, in the evaluation's alternative order. The
/// criterion weights, directions and ideal points are the panel's; cells the assessor declined or was not assigned
/// keep the panel's aggregate, and numeric criteria their measured values.
/// </param>
/// <param name="Ranking">Alternative ids, best first (exact ties in input order).</param>
/// <param name="CellsRated">How many linguistic cells the assessor rated with a term.</param>
/// <param name="MeanDistance">
/// The mean vertex distance d(own TFN, panel aggregate) over the cells they rated, in the rating scale's units
/// (Chen 2000, eq. 12): 0 when they agree with the aggregate everywhere.
/// </param>
/// <param name="TauWithPanel">
/// Kendall's tau-b between this assessor's closeness and the panel's: 1 for the same order, −1 for the reverse;
/// null when either leaves every alternative tied or there are fewer than two alternatives.
/// </param>
public sealed record AssessorAgreement(
    string Assessor,
    IReadOnlyList<AlternativeCloseness> Closeness,
    IReadOnlyList<string> Ranking,
    int CellsRated,
    double MeanDistance,
    double? TauWithPanel);
