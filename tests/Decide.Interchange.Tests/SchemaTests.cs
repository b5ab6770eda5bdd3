using System.Text.Json;
using Decide.Core.Analysis;
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

        var results = ResultsWriter.ToJson(DecisionEngine.Analyze(read.Evaluation), read.Evaluation);

        AssertValid(Schemas.Results, results);
    }

    [Fact]
    public void Results_of_a_pairwise_evaluation_match_the_results_schema()
    {
        var read = EvaluationFileReader.Read(Files.PairwiseText);

        AssertValid(Schemas.Results, ResultsWriter.ToJson(DecisionEngine.Analyze(read.Evaluation), read.Evaluation));
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
        var results = System.Text.Json.Nodes.JsonNode.Parse(ResultsWriter.ToJson(DecisionEngine.Analyze(read.Evaluation), read.Evaluation))!.AsObject();
        results.Remove("ranking");

        Assert.False(Schemas.Results.Evaluate(JsonDocument.Parse(results.ToJsonString()).RootElement).IsValid);
    }

    private static void AssertValid(JsonSchema schema, string json) => Schemas.AssertValid(schema, json);
}
