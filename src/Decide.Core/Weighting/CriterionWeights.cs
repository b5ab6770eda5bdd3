using Decide.Core.Aggregation;
using Decide.Core.Consistency;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Weighting;

/// <summary>
/// Derives every scored criterion's fuzzy weight from the panel's importance ratings or pairwise judgements,
/// combining group and local weights.
/// </summary>
/// <remarks>
/// Groups (one level deep): a grouped criterion's weight is its group's weight ⊗ its local weight.
/// <list type="bullet">
/// <item>Importance: each node (group or criterion) gets the aggregated importance TFN. Within a group the local
/// weights are divided by the sum of their centroids, so that a group's criteria share the group's weight rather
/// than each receiving it whole; a top-level criterion keeps its aggregated importance (Chen 2000).</item>
/// <item>Points: the published points, each criterion's weight its points ÷ the stated total (crisp).</item>
/// <item>Pairwise: one matrix at the top level (groups and top-level criteria) and one per group; Buckley weights
/// of the panel's matrix (element-wise weighted geometric mean of the assessors' matrices). A matrix of one item
/// gives it (1, 1, 1).</item>
/// </list>
/// Finally, when any weight's upper value exceeds 1, every weight is divided by the largest upper value
/// (<see cref="FuzzyTopsis.WeightBound"/>): the unit ideal points of fuzzy TOPSIS assume weighted values within
/// [0, 1] (Chen 2000, §3 after eq. 16). The crisp shares are unchanged; the group and local parts are reported as
/// derived, so their product is then the reported weight times that divisor.
/// See docs/methods.md §4 and docs/decisions/0004-criterion-groups.md.
/// </remarks>
public static class CriterionWeights
{
    /// <summary>The derived weights, in the order of <paramref name="scored"/>, and the consistency reports.</summary>
    /// <param name="evaluation">A validated evaluation.</param>
    /// <param name="scored">The scored (non-gate) criteria, in order.</param>
    public static (CriterionWeight[] Weights, MatrixConsistency[] Consistency) Derive(
        Evaluation evaluation, IReadOnlyList<Criterion> scored)
    {
        Dictionary<string, Tfn> node;
        MatrixConsistency[] consistency;
        switch (evaluation.Weighting)
        {
            case WeightingMethod.Importance:
                node = FromImportance(evaluation, scored);
                consistency = [];
                break;
            case WeightingMethod.Points:
                node = FromPoints(evaluation);
                consistency = [];
                break;
            default:
                (node, consistency) = FromPairwise(evaluation);
                break;
        }

        var fuzzy = new Tfn[scored.Count];
        var parts = new (Tfn? Group, Tfn? Local)[scored.Count];
        for (var j = 0; j < scored.Count; j++)
        {
            var c = scored[j];
            if (c.Group is { } g)
            {
                var local = node[c.Id];
                fuzzy[j] = node[g] * local;
                parts[j] = (node[g], local);
            }
            else
            {
                fuzzy[j] = node[c.Id];
            }
        }

        // Brought within [0, 1] as fuzzy TOPSIS's unit ideal points assume (Buckley upper weights and custom importance
        // scales can exceed 1); one divisor for all, so the crisp shares are unchanged.
        var bound = FuzzyTopsis.WeightBound(fuzzy);
        if (bound > 1)
        {
            for (var j = 0; j < fuzzy.Length; j++)
            {
                fuzzy[j] = (1 / bound) * fuzzy[j];
            }
        }

        var crisp = CrispShares.FromCentroids(fuzzy);
        var weights = new CriterionWeight[scored.Count];
        for (var j = 0; j < scored.Count; j++)
        {
            weights[j] = new CriterionWeight(scored[j].Id, fuzzy[j], crisp[j], scored[j].Group, parts[j].Group, parts[j].Local);
        }

        return (weights, consistency);
    }

