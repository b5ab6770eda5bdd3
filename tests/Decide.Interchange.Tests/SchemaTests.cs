using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Json.Schema;

namespace Decide.Interchange.Tests;

/// <summary>The published JSON Schemas agree with the examples, the samples and what the writers produce.</summary>
public sealed class SchemaTests
{
    /// <summary>The documented example and every file in samples/, as paths relative to the repository.</summary>
    public static TheoryData<string> EvaluationFiles() => [.. EvaluationFilePaths()];

    private static List<string> EvaluationFilePaths()
    {
        var files = new List<string> { Path.Combine("docs", "examples", "minimal.json") };
        var samples = RepositoryFiles.PathOf("samples");
        if (Directory.Exists(samples))
        {
            foreach (var file in Directory.EnumerateFiles(samples, "*.json").Order(StringComparer.Ordinal))
            {
                files.Add(Path.GetRelativePath(RepositoryFiles.Root, file));
            }
        }

        return files;
    }

    [Fact]
    public void The_files_checked_include_the_minimal_example_so_the_check_is_never_empty()
    {
        var files = EvaluationFilePaths();

        Assert.Contains(Path.Combine("docs", "examples", "minimal.json"), files);
        Assert.All(files, f => Assert.True(File.Exists(RepositoryFiles.PathOf(f)), f));
    }

    [Theory]
    [MemberData(nameof(EvaluationFiles))]
    public void Every_example_and_sample_matches_the_evaluation_schema(string file)
    {
        AssertValid(Schemas.Evaluation, File.ReadAllText(RepositoryFiles.PathOf(file)));
    }

    [Theory]
    [MemberData(nameof(EvaluationFiles))]
    public void Every_example_and_sample_reads_and_analyses_and_its_results_match_the_results_schema(string file)
    {
        var read = EvaluationFileReader.ReadFile(RepositoryFiles.PathOf(file));

        // The whole run, so that a points award's section is checked too.
        var results = ResultsWriter.ToJson(ResultsWriter.CreateDocument(DecisionRun.Of(read.Evaluation), read.Evaluation));

        AssertValid(Schemas.Results, results);
    }

    [Theory]
    [MemberData(nameof(EvaluationFiles))]
    public void Results_with_robustness_of_every_example_and_sample_match_the_results_schema(string file)
    {
        var read = EvaluationFileReader.ReadFile(RepositoryFiles.PathOf(file));

        AssertValid(Schemas.Results, WithRobustness(read));
    }

    [Fact]
    public void Results_with_robustness_of_a_pairwise_evaluation_with_uniform_weights_match_the_results_schema()
    {
        var read = EvaluationFileReader.Read(Files.Pairwise().Set("options/acceptabilityWeights", "\"uniform\"").ToJsonString());

        var json = WithRobustness(read);

        AssertValid(Schemas.Results, json);
        Assert.Contains("\"acceptabilityWeights\": \"uniform\"", json);
    }

    [Theory]
    [InlineData("agreement", "kendallW")]
    [InlineData("agreement", "cells")]
    [InlineData("sensitivity", "sweeps")]
    [InlineData("sensitivity", "seed")]
    public void The_results_schema_rejects_robustness_sections_missing_a_fixed_member(string section, string member)
    {
        var results = JsonNode.Parse(WithRobustness(EvaluationFileReader.Read(Files.PairwiseText)))!.AsObject();
        results[section]!.AsObject().Remove(member);

        Assert.False(Schemas.IsValid(Schemas.Results, results.ToJsonString()));
    }

    [Fact]
    public void The_results_schema_rejects_an_unknown_member_in_a_robustness_section_and_a_reversal_without_its_pair()
    {
        var json = WithRobustness(EvaluationFileReader.ReadFile(RepositoryFiles.PathOf("samples", "bus-stop-displays-importance.json")));
        var unknown = JsonNode.Parse(json)!.AsObject();
        unknown["agreement"]!["allCells"] = new JsonArray();
        var noPair = JsonNode.Parse(json)!.AsObject();
        var reversal = noPair["sensitivity"]!["sweeps"]!.AsArray().Select(s => s!["reversals"]!.AsArray()).First(r => r.Count > 0)[0]!.AsObject();
        reversal.Remove("pair");

        Assert.False(Schemas.IsValid(Schemas.Results, unknown.ToJsonString()));
        Assert.False(Schemas.IsValid(Schemas.Results, noPair.ToJsonString()));
    }

    [Theory]
    [InlineData("acceptability", "holistic")]
    [InlineData("centralWeights", "confidence")]
    public void The_results_schema_requires_the_holistic_index_and_the_confidence_factor(string list, string member)
    {
        var results = JsonNode.Parse(WithRobustness(EvaluationFileReader.Read(Files.PairwiseText)))!.AsObject();
        Assert.True(Schemas.IsValid(Schemas.Results, results.ToJsonString()));
        results["sensitivity"]![list]!.AsArray()[0]!.AsObject().Remove(member);

        Assert.False(Schemas.IsValid(Schemas.Results, results.ToJsonString()));
    }

    private static string WithRobustness(EvaluationFile read) =>
        ResultsWriter.ToJson(ResultsWriter.CreateDocument(DecisionRun.Of(read.Evaluation, new RobustnessOptions(Draws: 300, Seed: 1)), read.Evaluation));

    [Fact]
    public void Results_of_a_pairwise_evaluation_match_the_results_schema()
    {
        var read = EvaluationFileReader.Read(Files.PairwiseText);

        AssertValid(Schemas.Results, ResultsWriter.ToJson(DecisionEngine.Analyse(read.Evaluation), read.Evaluation));
    }

    [Fact]
    public void What_the_evaluation_writer_produces_matches_the_evaluation_schema()
    {
        AssertValid(Schemas.Evaluation, Files.PairwiseText);
        AssertValid(Schemas.Evaluation, EvaluationFileWriter.ToJson(EvaluationFileReader.Read(Files.PairwiseText)));
        AssertValid(Schemas.Evaluation, EvaluationFileWriter.ToJson(EvaluationFileReader.Read(Files.MinimalText)));
    }

    [Theory]
    [InlineData("titel", "\"typo\"")]
    [InlineData("format", "\"decide-evaluation/2\"")]
    [InlineData("ratings/E1/B2/quality", """{"term": "G", "declined": "both given"}""")]
    [InlineData("criteria/0/kind", "\"Linguistic\"")]
    [InlineData("ratingScale", "\"chen-rating-9\"")]
    [InlineData("values/B1/price", "\"NaN\"")]
    public void The_evaluation_schema_rejects_what_the_reader_rejects_for_its_shape(string at, string json)
    {
        var node = Files.Minimal().Set(at, json);

        Assert.False(Schemas.Evaluation.Evaluate(JsonDocument.Parse(node.ToJsonString()).RootElement).IsValid);
        Assert.NotEmpty(Files.ErrorsOf(node));
    }

    [Fact]
    public void The_results_schema_rejects_a_document_without_a_ranking()
    {
        var read = EvaluationFileReader.Read(Files.MinimalText);
        var results = JsonNode.Parse(ResultsWriter.ToJson(DecisionEngine.Analyse(read.Evaluation), read.Evaluation))!.AsObject();
        results.Remove("ranking");

        Assert.False(Schemas.Results.Evaluate(JsonDocument.Parse(results.ToJsonString()).RootElement).IsValid);
    }

    private static void AssertValid(JsonSchema schema, string json) => Schemas.AssertValid(schema, json);
}
