using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Scales;

namespace Decide.Interchange.Tests;

/// <summary>Moderated values in the evaluation file (<c>moderation</c>) and in the results (<c>matrix[].moderated</c>).</summary>
public sealed class ModerationTests
{
    private const string Reason = "Both evaluators accept the audit routine; the named supervisors cover the day shifts only.";

    /// <summary>The minimal example with B1's quality moderated to <paramref name="term"/>.</summary>
    private static JsonObject WithModeration(string term = "VG", string agreedBy = """, "agreedBy": ["E1", "E2"]""") =>
        Files.Minimal().Set("moderation", "{\"B1\": {\"quality\": {\"term\": \"" + term + "\", \"reason\": \"" + Reason + "\"" + agreedBy + "}}}");

    /// <summary>The minimal example as text with <paramref name="moderation"/> (raw JSON) inserted before <c>values</c>.</summary>
    private static string WithRawModeration(string moderation) =>
        Files.MinimalText.Replace("\"values\": {", $"\"moderation\": {moderation},\n  \"values\": {{", StringComparison.Ordinal);

    [Fact]
    public void A_moderated_value_is_read_with_its_term_reason_and_who_agreed()
    {
        var file = EvaluationFileReader.Read(WithModeration().ToJsonString());

        var moderated = Assert.Single(file.Evaluation.Moderated);
        Assert.Equal(("B1", "quality", "VG", Reason), (moderated.Alternative, moderated.Criterion, moderated.Term, moderated.Reason));
        Assert.Equal(["E1", "E2"], moderated.AgreedBy!);
        Assert.Equal(2, file.Evaluation.Ratings.Count(r => r.Alternative == "B1" && r.Criterion == "quality")); // the ratings stay
    }

    [Fact]
    public void A_moderated_value_without_agreed_by_reads_as_not_recorded()
    {
        var file = EvaluationFileReader.Read(WithModeration(agreedBy: "").ToJsonString());

        Assert.Null(Assert.Single(file.Evaluation.Moderated).AgreedBy);
    }

    [Fact]
    public void A_file_without_moderation_reads_with_none()
    {
        Assert.Empty(EvaluationFileReader.Read(Files.MinimalText).Evaluation.Moderated);
    }

    [Fact]
    public void Moderation_is_written_and_reads_back_the_same()
    {
        var original = EvaluationFileReader.Read(WithModeration().ToJsonString());

        var json = EvaluationFileWriter.ToJson(original);
        var again = EvaluationFileReader.Read(json);

        ContentAssert.Same(original, again);
        var written = JsonNode.Parse(json)!["moderation"]!["B1"]!["quality"]!;
        Assert.Equal("VG", written["term"]!.GetValue<string>());
        Assert.Equal(Reason, written["reason"]!.GetValue<string>());
        Assert.Equal(["E1", "E2"], written["agreedBy"]!.AsArray().Select(a => a!.GetValue<string>()));
        Assert.Equal(json, EvaluationFileWriter.ToJson(again));
    }

    [Fact]
    public void A_model_built_in_code_keeps_the_difference_between_nobody_recorded_and_an_empty_list_of_who_agreed()
    {
        var evaluation = EvaluationFileReader.Read(Files.PairwiseText).Evaluation with
        {
            Moderated =
            [
                new ModeratedRating("S1", "coverage", "S", "Agreed after the site visit."),
                new ModeratedRating("S3", "risk", "A", "Agreed on the delivery plan, p. 12.", []),
                new ModeratedRating("S1", "security", "E", "Certificate checked by the chair.", ["E1"]),
            ],
        };

        var json = EvaluationFileWriter.ToJson(evaluation);
        var again = EvaluationFileReader.Read(json).Evaluation;

        ContentAssert.Same(evaluation, again);
        Assert.Null(again.Moderated.Single(m => m.Criterion == "coverage").AgreedBy);
        Assert.Empty(again.Moderated.Single(m => m.Criterion == "risk").AgreedBy!);
        Schemas.AssertValid(Schemas.Evaluation, json);
    }

    [Fact]
    public void A_file_with_moderation_matches_the_evaluation_schema()
    {
        Schemas.AssertValid(Schemas.Evaluation, WithModeration().ToJsonString());
        Schemas.AssertValid(Schemas.Evaluation, WithModeration(agreedBy: "").ToJsonString());
    }

