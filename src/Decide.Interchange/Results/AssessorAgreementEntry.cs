using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>One assessor set against the panel.</summary>
/// <param name="Assessor">Assessor id.</param>
/// <param name="Ranking">Alternative ids, best first, when the assessor's own ratings replace the aggregate where they rated.</param>
/// <param name="Closeness">Alternative id → closeness under the assessor's ratings, in input order.</param>
/// <param name="CellsRated">How many linguistic cells they rated with a term.</param>
/// <param name="MeanDistance">Mean vertex distance of their ratings from the panel aggregate, in rating-scale units.</param>
/// <param name="TauWithPanel">Kendall's tau-b between their closeness and the panel's; null (written) when undefined.</param>
public sealed record AssessorAgreementEntry(
    string Assessor,
    IReadOnlyList<string> Ranking,
    IReadOnlyDictionary<string, double> Closeness,
    int CellsRated,
    double MeanDistance,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? TauWithPanel);
