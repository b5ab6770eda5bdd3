using Decide.Core.Robustness;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace Decide.Assignment.Tests;

public sealed class LotCapAwardTests
{
    private static LotStanding Lot(string id, params (string, double)[] ranked) => new(id, $"Lot {id}", ranked);

    [Fact]
    public void In_lot_order_a_bidder_at_the_cap_is_passed_over_for_the_next_on_that_lot()
    {
        // Worked by hand: cap 1. Lot 1 → North (first). Lot 2: North first but at the cap → East (second). Lot 3:
        // East first but at the cap, North at the cap → West (third).
        var result = LotCapAward.Award(
            [Lot("1", ("North", 80), ("East", 70)), Lot("2", ("North", 75), ("East", 74)), Lot("3", ("East", 90), ("North", 85), ("West", 60))],
            1,
            LotCapRule.InLotOrder);
        Assert.Equal(["North", "East", "West"], result.Lots.Select(l => l.Winner));
        Assert.Equal([1, 2, 3], result.Lots.Select(l => l.Place));
        Assert.Equal(["East", "North"], result.Lots[2].PassedOver);
        Assert.Contains("East (Lot 2), North (Lot 1) ranked above but had reached the cap of 1 lot", result.Lots[2].Explanation);
        Assert.Equal(80 + 74 + 60, result.Total);
    }

    [Fact]
    public void A_lot_whose_every_bidder_is_at_the_cap_is_not_awarded_and_says_so()
    {
        var result = LotCapAward.Award([Lot("1", ("North", 80)), Lot("2", ("North", 75))], 1, LotCapRule.InLotOrder);
        Assert.Null(result.Lots[1].Winner);
        Assert.Contains("every bidder ranked on it has already won 1 lot, the cap", result.Lots[1].Explanation);
    }

    [Fact]
    public void Best_total_can_differ_from_lot_order()
    {
        // In lot order North takes lot 1 (80 + 60 = 140); the best total gives lot 1 to East and lot 2 to North
        // (79 + 95 = 174).
        var lots = new[] { Lot("1", ("North", 80), ("East", 79)), Lot("2", ("North", 95), ("East", 60)) };
        Assert.Equal(140, LotCapAward.Award(lots, 1, LotCapRule.InLotOrder).Total);
        var best = LotCapAward.Award(lots, 1, LotCapRule.BestTotal);
        Assert.Equal(["East", "North"], best.Lots.Select(l => l.Winner));
        Assert.Equal(174, best.Total, 9);
    }

    public static Arbitrary<(LotStanding[] Lots, int Cap)> Cases() =>
        Gen.Choose(0, int.MaxValue).Select(seed =>
        {
            var random = new SeededRandom((ulong)seed, 3);
            int Next(int lo, int hi) => lo + (int)(random.NextDouble() * (hi - lo + 1));
            var bidders = Enumerable.Range(1, Next(1, 5)).Select(b => $"B{b}").ToArray();
            var lots = Enumerable.Range(1, Next(1, 4)).Select(l => new LotStanding($"{l}", $"Lot {l}",
                bidders.Where(_ => random.NextDouble() < 0.7)
                    .Select(b => (b, Math.Round(random.NextDouble() * 100, 2)))
                    .OrderByDescending(x => x.Item2).ToArray())).ToArray();
            return (lots, Next(1, 3));
        }).ToArbitrary();

    /// <summary>Every combination of awards (each lot to one of its ranked bidders, or to nobody) within the cap.</summary>
    private static (int Awarded, double Total) Enumerate(LotStanding[] lots, int cap)
    {
        var best = (Awarded: -1, Total: double.MinValue);
        void Walk(int l, Dictionary<string, int> count, int awarded, double total)
        {
            if (l == lots.Length)
            {
                if (awarded > best.Awarded || (awarded == best.Awarded && total > best.Total + 1e-9))
                {
                    best = (awarded, total);
                }

                return;
            }

            Walk(l + 1, count, awarded, total);
            foreach (var (bidder, score) in lots[l].Ranked)
            {
                if (count.GetValueOrDefault(bidder) < cap)
                {
                    count[bidder] = count.GetValueOrDefault(bidder) + 1;
                    Walk(l + 1, count, awarded + 1, total + score);
                    count[bidder]--;
                }
            }
        }

        Walk(0, new Dictionary<string, int>(StringComparer.Ordinal), 0, 0);
        return best;
    }

    [Property(Arbitrary = [typeof(LotCapAwardTests)], MaxTest = 200)]
    public void Best_total_matches_exhaustive_enumeration_of_all_award_combinations((LotStanding[] Lots, int Cap) c)
    {
        var result = LotCapAward.Award(c.Lots, c.Cap, LotCapRule.BestTotal);
        var (awarded, total) = Enumerate(c.Lots, c.Cap);
        Assert.Equal(awarded, result.Lots.Count(l => l.Winner is not null));
        Assert.Equal(total, result.Total, 6);
        var wins = result.Lots.Where(l => l.Winner is not null).GroupBy(l => l.Winner);
        Assert.All(wins, g => Assert.True(g.Count() <= c.Cap));
    }

    [Property(Arbitrary = [typeof(LotCapAwardTests)], MaxTest = 200)]
    public void In_lot_order_never_beats_the_best_total_and_respects_the_cap((LotStanding[] Lots, int Cap) c)
    {
        var inOrder = LotCapAward.Award(c.Lots, c.Cap, LotCapRule.InLotOrder);
        var (awarded, total) = Enumerate(c.Lots, c.Cap);
        var mine = inOrder.Lots.Count(l => l.Winner is not null);
        Assert.True(mine < awarded || (mine == awarded && inOrder.Total <= total + 1e-6));
        Assert.All(inOrder.Lots.Where(l => l.Winner is not null).GroupBy(l => l.Winner), g => Assert.True(g.Count() <= c.Cap));
    }
}
