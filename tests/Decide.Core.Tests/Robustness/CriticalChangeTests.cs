using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// Critical changes against the closed form of Triantaphyllou, E. &amp; Sánchez, A. (1997), "A sensitivity analysis
/// approach for some deterministic multi-criteria decision-making methods", Decision Sciences 28(1):151–194, for the
/// weighted sum model [definitions recalled]: criterion k's weight alone becomes wₖ − δ and all weights are then
/// renormalised; alternatives i and j swap at δₖ,ᵢ,ⱼ = (Pᵢ − Pⱼ)/(aᵢₖ − aⱼₖ), feasible when wₖ − δ stays in [0, 1].
/// </summary>
/// <remarks>
/// With crisp numeric criteria, crisp weights whose upper values stay at most 1 and the unit ideal points (1, 1, 1)
/// and (0, 0, 0), each weighted value v lies in [0, 1], so d(v, 1) = 1 − v and d(v, 0) = v: d⁺ + d⁻ = m and closeness
/// is Σⱼ wⱼaⱼ / m, the weighted sum divided by the number of criteria (Chen 2000, eqs. 15–19) [derived]. The
/// paper's closed form then applies exactly. The expected values below are computed from the normalised matrix with
/// that formula, not from the sweep.
/// </remarks>
public sealed class CriticalChangeTests
{
    // Importance 0.5, 0.3, 0.2 (crisp, summing to 1, so the crisp shares are these weights and no weight on a sweep
    // exceeds 1). C1 is a price (cost), C2 and C3 are benefits.
    private static readonly double[] Shares = [0.5, 0.3, 0.2];
    private static readonly bool[] Cost = [true, false, false];

    private static readonly double[][] Values =
    [
        [100, 80, 60],  // A1
        [125, 90, 40],  // A2
        [160, 70, 100], // A3
        [110, 60, 55],  // A4
    ];

    [Fact]
    public void With_crisp_criteria_the_critical_change_of_every_pair_is_the_weighted_sum_closed_form()
    {
        var (prepared, result, critical) = Analyse(Values);
        var (a, p) = WeightedSum(Values);
        var ids = Enumerable.Range(1, Values.Length).Select(i => $"A{i}").ToArray();

        // The base ranking is the order of the weighted sums P: A1 0.8867 > A2 0.7800 > A4 0.7645 > A3 0.7458 [derived].
        Assert.Equal(Enumerable.Range(0, ids.Length).OrderByDescending(i => p[i]).Select(i => ids[i]), result.Ranking.Select(r => r.Alternative));
        Assert.Equal(3 * 6, critical.Changes.Count);

        int feasible = 0, aboveOne = 0, none = 0;
        foreach (var change in critical.Changes)
        {
            var k = Array.IndexOf(["C1", "C2", "C3"], change.Criterion);
            int i = Array.IndexOf(ids, change.Leader), j = Array.IndexOf(ids, change.Challenger);
            var w = Shares[k];
            Assert.Equal(w, change.Current, 12);

            var delta = (p[i] - p[j]) / (a[i][k] - a[j][k]);
            if (delta > w)
            {
                // Even a weight of 0 leaves the leader ahead (or lowering the weight never helps the challenger).
                none++;
                Assert.False(change.Reverses, $"{change}: δ = {delta} > w = {w}");
                Assert.Null(change.Delta);
                continue;
            }

            // The renormalised share at wₖ − δ: t = (w − δ)/(1 − δ).
            var t = (w - delta) / (1 - delta);
            Assert.True(change.Reverses, $"{change}: δ = {delta}");
            Assert.Equal(t, change.Weight!.Value, 8);
            Assert.Equal(Math.Abs(t - w), change.Absolute!.Value, 8);
            // Feasible whenever the changed weight wₖ − δ is not negative (δ ≤ wₖ, checked above); one of these
            // raises the weight alone above 1 before renormalising (δ < wₖ − 1), still a valid weight.
            feasible++;
            aboveOne += delta < w - 1 ? 1 : 0;
            Assert.Equal(delta, change.Delta!.Value, 8);
            Assert.Equal(delta / w * 100, change.DeltaRelative!.Value, 4);
            Assert.Equal(t, change.DeltaShare!.Value, 8);
        }

        // The case covers all three outcomes [derived from the closed form].
        Assert.Equal((12, 1, 6), (feasible, aboveOne, none));
    }

