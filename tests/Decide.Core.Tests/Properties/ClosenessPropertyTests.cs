using Decide.Core.Analysis;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Properties;

[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class ClosenessPropertyTests
{
    [Property]
    public void Closeness_lies_between_zero_and_one(GeneratedEvaluation generated)
    {
        var result = DecisionEngine.Analyse(generated.Evaluation);
        Assert.Equal(generated.Evaluation.Alternatives.Count, result.Ranking.Count);
        foreach (var r in result.Ranking)
        {
            Assert.InRange(r.Closeness, 0, 1);
            Assert.True(r.DPlus >= 0 && r.DMinus >= 0);
        }
    }

    [Property]
    public void Ranks_follow_closeness(GeneratedEvaluation generated)
    {
        var ranking = DecisionEngine.Analyse(generated.Evaluation).Ranking;
        Assert.Equal(1, ranking[0].Rank);
        for (var i = 1; i < ranking.Count; i++)
        {
            Assert.True(ranking[i - 1].Closeness >= ranking[i].Closeness);
            Assert.Equal(ranking[i - 1].Closeness - ranking[i].Closeness <= 1e-12 ? ranking[i - 1].Rank : i + 1, ranking[i].Rank);
        }
    }

    [Property]
    public void Crisp_weight_shares_sum_to_one(GeneratedEvaluation generated)
    {
        var weights = DecisionEngine.Analyse(generated.Evaluation).Weights;
        Assert.Equal(1, weights.Sum(w => w.Crisp), 1e-12);
        Assert.All(weights, w => Assert.True(w.Fuzzy.Lower <= w.Fuzzy.Middle && w.Fuzzy.Middle <= w.Fuzzy.Upper));
    }
}
