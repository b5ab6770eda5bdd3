namespace Decide.Core.Robustness;

/// <summary>
/// How far the panel agrees: each assessor's own ranking, Kendall's W over those rankings, and the cells where the
/// assessors' terms lie far apart. Information for the moderator to discuss; nothing here changes any assessor's
/// weight or rating.
/// </summary>
/// <param name="Tolerance">The largest spread, in scale steps, a cell may have without being listed for discussion.</param>
/// <param name="Assessors">
/// Every assessor who rated at least one linguistic cell, in panel order, with the ranking their own ratings give.
/// </param>
/// <param name="Concordance">
/// Kendall's W (tie-corrected) over the rankings in <paramref name="Assessors"/>, with χ², degrees of freedom and
/// p-value; null when fewer than two assessors or alternatives take part, or every assessor's ratings leave all
/// alternatives tied.
/// </param>
/// <param name="Cells">
/// Every (alternative, linguistic criterion) cell rated by at least two assessors, alternative by alternative in
/// input order and, within one, in criterion order.
/// </param>
/// <param name="ForDiscussion">
/// The cells whose spread exceeds <paramref name="Tolerance"/>, largest spread first, then in alternative order and
/// criterion order.
/// </param>
public sealed record PanelAgreementResult(
    int Tolerance,
    IReadOnlyList<AssessorAgreement> Assessors,
    Concordance? Concordance,
    IReadOnlyList<CellSpread> Cells,
    IReadOnlyList<CellSpread> ForDiscussion);
