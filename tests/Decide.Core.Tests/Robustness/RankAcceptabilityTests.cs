using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

public sealed class RankAcceptabilityTests
{
    [Fact]
    public void Shares_sum_to_one_over_ranks_and_over_alternatives()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = RankAcceptabilityAnalysis.Run(prepared, 3000, 42);
        var n = result.Alternatives.Count;
        Assert.All(result.Alternatives, a => Assert.Equal(1, a.Ranks.Sum(), 12));
        for (var r = 0; r < n; r++)
        {
            Assert.Equal(1, result.Alternatives.Sum(a => a.Ranks[r]), 12);
        }
    }

    [Fact]
    public void The_same_seed_gives_identical_numbers_on_one_and_on_several_threads()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var one = RankAcceptabilityAnalysis.Run(prepared, 5000, 7, threads: 1);
        var four = RankAcceptabilityAnalysis.Run(prepared, 5000, 7, threads: 4);
        for (var i = 0; i < one.Alternatives.Count; i++)
        {
            Assert.Equal(one.Alternatives[i].Ranks, four.Alternatives[i].Ranks);
        }

        Assert.Equal(one.CentralWeights.Count, four.CentralWeights.Count);
        for (var i = 0; i < one.CentralWeights.Count; i++)
        {
            Assert.Equal(one.CentralWeights[i].Weights, four.CentralWeights[i].Weights);
        }
    }

    [Fact]
    public void A_different_seed_gives_different_draws()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var a = RankAcceptabilityAnalysis.Run(prepared, 2000, 1);
        var b = RankAcceptabilityAnalysis.Run(prepared, 2000, 2);
        Assert.NotEqual(a.Alternatives.SelectMany(x => x.Ranks), b.Alternatives.SelectMany(x => x.Ranks));
    }

    [Fact]
    public void A_panel_with_no_spread_at_all_gives_full_acceptability_to_the_deterministic_order()
    {
        // Crisp ratings and crisp importance: every draw is the base case.
        var evaluation = RobustnessFixtures.Uniform([["7", "4"], ["5", "9"], ["3", "3"]], ["8", "5"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance);
        var prepared = DecisionEngine.Prepare(evaluation);
        var order = prepared.Analyze().Ranking.Select(r => r.Alternative).ToArray();
        var result = RankAcceptabilityAnalysis.Run(prepared, 1000, 3);
        for (var r = 0; r < order.Length; r++)
        {
            Assert.Equal(1.0, result.Alternatives.Single(a => a.Alternative == order[r]).Ranks[r]);
        }
    }

    [Fact]
    public void A_strictly_dominant_alternative_ranks_first_in_every_draw_even_with_uniform_weights()
    {
        var evaluation = RobustnessFixtures.Uniform([["6", "5", "7"], ["8", "9", "8"], ["7", "2", "1"]], ["8", "5", "3"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance);
        var prepared = DecisionEngine.Prepare(evaluation);
        foreach (var mode in new[] { AcceptabilityWeights.Fuzzy, AcceptabilityWeights.Uniform })
        {
            var result = RankAcceptabilityAnalysis.Run(prepared, 2000, 11, mode);
            Assert.Equal(1.0, result.Alternatives.Single(a => a.Alternative == "A2").Ranks[0]);
        }
    }

    [Fact]
    public void Central_weights_are_shares_and_exist_only_for_alternatives_that_ever_win()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = RankAcceptabilityAnalysis.Run(prepared, 4000, 5, AcceptabilityWeights.Uniform);
        foreach (var central in result.CentralWeights)
        {
            Assert.Equal(1, central.Weights.Sum(), 9);
            Assert.True(result.Alternatives.Single(a => a.Alternative == central.Alternative).Ranks[0] > 0);
        }

        // Under uniform weights the C1 specialist wins with C1-heavy weights, the C2 specialist with C2-heavy ones.
        var a1 = result.CentralWeights.Single(c => c.Alternative == "A1");
        var a2 = result.CentralWeights.Single(c => c.Alternative == "A2");
        Assert.True(a1.Weights[0] > a2.Weights[0]);
        Assert.True(a2.Weights[1] > a1.Weights[1]);
    }

    [Theory]
    [InlineData(0.5, 100, 0.4038, 0.5962)] // Wilson interval, z = 1.96: values derived from the formula (Wilson 1927)
    [InlineData(0.0, 50, 0.0, 0.0713)]
    public void Wilson_interval_matches_the_formula(double share, int n, double low, double high)
    {
        var interval = RankAcceptabilityAnalysis.Wilson(share, n);
        Assert.Equal(low, interval.Low, 3);
        Assert.Equal(high, interval.High, 3);
    }

    [Theory]
    [InlineData(0.0, 500)]
    [InlineData(0.0, 10_000)]
    [InlineData(1.0, 500)]
    [InlineData(1.0, 10_000)]
    public void Wilson_interval_of_a_share_of_0_or_1_starts_or_ends_exactly_there(double share, int n)
    {
        var interval = RankAcceptabilityAnalysis.Wilson(share, n);
        Assert.InRange(share, interval.Low, interval.High);
        Assert.Equal(share, share == 0 ? interval.Low : interval.High);
    }
}
