using Decide.Core.Analysis;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Award;

/// <summary>
/// The published award applied to a whole evaluation: panel scores from the assessors' terms, the plan's rules, the
/// exclusions carried into the fuzzy analysis, and the validator's refusals by place. Expected figures are worked by
/// hand from the definitions in docs/methods.md §10 (score ÷ scale maximum × criterion points; S = Smax × Pmin / P).
/// </summary>
public sealed class AwardAnalysisTests
{
    /// <summary>
    /// Two quality criteria (method 40, team 20 of quality 60) and price 40 on the 0–5 points scale; three bids; two
    /// assessors. Ratings: a: method 4/5, team 3/3; b: method 5/5, team 4/4; c: method 2/3, team 2/2.
    /// </summary>
    private static Evaluation Tender(AwardMethod? award = null, Action<List<Rating>>? edit = null, double assessorWeight = 1) =>
        Build(award ?? new AwardMethod("price", PriceFormula.LowestPriceRatio), edit, assessorWeight);

    private static Evaluation Build(AwardMethod award, Action<List<Rating>>? edit, double assessorWeight)
    {
        var terms = new (string Bid, string Criterion, string First, string Second)[]
        {
            ("a", "method", "4", "5"), ("a", "team", "3", "3"),
            ("b", "method", "5", "5"), ("b", "team", "4", "4"),
            ("c", "method", "2", "3"), ("c", "team", "2", "2"),
        };
        var ratings = terms.SelectMany(t => new[]
        {
            new Rating("r1", t.Bid, t.Criterion, t.First, "Reason."),
            new Rating("r2", t.Bid, t.Criterion, t.Second, "Reason."),
        }).ToList();
        edit?.Invoke(ratings);
        return new Evaluation
        {
            Title = "Award test",
            RatingScale = BuiltInScales.Points5,
            Groups = [new CriterionGroup("quality", "Quality")],
            Criteria =
            [
                new Criterion("method", "Method", Group: "quality"),
                new Criterion("team", "Team", Group: "quality"),
                new Criterion("price", "Price", CriterionKind.Numeric, Direction.Cost),
            ],
            Alternatives = [new Alternative("a", "Alpha"), new Alternative("b", "Beta"), new Alternative("c", "Gamma")],
            Assessors = [new Assessor("r1", "First"), new Assessor("r2", "Second", assessorWeight)],
            Weighting = WeightingMethod.Points,
            Points = new PublishedWeights(100, new Dictionary<string, double> { ["quality"] = 60 },
                [new("method", 40, "quality"), new("team", 20, "quality"), new("price", 40)]),
            Award = award,
            Ratings = ratings,
            Values = [new NumericValue("a", "price", 100), new NumericValue("b", "price", 125), new NumericValue("c", "price", 80)],
        };
    }

    [Fact]
    public void Panel_scores_are_the_mean_of_the_assessors_points_and_totals_follow_the_published_method()
    {
        var award = DecisionRun.Of(Tender()).Award!;
        var a = award.Lines.Single(l => l.Alternative == "a");

        // method: (4 + 5) / 2 = 4.5 → 4.5 / 5 × 40 = 36; team: 3 → 3 / 5 × 20 = 12; quality 48.
        Close.All([4.5, 3], a.Cells.Select(c => c.Score).ToArray());
        Close.All([36, 12], a.Award.CriterionPoints);
        Assert.Equal(48, a.Award.QualityPoints, 9);

        // Price: Pmin = 80 (c). a: 40 × 80 / 100 = 32; b: 40 × 80 / 125 = 25.6; c: 40.
        // b quality: 5/5 × 40 + 4/5 × 20 = 56 → 81.6; a: 80; c: 2.5/5 × 40 + 2/5 × 20 = 28 → 68.
        Close.All([80, 81.6, 68], award.Result.Bids.Select(b => b.Total!.Value).ToArray());
        Assert.Equal("b", award.Winner);
        Assert.Equal(["b", "a", "c"], award.Result.Ranking.Select(b => b.Id));
    }

