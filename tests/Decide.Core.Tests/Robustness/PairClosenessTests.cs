using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// The sweep's root-finding computes two alternatives' closeness at a time; it must be the very number the full
/// fuzzy TOPSIS run gives at that share, to the last bit, or a reversal could be placed where the full run sees none.
/// </summary>
[Properties(Arbitrary = [typeof(DecideArbitraries)], MaxTest = 60)]
public sealed class PairClosenessTests
{
    [Property]
    public void One_alternatives_closeness_equals_the_full_runs_at_any_share(AnyPanel panel)
    {
        var prepared = DecisionEngine.Prepare(panel.Evaluation);
        for (var k = 0; k < prepared.Criteria.Count; k++)
        {
            if (!(prepared.Weights[k].Crisp is > 0 and < 1))
            {
                continue;
            }

            var sweep = new WeightSweeps.Sweeper(prepared, k);
            foreach (var t in new[] { 0.0, 0.137, prepared.Weights[k].Crisp, 0.5, 0.913, 1.0 })
            {
                var full = sweep.Closeness(t).ToArray();
                for (var i = 0; i < full.Length; i++)
                {
                    Assert.Equal(full[i], sweep.ClosenessOf(i, t));
                }
            }
        }
    }

    [Fact]
    public void It_holds_with_extreme_ideal_points_and_cost_criteria_too()
    {
        var e = SampleEvaluation.WithImportance() with { Options = new AnalysisOptions(Ideal: IdealPoints.Extreme) };
        var prepared = DecisionEngine.Prepare(e);
        var sweep = new WeightSweeps.Sweeper(prepared, 2); // the price, a cost criterion
        foreach (var t in new[] { 0.05, 0.3, 0.77 })
        {
            var full = sweep.Closeness(t).ToArray();
            for (var i = 0; i < full.Length; i++)
            {
                Assert.Equal(full[i], sweep.ClosenessOf(i, t));
            }
        }
    }
}