    [Theory]
    [InlineData("""{"term": "G"}""")]
    [InlineData("""{"term": "G", "reason": 3}""")]
    [InlineData("""{"term": "G", "reason": "r", "note": "x"}""")]
    [InlineData("""{"term": "G", "reason": "r", "agreedBy": "E1"}""")]
    [InlineData("\"G\"")]
    public void The_evaluation_schema_rejects_a_moderated_value_the_reader_rejects_for_its_shape(string json)
    {
        var node = Files.Minimal().Set("moderation", $$$"""{"B1": {"quality": {{{json}}}}}""");

        Assert.False(Schemas.IsValid(Schemas.Evaluation, node.ToJsonString()));
        Assert.NotEmpty(Files.ErrorsOf(node));
    }

    [Theory]
    [InlineData("\"VG\"", "$.moderation", "expected an object {alternativeId: {criterionId: moderated value}}, got a string")]
    [InlineData("""{"B1": ["VG"]}""", "$.moderation.B1", "expected an object {criterionId: moderated value}, got an array")]
    [InlineData("""{"B1": {"quality": "VG"}}""", "$.moderation.B1.quality", "expected a moderated value {\"term\", \"reason\", \"agreedBy\"}, got a string")]
    [InlineData("""{"B1": {"quality": {"reason": "r"}}}""", "$.moderation.B1.quality.term", "required: the term of the rating scale")]
    [InlineData("""{"B1": {"quality": {"term": 6, "reason": "r"}}}""", "$.moderation.B1.quality.term", "expected a string, got a number (6)")]
    [InlineData("""{"B1": {"quality": {"term": "VG"}}}""", "$.moderation.B1.quality.reason", "required: why the panel agreed")]
    [InlineData("""{"B1": {"quality": {"term": "VG", "reason": null}}}""", "$.moderation.B1.quality.reason", "expected a string, got null")]
    [InlineData("""{"B1": {"quality": {"term": "VG", "reason": "r", "agreedBy": "E1"}}}""", "$.moderation.B1.quality.agreedBy", "expected an array, got a string")]
    [InlineData("""{"B1": {"quality": {"term": "VG", "reason": "r", "agreedBy": ["E1", 2]}}}""", "$.moderation.B1.quality.agreedBy[1]", "expected a string, got a number (2)")]
    [InlineData("""{"B1": {"quality": {"term": "VG", "reason": "r", "agredBy": ["E1"]}}}""", "$.moderation.B1.quality.agredBy", "unknown member \"agredBy\"; expected one of term, reason, agreedBy")]
    [InlineData("""{"B1": {"quality": {"term": "Great", "reason": "r"}}}""", "$.moderation.B1.quality.term", "unknown term \"Great\"; the rating scale has VP, P, MP, F, MG, G, VG")]
    [InlineData("""{"B1": {"quality": {"term": "VG", "reason": "  "}}}""", "$.moderation.B1.quality.reason", "needs the reason")]
    [InlineData("""{"B1": {"quality": {"term": "VG", "reason": "r", "agreedBy": ["E9"]}}}""", "$.moderation.B1.quality.agreedBy", "unknown assessor \"E9\"")]
    [InlineData("""{"B9": {"quality": {"term": "VG", "reason": "r"}}}""", "$.moderation.B9", "unknown alternative \"B9\"")]
    [InlineData("""{"B1": {"colour": {"term": "VG", "reason": "r"}}}""", "$.moderation.B1.colour", "unknown criterion \"colour\"")]
    [InlineData("""{"B1": {"price": {"term": "VG", "reason": "r"}}}""", "$.moderation.B1.price", "only linguistic ratings are moderated")]
    public void Bad_moderation_is_reported_alone_at_its_place(string moderation, string path, string reason)
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("moderation", moderation));

        var error = Assert.Single(errors);
        Assert.Equal(path, error.Path);
        Assert.Contains(reason, error.Reason);
    }

    [Fact]
    public void A_cell_given_twice_under_moderation_is_reported_at_the_second()
    {
        var errors = Files.ErrorsOf(WithRawModeration(
            """{"B1": {"quality": {"term": "VG", "reason": "r"}, "quality": {"term": "G", "reason": "s"}}}"""));

        var error = Assert.Single(errors);
        Assert.Equal("$.moderation.B1.quality", error.Path);
        Assert.Contains("given twice", error.Reason);
    }

    [Fact]
    public void A_member_given_twice_in_a_moderated_value_is_reported()
    {
        var errors = Files.ErrorsOf(WithRawModeration("""{"B1": {"quality": {"term": "VG", "term": "G", "reason": "r"}}}"""));

        Assert.Contains("given twice", Assert.Single(errors).Reason);
        Assert.Equal("$.moderation.B1.quality.term", errors[0].Path);
    }

    [Fact]
    public void A_moderated_term_is_not_checked_against_a_rating_scale_that_could_not_be_read()
    {
        var errors = Files.ErrorsOf(WithModeration().Set("ratingScale", "\"chen-rating-9\""));

        Assert.Equal("$.ratingScale", Assert.Single(errors).Path);
    }

    [Fact]
    public void A_cell_everyone_declined_is_ranked_on_its_moderated_term()
    {
        var declined = Files.Minimal().Set("ratings/E1/B2/quality", """{"declined": "Recused."}""");
        Assert.Contains("nobody rated", Files.ErrorsOf(declined.DeepClone()).At("$.ratings.*.B2.quality").Reason);

        var file = EvaluationFileReader.Read(declined.Set("moderation", """{"B2": {"quality": {"term": "MG", "reason": "Agreed from the interview notes."}}}""").ToJsonString());

        Assert.Equal(2, DecisionEngine.Analyse(file.Evaluation).Ranking.Count);
    }

    [Fact]
    public void An_unreadable_moderated_value_of_a_cell_everyone_declined_is_not_also_reported_as_nobody_rated()
    {
        var node = Files.Minimal()
            .Set("ratings/E1/B2/quality", """{"declined": "Recused."}""")
            .Set("moderation", """{"B2": {"quality": {"reason": "Agreed from the interview notes."}}}""");

        Assert.Equal("$.moderation.B2.quality.term", Assert.Single(Files.ErrorsOf(node)).Path);
    }

    [Fact]
    public void The_results_name_the_moderated_term_of_a_moderated_cell_only()
    {
        var file = EvaluationFileReader.Read(WithModeration("MP").ToJsonString());
        var json = JsonDocument.Parse(ResultsWriter.ToJson(DecisionEngine.Analyse(file.Evaluation), file.Evaluation)).RootElement;

        var cells = json.GetProperty("matrix").EnumerateArray().ToArray();
        var cell = cells.Single(c => c.GetProperty("alternative").GetString() == "B1" && c.GetProperty("criterion").GetString() == "quality");
        Assert.Equal("MP", cell.GetProperty("moderated").GetString());
        Assert.Equal(BuiltInScales.ChenRating7.Terms.Single(t => t.Code == "MP").Value.ToArray(),
            cell.GetProperty("aggregated").EnumerateArray().Select(x => x.GetDouble()));
        Assert.Equal(2, cell.GetProperty("raters").GetInt32()); // both ratings are still counted
        Assert.All(cells.Where(c => !c.Equals(cell)), c => Assert.False(c.TryGetProperty("moderated", out _)));
    }

    [Fact]
    public void Moderating_a_cell_down_changes_the_ranking_in_the_results()
    {
        // B1 leads the unmoderated example on quality (E1 G, E2 VG against B2's MG); moderated to VP it must fall back.
        var plain = DecisionEngine.Analyse(EvaluationFileReader.Read(Files.MinimalText).Evaluation);
        var moderated = DecisionEngine.Analyse(EvaluationFileReader.Read(WithModeration("VP").ToJsonString()).Evaluation);

        var before = plain.Ranking.Single(r => r.Alternative == "B1").Closeness;
        var after = moderated.Ranking.Single(r => r.Alternative == "B1").Closeness;
        Assert.True(after < before, $"closeness of B1 {after} is not below {before}");
    }

    [Fact]
    public void Results_of_an_evaluation_with_a_moderated_cell_match_the_results_schema_with_and_without_robustness()
    {
        var file = EvaluationFileReader.Read(WithModeration().ToJsonString());
        var prepared = DecisionEngine.Prepare(file.Evaluation);
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(Draws: 200, Seed: 1));

        var plain = ResultsWriter.ToJson(result, file.Evaluation);
        var full = ResultsWriter.ToJson(result, file.Evaluation, robustness);

        Assert.Contains("\"moderated\": \"VG\"", plain);
        Schemas.AssertValid(Schemas.Results, plain);
        Schemas.AssertValid(Schemas.Results, full);
        // E2 agreed the moderated value and may still be left out (without E1, B2's quality has no rating at all).
        Assert.Null(robustness.Sensitivity.LeaveOneOut.Single(l => l.Assessor == "E2").Problem);
    }

    [Fact]
    public void The_results_schema_rejects_a_moderated_term_that_is_not_a_string()
    {
        var file = EvaluationFileReader.Read(WithModeration().ToJsonString());
        var results = JsonNode.Parse(ResultsWriter.ToJson(DecisionEngine.Analyse(file.Evaluation), file.Evaluation))!;
        results["matrix"]![0]!["moderated"] = 5;

        Assert.False(Schemas.IsValid(Schemas.Results, results.ToJsonString()));
    }
}
