using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Award;

/// <summary>
/// Robustness of the points award, on an evaluation built so the lowest-price ratio's known paradox appears
/// (Stilger, Siderius &amp; van Raaij 2017; Bergman &amp; Lundberg 2013): quality 60 on one criterion of the 0–5 scale,
/// price 40. Worked by hand: with the lowest bid L (price 30), A = 54 + 40 × 30/100 = 66, B = 42 + 40 × 30/60 = 62,
/// L = 18 + 40 = 58; without L the lowest price is B's 60, so A = 54 + 24 = 78 and B = 42 + 40 = 82 — B overtakes A.
/// </summary>
public sealed class AwardRobustnessTests
{
    private static Evaluation Paradox(params (string Bid, string First, string Second, double Price)[] bids)
    {
        bids = bids.Length > 0 ? bids : [("A", "4", "5", 100), ("B", "3", "4", 60), ("L", "1", "2", 30)];
        return new Evaluation
        {
            Title = "Paradox",
            RatingScale = BuiltInScales.Points5,
            Criteria = [new Criterion("method", "Method"), new Criterion("price", "Price", CriterionKind.Numeric, Direction.Cost)],
            Alternatives = bids.Select(b => new Alternative(b.Bid, b.Bid)).ToArray(),
            Assessors = [new Assessor("r1", "First"), new Assessor("r2", "Second")],
            Weighting = WeightingMethod.Points,
            Points = new PublishedWeights(100, new Dictionary<string, double>(), [new("method", 60), new("price", 40)]),
            Award = new AwardMethod("price", PriceFormula.LowestPriceRatio),
            Ratings = bids.SelectMany(b => new[] { new Rating("r1", b.Bid, "method", b.First, "Reason."), new Rating("r2", b.Bid, "method", b.Second, "Reason.") }).ToArray(),
            Values = bids.Select(b => new NumericValue(b.Bid, "price", b.Price)).ToArray(),
        };
    }

    private static AwardRobustnessResult Run(Evaluation e, int draws = 500, ulong seed = 7) =>
        DecisionRun.Of(e).WithRobustness(new RobustnessOptions(draws, seed)).AwardRobustness!;

    [Fact]
    public void Without_the_lowest_bid_the_check_shows_the_two_others_reversed()
    {
        var run = DecisionRun.Of(Paradox());
        Close.All([66, 62, 58], run.Award!.Result.Bids.Select(b => b.Total!.Value).ToArray());

        var withoutL = run.WithRobustness(new RobustnessOptions(0)).AwardRobustness!.WithoutBid.Single(w => w.Without == "L");
        Assert.Equal(new AwardReversal("A", "B"), Assert.Single(withoutL.Reversed));
        Assert.Equal("B", withoutL.Winner);
        Assert.True(withoutL.WinnerChanged);
    }

    [Fact]
    public void An_absolute_formula_never_reorders_the_others_when_a_bid_is_removed()
    {
        var e = Paradox() with { Award = new AwardMethod("price", PriceFormula.BudgetBased, Budget: 120, Floor: 20) };
        Assert.All(Run(e, draws: 0).WithoutBid, w => Assert.Empty(w.Reversed));
    }

    [Fact]
    public void The_price_sweep_finds_the_share_at_which_the_first_place_changes()
    {
        // Price share w of 100 points: A = 90 − 60w, B = 70 − 20w, L = 30 + 70w. A leads until L overtakes it at
        // w = 60/130 ≈ 0.4615, so the first share above the published 0.40 with another winner is 0.47 (L); below 0.40
        // A only gains, so there is none.
        var price = Run(Paradox(), draws: 0).Sweeps.Single(s => s.Criterion == "price");
        Assert.Equal(0.4, price.Published, 9);
        Assert.Null(price.Lower);
        Assert.Equal(0.47, price.Upper!.Value, 9);
        Assert.Equal("L", price.UpperWinner);
    }

    [Fact]
    public void Leaving_out_an_assessor_recomputes_the_panel_score_from_the_others()
    {
        // Without r2, A scores 4 (48 + 12 = 60), B 3 (36 + 20 = 56), L 1 (12 + 40 = 52): the order stands.
        var without = Run(Paradox(), draws: 0).WithoutAssessor.Single(w => w.Without == "r2");
        Assert.Equal("A", without.Winner);
        Assert.False(without.WinnerChanged);
        Assert.Empty(without.Reversed);
    }

    [Fact]
    public void Rank_acceptability_is_certain_when_the_panel_agrees_and_repeats_exactly_with_its_seed()
    {
        var agreed = Paradox(("A", "5", "5", 100), ("B", "3", "3", 60), ("L", "1", "1", 30));
        var shares = Run(agreed).Acceptability;
        Assert.Equal(1, shares.Single(a => a.Bid == "A").First, 9);

        var first = Run(Paradox(), seed: 11).Acceptability;
        var again = Run(Paradox(), seed: 11).Acceptability;
        Assert.Equal(first.Select(a => a.Ranks.ToArray()), again.Select(a => a.Ranks.ToArray()));
        Assert.All(first, a => Assert.Equal(1, a.Ranks.Sum() + a.Excluded, 9));
        Assert.InRange(first.Single(a => a.Bid == "A").First, 0.01, 0.99); // A's 4 and 5 against B's 3 and 4: not certain
    }

    [Fact]
    public void The_critical_change_of_each_pair_of_neighbours_is_the_nearest_share_that_reverses_them()
    {
        // Method share t (price 1 − t): A = 30 + 60t, B = 50 + 20t, L = 100 − 70t, published t = 0.60. A and B meet at
        // t = 0.5 (a tie kept by the higher quality points), so B passes A first at 0.49; B and L meet at t = 5/9 ≈ 0.556,
        // so L passes B at 0.55. (With two criteria the price sweep is the same line read the other way.)
        var critical = Run(Paradox(), draws: 0).CriticalChanges;
        var ab = critical.Single(c => c.Above == "A");
        Assert.Equal(("B", "method"), (ab.Below, ab.Criterion));
        Assert.Equal(0.49, ab.Share, 9);
        var bl = critical.Single(c => c.Above == "B");
        Assert.Equal(("L", "method"), (bl.Below, bl.Criterion));
        Assert.Equal(0.55, bl.Share, 9);
    }
}