    [Fact]
    public void The_most_critical_criteria_are_the_smallest_closed_form_changes()
    {
        var (_, _, critical) = Analyse(Values);
        var (a, p) = WeightedSum(Values);
        var pairs = (from k in Enumerable.Range(0, 3)
                     from i in Enumerable.Range(0, 4)
                     from j in Enumerable.Range(0, 4)
                     where p[i] > p[j] && a[i][k] != a[j][k]
                     let delta = (p[i] - p[j]) / (a[i][k] - a[j][k])
                     let t = (Shares[k] - delta) / (1 - delta)
                     select (k, i, j, delta, relative: delta / Shares[k] * 100, t, reverses: delta <= Shares[k], feasible: delta <= Shares[k]))
                    .ToArray();
        var top = 0; // A1 has the largest weighted sum

        var topAbsolute = pairs.Where(x => x.feasible && x.i == top).MinBy(x => Math.Abs(x.delta));
        var topRelative = pairs.Where(x => x.feasible && x.i == top).MinBy(x => Math.Abs(x.relative));
        var anyAbsolute = pairs.Where(x => x.feasible).MinBy(x => Math.Abs(x.delta));
        var anyRelative = pairs.Where(x => x.feasible).MinBy(x => Math.Abs(x.relative));
        var topShare = pairs.Where(x => x.reverses && x.i == top).MinBy(x => Math.Abs(x.t - Shares[x.k]));

        // For the top rank the two definitions pick different criteria: lowering the price weight by 0.376 (75% of
        // it) against raising C3's by 0.352 (176% of it) [derived].
        Assert.NotEqual(topAbsolute.k, topRelative.k);
        Check(topAbsolute, critical.TopAbsolute);
        Check(topRelative, critical.TopRelative);
        Check(anyAbsolute, critical.AnyAbsolute);
        Check(anyRelative, critical.AnyRelative);
        Assert.NotNull(critical.TopShare);
        Assert.Equal($"C{topShare.k + 1}", critical.TopShare!.Criterion);
        Assert.Equal(topShare.t, critical.TopShare.Weight, 8);
        Assert.Equal(Math.Abs(topShare.t - Shares[topShare.k]), critical.TopShare.Absolute, 8);

        static void Check((int k, int i, int j, double delta, double relative, double t, bool reverses, bool feasible) expected, MostCriticalCriterion? actual)
        {
            Assert.NotNull(actual);
            Assert.Equal($"C{expected.k + 1}", actual!.Criterion);
            Assert.Equal(($"A{expected.i + 1}", $"A{expected.j + 1}"), (actual.Leader, actual.Challenger));
            Assert.Equal(expected.delta, actual.Delta!.Value, 8);
            Assert.Equal(expected.relative, actual.DeltaRelative!.Value, 4);
            Assert.Equal(expected.t, actual.Weight, 8);
        }
    }

    [Fact]
    public void When_each_bid_is_at_least_as_good_as_the_next_on_every_criterion_nothing_reverses()
    {
        // A1 is cheapest and best on both benefits, A2 beats A3 likewise: no weighting reverses any pair, so the
        // closed form gives δ > wₖ (or no δ at all) for every pair [derived].
        var (_, result, critical) = Analyse([[100, 90, 100], [120, 80, 60], [150, 70, 40]]);
        Assert.Equal(["A1", "A2", "A3"], result.Ranking.Select(r => r.Alternative));
        Assert.Equal(9, critical.Changes.Count);
        Assert.All(critical.Changes, c =>
        {
            Assert.False(c.Reverses);
            Assert.Null(c.Weight);
            Assert.Null(c.Delta);
        });
        Assert.Null(critical.TopAbsolute);
        Assert.Null(critical.TopRelative);
        Assert.Null(critical.AnyAbsolute);
        Assert.Null(critical.AnyRelative);
        Assert.Null(critical.TopShare);
        Assert.Null(critical.AnyShare);
    }

