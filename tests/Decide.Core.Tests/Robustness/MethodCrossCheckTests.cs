using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// The method cross-check. The weighted total is the conventional score of procurement scoring rules: each rating
/// scored on the rating scale itself (the centroid of the panel's triangle, (l + m + u)/3, divided by the scale's
/// top), a price scored lowest ÷ price, each times the criterion's weight share.
/// </summary>
public sealed class MethodCrossCheckTests
{
    [Fact]
    public void The_weighted_total_is_the_score_on_the_rating_scale_times_the_weight_shares()
    {
        // Chen's rating scale (top of its range 10), two assessors with equal weight, crisp importance 0.5, 0.3 and
        // 0.2 (already summing to 1, so these are the shares). Terms: F (3,5,7), MG (5,7,9), G (7,9,10), VG (9,10,10).
        // The mean of two triangles has the mean of their centroids. Price: lowest (80) ÷ price [derived].
        var scores = MethodCrossCheck.WeightedTotal(DecisionEngine.Prepare(ThreeBids()));
        double g = (7 + 9 + 10) / 3.0, vg = (9 + 10 + 10) / 3.0, f = (3 + 5 + 7) / 3.0, mg = (5 + 7 + 9) / 3.0;
        Assert.Equal((0.5 * ((g + vg) / 2) / 10) + (0.3 * f / 10) + (0.2 * 80 / 100), scores[0], 12);  // 0.768333
        Assert.Equal((0.5 * mg / 10) + (0.3 * ((vg + g) / 2) / 10) + (0.2 * 80 / 80), scores[1], 12);   // 0.825
        Assert.Equal((0.5 * ((f + g) / 2) / 10) + (0.3 * g / 10) + (0.2 * 80 / 125), scores[2], 12);    // 0.729667
    }

    [Fact]
    public void A_crisp_benefit_number_is_scored_relative_to_the_highest_and_a_crisp_rating_on_the_scale()
    {
        // Crisp scores on a 0–10 scale, crisp importance 0.8 and 0.5 (shares 0.8/1.3 and 0.5/1.3): the ratings are
        // divided by the scale's top (10), not by the best score received as TOPSIS does [derived].
        var evaluation = RobustnessFixtures.Uniform([["7", "4"], ["5", "9"], ["3", "3"]], ["8", "5"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance);
        var scores = MethodCrossCheck.WeightedTotal(DecisionEngine.Prepare(evaluation));
        Assert.Equal(((0.8 * 7) + (0.5 * 4)) / 1.3 / 10, scores[0], 12);
        Assert.Equal(((0.8 * 5) + (0.5 * 9)) / 1.3 / 10, scores[1], 12);
        Assert.Equal(((0.8 * 3) + (0.5 * 3)) / 1.3 / 10, scores[2], 12);

        var withCapacity = evaluation with
        {
            Criteria = [.. evaluation.Criteria, new Criterion("C3", "Capacity", CriterionKind.Numeric, Direction.Benefit)],
            Importance = [.. evaluation.Importance, .. evaluation.Assessors.Select(a => new ImportanceRating(a.Id, "C3", "7"))],
            Values = [new NumericValue("A1", "C3", 40), new NumericValue("A2", "C3", 50), new NumericValue("A3", "C3", 0)],
        };
        var totals = MethodCrossCheck.WeightedTotal(DecisionEngine.Prepare(withCapacity));
        Assert.Equal(((0.8 * 7 / 10) + (0.5 * 4 / 10) + (0.7 * 40 / 50)) / 2.0, totals[0], 12);
        Assert.Equal(((0.8 * 5 / 10) + (0.5 * 9 / 10) + (0.7 * 50 / 50)) / 2.0, totals[1], 12);
        Assert.Equal(((0.8 * 3 / 10) + (0.5 * 3 / 10) + (0.7 * 0 / 50)) / 2.0, totals[2], 12);
    }

    [Fact]
    public void Where_topsis_divides_by_the_best_rating_received_the_weighted_total_can_rank_differently()
    {
        // Equal weights. C1 is rated poorly for both: A1 P (0,1,3), A2 VP (0,0,1). C2: A1 MG (5,7,9), A2 G (7,9,10).
        // TOPSIS divides C1 by its largest upper value, 3, so A1's small lead there is magnified: CC(A1) = 0.3125,
        // CC(A2) = 0.2603 with unit ideal points [derived]. On the rating scale A1's lead on C1 is (4/3 − 1/3)/10 = 0.1
        // and A2's on C2 is (26/3 − 21/3)/10 = 0.1667: totals 0.4167 and 0.4500, so A2 leads [derived].
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.Uniform([["P", "MG"], ["VP", "G"]], ["5", "5"],
            assessors: 1, importanceScale: RobustnessFixtures.CrispImportance));
        var result = prepared.Analyse();
        Assert.Equal(["A1", "A2"], result.Ranking.Select(r => r.Alternative));
        Assert.Equal(0.3125, result.Ranking[0].Closeness, 3);
        Assert.Equal(0.2603, result.Ranking[1].Closeness, 3);

        var total = MethodCrossCheck.Run(prepared, result).Single(m => m.Method == MethodCrossCheck.WeightedTotalMethod);
        Assert.Equal(["A2", "A1"], total.Ranking);
        Assert.Equal((0.5 * (1 / 3.0) / 10) + (0.5 * (26 / 3.0) / 10), total.Scores[0], 12);
        Assert.Equal((0.5 * (4 / 3.0) / 10) + (0.5 * (21 / 3.0) / 10), total.Scores[1], 12);
        Assert.False(total.SameWinner);
        Assert.Equal(-1.0, total.KendallTau!.Value, 12);
        Assert.Null(total.Note);
    }

