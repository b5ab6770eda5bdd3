using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Rounds;

namespace Decide.Core.Tests.Rounds;

public sealed class FundingAndBandsTests
{
    private static readonly (string, double)[] Order = [("A", 0.9), ("B", 0.8), ("C", 0.7), ("D", 0.6)];
    private static readonly Dictionary<string, double> Asks = new() { ["A"] = 40, ["B"] = 50, ["C"] = 30, ["D"] = 5 };

    [Fact]
    public void Stop_at_the_first_unaffordable_funds_an_unbroken_run_from_the_top()
    {
        // Budget 100, worked by hand: A 40 (60 left), B 50 (10 left), C 30 does not fit → stop; D is not reached.
        var result = FundingLine.Draw(Order, id => Asks[id], new FundingPlan(100));
        Assert.Equal(["A", "B"], result.Funded);
        Assert.Equal(2, result.Line);
        Assert.Equal(90, result.Spent);
        Assert.DoesNotContain(result.Decisions, d => d.PassedOver);
    }

    [Fact]
    public void Skip_unaffordable_passes_over_and_goes_on_down_the_list()
    {
        // Budget 100: A, B (10 left), C passed over, D 5 fits (5 left).
        var result = FundingLine.Draw(Order, id => Asks[id], new FundingPlan(100, FundingRule.SkipUnaffordable));
        Assert.Equal(["A", "B", "D"], result.Funded);
        Assert.Equal(2, result.Line);
        Assert.Equal(95, result.Spent);
        Assert.True(result.Decisions.Single(d => d.Alternative == "C").PassedOver);
    }

    [Fact]
    public void A_tie_across_the_line_is_named()
    {
        var result = FundingLine.Draw([("A", 0.9), ("B", 0.8), ("C", 0.8)], _ => 50, new FundingPlan(100));
        Assert.Equal(["B", "C"], result.TiedAcrossTheLine);
    }

    [Fact]
    public void Bands_join_applications_whose_rank_intervals_overlap_the_band_leaders()
    {
        // A 1–2, B 1–3, C 2–4 (overlaps A: joins band 1), D 3–4 (starts band 2: best 3 is beyond A's worst 2), E 5–5.
        var intervals = new[] { new RankInterval("A", 1, 2), new RankInterval("B", 1, 3), new RankInterval("C", 2, 4), new RankInterval("D", 3, 4), new RankInterval("E", 5, 5) };
        var bands = ScoreBands.Of(["A", "B", "C", "D", "E"], intervals);
        Assert.Equal([["A", "B", "C"], ["D"], ["E"]], bands.Select(b => b.Alternatives.ToArray()));
        Assert.Equal((1, 4), (bands[0].Best, bands[0].Worst));
    }

    [Fact]
    public void Rank_intervals_are_read_from_the_cumulative_shares()
    {
        // Shares at ranks 1..4: 0.02 0.50 0.46 0.02 → cumulative 0.02 0.52 0.98 1.00: best 2 (first above 2.5%),
        // worst 3 (first at or above 97.5%).
        var acceptability = new AcceptabilityResult(1000, 1, AcceptabilityWeights.Fuzzy,
            [new RankAcceptability("A", [0.02, 0.50, 0.46, 0.02], [], 0.5)], []);
        Assert.Equal(new RankInterval("A", 2, 3), ScoreBands.Intervals(acceptability).Single());
    }
}
