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
/// <param name="Reliability">
/// Krippendorff's alpha over the linguistic cells, valid however many assessors rated each cell; null when no cell
/// has two ratings.
/// </param>
/// <param name="OutsideConcordance">
/// Assessors left out of Kendall's W because they did not rate every alternative in the running (a whole bid
/// declined, or a round in which each reads only some applications): W compares complete rankings, and filling their
/// gaps with the panel's values would overstate the agreement.
/// </param>
public sealed record PanelAgreementResult(
    int Tolerance,
    IReadOnlyList<AssessorAgreement> Assessors,
    Concordance? Concordance,
    IReadOnlyList<CellSpread> Cells,
    IReadOnlyList<CellSpread> ForDiscussion,
    PanelReliability? Reliability = null,
    IReadOnlyList<string>? OutsideConcordance = null);

/// <summary>
/// Krippendorff's alpha over the panel's ratings, each (alternative, linguistic criterion) cell a unit and each
/// assessor's term a value.
/// </summary>
/// <param name="Ordinal">On the order of the terms (the scale's steps): the measure for a linguistic scale.</param>
/// <param name="Interval">On the centre of each term's triangle ((l + m + u) ∕ 3), for scales whose terms are unevenly spaced.</param>
public sealed record PanelReliability(AlphaEstimate? Ordinal, AlphaEstimate? Interval);
