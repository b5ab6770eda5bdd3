using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Analysis;

/// <summary>
/// The geometric mean multiplies the assessors' values, so one value of 0 zeroes the panel's value: a veto, not an
/// average. It is refused on a scale that has such terms, with a message naming them, and accepted on scales whose
/// terms all lie above 0.
/// </summary>
public sealed class GeometricAggregationTests
{
    private static Evaluation Geometric(Evaluation e) => e with { Options = e.Options with { Aggregation = AggregationRule.Geometric } };

    [Fact]
    public void Is_refused_on_Chens_scales_naming_every_term_with_a_value_of_0()
    {
        var errors = ErrorAssert.Refused(Geometric(SampleEvaluation.WithImportance()));
        var rating = errors.Single(e => e.Reason.Contains("rating scale", StringComparison.Ordinal));
        var importance = errors.Single(e => e.Reason.Contains("importance scale", StringComparison.Ordinal));
        Assert.Equal("$.options.aggregation", rating.Path);
        Assert.Equal("$.options.aggregation", importance.Path);

        // Chen's rating scale: VP (0, 0, 1) and P (0, 1, 3) start at 0; importance: VL (0, 0, 0.1) and L (0, 0.1, 0.3).
        Assert.Contains("VP (Very poor)", rating.Reason, StringComparison.Ordinal);
        Assert.Contains("P (Poor)", rating.Reason, StringComparison.Ordinal);
        Assert.DoesNotContain("MP", rating.Reason, StringComparison.Ordinal);
        Assert.Contains("VL (Very low)", importance.Reason, StringComparison.Ordinal);
        Assert.Contains("L (Low)", importance.Reason, StringComparison.Ordinal);
        Assert.Contains("weighted mean", rating.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Is_refused_in_the_plan_check_before_any_bid_exists()
    {
        var plan = Geometric(SampleEvaluation.WithImportance()) with { Alternatives = [], Assessors = [], Ratings = [], Importance = [], Values = [], Gates = [] };
        Assert.Contains(EvaluationValidator.ValidatePlan(plan), e => e.Path == "$.options.aggregation");
    }

    [Fact]
    public void Pairwise_weighting_checks_only_the_rating_scale()
    {
        var errors = ErrorAssert.Refused(Geometric(SampleEvaluation.WithPairwise()));
        Assert.Single(errors, e => e.Path == "$.options.aggregation");
        Assert.Contains("rating scale", errors.Single(e => e.Path == "$.options.aggregation").Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void Is_accepted_on_scales_whose_terms_all_lie_above_0_and_differs_from_the_mean()
    {
        var e = SampleEvaluation.WithImportance();
        string Map(string code) => code switch
        {
            "VP" or "P" => "R1", "MP" => "R2", "F" => "R3", "MG" => "R4", _ => "R5",
        };
        string MapImportance(string code) => code switch
        {
            "VL" or "L" => "I1", "ML" or "M" => "I2", "MH" or "H" => "I3", _ => "I4",
        };
        var positive = e with
        {
            RatingScale = PanelGenerator.PositiveRating,
            ImportanceScale = PanelGenerator.PositiveImportance,
            Ratings = e.Ratings.Select(r => r.Term is null ? r : r with { Term = Map(r.Term) }).ToArray(),
            Importance = e.Importance.Select(r => r with { Term = MapImportance(r.Term) }).ToArray(),
        };

        var mean = DecisionEngine.Analyse(positive);
        var geometric = DecisionEngine.Analyse(Geometric(positive));
        Assert.NotEqual(mean.Ranking.Select(r => r.Closeness), geometric.Ranking.Select(r => r.Closeness));
    }
}
