using Decide.Core.Scales;

namespace Decide.Interchange.Tests;

public sealed class BuiltInScaleTests
{
    public static TheoryData<string> Names() => [.. BuiltInScales.ByName.Keys];

    [Fact]
    public void The_documented_built_in_names_are_the_ones_the_engine_knows()
    {
        Assert.Equal(["chen-importance-7", "chen-rating-7", "importance-5", "pairwise-9", "points-0-10", "points-0-5", "rating-5"], BuiltInScales.ByName.Keys.Order());
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Every_built_in_scale_reads_by_name_as_the_rating_scale(string name)
    {
        var scale = BuiltInScales.ByName[name];
        var node = Files.Minimal().Set("ratingScale", $"\"{name}\"");
        node["criteria"]![0]!.AsObject().Remove("descriptors"); // written for the Chen codes
        foreach (var (assessor, alternatives) in node["ratings"]!.AsObject())
        {
            foreach (var (alternative, _) in alternatives!.AsObject().ToArray())
            {
                node.Set($"ratings/{assessor}/{alternative}/quality", $"\"{scale.Terms[^1].Code}\"");
            }
        }

        var read = EvaluationFileReader.Read(node.ToJsonString()).Evaluation;

        Assert.Same(scale, read.RatingScale);
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Every_built_in_scale_reads_by_name_as_the_importance_scale(string name)
    {
        var scale = BuiltInScales.ByName[name];
        var code = $"\"{scale.Terms[^1].Code}\"";
        var node = Files.Minimal().Set("importanceScale", $"\"{name}\"")
            .Set("importance/E1/quality", code).Set("importance/E1/price", code)
            .Set("importance/E2/quality", code).Set("importance/E2/price", code);

        var read = EvaluationFileReader.Read(node.ToJsonString()).Evaluation;

        Assert.Same(scale, read.ImportanceScale);
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Every_built_in_scale_reads_by_name_as_the_pairwise_scale(string name)
    {
        var scale = BuiltInScales.ByName[name];
        var node = Files.Pairwise().Set("pairwiseScale", $"\"{name}\"");
        foreach (var (_, judgements) in node["pairwise"]!.AsObject())
        {
            foreach (var judgement in judgements!.AsArray())
            {
                judgement!.AsObject().Remove("tfn");
                judgement["term"] = scale.Terms[^1].Code;
            }
        }

        var read = EvaluationFileReader.Read(node.ToJsonString()).Evaluation;

        Assert.Same(scale, read.PairwiseScale);
        Assert.All(read.Pairwise, j => Assert.Equal(scale.Terms[^1].Value, j.Value));
    }
}
