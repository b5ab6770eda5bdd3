using Decide.Core.Analysis;

namespace Decide.Core.Robustness;

/// <summary>
/// Critical changes of criterion weights, after Triantaphyllou, E. &amp; Sánchez, A. (1997), "A sensitivity analysis
/// approach for some deterministic multi-criteria decision-making methods", Decision Sciences 28(1):151–194.
/// </summary>
/// <remarks>
/// <para>
/// The paper's critical change δ of criterion k for a pair: the weight wₖ alone becomes wₖ* = wₖ − δ, the other
/// weights are unchanged, and then all weights are renormalised to sum 1 (definitions recalled). In share space this
/// is exactly the proportional sweep of <see cref="WeightSweeps"/>: with shares ŵ summing to 1 the renormalised
/// weights are ŵⱼ/(1 − δ) for j ≠ k and (ŵₖ − δ)/(1 − δ) =: t for k; and since 1 − t = (1 − ŵₖ)/(1 − δ), the others
/// are ŵⱼ(1 − t)/(1 − ŵₖ), the sweep rule at share t. Solving t(1 − δ) = ŵₖ − δ for δ gives δ = (ŵₖ − t)/(1 − t).
/// So each confirmed reversal t* of a pair's sweep gives a critical change δ = (ŵₖ − t*)/(1 − t*) and relative
/// δ' = δ/ŵₖ × 100%. It is feasible when the changed weight wₖ − δ is not negative, δ ≤ ŵₖ (the paper's condition,
/// recalled); a changed weight above 1 is a valid weight before renormalisation, so every reversal with t* &lt; 1 is
/// feasible (t* = 1 would need δ → −∞). The pair's critical change is the feasible one smallest in size. δ falls as t rises
/// (dδ/dt = (ŵₖ − 1)/(1 − t)² &lt; 0), so on each side of ŵₖ the nearest reversal gives the smallest |δ|, but a fall
/// of the share counts for more than an equal rise: the reversal nearest in share is not always the one with the
/// smallest |δ|.
/// </para>
/// <para>
/// Beside it, Decide's share change |t* − ŵₖ| (nearest confirmed reversal, relative |t* − ŵₖ|/ŵₖ × 100%): the share
/// the criterion must reach, the figure panels publish; the screens and the summary use it, the record and the
/// results document give both. Most critical criteria as the paper defines them: for the top rank, over pairs led
/// by the first-ranked alternative; for any rank, over every pair; each by |δ| and by |δ'| (the paper's PT and PA
/// criteria are the relative ones). The paper derives closed forms for the weighted sum model; for TOPSIS the
/// reversals come from the sweep's root-finding. With crisp values and unit ideal points closeness is the weighted
/// sum divided by the number of criteria, and the tests check the engine against the paper's closed form
/// δ = (Pᵢ − Pⱼ)/(aᵢₖ − aⱼₖ).
/// </para>
/// </remarks>
public static class CriticalChanges
{
    /// <summary>
    /// Up to this many ranked alternatives every pair gets an entry, reversing or not. Above it (a round of hundreds
    /// of applications, whose pairs run to the hundred thousand) only the leader's pairs and the neighbouring pairs
    /// of the ranking, and of those only the ones some change of weight reverses. The most critical criteria stay
    /// exact: moving one weight away from its value, the first reversal to happen is between two alternatives that
    /// are neighbours in the ranking as it stands, so the smallest change over every pair is a neighbour's.
    /// </summary>
    public const int EveryPairUpTo = 40;