    [Fact]
    public void The_mean_weighs_each_assessor_by_the_plans_weight()
    {
        // r2 counts three times: a's method = (4 + 3 × 5) / 4 = 4.75.
        var a = DecisionRun.Of(Tender(assessorWeight: 3)).Award!.Lines.Single(l => l.Alternative == "a");
        Assert.Equal(4.75, a.Cells[0].Score, 9);
    }

    [Fact]
    public void The_moderated_rule_takes_the_agreed_terms_points_and_the_mean_rule_keeps_the_mean()
    {
        var moderated = new ModeratedRating("a", "method", "3", "Agreed after discussion.");
        var byModeration = Tender(new AwardMethod("price", PriceFormula.LowestPriceRatio, PanelScore: PanelScoreRule.Moderated)) with { Moderated = [moderated] };
        var byMean = Tender() with { Moderated = [moderated] };

        var cell = DecisionRun.Of(byModeration).Award!.Lines.Single(l => l.Alternative == "a").Cells[0];
        Assert.Equal((3.0, PanelScoreSource.Moderated, "3"), (cell.Score, cell.Source, cell.Term));
        Assert.Equal(["4", "5"], cell.Terms);

        var mean = DecisionRun.Of(byMean).Award!.Lines.Single(l => l.Alternative == "a").Cells[0];
        Assert.Equal((4.5, PanelScoreSource.Mean), (mean.Score, mean.Source));
    }

    [Fact]
    public void Published_points_are_the_fuzzy_analysis_crisp_weights_with_group_and_local_parts()
    {
        var weights = DecisionRun.Of(Tender()).Analysis.Weights;
        Close.All([0.4, 0.2, 0.4], weights.Select(w => w.Crisp).ToArray());
        var method = weights[0];
        Close.All([0.4, 0.4, 0.4], [method.Fuzzy.Lower, method.Fuzzy.Middle, method.Fuzzy.Upper]);
        Assert.Equal(0.6, method.GroupWeight!.Value.Middle, 9);
        Assert.Equal(40.0 / 60, method.Local!.Value.Middle, 9);
    }

    [Fact]
    public void A_bid_below_a_threshold_leaves_the_fuzzy_analysis_too_and_says_why()
    {
        var run = DecisionRun.Of(Tender(new AwardMethod("price", PriceFormula.LowestPriceRatio, MinimumQualityShare: 0.5)));

        // c has 28 of 60 quality points (46.7 %): excluded, and the lowest price is now a's 100.
        var c = run.Award!.Result.Bids.Single(b => b.Id == "c");
        Assert.Equal(AwardExclusion.BelowQualityThreshold, c.Excluded);
        Assert.Equal(40, run.Award.Result.Bids.Single(b => b.Id == "a").PricePoints!.Value, 9);
        var excluded = Assert.Single(run.Analysis.Excluded);
        Assert.Equal("c", excluded.Alternative);
        Assert.Empty(excluded.Gates);
        Assert.Contains("below the threshold of 50", excluded.Reason);
        Assert.DoesNotContain(run.Analysis.Ranking, r => r.Alternative == "c");
    }

    [Fact]
    public void A_bid_excluded_before_price_needs_no_price_but_a_bid_still_in_the_running_does()
    {
        var method = new AwardMethod("price", PriceFormula.LowestPriceRatio, MinimumQualityShare: 0.5, TwoStage: true);
        var unopened = Tender(method) with { Values = Tender().Values.Where(v => v.Alternative != "c").ToArray() };
        Assert.Empty(EvaluationValidator.Validate(unopened));
        Assert.Equal(AwardExclusion.BelowQualityThreshold, DecisionRun.Of(unopened).Award!.Result.Bids.Single(b => b.Id == "c").Excluded);

        var missing = Tender(method) with { Values = Tender().Values.Where(v => v.Alternative != "a").ToArray() };
        Assert.Contains(EvaluationValidator.Validate(missing), e => e.Path == "$.values.a.price");
    }

