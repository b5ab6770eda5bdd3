using System.Text.Json;
using Decide.Core.Award;
using Decide.Core.Weighting;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Evaluations;

/// <summary>
/// Builds the portable evaluation (<c>decide-evaluation/1</c>) from what is stored: the locked plan, the panel's
/// assessors, the bids and every input. Used by results, export and sign-off, so they all analyse the same thing.
/// The order is fixed (panel order, bid position, criterion order) so that exports are byte-for-byte repeatable.
/// </summary>
public sealed class EvaluationComposer
{
    /// <summary>The plan alone, parsed (no panel, bids or inputs).</summary>
    public static EvaluationFile ReadPlan(StoredEvaluation evaluation) => EvaluationFileReader.ReadPlan(evaluation.PlanJson);

    /// <summary>Everything stored, as one evaluation file.</summary>
    public async Task<EvaluationFile> ComposeAsync(DecideDbContext db, StoredEvaluation stored, CancellationToken ct = default)
    {
        var plan = ReadPlan(stored);
        var id = stored.Id;
        var criteria = plan.Evaluation.Criteria;
        var criterionOrder = criteria.Select((c, i) => (c.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);

        var seats = await db.PanelMembers.AsNoTracking().Include(p => p.User)
            .Where(p => p.EvaluationId == id && p.Role == PanelRole.Assessor).OrderBy(p => p.Id).ToListAsync(ct);
        var assessors = seats.Select(s => new Assessor(s.AssessorCode!, s.User?.DisplayName ?? s.AssessorCode!, s.Weight, Assigned(s), Topics(s))).ToArray();
        var assessorOrder = assessors.Select((a, i) => (a.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);

        var alternatives = await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id)
            .OrderBy(a => a.Position).ThenBy(a => a.Id).ToListAsync(ct);
        var alternativeOrder = alternatives.Select((a, i) => (a.Code, i)).ToDictionary(x => x.Code, x => x.i, StringComparer.Ordinal);

        var judgements = await db.WeightJudgements.AsNoTracking().Where(w => w.EvaluationId == id).OrderBy(w => w.Id).ToListAsync(ct);
        var ratings = await db.Ratings.AsNoTracking().Where(r => r.EvaluationId == id).ToListAsync(ct);
        var values = await db.NumericValues.AsNoTracking().Where(v => v.EvaluationId == id).ToListAsync(ct);
        var gates = await db.GateResults.AsNoTracking().Where(g => g.EvaluationId == id).ToListAsync(ct);
        var moderation = await db.Moderation.AsNoTracking().Where(m => m.EvaluationId == id).OrderBy(m => m.Id).ToListAsync(ct);
        var reviews = await db.LowPriceReviews.AsNoTracking().Where(r => r.EvaluationId == id).ToListAsync(ct);
        var assigned = plan.Evaluation.Reviews is null
            ? []
            : await db.ReviewAssignments.AsNoTracking().Where(r => r.EvaluationId == id).ToListAsync(ct);

        int A(string code) => assessorOrder.GetValueOrDefault(code, int.MaxValue);
        int B(string code) => alternativeOrder.GetValueOrDefault(code, int.MaxValue);
        int C(string code) => criterionOrder.GetValueOrDefault(code, int.MaxValue);

        var evaluation = plan.Evaluation with
        {
            Alternatives = alternatives.Select(a => new Alternative(a.Code, a.Name, a.RequestedAmount, a.Topic)).ToArray(),
            Reviews = plan.Evaluation.Reviews is { } design
                ? design with
                {
                    Assigned = assessors.Select(a => new ReviewAssignment(a.Id, assigned.Where(r => r.AssessorCode == a.Id)
                        .OrderBy(r => B(r.AlternativeCode)).Select(r => r.AlternativeCode).ToArray())).Where(r => r.Alternatives.Count > 0).ToArray(),
                }
                : null,
            Assessors = assessors,
            Importance = judgements.Where(j => j.Kind == WeightJudgement.ImportanceKind)
                .OrderBy(j => A(j.AssessorCode)).ThenBy(j => WeightStructure.NodeOrder(plan.Evaluation, j.Node))
                .Select(j => new ImportanceRating(j.AssessorCode, j.Node, j.Term ?? "")).ToArray(),
            Pairwise = judgements.Where(j => j.Kind == WeightJudgement.PairwiseKind)
                .OrderBy(j => A(j.AssessorCode)).ThenBy(j => j.Id)
                .Select(j => new PairwiseJudgement(j.AssessorCode, j.Node, j.Column ?? "", WeightStructure.PairwiseValue(plan.Evaluation, j.Term, j.Lower, j.Middle, j.Upper), j.Term)).ToArray(),
            Ratings = ratings.OrderBy(r => A(r.AssessorCode)).ThenBy(r => B(r.AlternativeCode)).ThenBy(r => C(r.CriterionId))
                .Select(r => new Rating(r.AssessorCode, r.AlternativeCode, r.CriterionId, r.Term, r.Rationale, r.DeclinedReason)).ToArray(),
            Values = values.OrderBy(v => B(v.AlternativeCode)).ThenBy(v => C(v.CriterionId))
                .Select(v => new NumericValue(v.AlternativeCode, v.CriterionId, v.Value)).ToArray(),
            Gates = gates.OrderBy(g => B(g.AlternativeCode)).ThenBy(g => C(g.CriterionId))
                .Select(g => new GateResult(g.AlternativeCode, g.CriterionId, g.Passed, g.Note)).ToArray(),
            Moderated = moderation.GroupBy(m => (m.AlternativeCode, m.CriterionId)).Select(g => g.Last())
                .OrderBy(m => B(m.AlternativeCode)).ThenBy(m => C(m.CriterionId))
                .Select(m => new ModeratedRating(m.AlternativeCode, m.CriterionId, m.Term, m.Reason,
                    JsonSerializer.Deserialize<string[]>(m.AgreedByJson) is { Length: > 0 } agreed ? agreed : null)).ToArray(),
            LowPriceReviews = reviews.OrderBy(r => B(r.AlternativeCode))
                .Select(r => new LowPriceReview(r.AlternativeCode, r.Asked, r.Answer,
                    r.Decision is null ? null : FormatWords.Parse(FormatWords.LowPriceDecisions, r.Decision, LowPriceDecision.Accepted), r.Reasons)).ToArray(),
        };
        return plan with { Evaluation = evaluation };
    }

    /// <summary>The fields a reviewer knows, or null.</summary>
    public static IReadOnlyList<string>? Topics(PanelMember seat) =>
        seat.TopicsJson is null ? null : JsonSerializer.Deserialize<string[]>(seat.TopicsJson);

    /// <summary>The criteria assigned to a seat, or null for all linguistic criteria.</summary>
    public static IReadOnlyList<string>? Assigned(PanelMember seat) =>
        seat.AssignedCriteriaJson is null ? null : JsonSerializer.Deserialize<string[]>(seat.AssignedCriteriaJson);
}