    /// <summary>Computes critical changes from the sweeps and the base ranking.</summary>
    /// <param name="prepared">The prepared evaluation (kept for symmetry with the other analyses).</param>
    /// <param name="baseResult">The base ranking; pairs are taken in its order, leader first.</param>
    /// <param name="sweeps">The weight sweeps of every scored criterion (<see cref="WeightSweeps.Run"/>).</param>
    public static CriticalChangesResult Compute(
        PreparedEvaluation prepared, AnalysisResult baseResult, IReadOnlyList<WeightSweepResult> sweeps)
    {
        ArgumentNullException.ThrowIfNull(prepared);
        var ranking = baseResult.Ranking;
        var changes = new List<CriticalChange>();
        var everyPair = ranking.Count <= EveryPairUpTo;
        foreach (var sweep in sweeps)
        {
            var current = sweep.Current;

            // The confirmed reversal shares of each unordered pair, found once per sweep rather than per pair.
            var byPair = new Dictionary<(string, string), List<double>>();
            foreach (var r in sweep.Reversals.Where(r => r.Confirmed))
            {
                var key = string.CompareOrdinal(r.Below, r.Above) < 0 ? (r.Below, r.Above) : (r.Above, r.Below);
                (byPair.TryGetValue(key, out var list) ? list : byPair[key] = []).Add(r.Weight);
            }

            for (var a = 0; a < ranking.Count; a++)
            {
                if (!everyPair && byPair.Count == 0)
                {
                    break;
                }

                for (var b = a + 1; b < ranking.Count; b++)
                {
                    if (!everyPair && a > 0 && b > a + 1)
                    {
                        break; // a large round: the leader's pairs and neighbours only
                    }

                    if (ranking[a].Rank == ranking[b].Rank)
                    {
                        continue; // tied in the base ranking: nothing to reverse
                    }

                    string leader = ranking[a].Alternative, challenger = ranking[b].Alternative;
                    var key = string.CompareOrdinal(leader, challenger) < 0 ? (leader, challenger) : (challenger, leader);
                    if (!byPair.TryGetValue(key, out var found))
                    {
                        if (everyPair)
                        {
                            changes.Add(new CriticalChange(sweep.Criterion, leader, challenger, current, null, null, null, null, null, null));
                        }

                        continue;
                    }

                    var points = found.ToArray();
                    var nearest = points.MinBy(t => Math.Abs(t - current));
                    var absolute = Math.Abs(nearest - current);
                    var feasible = points.Where(t => Delta(current, t) is not null).ToArray();
                    double? deltaShare = feasible.Length == 0 ? null : feasible.MinBy(t => Math.Abs(Delta(current, t)!.Value));
                    var delta = deltaShare is { } s ? Delta(current, s) : null;
                    changes.Add(new CriticalChange(sweep.Criterion, leader, challenger, current, nearest, absolute, absolute / current * 100,
                        delta, delta / current * 100, deltaShare));
                }
            }
        }

        var top = ranking.Count > 0 ? ranking[0].Alternative : null;
        var forTop = changes.Where(c => c.Leader == top).ToArray();
        return new CriticalChangesResult(
            changes,
            ByDelta(forTop, c => Math.Abs(c.Delta!.Value)),
            ByDelta(forTop, c => Math.Abs(c.DeltaRelative!.Value)),
            ByDelta(changes, c => Math.Abs(c.Delta!.Value)),
            ByDelta(changes, c => Math.Abs(c.DeltaRelative!.Value)),
            ByShare(forTop),
            ByShare(changes));
    }

    /// <summary>
    /// Triantaphyllou &amp; Sánchez's δ for a reversal at share <paramref name="t"/> of a criterion whose share is
    /// <paramref name="current"/>: (ŵₖ − t)/(1 − t) when the changed weight ŵₖ − δ is not negative, otherwise null
    /// (only t = 1, which no finite δ reaches).
    /// </summary>
    public static double? Delta(double current, double t)
    {
        if (!(t < 1))
        {
            return null; // t = 1 would need δ → −∞
        }

        var delta = (current - t) / (1 - t);
        return delta <= current ? delta : null;
    }

    private static MostCriticalCriterion? ByDelta(IEnumerable<CriticalChange> changes, Func<CriticalChange, double> size)
    {
        var best = changes.Where(c => c.Delta is not null).OrderBy(size).FirstOrDefault();
        return best is null ? null : At(best, best.DeltaShare!.Value);
    }

    private static MostCriticalCriterion? ByShare(IEnumerable<CriticalChange> changes)
    {
        var best = changes.Where(c => c.Reverses).OrderBy(c => c.Absolute!.Value).FirstOrDefault();
        return best is null ? null : At(best, best.Weight!.Value);
    }

    private static MostCriticalCriterion At(CriticalChange change, double t)
    {
        var absolute = Math.Abs(t - change.Current);
        var delta = Delta(change.Current, t);
        return new MostCriticalCriterion(change.Criterion, change.Leader, change.Challenger, change.Current,
            absolute, absolute / change.Current * 100, t, delta, delta / change.Current * 100);
    }
}
