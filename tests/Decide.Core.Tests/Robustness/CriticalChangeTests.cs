using Decide.Core.Analysis;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

public sealed class CriticalChangeTests
{
    [Fact]
    public void Critical_change_is_the_distance_from_the_current_share_to_the_nearest_reversal()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyze();
        var sweeps = WeightSweeps.Run(prepared);
        var critical = CriticalChanges.Compute(prepared, result, sweeps);

        foreach (var change in critical.Changes.Where(c => c.Reverses))
        {
            var sweep = sweeps.Single(s => s.Criterion == change.Criterion);
            var nearest = sweep.Reversals
                .Where(r => new[] { r.Below, r.Above }.Order().SequenceEqual(new[] { change.Leader, change.Challenger }.Order()))
                .Min(r => Math.Abs(r.Weight - sweep.Current));
            Assert.Equal(nearest, change.Absolute!.Value, 12);
            Assert.Equal(nearest / sweep.Current * 100, change.Relative!.Value, 9);
        }
    }

    [Fact]
    public void Every_pair_of_every_criterion_is_listed_and_unreversed_pairs_say_so()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyze();
        var critical = CriticalChanges.Compute(prepared, result, WeightSweeps.Run(prepared));
        var n = result.Ranking.Count;
        Assert.Equal(prepared.Criteria.Count * n * (n - 1) / 2, critical.Changes.Count);
        Assert.Contains(critical.Changes, c => !c.Reverses);
        Assert.All(critical.Changes.Where(c => !c.Reverses), c => Assert.Null(c.Weight));
    }

    [Fact]
    public void Most_critical_for_the_top_rank_is_the_smallest_change_that_dethrones_the_leader()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyze();
        var critical = CriticalChanges.Compute(prepared, result, WeightSweeps.Run(prepared));
        var leader = result.Ranking[0].Alternative;
        var expected = critical.Changes.Where(c => c.Reverses && c.Leader == leader).MinBy(c => c.Absolute);
        Assert.NotNull(critical.TopAbsolute);
        Assert.Equal(expected!.Criterion, critical.TopAbsolute!.Criterion);
        Assert.Equal(expected.Absolute!.Value, critical.TopAbsolute.Absolute, 12);
        Assert.True(critical.AnyAbsolute!.Absolute <= critical.TopAbsolute.Absolute);
        Assert.True(critical.AnyRelative!.Relative <= critical.TopRelative!.Relative);
    }
}
