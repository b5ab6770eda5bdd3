using System.Text.Json.Nodes;
using Decide.Core.Award;
using Decide.Core.Model;

namespace Decide.Interchange.Tests;

/// <summary>
/// The published award in the portable file: the points sample reads, writes back to the same content, and every
/// mistake is refused by its place in the file with a reason.
/// </summary>
public sealed class AwardFileTests
{
    private static string SamplePath => RepositoryFiles.PathOf("samples", "park-grounds-points.json");

    private static JsonObject Sample() => JsonNode.Parse(File.ReadAllText(SamplePath))!.AsObject();

    [Fact]
    public void The_points_sample_reads_its_published_weights_award_method_and_reviews()
    {
        var e = EvaluationFileReader.ReadFile(SamplePath).Evaluation;
        Assert.Equal(WeightingMethod.Points, e.Weighting);
        Assert.Equal(100, e.Points!.Total);
        Assert.Equal(60, e.Points.Groups["quality"]);
        Assert.Equal("quality", e.Points.Criteria.Single(c => c.Id == "method").Group);
        Assert.Null(e.Points.Criteria.Single(c => c.Id == "price").Group);

        var award = e.Award!;
        Assert.Equal((PriceFormula.LowestPriceRatio, "price", PanelScoreRule.Moderated, BindingResult.Points, true),
            (award.Formula, award.PriceCriterion, award.PanelScore, award.Binding, award.TwoStage));
        Assert.Equal(0.5, award.MinimumQualityShare);
        Assert.Equal("4", award.MinimumTerms!["method"]);
        Assert.Equal([TieBreak.HigherQuality, TieBreak.LowerPrice, TieBreak.EarlierSubmission], award.TieBreaks);
        Assert.Equal(20, award.AbnormallyLow!.BelowMeanOfOthersPercent);

        var review = Assert.Single(e.LowPriceReviews);
        Assert.Equal(("quickcut", LowPriceDecision.Accepted), (review.Alternative, review.Decision));
    }

    [Fact]
    public void The_points_sample_writes_back_to_the_same_content()
    {
        var first = EvaluationFileReader.ReadFile(SamplePath);
        var written = EvaluationFileWriter.ToJson(first);
        var again = EvaluationFileReader.Read(written);
        Assert.Equal(written, EvaluationFileWriter.ToJson(again));
        Assert.Equal(first.Evaluation.Points!.Criteria, again.Evaluation.Points!.Criteria);
        Assert.Equal(first.Evaluation.Award!.MinimumTerms, again.Evaluation.Award!.MinimumTerms);
        Assert.Equal(first.Evaluation.LowPriceReviews, again.Evaluation.LowPriceReviews);
    }

    [Fact]
    public void An_unknown_price_formula_is_refused_at_the_formula_with_the_words_it_takes()
    {
        var error = Files.ErrorsOf(Sample().Set("award/price/formula", "\"cheapest\"")).At("$.award.price.formula");
        Assert.Contains("\"lowest-price-ratio\"", error.Reason);
        Assert.Contains("\"cheapest\"", error.Reason);
    }

    [Fact]
    public void Published_points_that_do_not_add_up_are_refused_at_the_group_and_nothing_else_is_said_about_them()
    {
        var errors = Files.ErrorsOf(Sample().Set("publishedWeights/criteria/method", "30"));
        Assert.Contains("add up to 65", errors.At("$.publishedWeights.groups.quality").Reason);
    }

    [Fact]
    public void A_points_value_that_is_not_a_number_is_reported_once_at_its_place()
    {
        var errors = Files.ErrorsOf(Sample().Set("publishedWeights/criteria/social", "\"ten\""));
        Assert.Contains("a number", errors.At("$.publishedWeights.criteria.social").Reason);
    }

    [Fact]
    public void A_decision_without_reasons_and_an_unknown_member_of_the_award_are_refused_by_place()
    {
        var node = Sample();
        node["lowPriceReviews"]!["quickcut"]!.AsObject().Remove("reasons");
        node.Set("award/tiebreak", "[]");
        var errors = Files.ErrorsOf(node);
        Assert.Contains("reasons", errors.At("$.lowPriceReviews.quickcut.reasons").Reason);
        Assert.Contains("unknown member", errors.At("$.award.tiebreak").Reason);
    }

    [Fact]
    public void An_award_on_a_scale_without_points_is_refused_at_the_rating_scale()
    {
        var node = Sample().Set("ratingScale", "\"rating-5\"");
        node.Remove("ratings");
        node.Remove("moderation");
        node["award"]!["thresholds"]!.AsObject().Remove("minimumTerms");
        Assert.Contains("points", Files.ErrorsOf(node).At("$.ratingScale").Reason);
    }
}
