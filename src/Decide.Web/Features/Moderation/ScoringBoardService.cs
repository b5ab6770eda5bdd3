using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Weighting;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Moderation;

/// <summary>
/// The scoring board for the facilitator and the observer: declarations, weights, consistency, how many cells each
/// assessor has rated or declined, submission; and how many values the price evaluators have entered. It counts,
/// and never shows what anyone rated.
/// </summary>
public sealed class ScoringBoardService(IDbContextFactory<DecideDbContext> factory, EvaluationAccess access)
{
    public async Task<ScoringBoard> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer);

        var plan = EvaluationComposer.ReadPlan(m.Evaluation).Evaluation;
        var linguistic = plan.Criteria.Where(c => c.Kind == CriterionKind.Linguistic).Select(c => c.Id).ToArray();
        var numeric = plan.Criteria.Where(c => c.Kind == CriterionKind.Numeric).Select(c => c.Id).ToHashSet(StringComparer.Ordinal);
        var failed = await ModerationService.FailedGatesAsync(db, id, ct);
        var scored = (await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id).Select(a => a.Code).ToListAsync(ct))
            .Where(code => !failed.ContainsKey(code)).ToHashSet(StringComparer.Ordinal);

        // Only whether a cell is done is read, never its term or rationale.
        var done = await db.Ratings.AsNoTracking().Where(r => r.EvaluationId == id && (r.Term != null || r.DeclinedReason != null))
            .Select(r => new { r.AssessorCode, r.AlternativeCode, r.CriterionId }).ToListAsync(ct);
        var values = await db.NumericValues.AsNoTracking().Where(v => v.EvaluationId == id)
            .Select(v => new { v.AlternativeCode, v.CriterionId }).ToListAsync(ct);
        var judgements = plan.Weighting == WeightingMethod.Pairwise
            ? await db.WeightJudgements.AsNoTracking().Where(w => w.EvaluationId == id && w.Kind == WeightJudgement.PairwiseKind).OrderBy(w => w.Id).ToListAsync(ct)
            : [];
        // In a round, each reviewer is expected to rate only the applications assigned to them.
        var reads = plan.Reviews is null
            ? null
            : (await db.ReviewAssignments.AsNoTracking().Where(r => r.EvaluationId == id).Select(r => new { r.AssessorCode, r.AlternativeCode }).ToListAsync(ct))
                .GroupBy(r => r.AssessorCode).ToDictionary(g => g.Key, g => g.Select(r => r.AlternativeCode).ToHashSet(StringComparer.Ordinal), StringComparer.Ordinal);
        var userIds = m.Evaluation.Panel.Select(p => p.UserId).Distinct().ToArray();
        var names = await db.Users.AsNoTracking().Where(u => userIds.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);

        var assessors = new List<AssessorProgress>();
        foreach (var seat in m.Evaluation.Panel.Where(p => p.Role == PanelRole.Assessor).OrderBy(p => p.Id))
        {
            var code = seat.AssessorCode ?? "";
            var assigned = (EvaluationComposer.Assigned(seat) ?? linguistic).Where(linguistic.Contains).ToHashSet(StringComparer.Ordinal);
            var theirs = reads is null ? scored : scored.Where(a => reads.GetValueOrDefault(code)?.Contains(a) == true).ToHashSet(StringComparer.Ordinal);
            var ratingsDone = done.Count(r => r.AssessorCode == code && theirs.Contains(r.AlternativeCode) && assigned.Contains(r.CriterionId));
            var matrices = plan.Weighting == WeightingMethod.Pairwise
                ? WeightStructure.Matrices(plan).Select(x => Consistency(plan, x.Group, x.Items, judgements.Where(j => j.AssessorCode == code))).ToArray()
                : null;
            assessors.Add(new AssessorProgress(
                code, names.GetValueOrDefault(seat.UserId, code), seat.DeclarationSignedAt, seat.DeclarationVersion, seat.NamesConfirmedAt,
                seat.WeightsSubmittedAt, matrices, matrices?.Any(x => x.Flagged) == true,
                ratingsDone, theirs.Count * assigned.Count, seat.SubmittedAt));
        }

        var valuesEntered = values.Count(v => scored.Contains(v.AlternativeCode) && numeric.Contains(v.CriterionId));
        var price = m.Evaluation.Panel.Where(p => p.Role == PanelRole.PriceEvaluator).OrderBy(p => p.Id)
            .Select(p => new PriceEvaluatorProgress(p.AssessorCode ?? "", names.GetValueOrDefault(p.UserId, p.AssessorCode ?? ""),
                valuesEntered, scored.Count * numeric.Count))
            .ToArray();
        return new ScoringBoard(id, m.Evaluation.Stage, plan.Weighting, scored.Count, assessors, price);
    }

    private static MatrixProgress Consistency(Evaluation plan, string? group, IReadOnlyList<string> items, IEnumerable<WeightJudgement> judgements)
    {
        var needed = items.Count * (items.Count - 1) / 2;
        var position = items.Select((item, i) => (item, i)).ToDictionary(x => x.item, x => x.i, StringComparer.Ordinal);
        var matrix = new FuzzyPairwiseMatrix(items);
        var pairs = new HashSet<(int, int)>();
        foreach (var j in judgements)
        {
            if (j.Column is null || !position.TryGetValue(j.Node, out var row) || !position.TryGetValue(j.Column, out var col) || row == col
                || Value(plan, j) is not { } value)
            {
                continue;
            }

            matrix.Set(row, col, value);
            pairs.Add((Math.Min(row, col), Math.Max(row, col)));
        }

        if (needed == 0 || pairs.Count < needed)
        {
            return new MatrixProgress(group, pairs.Count, needed, null, null, false);
        }

        var report = CriterionWeights.Report("", group, matrix).Report;
        return new MatrixProgress(group, pairs.Count, needed, report.Ratio, report.Threshold, !report.Acceptable);
    }

    /// <summary>A judgement's TFN: its scale term, or its numbers; null when the stored numbers are not a positive TFN.</summary>
    private static Tfn? Value(Evaluation plan, WeightJudgement j)
    {
        if (j.Term is { } term && plan.PairwiseScale.TryFind(term, out var step))
        {
            return plan.PairwiseScale[step].Value;
        }

        if (j is { Lower: > 0 and var l, Middle: { } mid, Upper: { } u } && l <= mid && mid <= u && double.IsFinite(u))
        {
            return new Tfn(l, mid, u);
        }

        return null;
    }
}
