using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// Re-ranks with each alternative removed in turn. Normalisation (the largest upper value, the lowest price) and
/// extreme ideal points depend on which bids are present, so removing one bid can reorder the others; a panel must
/// know before it disqualifies or accepts a withdrawal.
/// </summary>
public static class WithoutAlternative
{
    /// <summary>One entry per ranked alternative, in input order; empty when fewer than three are ranked.</summary>
    public static IReadOnlyList<WithoutAlternativeResult> Run(PreparedEvaluation prepared)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        if (n < 3)
        {
            return [];
        }

        var full = new TopsisWorkspace(n, m);
        full.Evaluate(prepared.Matrix, prepared.IsCost, prepared.FuzzyWeights, prepared.Source.Options.Ideal);
        var fullRank = full.Ranks.ToArray();

        var workspace = new TopsisWorkspace(n - 1, m);
        var matrix = new Tfn[(n - 1) * m];
        var kept = new int[n - 1];
        var results = new WithoutAlternativeResult[n];
        for (var removed = 0; removed < n; removed++)
        {
            for (int i = 0, r = 0; i < n; i++)
            {
                if (i == removed)
                {
                    continue;
                }

                kept[r] = i;
                prepared.Matrix.AsSpan(i * m, m).CopyTo(matrix.AsSpan(r * m, m));
                r++;
            }

            workspace.Evaluate(matrix, prepared.IsCost, prepared.FuzzyWeights, prepared.Source.Options.Ideal);
            var reversals = new List<OrderReversal>();
            for (var a = 0; a < n - 1; a++)
            {
                for (var b = 0; b < n - 1; b++)
                {
                    // a was strictly ahead of b before, and b is strictly ahead now.
                    if (fullRank[kept[a]] < fullRank[kept[b]] && workspace.Ranks[b] < workspace.Ranks[a])
                    {
                        reversals.Add(new OrderReversal(prepared.Alternatives[kept[a]].Id, prepared.Alternatives[kept[b]].Id));
                    }
                }
            }

            results[removed] = new WithoutAlternativeResult(
                prepared.Alternatives[removed].Id,
                workspace.Order.Select(i => prepared.Alternatives[kept[i]].Id).ToArray(),
                reversals);
        }

        return results;
    }
}
