using Decide.Core.Analysis;

namespace Decide.Core.Robustness;

/// <summary>
/// Critical changes of criterion shares, after Triantaphyllou, E. &amp; Sánchez, A. (1997), "A sensitivity analysis
/// approach for some deterministic multi-criteria decision-making methods", Decision Sciences 28(1):151–194.
/// </summary>
/// <remarks>
/// For criterion k and a pair (i ahead of j in the base ranking): δ = the smallest |t − ŵₖ| at which i and j swap,
/// from the reversal points of <see cref="WeightSweeps"/>; relative δ' = δ/ŵₖ × 100%. The most critical criterion
/// for the top rank (PT) considers pairs whose leader is the top alternative; for any rank (PA), every pair. Each is
/// reported by absolute and by relative change, because a small criterion can be critical in relative terms and not
/// in absolute ones. The paper states these for the weighted sum; Decide applies the definitions to its own sweep.
/// </remarks>
public static class CriticalChanges
{
    /// <summary>Computes critical changes from the sweeps and the base ranking.</summary>
    public static CriticalChangesResult Compute(
        PreparedEvaluation prepared, AnalysisResult baseResult, IReadOnlyList<WeightSweepResult> sweeps)
    {
        var ranking = baseResult.Ranking;
        var changes = new List<CriticalChange>();
        foreach (var sweep in sweeps)
        {
            for (var a = 0; a < ranking.Count; a++)
            {
                for (var b = a + 1; b < ranking.Count; b++)
                {
                    if (ranking[a].Rank == ranking[b].Rank)
                    {
                        continue; // tied in the base ranking: nothing to reverse
                    }

                    string leader = ranking[a].Alternative, challenger = ranking[b].Alternative;
                    var closest = sweep.Reversals
                        .Where(r => r.Confirmed && ((r.Below == leader && r.Above == challenger) || (r.Below == challenger && r.Above == leader)))
                        .OrderBy(r => Math.Abs(r.Weight - sweep.Current))
                        .FirstOrDefault();
                    if (closest is null)
                    {
                        changes.Add(new CriticalChange(sweep.Criterion, leader, challenger, sweep.Current, null, null, null));
                    }
                    else
                    {
                        var delta = Math.Abs(closest.Weight - sweep.Current);
                        changes.Add(new CriticalChange(sweep.Criterion, leader, challenger, sweep.Current, closest.Weight, delta, delta / sweep.Current * 100));
                    }
                }
            }
        }

        var top = ranking.Count > 0 ? ranking[0].Alternative : null;
        var reversing = changes.Where(c => c.Reverses).ToArray();
        var forTop = reversing.Where(c => c.Leader == top).ToArray();
        return new CriticalChangesResult(
            changes,
            Most(forTop, c => c.Absolute!.Value),
            Most(forTop, c => c.Relative!.Value),
            Most(reversing, c => c.Absolute!.Value),
            Most(reversing, c => c.Relative!.Value));
    }

    private static MostCriticalCriterion? Most(IReadOnlyList<CriticalChange> candidates, Func<CriticalChange, double> by)
    {
        var best = candidates.OrderBy(by).FirstOrDefault();
        return best is null
            ? null
            : new MostCriticalCriterion(best.Criterion, best.Leader, best.Challenger, best.Current, best.Absolute!.Value, best.Relative!.Value, best.Weight!.Value);
    }
}
