using System.Globalization;
using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Moderation;

namespace Decide.Web.Components.Pages.Panel;

/// <summary>One assessor's line of the scoring board, in the words the facilitator reads.</summary>
/// <param name="Code">Assessor code.</param>
/// <param name="Name">Display name.</param>
/// <param name="DeclarationSigned">The declaration of interests is signed.</param>
/// <param name="Declaration">What the declaration column says ("signed 13 Nov 2026" or "not signed").</param>
/// <param name="NamesConfirmed">Whether the declaration was confirmed once the bidders' names were known; null while unsigned.</param>
/// <param name="WeightsDone">The weight judgements are submitted.</param>
/// <param name="Consistency">What the consistency column says ("—" when the plan weighs by importance).</param>
/// <param name="ConsistencyFlag">A complete matrix of theirs is above its consistency threshold: ask them to revise.</param>
/// <param name="Done">Cells rated or declined.</param>
/// <param name="Total">Cells to rate.</param>
/// <param name="Submitted">The rating sheet is submitted.</param>
/// <param name="Sheet">What the sheet column says.</param>
/// <param name="CanReopen">The facilitator may reopen the sheet now (submitted; scoring or moderation).</param>
public sealed record BoardRow(
    string Code, string Name, bool DeclarationSigned, string Declaration, string? NamesConfirmed, bool WeightsDone, string Consistency, bool ConsistencyFlag,
    int Done, int Total, bool Submitted, string Sheet, bool CanReopen)
{
    /// <summary>Share of the cells done, 0 to 100 (100 when there is nothing to rate).</summary>
    public double Percent => Total == 0 ? 100 : 100.0 * Done / Total;

    /// <summary>Something on this line keeps the panel from moving on, or needs the facilitator's word.</summary>
    public bool NeedsAttention => !DeclarationSigned || !WeightsDone || ConsistencyFlag || Done < Total || !Submitted;

    /// <summary>The line for <paramref name="p"/> at <paramref name="stage"/>.</summary>
    public static BoardRow From(AssessorProgress p, EvaluationStage stage)
    {
        var declaration = p.DeclarationSignedAt is { } signed ? $"signed {TradeWords.Date(signed)}" : "not signed";
        return new BoardRow(
            p.AssessorCode, p.Name, p.DeclarationSignedAt is not null, declaration,
            p.DeclarationSignedAt is null ? null : p.NamesConfirmedAt is { } confirmed ? $"bidders' names confirmed {TradeWords.Date(confirmed)}" : "bidders' names not yet confirmed",
            p.WeightsSubmittedAt is not null,
            ConsistencyText(p.Consistency), p.InconsistentMatrices,
            p.RatingsDone, p.RatingsTotal, p.SubmittedAt is not null,
            p.SubmittedAt is { } at ? $"submitted {TradeWords.Date(at)}" : "open",
            p.SubmittedAt is not null && stage is EvaluationStage.Scoring or EvaluationStage.Moderation);
    }

    /// <summary>
    /// The worst consistency ratio among the complete matrices with its limit, and how many pairs are still to judge;
    /// "—" for importance weighting (no ratio applies).
    /// </summary>
    public static string ConsistencyText(IReadOnlyList<MatrixProgress>? matrices)
    {
        if (matrices is null)
        {
            return "—";
        }

        var parts = new List<string>();
        var complete = matrices.Where(m => m.Ratio is not null).ToArray();
        if (complete.Length > 0)
        {
            var worst = complete.OrderByDescending(m => m.Ratio!.Value - (m.Threshold ?? 0)).First();
            var where = worst.Group is null ? "" : $" within {worst.Group}";
            parts.Add(string.Create(CultureInfo.InvariantCulture, $"CR {worst.Ratio:0.000} (limit {worst.Threshold:0.00}){where}"));
        }

        var missing = matrices.Sum(m => m.Needed - m.Judgements);
        if (missing > 0)
        {
            parts.Add($"{missing} of {matrices.Sum(m => m.Needed)} pairs still to judge");
        }

        return parts.Count == 0 ? "no pairs to judge" : string.Join("; ", parts);
    }
}
