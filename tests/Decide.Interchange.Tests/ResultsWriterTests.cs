using System.Reflection;
using System.Text.Json;
using Decide.Core.Analysis;
using Decide.Core.Consistency;

namespace Decide.Interchange.Tests;

public sealed class ResultsWriterTests
{
    private static (EvaluationFile File, AnalysisResult Result, JsonElement Json) Analyse(string json)
    {
        var file = EvaluationFileReader.Read(json);
        var result = DecisionEngine.Analyse(file.Evaluation);
        var text = ResultsWriter.ToJson(result, file.Evaluation);
        return (file, result, JsonDocument.Parse(text).RootElement);
    }

    [Fact]
    public void The_document_names_its_format_title_engine_and_method()
    {
        var (_, _, json) = Analyse(Files.MinimalText);

        Assert.Equal("decide-results/1", json.GetProperty("format").GetString());
        Assert.Equal("Office cleaning contract 2027", json.GetProperty("title").GetString());
        Assert.Equal("Decide", json.GetProperty("engine").GetProperty("name").GetString());
        var coreVersion = typeof(DecisionEngine).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()!.InformationalVersion;
        Assert.Equal(coreVersion, json.GetProperty("engine").GetProperty("version").GetString());
        var method = json.GetProperty("method");
        Assert.Equal(("importance", "mean", "unit"),
            (method.GetProperty("weighting").GetString(), method.GetProperty("aggregation").GetString(), method.GetProperty("ideal").GetString()));
        Assert.False(method.TryGetProperty("randomIndexTable", out _)); // only meaningful for pairwise weighting
    }

    [Fact]
    public void The_ranking_is_best_first_with_names_and_exact_numbers()
    {
        var (file, result, json) = Analyse(Files.MinimalText);
        var ranking = json.GetProperty("ranking").EnumerateArray().ToArray();

        Assert.Equal(result.Ranking.Select(r => r.Alternative), ranking.Select(r => r.GetProperty("alternative").GetString()));
        Assert.Equal(ranking.Select(r => r.GetProperty("rank").GetInt32()).Order(), ranking.Select(r => r.GetProperty("rank").GetInt32()));
        Assert.Equal(file.Evaluation.Alternatives.Single(a => a.Id == result.Ranking[0].Alternative).Name, ranking[0].GetProperty("name").GetString());
        for (var i = 0; i < ranking.Length; i++)
        {
            Assert.Equal(result.Ranking[i].Closeness, ranking[i].GetProperty("closeness").GetDouble()); // exact: doubles round-trip
            Assert.Equal(result.Ranking[i].DPlus, ranking[i].GetProperty("dPlus").GetDouble());
            Assert.Equal(result.Ranking[i].Contributions.Count, ranking[i].GetProperty("contributions").GetArrayLength());
        }
    }

    [Fact]
    public void An_alternative_that_failed_a_gate_is_listed_with_the_gate()
    {
        var (_, _, json) = Analyse(Files.MinimalText);

        var excluded = Assert.Single(json.GetProperty("excluded").EnumerateArray());
        Assert.Equal("B3", excluded.GetProperty("alternative").GetString());
        Assert.Equal("Cedar Property Care", excluded.GetProperty("name").GetString());
        Assert.Equal(["insurance"], excluded.GetProperty("gates").EnumerateArray().Select(g => g.GetString()));
    }

    [Fact]
    public void Weights_carry_names_fuzzy_triples_and_crisp_shares_that_sum_to_one()
    {
        var (_, _, json) = Analyse(Files.MinimalText);
        var weights = json.GetProperty("weights").EnumerateArray().ToArray();

        Assert.Equal(["quality", "price"], weights.Select(w => w.GetProperty("criterion").GetString()));
        Assert.Equal("Annual price", weights[1].GetProperty("name").GetString());
        Assert.All(weights, w => Assert.Equal(3, w.GetProperty("fuzzy").GetArrayLength()));
        Assert.Equal(1, weights.Sum(w => w.GetProperty("crisp").GetDouble()), 12);
        Assert.All(weights, w => Assert.False(w.TryGetProperty("group", out _))); // nulls are left out
    }

    [Fact]
    public void Matrix_cells_record_raters_and_who_declined()
    {
        var (_, _, json) = Analyse(Files.MinimalText);

        var cell = json.GetProperty("matrix").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == "B2" && c.GetProperty("criterion").GetString() == "quality");
        Assert.Equal(1, cell.GetProperty("raters").GetInt32());
        var declined = Assert.Single(cell.GetProperty("declined").EnumerateArray());
        Assert.Equal("E2", declined.GetProperty("assessor").GetString());
        Assert.StartsWith("Declared a conflict", declined.GetProperty("reason").GetString());
    }

    [Fact]
    public void Member_names_are_camel_case()
    {
        var file = EvaluationFileReader.Read(Files.MinimalText);
        var text = ResultsWriter.ToJson(DecisionEngine.Analyse(file.Evaluation), file.Evaluation);

        Assert.Contains("\"dPlus\"", text);
        Assert.DoesNotContain("\"DPlus\"", text);
        Assert.DoesNotContain("\"Ranking\"", text);
    }

    [Fact]
    public void Pairwise_results_carry_consistency_per_matrix_and_group_weights()
    {
        var (_, result, json) = Analyse(Files.PairwiseText);

        Assert.Equal(RandomIndex.TableName, json.GetProperty("method").GetProperty("randomIndexTable").GetString());
        var consistency = json.GetProperty("consistency").EnumerateArray().ToArray();
        Assert.Equal(result.Consistency.Count, consistency.Length);
        var panelTop = consistency.Single(c => c.GetProperty("assessor").GetString() == "panel" && !c.TryGetProperty("group", out _));
        Assert.Equal(["tech", "service", "risk", "cost"], panelTop.GetProperty("items").EnumerateArray().Select(i => i.GetString()));
        Assert.Equal(4, panelTop.GetProperty("n").GetInt32());
        Assert.Equal(4, panelTop.GetProperty("weights").GetArrayLength());
        Assert.Contains(consistency, c => c.TryGetProperty("group", out var g) && g.GetString() == "tech");

        var coverage = json.GetProperty("weights").EnumerateArray().Single(w => w.GetProperty("criterion").GetString() == "coverage");
        Assert.Equal("tech", coverage.GetProperty("group").GetString());
        Assert.Equal(3, coverage.GetProperty("groupWeight").GetArrayLength());
        Assert.Equal(3, coverage.GetProperty("local").GetArrayLength());
    }

    [Fact]
    public void A_later_section_can_be_added_to_the_document_without_touching_the_rest()
    {
        var file = EvaluationFileReader.Read(Files.MinimalText);
        var document = ResultsWriter.CreateDocument(DecisionEngine.Analyse(file.Evaluation), file.Evaluation);

        var retitled = ResultsWriter.ToJson(document with { Title = "Renamed" });

        Assert.Contains("\"title\": \"Renamed\"", retitled);
        Assert.Equal(ResultsWriter.ToJson(document).Length - file.Evaluation.Title.Length + "Renamed".Length, retitled.Length);
    }
}
