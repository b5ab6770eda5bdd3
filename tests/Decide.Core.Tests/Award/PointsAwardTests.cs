using Decide.Core.Award;

namespace Decide.Core.Tests.Award;

/// <summary>Thresholds, abnormally low prices, tie-breaks and the known paradox of the lowest-price ratio, on small worked examples.</summary>
public sealed class PointsAwardTests
{
    private const double Tolerance = 1e-9;

    /// <summary>Quality 60 points (technical 30, service 20, risk 10) scored 0–10; price 40 points.</summary>
    private static AwardPlan Plan(PriceFormula formula = PriceFormula.LowestPriceRatio) =>
        new([30, 20, 10], 10, new PriceRule(formula, 40));

    [Fact]
    public void Quality_points_are_the_score_over_the_scale_maximum_times_the_criterions_points()
    {
        // Scores 8, 5, 10 of 10: 24 + 10 + 10 = 44 of 60.
        var bid = PointsAward.Compute(Plan(), [new AwardBid("A", [8, 5, 10], 100)]).Bids[0];
        Close.All([24, 10, 10], bid.CriterionPoints);
        Assert.Equal(44, bid.QualityPoints, Tolerance);
        Assert.Equal(44.0 / 60, bid.QualityShare, Tolerance);
        Assert.Equal(84, bid.Total!.Value, Tolerance); // a lone bid gets all 40 price points
    }

    [Fact]
    public void Removing_the_lowest_bid_under_the_lowest_price_ratio_can_reverse_the_order_of_two_others()
    {
        // Bergman & Lundberg (2013) on relative formulas; Smax = 40, quality given directly on a 0–60 scale:
        // with A (price 60): B = 50 + 40 × 60/120 = 70, C = 45 + 40 × 60/100 = 69 → B before C;
        // without A: B = 50 + 40 × 100/120 = 83.33…, C = 45 + 40 = 85 → C before B.
        var plan = new AwardPlan([60], 60, new PriceRule(PriceFormula.LowestPriceRatio, 40));
        AwardBid a = new("A", [10], 60), b = new("B", [50], 120), c = new("C", [45], 100);
        var with = PointsAward.Compute(plan, [a, b, c]);
        var without = PointsAward.Compute(plan, [b, c]);
        Assert.True(Rank(with, "B") < Rank(with, "C"));
        Assert.True(Rank(without, "C") < Rank(without, "B"));
    }

    [Fact]
    public void A_bid_below_a_threshold_is_excluded_with_the_threshold_and_leaves_the_price_base()
    {
        var plan = Plan() with { MinimumQualityShare = 0.6, MinimumScores = [null, 4, null] };
        var award = PointsAward.Compute(plan,
        [
            new AwardBid("low-quality", [4, 5, 5], 50),   // 12 + 10 + 5 = 27 of 60 = 45 % < 60 %
            new AwardBid("weak-service", [10, 3, 10], 60), // service 3 < 4
            new AwardBid("A", [8, 6, 6], 100),            // 24 + 12 + 6 = 42 = 70 %
            new AwardBid("B", [7, 7, 7], 125),            // 21 + 14 + 7 = 42 = 70 %
        ]);
        var low = award.Bids.Single(x => x.Id == "low-quality");
        Assert.Equal(AwardExclusion.BelowQualityThreshold, low.Excluded);
        Assert.Contains("60", low.ExclusionDetail);
        Assert.Null(low.Rank);
        Assert.Equal(AwardExclusion.BelowCriterionMinimum, award.Bids.Single(x => x.Id == "weak-service").Excluded);
        Assert.StartsWith("criterion 2 scored 3", award.Bids.Single(x => x.Id == "weak-service").ExclusionDetail);
        var named = PointsAward.Compute(plan with { CriterionNames = ["Technical", "Service", "Risk"] }, [new AwardBid("weak-service", [10, 3, 10], 60)]);
        Assert.StartsWith("\"Service\" scored 3, below the minimum of 4", named.Bids[0].ExclusionDetail);

        // The excluded bids' lower prices take no part: A (100) is the lowest admissible and gets all 40 points.
        Assert.Equal(40, award.Bids.Single(x => x.Id == "A").PricePoints!.Value, Tolerance);
        Assert.Equal(32, award.Bids.Single(x => x.Id == "B").PricePoints!.Value, Tolerance);
    }

    [Fact]
    public void An_abnormally_low_price_is_flagged_and_only_a_recorded_rejection_excludes_it()
    {
        var plan = Plan() with { AbnormallyLow = new AbnormallyLowRule(BelowMeanOfOthersPercent: 20) };
        AwardBid[] bids = [new("A", [8, 8, 8], 100), new("B", [8, 8, 8], 110), new("C", [8, 8, 8], 60)];

        // C: the mean of the others is 105; 60 is 42.9 % below it, more than 20 %. A: 100 vs 85, not below.
        var flagged = PointsAward.Compute(plan, bids);
        Assert.NotNull(flagged.Bids.Single(x => x.Id == "C").AbnormallyLowFlag);
        Assert.Null(flagged.Bids.Single(x => x.Id == "A").AbnormallyLowFlag);
        Assert.Equal(1, Rank(flagged, "C")); // flagged but accepted: it stays in

        var rejected = PointsAward.Compute(plan, [bids[0], bids[1], bids[2] with { RejectedAsAbnormallyLow = true }]);
        Assert.Equal(AwardExclusion.AbnormallyLow, rejected.Bids.Single(x => x.Id == "C").Excluded);
        Assert.Equal(40, rejected.Bids.Single(x => x.Id == "A").PricePoints!.Value, Tolerance);
    }

