using Decide.Web.Features.Moderation;

namespace Decide.Web.Components.Pages.Panel;

/// <summary>
/// What stands between scoring and moderation: sheets not yet submitted (moderation cannot start until every sheet
/// is in), and what the facilitator should know before starting (inconsistent weights, values not all entered).
/// </summary>
/// <param name="Unsubmitted">Assessor codes whose sheet is still open.</param>
/// <param name="Warnings">Sentences for the facilitator; they do not stop moderation.</param>
public sealed record ModerationReadiness(IReadOnlyList<string> Unsubmitted, IReadOnlyList<string> Warnings)
{
    /// <summary>Moderation can start: every sheet is submitted.</summary>
    public bool CanStart => Unsubmitted.Count == 0;

    public static ModerationReadiness Of(ScoringBoard board)
    {
        var open = board.Assessors.Where(a => a.SubmittedAt is null).Select(a => a.AssessorCode).ToArray();
        var warnings = new List<string>();
        foreach (var a in board.Assessors.Where(a => a.InconsistentMatrices))
        {
            warnings.Add($"{a.AssessorCode}'s pairwise comparisons are above the consistency limit ({BoardRow.ConsistencyText(a.Consistency)}).");
        }

        foreach (var a in board.Assessors.Where(a => a.SubmittedAt is not null && a.RatingsDone < a.RatingsTotal))
        {
            warnings.Add($"{a.AssessorCode} submitted with {a.RatingsTotal - a.RatingsDone} of {a.RatingsTotal} cells neither rated nor declined.");
        }

        foreach (var p in board.PriceEvaluators.Where(p => p.ValuesEntered < p.ValuesTotal))
        {
            warnings.Add($"{p.ValuesTotal - p.ValuesEntered} of {p.ValuesTotal} numeric values are not entered yet (price evaluator {p.AssessorCode}).");
        }

        return new ModerationReadiness(open, warnings);
    }
}
