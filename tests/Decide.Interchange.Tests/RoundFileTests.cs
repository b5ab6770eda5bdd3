using System.Text.Json.Nodes;
using Decide.Core;
using Decide.Core.Model;
using Decide.Interchange.Results;

namespace Decide.Interchange.Tests;

/// <summary>
/// A round in the portable file (samples/community-grants-round.json, invented): the design, the funding line and the
/// requested amounts read, write back to the same content, and every mistake is refused by its place.
/// </summary>
public sealed class RoundFileTests
{
    private static string SamplePath => RepositoryFiles.PathOf("samples", "community-grants-round.json");

    private static JsonObject Sample() => JsonNode.Parse(File.ReadAllText(SamplePath))!.AsObject();

    [Fact]
    public void The_grant_sample_reads_its_design_funding_line_amounts_and_topics()
    {
        var e = EvaluationFileReader.ReadFile(SamplePath).Evaluation;
        Assert.Equal((3, 6), (e.Reviews!.ReviewersPerApplication, e.Reviews.MaxLoad));
        Assert.All(e.Reviews.Assigned, r => Assert.Equal(6, r.Alternatives.Count));
        Assert.All(e.Alternatives, a => Assert.Equal(3, e.Reviews.ReviewersOf(a.Id).Count));
        Assert.Equal((60000, FundingRule.StopAtFirstUnaffordable, "GBP"), (e.Funding!.Budget, e.Funding.Rule, e.Funding.Currency));
        Assert.Equal(8000, e.Alternatives.Single(a => a.Id == "orchard").Requested);
        Assert.Equal("food", e.Alternatives.Single(a => a.Id == "orchard").Topic);
        Assert.Equal(["food", "health"], e.Assessors.Single(a => a.Id == "okafor").Topics);
        Assert.Equal(12 * 3 * 3, e.Ratings.Count); // twelve applications, three reviewers each, three criteria: no fake cells
    }

    [Fact]
    public void The_grant_sample_writes_back_to_the_same_content()
    {
        var first = EvaluationFileReader.ReadFile(SamplePath);
        var written = EvaluationFileWriter.ToJson(first);
        var again = EvaluationFileReader.Read(written);
        Assert.Equal(written, EvaluationFileWriter.ToJson(again));
        Assert.Equal(first.Evaluation.Funding, again.Evaluation.Funding);
        Assert.Equal(first.Evaluation.Reviews!.Assigned.Select(r => string.Join(",", r.Alternatives)), again.Evaluation.Reviews!.Assigned.Select(r => string.Join(",", r.Alternatives)));
    }

    [Fact]
    public void The_results_carry_the_funding_line_bands_and_alpha()
    {
        var file = EvaluationFileReader.ReadFile(SamplePath);
        var run = DecisionRun.Of(file.Evaluation, new Core.Robustness.RobustnessOptions { Draws = 2000 });
        var document = ResultsWriter.CreateDocument(run, file.Evaluation);
        var round = document.Round!;
        Assert.Equal(12, round.Order.Count);
        Assert.Equal(60000, round.Funding!.Budget);
        Assert.True(round.Funding.Spent <= 60000);
        Assert.NotEmpty(round.Bands);
        Assert.Equal(12, round.Bands.Sum(b => b.Alternatives.Count));
        Assert.Contains(document.Agreement!.Alpha!, a => a.Metric == "ordinal");
        Assert.Equal(6, document.Agreement.OutsideConcordance!.Count);
        Assert.Null(document.Agreement.KendallW);
    }

    [Theory]
    [InlineData("reviews/maxLoad", "2.5", "$.reviews.maxLoad", "a whole number from 1 to 10000; got 2.5")]
    [InlineData("reviews/reviewersPerApplication", "0", "$.reviews.reviewersPerApplication", "a whole number from 1 to 10000; got 0")]
    [InlineData("funding/rule", "\"pro-rata\"", "$.funding.rule", "\"pro-rata\"")]
    [InlineData("funding/budget", "-5", "$.funding.budget", "the budget is a positive amount")]
    [InlineData("reviews/assigned/okafor", "[\"orchard\", \"nowhere\", \"pond\", \"roof\", \"seedbank\", \"youth\"]", "$.reviews.assigned.okafor[1]", "unknown alternative \"nowhere\"")]
    public void A_mistake_in_a_round_is_refused_at_its_place(string at, string json, string path, string fragment)
    {
        var error = Files.ErrorsOf(Sample().Set(at, json)).At(path);
        Assert.Contains(fragment, error.Reason);
    }

    [Fact]
    public void A_rating_of_an_application_not_assigned_is_refused_at_the_cell()
    {
        var error = Files.ErrorsOf(Sample().Set("ratings/okafor/compost", "{\"MERIT\": \"G\"}")).At("$.ratings.okafor.compost.MERIT");
        Assert.Contains("is not assigned to reviewer \"okafor\"", error.Reason);
    }

    [Fact]
    public void A_funding_line_without_an_amount_requested_names_the_application()
    {
        var sample = Sample();
        sample["alternatives"]!.AsArray()[2]!.AsObject().Remove("requested");
        var error = Files.ErrorsOf(sample).At("$.alternatives[2].requested");
        Assert.Contains("\"Ashby Lane Seed Library\" needs the amount it requests", error.Reason);
    }
}

public sealed class RoundCalibrationFileTests
{
    [Fact]
    public void Calibration_reads_writes_back_and_appears_in_the_results_beside_the_raw_order()
    {
        var sample = JsonNode.Parse(File.ReadAllText(RepositoryFiles.PathOf("samples", "community-grants-round.json")))!.AsObject();
        sample["reviews"]!.AsObject()["calibration"] = "standardise";
        var file = EvaluationFileReader.Read(sample.ToJsonString());
        Assert.Equal(ReviewerCalibration.Standardise, file.Evaluation.Reviews!.Calibration);
        Assert.Contains("\"calibration\": \"standardise\"", EvaluationFileWriter.ToJson(file), StringComparison.Ordinal);

        var document = ResultsWriter.CreateDocument(DecisionRun.Of(file.Evaluation), file.Evaluation);
        var calibrated = document.Round!.Calibrated!;
        Assert.Equal(12, calibrated.Order.Count);
        Assert.Equal(6, calibrated.Reviewers.Count);
        Assert.Equal(document.Ranking.Select(r => r.Alternative), document.Round.Order); // the round follows the raw ranking
        Schemas.AssertValid(Schemas.Evaluation, EvaluationFileWriter.ToJson(file));
        Schemas.AssertValid(Schemas.Results, ResultsWriter.ToJson(document));
    }

    [Fact]
    public void An_unknown_calibration_is_refused_with_the_words_it_takes()
    {
        var sample = JsonNode.Parse(File.ReadAllText(RepositoryFiles.PathOf("samples", "community-grants-round.json")))!.AsObject();
        var error = Files.ErrorsOf(sample.Set("reviews/calibration", "\"z-scores\"")).At("$.reviews.calibration");
        Assert.Contains("\"standardise\"", error.Reason);
    }
}