    [Fact]
    public void The_quality_stage_is_computed_while_every_price_is_sealed()
    {
        var method = new AwardMethod("price", PriceFormula.LowestPriceRatio, MinimumQualityShare: 0.5, TwoStage: true);
        var sealedPrices = Tender(method) with { Values = [] };
        Assert.Throws<InvalidEvaluationException>(() => DecisionRun.Of(sealedPrices));

        var quality = AwardAnalysis.QualityStage(sealedPrices);
        Assert.True(quality.Result.PricesSealed);
        Assert.Equal(AwardExclusion.BelowQualityThreshold, quality.Result.Bids.Single(b => b.Id == "c").Excluded);
        Assert.Equal(56, quality.Result.Bids.Single(b => b.Id == "b").QualityPoints, 9);
        Assert.Null(quality.Winner);
    }

    [Fact]
    public void A_criterion_minimum_given_as_a_term_excludes_a_bid_whose_score_is_below_that_terms_points()
    {
        var award = DecisionRun.Of(Tender(new AwardMethod("price", PriceFormula.LowestPriceRatio,
            MinimumTerms: new Dictionary<string, string> { ["method"] = "3" }))).Award!;
        var c = award.Result.Bids.Single(b => b.Id == "c");
        Assert.Equal(AwardExclusion.BelowCriterionMinimum, c.Excluded);
        Assert.Contains("\"Method\" scored 2.5, below the minimum of 3", c.ExclusionDetail);
    }

    [Fact]
    public void A_flagged_price_without_a_decision_holds_the_award_and_a_recorded_rejection_excludes_the_bid()
    {
        // c's 80 is 28.9 % below the mean of a and b (112.5); the rule flags more than 20 %.
        var rule = new AwardMethod("price", PriceFormula.LowestPriceRatio, AbnormallyLow: new AbnormallyLowRule(20));
        var pending = DecisionRun.Of(Tender(rule)).Award!;
        Assert.Equal(["c"], pending.AwaitingDecision);
        Assert.Null(pending.Winner);
        Assert.NotNull(pending.Result.Bids.Single(b => b.Id == "c").AbnormallyLowFlag);

        var rejected = Tender(rule) with { LowPriceReviews = [new LowPriceReview("c", "Explain the price.", "No answer.", LowPriceDecision.Rejected, "The answer does not cover the wage costs.")] };
        var run = DecisionRun.Of(rejected);
        Assert.Empty(run.Award!.AwaitingDecision);
        Assert.Equal(AwardExclusion.AbnormallyLow, run.Award.Result.Bids.Single(b => b.Id == "c").Excluded);
        Assert.Equal("b", run.Award.Winner);
        Assert.Contains(run.Analysis.Excluded, x => x.Alternative == "c");
    }

    [Fact]
    public void A_bid_that_fails_a_gate_keeps_its_quality_points_and_is_excluded_by_the_gate()
    {
        var gated = Tender() with
        {
            Criteria = [.. Tender().Criteria, new Criterion("insurance", "Insurance", CriterionKind.Gate)],
            Gates = [new GateResult("a", "insurance", true), new GateResult("b", "insurance", false), new GateResult("c", "insurance", true)],
        };
        var b = DecisionRun.Of(gated).Award!.Result.Bids.Single(x => x.Id == "b");
        Assert.Equal(AwardExclusion.FailedGate, b.Excluded);
        Assert.Contains("\"Insurance\"", b.ExclusionDetail);
        Assert.Equal(56, b.QualityPoints, 9);
    }

    [Fact]
    public void Agreement_with_the_closeness_ranking_names_both_first_places_and_measures_the_orders_by_kendall_tau()
    {
        var run = DecisionRun.Of(Tender());
        var award = run.Award!; // points order b, a, c
        static AnalysisResult Ranked(AnalysisResult analysis, params string[] order) => analysis with
        {
            Ranking = order.Select((id, i) => new RankedAlternative(id, i + 1, 1 - (0.1 * i), 0, 0, [])).ToArray(),
        };

        // The same order: τ-b = 1 and the same first place.
        var same = AwardAgreement.Of(award, Ranked(run.Analysis, "b", "a", "c"));
        Assert.Equal(("b", "b", true, 3), (same.PointsWinner, same.ClosenessWinner, same.SameWinner, same.Compared));
        Assert.Equal(1, same.KendallTau!.Value, 9);

        // The reverse order: every pair discordant, τ-b = −1.
        var reverse = AwardAgreement.Of(award, Ranked(run.Analysis, "c", "a", "b"));
        Assert.Equal(("c", false), (reverse.ClosenessWinner, reverse.SameWinner));
        Assert.Equal(-1, reverse.KendallTau!.Value, 9);

        // One swap among three (b, c, a): 2 concordant and 1 discordant pair of 3, τ-b = 1/3.
        Assert.Equal(1.0 / 3, AwardAgreement.Of(award, Ranked(run.Analysis, "b", "c", "a")).KendallTau!.Value, 9);
        Assert.Equal("b", AwardAgreement.Of(award, run.Analysis).PointsWinner);
    }

