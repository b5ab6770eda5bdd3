using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;
using Decide.Core.Robustness;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Ranking;

/// <summary>
/// Chen's unit ideal points (1, 1, 1) and (0, 0, 0) assume every weighted normalised value lies in [0, 1] (Chen 2000,
/// §3 after eq. 16). Weights whose upper value exceeds 1 — a swept weight, a Buckley upper weight, an importance scale
/// reaching 10 — are therefore divided by the largest upper value before they enter TOPSIS; without that, a weighted
/// value above 1 moves away from the ideal as it grows, and a dearer copy of a bid overtakes the cheaper one.
/// </summary>
public sealed class WeightBoundTests
{
    /// <summary>Two bids identical in quality (both "Good"), one 25% dearer; quality and price both "Very high".</summary>
    private static Evaluation CopyDearerBy25Percent() => new()
    {
        Title = "Two identical bids, one 25% dearer",
        Criteria = [new Criterion("quality", "Quality"), new Criterion("price", "Price", CriterionKind.Numeric, Direction.Cost)],
        Alternatives = [new Alternative("cheaper", "Cheaper"), new Alternative("dearer", "Dearer")],
        Assessors = [new Assessor("a1", "Assessor One")],
        Importance = [new ImportanceRating("a1", "quality", "VH"), new ImportanceRating("a1", "price", "VH")],
        Ratings = [new Rating("a1", "cheaper", "quality", "G"), new Rating("a1", "dearer", "quality", "G")],
        Values = [new NumericValue("cheaper", "price", 100_000), new NumericValue("dearer", "price", 125_000)],
    };

    [Fact]
    public void A_dearer_copy_of_a_bid_never_overtakes_it_whatever_the_weight_of_price()
    {
        var prepared = DecisionEngine.Prepare(CopyDearerBy25Percent());
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(Draws: 256));

        foreach (var sweep in robustness.Sensitivity.Sweeps)
        {
            Assert.Empty(sweep.Reversals);
            var cheaper = sweep.Series.Single(s => s.Alternative == "cheaper").Closeness;
            var dearer = sweep.Series.Single(s => s.Alternative == "dearer").Closeness;
            for (var s = 0; s < sweep.Samples.Count; s++)
            {
                Assert.True(cheaper[s] >= dearer[s] - 1e-12, $"{sweep.Criterion} at {sweep.Samples[s]}: dearer {dearer[s]} > cheaper {cheaper[s]}");
            }
        }

        Assert.All(robustness.Sensitivity.CriticalChanges.Changes, c => Assert.False(c.Reverses));
        Assert.Null(robustness.Sensitivity.CriticalChanges.TopAbsolute);
        Assert.DoesNotContain(robustness.Summary, line => line.Contains("overtakes", StringComparison.Ordinal));
    }

    [Fact]
    public void As_price_matters_more_the_dearer_copy_falls_further_behind()
    {
        // With quality equal, the gap is price's term alone: at price share t (swept weight t/½ · (0.9, 1, 1), then
        // divided by its upper value when that exceeds 1) the normalised prices are 1 and 0.8, so the gap in closeness
        // can only grow with t. Before the bound it shrank once price's share passed 50% and changed sign at 59%.
        // (Each bid's own closeness may still fall near t = 1: quality's weight then tends to 0, and a criterion of
        // weight 0 puts every bid at distance 1 from the unit ideal on it. Only the differences rank.)
        var prepared = DecisionEngine.Prepare(CopyDearerBy25Percent());
        var price = WeightSweeps.Sweep(prepared, 1);
        var gap = price.Series[0].Closeness.Zip(price.Series[1].Closeness, (c, d) => c - d).ToArray();
        for (var s = 1; s < gap.Length; s++)
        {
            Assert.True(gap[s] >= gap[s - 1] - 1e-12, $"gap {gap[s]} at {price.Samples[s]} below {gap[s - 1]} at {price.Samples[s - 1]}");
        }

        Assert.True(gap[^1] > gap[price.Samples.Count / 2], "the gap at a price share of 100% must exceed the gap at 50%");
    }

    [Fact]
    public void An_importance_scale_reaching_10_ranks_as_the_same_scale_divided_by_10()
    {
        // The wide scale's terms are ten times those of a scale on [0, 1]; both bring the weights within [0, 1] by
        // one divisor, so the closeness must be identical. Unbounded, the wide weights (up to 10) put weighted values
        // far beyond the unit ideal point.
        var wide = CopyDearerBy25Percent() with
        {
            ImportanceScale = PanelGenerator.WideImportance,
            Importance = [new ImportanceRating("a1", "quality", "W4"), new ImportanceRating("a1", "price", "W5")],
        };
        var tenth = Core.Scales.LinguisticScale.Create("tenth", 0, 1,
            PanelGenerator.WideImportance.Terms.Select(t => t with { Value = (1 / 10.0) * t.Value }).ToArray());
        var narrow = wide with { ImportanceScale = tenth };

        var a = DecisionEngine.Analyse(wide).Ranking;
        var b = DecisionEngine.Analyse(narrow).Ranking;
        Assert.Equal(b.Select(r => r.Alternative), a.Select(r => r.Alternative));
        for (var i = 0; i < a.Count; i++)
        {
            Assert.Equal(b[i].Closeness, a[i].Closeness, 12);
        }

        Assert.Equal("cheaper", a[0].Alternative);
    }

    [Fact]
    public void The_kernel_divides_weights_above_1_by_the_largest_upper_value_and_leaves_others_alone()
    {
        Assert.Equal(1, FuzzyTopsis.WeightBound([new Tfn(0.2, 0.5, 0.9), new Tfn(0.9, 1, 1)]));
        Assert.Equal(2.5, FuzzyTopsis.WeightBound([new Tfn(0.2, 0.5, 0.9), new Tfn(1, 2, 2.5)]));

        // One alternative with every normalised value 1: its weighted values are the weights divided by β = 2.
        Tfn[] matrix = [Tfn.Crisp(4), Tfn.Crisp(4)];
        Tfn[] weights = [new Tfn(1, 1.5, 2), new Tfn(0.5, 1, 1)];
        var weighted = new Tfn[2];
        FuzzyTopsis.Normalise(matrix, 1, 2, [false, false], weights, weighted);
        Assert.Equal(new Tfn(0.5, 0.75, 1), weighted[0]);
        Assert.Equal(new Tfn(0.25, 0.5, 0.5), weighted[1]);
    }
}