    [Fact]
    public void Three_comparisons_each_with_tau_against_the_main_ranking()
    {
        var prepared = DecisionEngine.Prepare(Published.Chen2000WorkedExample.Build());
        var result = prepared.Analyse();
        var methods = MethodCrossCheck.Run(prepared, result);
        Assert.Equal(["aggregation:geometric", "ideal:extreme", "weighted-total"], methods.Select(m => m.Method));
        Assert.All(methods.Where(m => m.Applicable), m => Assert.InRange(m.KendallTau!.Value, -1, 1));

        // The Chen example is clear-cut: every method that applies keeps A2 first, in the same order [derived].
        Assert.True(methods[1].Applicable);
        Assert.True(methods[2].Applicable);
        Assert.All(methods.Where(m => m.Applicable), m => Assert.True(m.SameWinner));
        Assert.All(methods.Where(m => m.Applicable), m => Assert.Equal(1.0, m.KendallTau!.Value, 12));
    }

    [Fact]
    public void The_geometric_check_on_Chens_scales_says_in_one_line_which_terms_reach_0()
    {
        var prepared = DecisionEngine.Prepare(Published.Chen2000WorkedExample.Build());
        var geometric = MethodCrossCheck.Run(prepared, prepared.Analyse()).Single(m => m.Method == "aggregation:geometric");
        Assert.Empty(geometric.Ranking);
        Assert.Null(geometric.KendallTau);
        Assert.Equal(
            "not applicable: the geometric mean needs scales whose terms all lie above 0, and \"Very poor\", \"Poor\" on the rating scale and \"Very low\", \"Low\" on the importance scale reach 0 (one such rating would decide a cell alone)",
            geometric.Note);
    }

    [Fact]
    public void A_method_the_engine_refuses_is_reported_as_not_applicable_with_the_reason()
    {
        // Stands in for the engine refusing the geometric mean on a scale with a term of value 0.
        var prepared = DecisionEngine.Prepare(Published.Chen2000WorkedExample.Build());
        var result = prepared.Analyse();
        var methods = MethodCrossCheck.Run(prepared, result, e => e.Options.Aggregation == AggregationRule.Geometric
            ? throw new InvalidEvaluationException("$.ratingScale.terms[0]", "the geometric mean is undefined for a term with a value of 0.")
            : DecisionEngine.Analyse(e));

        var geometric = methods.Single(m => m.Method == "aggregation:geometric");
        Assert.Equal("not applicable: the geometric mean is undefined for a term with a value of 0", geometric.Note);
        Assert.False(geometric.Applicable);
        Assert.Empty(geometric.Ranking);
        Assert.Empty(geometric.Scores);
        Assert.Null(geometric.KendallTau);
        Assert.All(methods.Where(m => m != geometric), m => Assert.True(m.Applicable));
    }

    private static Evaluation ThreeBids()
    {
        string[] assessors = ["E1", "E2"];
        (string Alternative, string[] C1, string[] C2, double Price)[] bids =
        [
            ("A1", ["G", "VG"], ["F", "F"], 100),
            ("A2", ["MG", "MG"], ["VG", "G"], 80),
            ("A3", ["F", "G"], ["G", "G"], 125),
        ];
        return new Evaluation
        {
            Title = "weighted total by hand",
            ImportanceScale = RobustnessFixtures.CrispImportance,
            Criteria =
            [
                new Criterion("C1", "Method statement"), new Criterion("C2", "Team"),
                new Criterion("C3", "Price", CriterionKind.Numeric, Direction.Cost),
            ],
            Alternatives = bids.Select(b => new Alternative(b.Alternative, $"Bid {b.Alternative}")).ToArray(),
            Assessors = assessors.Select(a => new Assessor(a, $"Assessor {a}")).ToArray(),
            Importance = [.. from a in assessors from x in new[] { ("C1", "5"), ("C2", "3"), ("C3", "2") } select new ImportanceRating(a, x.Item1, x.Item2)],
            Ratings = [.. from b in bids from k in Enumerable.Range(0, 2) from c in new[] { ("C1", b.C1), ("C2", b.C2) }
                select new Rating(assessors[k], b.Alternative, c.Item1, c.Item2[k])],
            Values = [.. bids.Select(b => new NumericValue(b.Alternative, "C3", b.Price))],
            Options = new AnalysisOptions(AggregationRule.Mean, IdealPoints.Unit),
        };
    }
}