    private static Dictionary<string, Tfn> FromImportance(Evaluation e, IReadOnlyList<Criterion> scored)
    {
        var weightOf = e.Assessors.ToDictionary(a => a.Id, a => a.Weight, StringComparer.Ordinal);
        var byNode = e.Importance.GroupBy(r => r.Node, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.ToArray(), StringComparer.Ordinal);
        var node = new Dictionary<string, Tfn>(StringComparer.Ordinal);
        foreach (var (id, ratings) in byNode)
        {
            var values = ratings.Select(r => e.ImportanceScale[Step(e, r.Term)].Value).ToArray();
            var weights = ratings.Select(r => weightOf[r.Assessor]).ToArray();
            node[id] = GroupAggregation.Aggregate(values, weights, e.Options.Aggregation);
        }

        foreach (var group in e.Groups)
        {
            var members = scored.Where(c => c.Group == group.Id).ToArray();
            var total = members.Sum(c => node[c.Id].Centroid);
            foreach (var c in members)
            {
                node[c.Id] = total > 0 ? (1 / total) * node[c.Id] : Tfn.Zero;
            }
        }

        return node;
    }

    /// <summary>
    /// Published points as crisp weights: a group's share of the total, and within it each criterion's share of the
    /// group's points, so that their product is the criterion's points ÷ the total.
    /// </summary>
    private static Dictionary<string, Tfn> FromPoints(Evaluation e)
    {
        var points = e.Points ?? throw new InvalidOperationException("Points weighting without published points.");
        var node = new Dictionary<string, Tfn>(StringComparer.Ordinal);
        foreach (var (group, value) in points.Groups)
        {
            node[group] = Tfn.Crisp(value / points.Total);
        }

        foreach (var c in points.Criteria)
        {
            node[c.Id] = Tfn.Crisp(c.Points / (c.Group is { } g ? points.Groups[g] : points.Total));
        }

        return node;
    }

    private static int Step(Evaluation e, string term) => e.ImportanceScale.TryFind(term, out var step)
        ? step
        : throw new InvalidOperationException($"Unvalidated importance term {term}.");

    private static (Dictionary<string, Tfn>, MatrixConsistency[]) FromPairwise(Evaluation e)
    {
        var node = new Dictionary<string, Tfn>(StringComparer.Ordinal);
        var reports = new List<MatrixConsistency>();
        // Each assessor's judgements, in input order, gathered once rather than searched for per matrix.
        var byAssessor = new Dictionary<string, List<PairwiseJudgement>>(StringComparer.Ordinal);
        foreach (var p in e.Pairwise)
        {
            if (!byAssessor.TryGetValue(p.Assessor, out var own))
            {
                byAssessor[p.Assessor] = own = [];
            }

            own.Add(p);
        }

        var judges = e.Assessors.Where(a => byAssessor.ContainsKey(a.Id)).ToArray();

        foreach (var (group, items) in WeightStructure.Matrices(e))
        {
            if (items.Count == 1)
            {
                node[items[0]] = Tfn.One;
                continue;
            }

            var position = items.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i, StringComparer.Ordinal);
            var individual = new List<FuzzyPairwiseMatrix>();
            foreach (var judge in judges)
            {
                var matrix = new FuzzyPairwiseMatrix(items);
                foreach (var j in byAssessor[judge.Id])
                {
                    if (position.TryGetValue(j.Row, out var row) && position.TryGetValue(j.Col, out var col))
                    {
                        matrix.Set(row, col, j.Value);
                    }
                }

                individual.Add(matrix);
                reports.Add(Report(judge.Id, group, matrix));
            }

            var panel = FuzzyPairwiseMatrix.GeometricMean(individual, judges.Select(j => j.Weight).ToArray());
            var panelReport = Report(WeightStructure.PanelId, group, panel);
            reports.Add(panelReport);
            for (var i = 0; i < items.Count; i++)
            {
                node[items[i]] = panelReport.Weights[i];
            }
        }

        return (node, reports.ToArray());
    }

    /// <summary>Consistency and Buckley weights of one matrix.</summary>
    public static MatrixConsistency Report(string assessor, string? group, FuzzyPairwiseMatrix matrix) =>
        new(assessor, group, matrix.Items, PairwiseConsistency.Analyse(matrix.Middles(), matrix.Items), BuckleyWeights.Compute(matrix));
}
