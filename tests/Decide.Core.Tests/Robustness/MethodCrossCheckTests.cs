using Decide.Core.Analysis;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

public sealed class MethodCrossCheckTests
{
    [Fact]
    public void Weighted_sum_of_crisp_ratings_is_the_textbook_weighted_total()
    {
        // Crisp scores on a 0–10 scale, crisp importance 0.8 and 0.5. Linear normalisation by the column maximum
        // (7 and 9), then Σ w·r [derived from the definition of simple additive weighting].
        var evaluation = RobustnessFixtures.Uniform([["7", "4"], ["5", "9"], ["3", "3"]], ["8", "5"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance);
        var scores = MethodCrossCheck.WeightedSum(DecisionEngine.Prepare(evaluation));
        Assert.Equal((0.8 * 7 / 7) + (0.5 * 4 / 9), scores[0], 12);
        Assert.Equal((0.8 * 5 / 7) + (0.5 * 9 / 9), scores[1], 12);
        Assert.Equal((0.8 * 3 / 7) + (0.5 * 3 / 9), scores[2], 12);
    }

    [Fact]
    public void Three_comparisons_each_with_tau_against_the_main_ranking()
    {
        var prepared = DecisionEngine.Prepare(Published.Chen2000WorkedExample.Build());
        var result = prepared.Analyze();
        var methods = MethodCrossCheck.Run(prepared, result);
        Assert.Equal(["aggregation:geometric", "ideal:extreme", "weighted-sum"], methods.Select(m => m.Method));
        Assert.All(methods, m => Assert.InRange(m.KendallTau!.Value, -1, 1));
        // The Chen example is clear-cut: every method keeps A2 first [derived].
        Assert.All(methods, m => Assert.True(m.SameWinner));
        Assert.All(methods, m => Assert.Equal(1.0, m.KendallTau!.Value, 12));
    }
}
