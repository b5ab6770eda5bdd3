using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Properties;

/// <summary>
/// Dominance, the property any defensible ranking method must have: an alternative at least as good as another on
/// every criterion — by each assessor's rating, by every moderated value and by every measured value, in the
/// criterion's direction — never ranks below it, under either choice of ideal points. Checked in the main ranking,
/// at every point of every weight sweep, in every reported reversal and critical change, in the bid-removal and
/// method cross-checks, and in the plain-words summary, on evaluations of every shape the format allows
/// (<see cref="PanelGenerator"/>). Without the weight bound of fuzzy TOPSIS (every weight divided by the largest
/// upper value when it exceeds 1) these fail: a dearer copy of a bid overtook the cheaper one as price mattered more.
/// </summary>
[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class DominancePropertyTests
{
    /// <summary>Closeness values of two alternatives rated identically may differ by rounding in the last bits.</summary>
    private const double Rounding = 1e-12;

    [Property(MaxTest = 300)]
    public void A_dominating_alternative_never_ranks_below_the_one_it_dominates(AnyPanel panel)
    {
        foreach (var ideal in new[] { IdealPoints.Unit, IdealPoints.Extreme })
        {
            var (evaluation, better, worse) = Dominated(panel, ideal);
            var ranking = DecisionEngine.Analyse(evaluation).Ranking;
            var b = ranking.Single(r => r.Alternative == better);
            var w = ranking.Single(r => r.Alternative == worse);
            Assert.True(b.Rank <= w.Rank, $"{ideal}: {better} (rank {b.Rank}, CC {b.Closeness}) dominates {worse} (rank {w.Rank}, CC {w.Closeness})");
        }
    }

    [Property(MaxTest = 200)]
    public void No_weight_sweep_point_reversal_or_critical_change_puts_the_dominated_alternative_ahead(AnyPanel panel)
    {
        foreach (var ideal in new[] { IdealPoints.Unit, IdealPoints.Extreme })
        {
            var (evaluation, better, worse) = Dominated(panel, ideal);
            var prepared = DecisionEngine.Prepare(evaluation);
            var sweeps = WeightSweeps.Run(prepared);
            foreach (var sweep in sweeps)
            {
                var top = sweep.Series.SingleOrDefault(s => s.Alternative == better);
                var low = sweep.Series.SingleOrDefault(s => s.Alternative == worse);
                for (var s = 0; top is not null && low is not null && s < sweep.Samples.Count; s++)
                {
                    Assert.True(top.Closeness[s] >= low.Closeness[s] - Rounding,
                        $"{ideal}: with {sweep.Criterion} at {sweep.Samples[s]:P0}, {worse} ({low.Closeness[s]}) is ahead of {better} ({top.Closeness[s]}), which dominates it");
                }

                Assert.DoesNotContain(sweep.Reversals, r => Pair(r.Below, r.Above, better, worse));
            }

            var critical = CriticalChanges.Compute(prepared, prepared.Analyse(), sweeps);
            Assert.DoesNotContain(critical.Changes, c => c.Reverses && Pair(c.Leader, c.Challenger, better, worse));
            foreach (var most in new[] { critical.TopAbsolute, critical.TopRelative, critical.AnyAbsolute, critical.AnyRelative })
            {
                Assert.False(most is not null && Pair(most.Leader, most.Challenger, better, worse), $"{ideal}: {worse} reported as overtaking {better}");
            }
        }
    }

    [Property(MaxTest = 60)]
    public void The_robustness_checks_and_the_summary_never_report_the_dominated_alternative_overtaking(AnyPanel panel)
    {
        foreach (var ideal in new[] { IdealPoints.Unit, IdealPoints.Extreme })
        {
            var (evaluation, better, worse) = Dominated(panel, ideal);
            var prepared = DecisionEngine.Prepare(evaluation);
            var result = prepared.Analyse();
            var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(Draws: 64, Seed: (ulong)panel.Seed));

            foreach (var removal in robustness.Sensitivity.WithoutAlternative)
            {
                Assert.DoesNotContain(removal.Reversals, r => r.WasAhead == better && r.NowAhead == worse);
            }

            foreach (var method in robustness.Sensitivity.Methods.Where(m => m.Scores.Count > 0))
            {
                double top = method.Scores[IndexOf(method.Ranking, better)], low = method.Scores[IndexOf(method.Ranking, worse)];
                Assert.True(top >= low - Rounding, $"{ideal}, {method.Method}: {worse} scores {low}, above {better} ({top}), which dominates it");
            }

            var names = evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name);
            Assert.DoesNotContain(robustness.Summary, line => line.Contains($"{names[worse]} overtakes {names[better]}", StringComparison.Ordinal));
        }
    }

    private static bool Pair(string first, string second, string better, string worse) =>
        (first == better && second == worse) || (first == worse && second == better);

    private static int IndexOf(IReadOnlyList<string> ranking, string id)
    {
        for (var i = 0; i < ranking.Count; i++)
        {
            if (ranking[i] == id)
            {
                return i;
            }
        }

        throw new InvalidOperationException($"{id} is not in the ranking");
    }

    /// <summary>
    /// The generated panel with one alternative rewritten to dominate another that passed every gate, under the given
    /// ideal points.
    /// </summary>
    private static (Evaluation Evaluation, string Better, string Worse) Dominated(AnyPanel panel, IdealPoints ideal)
    {
        var e = panel.Evaluation with { Options = panel.Evaluation.Options with { Ideal = ideal } };
        var random = new Random(panel.Seed);
        var failed = e.Gates.Where(g => !g.Passed).Select(g => g.Alternative).ToHashSet();
        var passing = e.Alternatives.Where(a => !failed.Contains(a.Id)).ToArray();
        var worse = passing[random.Next(passing.Length)].Id;
        var others = e.Alternatives.Where(a => a.Id != worse).ToArray();
        var better = others[random.Next(others.Length)].Id;
        return (Dominate(e, better, worse, random), better, worse);
    }

    /// <summary>
    /// Rewrites <paramref name="better"/>'s inputs so that it dominates <paramref name="worse"/>: wherever an assessor
    /// rated <paramref name="worse"/>, they rate <paramref name="better"/> the same or better (higher on a benefit
    /// criterion, lower on a cost one); where they declined it, they decline <paramref name="better"/> too (the same
    /// raters, so renormalisation treats both alike). A moderated value of <paramref name="worse"/> gets a moderated
    /// value for <paramref name="better"/> as good or better; a cell moderated only for <paramref name="better"/> loses
    /// its moderation. Measured values become the same or better in the criterion's direction, and
    /// <paramref name="better"/> gets <paramref name="worse"/>'s gate results. Everything else stays as generated.
    /// </summary>
    private static Evaluation Dominate(Evaluation e, string better, string worse, Random random)
    {
        var scale = e.RatingScale;
        var direction = e.Criteria.ToDictionary(c => c.Id, c => c.Direction);
        string AsGoodOrBetter(string criterion, string term)
        {
            scale.TryFind(term, out var step);
            return direction[criterion] == Direction.Benefit
                ? scale[random.Next(step, scale.Count)].Code
                : scale[random.Next(0, step + 1)].Code;
        }

        var ofWorse = e.Ratings.Where(r => r.Alternative == worse).ToDictionary(r => (r.Assessor, r.Criterion));
        var ratings = e.Ratings.Select(r =>
        {
            if (r.Alternative != better)
            {
                return r;
            }

            var other = ofWorse[(r.Assessor, r.Criterion)];
            return other.Term is null
                ? r with { Term = null, Declined = other.Declined }
                : r with { Term = AsGoodOrBetter(r.Criterion, other.Term), Declined = null };
        }).ToArray();

        var moderated = e.Moderated.Where(m => m.Alternative != better)
            .Concat(e.Moderated.Where(m => m.Alternative == worse)
                .Select(m => m with { Alternative = better, Term = AsGoodOrBetter(m.Criterion, m.Term) }))
            .ToArray();

        var worseValues = e.Values.Where(v => v.Alternative == worse).ToDictionary(v => v.Criterion, v => v.Value);
        var values = e.Values.Select(v =>
        {
            if (v.Alternative != better)
            {
                return v;
            }

            var other = worseValues[v.Criterion];
            var step = random.Next(3) * 50; // sometimes equal, sometimes better
            return v with { Value = direction[v.Criterion] == Direction.Benefit ? other + step : Math.Max(1, other - step) };
        }).ToArray();

        var gates = e.Gates.Where(g => g.Alternative != better)
            .Concat(e.Gates.Where(g => g.Alternative == worse).Select(g => g with { Alternative = better }))
            .ToArray();

        return e with { Ratings = ratings, Moderated = moderated, Values = values, Gates = gates };
    }
}