    [Fact]
    public void A_price_far_below_the_estimate_is_flagged()
    {
        var plan = Plan() with { AbnormallyLow = new AbnormallyLowRule(null, Estimate: 200, BelowEstimatePercent: 30) };
        var award = PointsAward.Compute(plan, [new AwardBid("A", [8, 8, 8], 130), new AwardBid("B", [8, 8, 8], 150)]);
        Assert.Contains("estimate", award.Bids.Single(x => x.Id == "A").AbnormallyLowFlag); // 35 % below
        Assert.Null(award.Bids.Single(x => x.Id == "B").AbnormallyLowFlag);                 // 25 % below
    }

    [Fact]
    public void Tie_breaks_apply_in_the_plans_order_and_the_result_says_which_decided()
    {
        // Equal totals: A = 48 + 32 = 80 (price 125); B = 40 + 40 = 80 (price 100).
        var plan = Plan() with { TieBreaks = [TieBreak.HigherQuality, TieBreak.LowerPrice] };
        AwardBid a = new("A", [8, 8, 8], 125), b = new("B", [10, 5, 0], 100);
        Assert.Equal(80, PointsAward.Compute(plan, [a, b]).Bids[0].Total!.Value, Tolerance);
        Assert.Equal(80, PointsAward.Compute(plan, [a, b]).Bids[1].Total!.Value, Tolerance);

        var byQuality = PointsAward.Compute(plan, [a, b]);
        Assert.Equal(1, Rank(byQuality, "A"));
        Assert.Equal(TieBreak.HigherQuality, byQuality.Bids.Single(x => x.Id == "A").DecidedBy);

        var byPrice = PointsAward.Compute(plan with { TieBreaks = [TieBreak.LowerPrice] }, [a, b]);
        Assert.Equal(1, Rank(byPrice, "B"));
        Assert.Equal(TieBreak.LowerPrice, byPrice.Bids.Single(x => x.Id == "B").DecidedBy);

        var bySubmission = PointsAward.Compute(plan with { TieBreaks = [TieBreak.EarlierSubmission] }, [b, a]);
        Assert.Equal(1, Rank(bySubmission, "B")); // listed (submitted) first
        Assert.Equal(TieBreak.EarlierSubmission, bySubmission.Bids.Single(x => x.Id == "B").DecidedBy);

        var none = PointsAward.Compute(plan with { TieBreaks = [] }, [a, b]);
        Assert.True(none.UnresolvedTie);
        Assert.Equal(Rank(none, "A"), Rank(none, "B"));
    }

    [Fact]
    public void Lowest_price_technically_acceptable_ranks_the_bids_that_pass_by_price_alone()
    {
        var plan = Plan(PriceFormula.LowestPriceAcceptable) with { MinimumQualityShare = 0.5 };
        var award = PointsAward.Compute(plan,
            [new AwardBid("best", [10, 10, 10], 150), new AwardBid("cheap-ok", [5, 5, 5], 100), new AwardBid("cheapest-fails", [2, 2, 2], 80)]);
        Assert.Equal(["cheap-ok", "best"], award.Ranking.Select(x => x.Id));
        Assert.Null(award.Bids[0].Total);
        Assert.Equal(150, award.Bids[0].Figure!.Value, Tolerance);
    }

    [Fact]
    public void A_budget_based_rule_excludes_a_bid_over_budget_with_its_reason()
    {
        var plan = new AwardPlan([60], 10, new PriceRule(PriceFormula.BudgetBased, 40, Budget: 200, Floor: 100));
        var award = PointsAward.Compute(plan, [new AwardBid("A", [6], 150), new AwardBid("B", [9], 210)]);
        Assert.Equal(AwardExclusion.OverBudget, award.Bids[1].Excluded);
        Assert.Contains("budget", award.Bids[1].ExclusionDetail);
        Assert.Equal(36 + 20, award.Bids[0].Total!.Value, Tolerance);
    }

    private static int? Rank(AwardResult award, string id) => award.Bids.Single(x => x.Id == id).Rank;

    [Fact]
    public void While_prices_are_sealed_quality_and_thresholds_are_final_and_nothing_is_ranked_or_flagged()
    {
        var plan = Plan() with { MinimumQualityShare = 0.6, AbnormallyLow = new AbnormallyLowRule(10) };
        var award = PointsAward.Compute(plan, [new AwardBid("A", [8, 6, 6], null), new AwardBid("low", [4, 5, 5], null)]);

        Assert.True(award.PricesSealed);
        Assert.All(award.Bids, b => Assert.Null(b.Rank));
        Assert.All(award.Bids, b => Assert.Null(b.AbnormallyLowFlag));
        Assert.Equal(AwardExclusion.BelowQualityThreshold, award.Bids[1].Excluded);
        Assert.Equal(42, award.Bids[0].QualityPoints, 9);
    }
}
