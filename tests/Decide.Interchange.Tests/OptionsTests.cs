using System.Text.Json;
using Decide.Core.Model;

namespace Decide.Interchange.Tests;

/// <summary>The robustness settings in <c>options</c>: divergence tolerance and the weights of the acceptability draws.</summary>
public sealed class OptionsTests
{
    [Fact]
    public void Divergence_tolerance_and_acceptability_weights_are_read()
    {
        var node = Files.Minimal().Set("options/divergenceTolerance", "3").Set("options/acceptabilityWeights", "\"uniform\"");

        var options = EvaluationFileReader.Read(node.ToJsonString()).Evaluation.Options;

        Assert.Equal(3, options.DivergenceTolerance);
        Assert.Equal(AcceptabilityWeights.Uniform, options.AcceptabilityWeights);
    }

    [Fact]
    public void Absent_robustness_options_take_the_documented_defaults_of_2_steps_and_fuzzy_weights()
    {
        var node = Files.Minimal();
        node["options"]!.AsObject().Remove("divergenceTolerance");
        node["options"]!.AsObject().Remove("acceptabilityWeights");

        var options = EvaluationFileReader.Read(node.ToJsonString()).Evaluation.Options;

        Assert.Equal(2, options.DivergenceTolerance);
        Assert.Equal(AcceptabilityWeights.Fuzzy, options.AcceptabilityWeights);
    }

    [Theory]
    [InlineData("0", 0)]
    [InlineData("4.0", 4)] // a whole number written with a fraction, which JSON Schema also counts as an integer
    public void A_whole_number_tolerance_is_accepted(string json, int expected)
    {
        var node = Files.Minimal().Set("options/divergenceTolerance", json);

        Assert.Equal(expected, EvaluationFileReader.Read(node.ToJsonString()).Evaluation.Options.DivergenceTolerance);
    }

    [Theory]
    [InlineData("-1", "0 or more")]
    [InlineData("1.5", "whole number")]
    [InlineData("1e12", "too large")]
    [InlineData("\"2\"", "expected a number")]
    [InlineData("true", "expected a number")]
    public void A_tolerance_that_is_not_a_whole_number_0_or_more_is_one_error_at_its_path(string json, string reason)
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("options/divergenceTolerance", json));

        Assert.Contains(reason, errors.At("$.options.divergenceTolerance").Reason);
        Assert.Single(errors); // the engine's own check of a negative tolerance is not repeated
    }

    [Fact]
    public void An_unknown_acceptability_weighting_names_the_allowed_values()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("options/acceptabilityWeights", "\"equal\""));

        Assert.Contains("\"fuzzy\", \"uniform\"", errors.At("$.options.acceptabilityWeights").Reason);
    }

    [Theory]
    [InlineData("-1")]
    [InlineData("1.5")]
    [InlineData("\"2\"")]
    public void The_schema_rejects_the_tolerances_the_reader_rejects(string json)
    {
        var node = Files.Minimal().Set("options/divergenceTolerance", json);

        Assert.False(Schemas.IsValid(Schemas.Evaluation, node.ToJsonString()));
        Assert.NotEmpty(Files.ErrorsOf(node));
    }

    [Fact]
    public void The_schema_rejects_an_unknown_acceptability_weighting()
    {
        var node = Files.Minimal().Set("options/acceptabilityWeights", "\"equal\"");

        Assert.False(Schemas.IsValid(Schemas.Evaluation, node.ToJsonString()));
    }

    [Fact]
    public void Non_default_robustness_options_survive_writing_and_reading_back()
    {
        var file = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample);
        var changed = file with
        {
            Evaluation = file.Evaluation with
            {
                Options = file.Evaluation.Options with { DivergenceTolerance = 0, AcceptabilityWeights = AcceptabilityWeights.Uniform },
            },
        };

        var json = EvaluationFileWriter.ToJson(changed);
        var again = EvaluationFileReader.Read(json).Evaluation.Options;

        Assert.Equal(changed.Evaluation.Options, again);
        Assert.Contains("\"divergenceTolerance\": 0", json);
        Assert.Contains("\"acceptabilityWeights\": \"uniform\"", json);
    }

    [Fact]
    public void The_writer_spells_out_the_default_robustness_options()
    {
        var options = JsonDocument.Parse(EvaluationFileWriter.ToJson(EvaluationFileReader.Read(Files.PairwiseText)))
            .RootElement.GetProperty("options");

        Assert.Equal(2, options.GetProperty("divergenceTolerance").GetInt32());
        Assert.Equal("fuzzy", options.GetProperty("acceptabilityWeights").GetString());
    }

    [Fact]
    public void A_file_carrying_its_summary_still_reads()
    {
        var node = Files.Minimal().Set("summary", """["Alder Facility Services ranks first."]""");

        Assert.Equal("Office cleaning contract 2027", EvaluationFileReader.Read(node.ToJsonString()).Evaluation.Title);
        Assert.True(Schemas.IsValid(Schemas.Evaluation, node.ToJsonString()));
    }
}