    [Theory]
    [InlineData(0.3, 0.3, 0.0)]   // no change of share, no change of weight
    [InlineData(0.3, 0.0, 0.3)]   // share 0 ⇔ the weight lowered by all of itself
    [InlineData(0.3, 0.5, -0.4)]  // (0.3 − 0.5)/(1 − 0.5)
    public void Delta_maps_a_share_to_the_change_of_the_weight_alone(double current, double t, double delta)
    {
        // Check by the definition: w − δ, the others unchanged (summing to 1 − w), renormalised by 1 − δ, gives share t.
        Assert.Equal(t, (current - delta) / (1 - delta), 12);
        Assert.Equal(delta, CriticalChanges.Delta(current, t)!.Value, 12);
    }

    [Fact]
    public void A_share_that_needs_the_weight_alone_above_one_is_still_a_feasible_change_but_the_whole_weight_is_not()
    {
        // w = 0.3: wₖ − δ = 1 at δ = −0.7, i.e. share 1/(2 − 0.3) = 0.588 [derived]; beyond it the changed weight exceeds
        // 1 before renormalising, which the paper's condition δ ≤ wₖ allows. A share of 1 needs δ → −∞.
        Assert.Equal((0.3 - 0.58) / (1 - 0.58), CriticalChanges.Delta(0.3, 0.58)!.Value, 12);
        Assert.Equal((0.3 - 0.6) / (1 - 0.6), CriticalChanges.Delta(0.3, 0.6)!.Value, 12);
        Assert.Null(CriticalChanges.Delta(0.3, 1));
    }

    [Fact]
    public void Every_pair_of_every_criterion_is_listed_and_unreversed_pairs_say_so()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyse();
        var critical = CriticalChanges.Compute(prepared, result, WeightSweeps.Run(prepared));
        var n = result.Ranking.Count;
        Assert.Equal(prepared.Criteria.Count * n * (n - 1) / 2, critical.Changes.Count);
        Assert.Contains(critical.Changes, c => !c.Reverses);
        Assert.All(critical.Changes.Where(c => !c.Reverses), c => Assert.Null(c.Weight));
        Assert.All(critical.Changes.Where(c => !c.Reverses), c => Assert.Null(c.Delta));
    }

    private static (PreparedEvaluation Prepared, AnalysisResult Result, CriticalChangesResult Critical) Analyse(double[][] values)
    {
        var prepared = DecisionEngine.Prepare(Crisp(values));
        var result = prepared.Analyse();
        return (prepared, result, CriticalChanges.Compute(prepared, result, WeightSweeps.Run(prepared)));
    }

    /// <summary>Normalised values a (Chen 2000, eq. 15: benefit x/max, cost min/x) and weighted sums P = Σ wₖaₖ.</summary>
    private static (double[][] A, double[] P) WeightedSum(double[][] values)
    {
        var a = values.Select(row => row.Select((x, k) => Cost[k]
            ? values.Min(r => r[k]) / x
            : x / values.Max(r => r[k])).ToArray()).ToArray();
        return (a, a.Select(row => row.Select((x, k) => Shares[k] * x).Sum()).ToArray());
    }

    private static Evaluation Crisp(double[][] values)
    {
        var criteria = new[]
        {
            new Criterion("C1", "Price", CriterionKind.Numeric, Direction.Cost),
            new Criterion("C2", "Capacity", CriterionKind.Numeric, Direction.Benefit),
            new Criterion("C3", "Warranty", CriterionKind.Numeric, Direction.Benefit),
        };
        var alternatives = Enumerable.Range(1, values.Length).Select(i => new Alternative($"A{i}", $"Bid {i}")).ToArray();
        return new Evaluation
        {
            Title = "weighted-sum closed form",
            ImportanceScale = RobustnessFixtures.CrispImportance,
            Criteria = criteria,
            Alternatives = alternatives,
            Assessors = [new Assessor("E1", "Assessor")],
            Importance = [new ImportanceRating("E1", "C1", "5"), new ImportanceRating("E1", "C2", "3"), new ImportanceRating("E1", "C3", "2")],
            Values = [.. from i in Enumerable.Range(0, values.Length) from k in Enumerable.Range(0, 3)
                select new NumericValue($"A{i + 1}", criteria[k].Id, values[i][k])],
            Options = new AnalysisOptions(AggregationRule.Mean, IdealPoints.Unit),
        };
    }
}
