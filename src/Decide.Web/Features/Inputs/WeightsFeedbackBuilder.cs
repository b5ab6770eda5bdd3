using Decide.Core.Consistency;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Core.Weighting;
using Decide.Data.Entities;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// Live feedback on one assessor's weight judgements: what is missing, and for pairwise judgements the
/// consistency of each matrix (CR, GCI, the judgements that fit the rest least, intransitive triads) by the engine's
/// own <see cref="CriterionWeights.Report"/>. An incomplete matrix gets what can be said without the missing pairs:
/// the pairs still to judge and the triads among the judgements given.
/// </summary>
public static class WeightsFeedbackBuilder
{
    /// <summary>Groups and weighted (non-gate) criteria, groups first: what importance is given for.</summary>
    public static IReadOnlyList<WeightNodeView> Nodes(Evaluation plan) =>
        plan.Groups.Select(g => new WeightNodeView(g.Id, g.Name, "group", null))
            .Concat(plan.Criteria.Where(c => c.Kind != CriterionKind.Gate).Select(c => new WeightNodeView(c.Id, c.Name, "criterion", c.Group)))
            .ToArray();

    /// <summary>The value a stored pairwise judgement stands for.</summary>
    public static Tfn ValueOf(Evaluation plan, WeightJudgement j) =>
        WeightStructure.PairwiseValue(plan, j.Term, j.Lower, j.Middle, j.Upper);

    public static WeightsFeedback Build(Evaluation plan, string assessor, IReadOnlyList<WeightJudgement> judgements) =>
        plan.Weighting switch
        {
            WeightingMethod.Importance => Importance(plan, judgements),
            WeightingMethod.Points => new WeightsFeedback(true, [], [], []),
            _ => Pairwise(plan, assessor, judgements),
        };

    private static WeightsFeedback Importance(Evaluation plan, IReadOnlyList<WeightJudgement> judgements)
    {
        var given = judgements.Where(j => j.Kind == WeightJudgement.ImportanceKind).Select(j => j.Node).ToHashSet(StringComparer.Ordinal);
        var missing = Nodes(plan).Select(n => n.Id).Where(n => !given.Contains(n)).ToArray();
        var warnings = missing.Length == 0 ? Array.Empty<string>() : [$"Still to rate: {string.Join(", ", missing)}."];
        return new WeightsFeedback(missing.Length == 0, missing, [], warnings);
    }

    private static WeightsFeedback Pairwise(Evaluation plan, string assessor, IReadOnlyList<WeightJudgement> judgements)
    {
        var pairwise = judgements.Where(j => j.Kind == WeightJudgement.PairwiseKind).ToArray();
        var matrices = new List<MatrixFeedback>();
        var warnings = new List<string>();
        foreach (var (group, items) in WeightStructure.Matrices(plan).Where(m => m.Items.Count >= 2))
        {
            var feedback = Matrix(plan, assessor, group, items, pairwise);
            matrices.Add(feedback);
            var where = group is null ? "at the top level" : $"within {group}";
            if (!feedback.Complete)
            {
                warnings.Add($"Still to compare {where}: {string.Join(", ", feedback.MissingPairs.Select(p => $"{p[0]}–{p[1]}"))}.");
            }

            if (feedback.WorstJudgements.Count > 0)
            {
                warnings.Add($"Your comparisons {where} are not consistent enough (consistency ratio {feedback.ConsistencyRatio:0.000}, acceptable up to {feedback.Threshold:0.00}; GCI {feedback.Gci:0.000}, acceptable up to {feedback.GciThreshold:0.00}): "
                    + $"reconsider {string.Join("; ", feedback.WorstJudgements.Select(h => $"{h.Row} over {h.Col} (given {h.Given:0.###}, the others imply about {h.Consistent:0.###}, nearest term {h.SuggestedTerm})"))}.");
            }

            warnings.AddRange(feedback.IntransitiveTriads.Select(t =>
                $"Your comparisons {where} go round in a circle: {t[0]} over {t[1]} and {t[1]} over {t[2]}, but {t[2]} over {t[0]}."));
        }

        return new WeightsFeedback(matrices.All(m => m.Complete), [], matrices, warnings);
    }

    private static MatrixFeedback Matrix(Evaluation plan, string assessor, string? group, IReadOnlyList<string> items, IReadOnlyList<WeightJudgement> judgements)
    {
        var position = items.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i, StringComparer.Ordinal);
        var matrix = new FuzzyPairwiseMatrix(items);
        var judged = new HashSet<(int, int)>();
        foreach (var j in judgements)
        {
            if (j.Column is { } col && position.TryGetValue(j.Node, out var r) && position.TryGetValue(col, out var c) && r != c)
            {
                matrix.Set(r, c, ValueOf(plan, j));
                judged.Add((Math.Min(r, c), Math.Max(r, c)));
            }
        }

        var missing = new List<string[]>();
        for (var i = 0; i < items.Count; i++)
        {
            for (var k = i + 1; k < items.Count; k++)
            {
                if (!judged.Contains((i, k)))
                {
                    missing.Add([items[i], items[k]]);
                }
            }
        }

        var n = items.Count;
        var threshold = RandomIndex.Threshold(n);
        var gciThreshold = RandomIndex.GciThreshold(n);

        // A pair not yet judged stays at 1 (equal), which never closes a cycle: the triads are those among the judgements given.
        var triads = PairwiseConsistency.IntransitiveTriads(matrix.Middles(), items);
        if (missing.Count > 0 || n > RandomIndex.MaxOrder)
        {
            return new MatrixFeedback(group, items, missing.Count == 0, missing, null, threshold, null, null, gciThreshold, [], triads, null);
        }

        var consistency = CriterionWeights.Report(assessor, group, matrix);
        var report = consistency.Report;
        var shares = CrispShares.FromCentroids(consistency.Weights.ToArray());
        return new MatrixFeedback(
            group, items, true, [], report.Ratio, report.Threshold, report.Acceptable, report.Gci, report.GciThreshold,
            report.WorstJudgements.Select(w => new JudgementHint(w.Row, w.Col, w.Given, w.Consistent, Nearest(plan.PairwiseScale, w.Consistent))).ToArray(),
            report.IntransitiveTriads,
            items.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => shares[x.i], StringComparer.Ordinal));
    }

    /// <summary>The term whose middle value is nearest to <paramref name="value"/> on a log scale (ratios are compared by their logarithms).</summary>
    private static string Nearest(LinguisticScale scale, double value) =>
        scale.Terms.MinBy(t => Math.Abs(Math.Log(t.Value.Middle) - Math.Log(value)))!.Code;
}