    [Fact]
    public void The_validator_names_each_mistake_of_an_award_plan_by_its_place()
    {
        var noScalePoints = Tender() with { RatingScale = BuiltInScales.Rating5, Ratings = [] };
        Assert.Contains(EvaluationValidator.ValidatePlan(noScalePoints), e => e.Path == "$.ratingScale" && e.Reason.Contains("points"));

        var notCost = Tender(new AwardMethod("method", PriceFormula.LowestPriceRatio));
        Assert.Contains(EvaluationValidator.ValidatePlan(notCost), e => e.Path == "$.award.price.criterion");

        var noBudget = Tender(new AwardMethod("price", PriceFormula.BudgetBased));
        Assert.Contains(EvaluationValidator.ValidatePlan(noBudget), e => e.Path == "$.award.price.budget");

        var floorAbove = Tender(new AwardMethod("price", PriceFormula.BudgetBased, Budget: 100, Floor: 120));
        Assert.Contains(EvaluationValidator.ValidatePlan(floorAbove), e => e.Path == "$.award.price.floor");

        var noRate = Tender(new AwardMethod("price", PriceFormula.QualityAdjustedPrice));
        Assert.Contains(EvaluationValidator.ValidatePlan(noRate), e => e.Path == "$.award.price.valuePerQualityPoint");

        var badShare = Tender(new AwardMethod("price", PriceFormula.LowestPriceRatio, MinimumQualityShare: 60));
        Assert.Contains(EvaluationValidator.ValidatePlan(badShare), e => e.Path == "$.award.thresholds.qualityShare");

        var badTerm = Tender(new AwardMethod("price", PriceFormula.LowestPriceRatio, MinimumTerms: new Dictionary<string, string> { ["method"] = "G" }));
        Assert.Contains(EvaluationValidator.ValidatePlan(badTerm), e => e.Path == "$.award.thresholds.minimumTerms.method" && e.Reason.Contains("0, 1, 2, 3, 4, 5"));

        var twice = Tender(new AwardMethod("price", PriceFormula.LowestPriceRatio, TieBreaks: [TieBreak.LowerPrice, TieBreak.LowerPrice]));
        Assert.Contains(EvaluationValidator.ValidatePlan(twice), e => e.Path == "$.award.tieBreaks");

        var notPoints = Tender() with { Weighting = WeightingMethod.Importance };
        Assert.Contains(EvaluationValidator.ValidatePlan(notPoints), e => e.Path == "$.award");

        var missing = Tender() with { Points = new PublishedWeights(100, new Dictionary<string, double> { ["quality"] = 60 }, [new("method", 60, "quality"), new("price", 40)]) };
        Assert.Contains(EvaluationValidator.ValidatePlan(missing), e => e.Path == "$.publishedWeights.criteria.team");
    }

    [Fact]
    public void The_validator_refuses_a_decision_without_reasons_and_a_record_for_an_unknown_bid()
    {
        var rule = new AwardMethod("price", PriceFormula.LowestPriceRatio, AbnormallyLow: new AbnormallyLowRule(20));
        var errors = EvaluationValidator.Validate(Tender(rule) with
        {
            LowPriceReviews = [new LowPriceReview("c", "Explain.", null, LowPriceDecision.Accepted, " "), new LowPriceReview("z", "Explain.")],
        });
        Assert.Contains(errors, e => e.Path == "$.lowPriceReviews.c.reasons");
        Assert.Contains(errors, e => e.Path == "$.lowPriceReviews.z" && e.Reason.Contains("unknown alternative"));
    }
}
