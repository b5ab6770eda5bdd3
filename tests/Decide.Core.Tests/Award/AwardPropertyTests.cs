using Decide.Core.Award;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Award;

/// <summary>Properties a published points award must have, on random bids (seeded by FsCheck).</summary>
public sealed class AwardPropertyTests
{
    private const double Tolerance = 1e-9;

    private static readonly PriceFormula[] Formulas = Enum.GetValues<PriceFormula>();

    /// <summary>A plan and bids drawn from a seed: 3 criteria, 0–10 scores, prices 50–500.</summary>
    private static (AwardPlan Plan, AwardBid[] Bids) Draw(int seed)
    {
        var random = new Random(seed);
        var formula = Formulas[random.Next(Formulas.Length)];
        var plan = new AwardPlan([30, 20, 10], 10, new PriceRule(formula, 40, Budget: 400, Floor: 80, ValuePerQualityPoint: 3),
            MinimumQualityShare: random.Next(2) == 0 ? null : 0.4, TieBreaks: [TieBreak.HigherQuality, TieBreak.LowerPrice],
            AbnormallyLow: new AbnormallyLowRule(25));
        var bids = Enumerable.Range(0, random.Next(2, 9)).Select(i => new AwardBid(
            $"bid{i}", [random.Next(11), random.Next(11), random.Next(11)], 50 + random.Next(451), random.Next(6) == 0)).ToArray();
        return (plan, bids);
    }

    [Property]
    public void A_bids_quality_points_never_depend_on_the_other_bids(int seed)
    {
        var (plan, bids) = Draw(seed);
        var together = PointsAward.Compute(plan, bids);
        foreach (var bid in bids)
        {
            var alone = PointsAward.Compute(plan, [bid]).Bids[0];
            var same = together.Bids.Single(b => b.Id == bid.Id);
            Close.All(alone.CriterionPoints, same.CriterionPoints);
            Assert.Equal(alone.QualityPoints, same.QualityPoints, Tolerance);
        }
    }

    [Property]
    public void Totals_equal_the_sum_of_the_parts_shown(int seed)
    {
        var (plan, bids) = Draw(seed);
        foreach (var b in PointsAward.Compute(plan, bids).Bids)
        {
            Assert.Equal(b.CriterionPoints.Sum(), b.QualityPoints, Tolerance);
            if (b.Total is { } total)
            {
                Assert.Equal(b.QualityPoints + b.PricePoints!.Value, total, Tolerance);
            }
        }
    }

    [Property]
    public void The_award_does_not_depend_on_the_order_the_bids_are_listed_in(int seed)
    {
        var (plan, bids) = Draw(seed);
        var random = new Random(seed ^ 0x5bd1e995);
        var shuffled = bids.OrderBy(_ => random.Next()).ToArray();
        var first = PointsAward.Compute(plan, bids).Bids.ToDictionary(b => b.Id);
        foreach (var b in PointsAward.Compute(plan, shuffled).Bids)
        {
            Assert.Equal(first[b.Id].Rank, b.Rank);
            Assert.Equal(first[b.Id].Excluded, b.Excluded);
        }
    }

    [Property]
    public void An_excluded_bid_changes_no_other_bids_quality_points_or_price_score(int seed)
    {
        var (plan, bids) = Draw(seed);
        var with = PointsAward.Compute(plan, bids);
        var excluded = with.Bids.Where(b => b.Excluded is not null).Select(b => b.Id).ToHashSet();
        var without = PointsAward.Compute(plan, bids.Where(b => !excluded.Contains(b.Id)).ToArray()).Bids.ToDictionary(b => b.Id);
        foreach (var b in with.Bids.Where(b => b.Excluded is null))
        {
            Assert.Equal(without[b.Id].QualityPoints, b.QualityPoints, Tolerance);
            // The excluded bids are in no price base, so every formula scores the rest as if they were never bid.
            Assert.Equal(without[b.Id].PricePoints ?? without[b.Id].Figure, b.PricePoints ?? b.Figure);
        }
    }
}
