using Decide.Core.Award;

namespace Decide.Core.Tests.Award;

/// <summary>
/// Each price formula on a worked example written from its published definition (PRACTICE §4; Stilger, Siderius &amp;
/// van Raaij 2017, J. Public Procurement 17(1):89–125; Bergman &amp; Lundberg 2013, J. Purchasing &amp; Supply
/// Management 19(2):73–83). The prices are ours; the expected points are worked by hand from the printed equation.
/// </summary>
public sealed class PriceFormulaTests
{
    private const double Tolerance = 1e-9;

    private static double[] Points(PriceRule rule, params double[] prices) =>
        PriceScoring.Score(rule, prices, new double[prices.Length]).Select(s => s.Points!.Value).ToArray();

    [Fact]
    public void Lowest_price_ratio_gives_the_lowest_all_the_points_and_the_others_in_proportion()
    {
        // S = Smax × Pmin / P with Smax = 40: 100 → 40; 125 → 40 × 100/125 = 32; 200 → 40 × 100/200 = 20.
        var points = Points(new PriceRule(PriceFormula.LowestPriceRatio, 40), 100, 125, 200);
        Close.All([40, 32, 20], points);
    }

    [Fact]
    public void Linear_from_lowest_takes_one_per_cent_of_the_points_per_per_cent_above_the_lowest_and_never_goes_below_zero()
    {
        // S = Smax × max(0, 1 − (P − Pmin)/Pmin), Smax = 40: 100 → 40; 150 (50 % above) → 20; 250 (150 % above) → 0.
        var points = Points(new PriceRule(PriceFormula.LinearFromLowest, 40), 100, 150, 250);
        Close.All([40, 20, 0], points);
    }

    [Fact]
    public void Interpolation_between_lowest_and_highest_gives_the_dearer_of_two_bids_nothing_however_close()
    {
        // The paradox of the "highest bid – lowest bid" formula [STIL]: two prices a hundredth apart, all or nothing.
        var points = Points(new PriceRule(PriceFormula.LowestHighestInterpolation, 40), 100_000, 100_000.01);
        Close.All([40, 0], points);

        // With a third bid in between it is linear: 100 → 40, 150 → 20, 200 → 0.
        Close.All([40, 20, 0], Points(new PriceRule(PriceFormula.LowestHighestInterpolation, 40), 100, 150, 200));
    }

    [Fact]
    public void Budget_based_scores_each_price_against_the_budget_and_floor_alone_and_marks_a_price_over_budget()
    {
        // S = Smax × (B − P)/(B − Pfloor) within [0, Smax], B = 200, Pfloor = 100, Smax = 40:
        // 150 → 40 × 50/100 = 20; 90 (below the floor) → 40; 200 → 0; 210 → over budget.
        var rule = new PriceRule(PriceFormula.BudgetBased, 40, Budget: 200, Floor: 100);
        var scores = PriceScoring.Score(rule, [150, 90, 200, 210], [0, 0, 0, 0]);
        Assert.Equal(20, scores[0].Points!.Value, Tolerance);
        Assert.Equal(40, scores[1].Points!.Value, Tolerance);
        Assert.Equal(0, scores[2].Points!.Value, Tolerance);
        Assert.True(scores[3].OverBudget);

        // Absolute: the same price gets the same points whatever else is bid.
        Assert.Equal(20, PriceScoring.Score(rule, [150], [0])[0].Points!.Value, Tolerance);
    }

    [Fact]
    public void Value_for_money_is_price_per_quality_point_and_quality_adjusted_price_takes_quality_off_in_money()
    {
        // V = P / Q (LGP NSW): 120,000 / 48 = 2,500 and 100,000 / 32 = 3,125; the first is the better value.
        var vfm = PriceScoring.Score(new PriceRule(PriceFormula.ValueForMoney, 0), [120_000, 100_000], [48, 32]);
        Assert.Equal(2_500, vfm[0].Figure!.Value, Tolerance);
        Assert.Equal(3_125, vfm[1].Figure!.Value, Tolerance);

        // A = P − v × Q with v = 1,000 per quality point [BL]: 120,000 − 48,000 = 72,000; 100,000 − 32,000 = 68,000.
        var adjusted = PriceScoring.Score(new PriceRule(PriceFormula.QualityAdjustedPrice, 0, ValuePerQualityPoint: 1_000), [120_000, 100_000], [48, 32]);
        Assert.Equal(72_000, adjusted[0].Figure!.Value, Tolerance);
        Assert.Equal(68_000, adjusted[1].Figure!.Value, Tolerance);
    }

    [Fact]
    public void World_bank_qcbs_financial_score_and_combined_score_on_a_worked_example()
    {
        // The formulas as printed in the World Bank's consultant-selection guidance (Sf = 100 × Fm / F;
        // S = St × T% + Sf × P%, T + P = 100 %; recalled from memory of the 2011 Consultant Guidelines, para 2.23 —
        // the example's figures are ours). T = 80 %, P = 20 %; St: firm A 85, firm B 80; prices A 120,000, B 100,000.
        // Sf: A = 100 × 100,000/120,000 = 83.333…, B = 100. S: A = 68 + 16.666… = 84.666…, B = 64 + 20 = 84.
        // Written as a points award: technical worth 80 points (score out of 100), price 20 points.
        var plan = new AwardPlan([80], 100, new PriceRule(PriceFormula.LowestPriceRatio, 20));
        var award = PointsAward.Compute(plan, [new AwardBid("A", [85], 120_000), new AwardBid("B", [80], 100_000)]);
        var a = award.Bids.Single(b => b.Id == "A");
        var b = award.Bids.Single(b => b.Id == "B");
        Assert.Equal(100.0 * 100_000 / 120_000 * 0.2, a.PricePoints!.Value, Tolerance);
        Assert.Equal(84 + (2.0 / 3), a.Total!.Value, Tolerance);
        Assert.Equal(84, b.Total!.Value, Tolerance);
        Assert.Equal(1, a.Rank);
        Assert.Equal(2, b.Rank);
    }

    [Theory]
    [InlineData(PriceFormula.LowestPriceRatio, true)]
    [InlineData(PriceFormula.LinearFromLowest, true)]
    [InlineData(PriceFormula.LowestHighestInterpolation, true)]
    [InlineData(PriceFormula.BudgetBased, false)]
    [InlineData(PriceFormula.ValueForMoney, false)]
    [InlineData(PriceFormula.QualityAdjustedPrice, false)]
    [InlineData(PriceFormula.LowestPriceAcceptable, false)]
    public void A_formula_is_described_as_relative_exactly_when_a_price_score_moves_with_another_bids_price(PriceFormula formula, bool relative)
    {
        var rule = new PriceRule(formula, 40, Budget: 1_000, Floor: 50, ValuePerQualityPoint: 2);
        double Own(params double[] prices)
        {
            var s = PriceScoring.Score(rule, prices, prices.Select(_ => 30.0).ToArray())[0];
            return s.Points ?? s.Figure!.Value;
        }

        var moves = Math.Abs(Own(300, 200, 400) - Own(300, 250, 900)) > Tolerance;
        Assert.Equal(relative, moves);
        Assert.Equal(relative, PriceFormulas.Describe(formula).Relative);
        Assert.False(string.IsNullOrWhiteSpace(PriceFormulas.Describe(formula).Source));
    }
}
