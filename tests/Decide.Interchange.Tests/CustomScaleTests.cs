using Decide.Core.Fuzzy;
using Decide.Core.Scales;

namespace Decide.Interchange.Tests;

public sealed class CustomScaleTests
{
    [Fact]
    public void A_custom_scale_is_read_with_its_name_range_terms_and_descriptors()
    {
        var scale = EvaluationFileReader.Read(Files.PairwiseText).Evaluation.RatingScale;

        Assert.Equal("house-rating-4", scale.Name);
        Assert.Equal((1.0, 10.0), (scale.Minimum, scale.Maximum));
        Assert.Equal(["W", "A", "S", "E"], scale.Terms.Select(t => t.Code));
        Assert.Equal(new Tfn(4, 7, 10), scale[2].Value);
        Assert.Equal("Falls short of the requirement.", scale[0].Descriptor);
    }

    [Theory]
    [InlineData("ratingScale", 0.0, 10.0)]
    [InlineData("importanceScale", 0.0, 1.0)]
    [InlineData("pairwiseScale", 1.0 / 9, 9.0)]
    public void A_custom_scale_without_a_range_takes_its_roles_default(string role, double minimum, double maximum)
    {
        var builtIn = role switch
        {
            "ratingScale" => BuiltInScales.ChenRating7,
            "importanceScale" => BuiltInScales.ChenImportance7,
            _ => BuiltInScales.Pairwise9,
        };
        var terms = string.Join(", ", builtIn.Terms.Select(t =>
            $$"""{"code": "{{t.Code}}", "label": "{{t.Label}}", "tfn": [{{t.Value.Lower:R}}, {{t.Value.Middle:R}}, {{t.Value.Upper:R}}]}"""));
        var node = Files.Minimal().Set(role, $$"""{"name": "same-terms", "terms": [{{terms}}]}""");

        var e = EvaluationFileReader.Read(node.ToJsonString()).Evaluation;
        var scale = role switch
        {
            "ratingScale" => e.RatingScale,
            "importanceScale" => e.ImportanceScale,
            _ => e.PairwiseScale,
        };

        Assert.Equal("same-terms", scale.Name);
        Assert.Equal((minimum, maximum), (scale.Minimum, scale.Maximum));
    }

    [Fact]
    public void A_duplicate_code_is_reported_at_the_term_and_names_the_code()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/terms/3/code", "\"w\""));

        var reason = errors.At("$.ratingScale.terms[3].code").Reason;
        Assert.Contains("\"w\"", reason);
        Assert.Contains("already used", reason);
    }

    [Fact]
    public void A_term_outside_the_range_is_reported_at_its_tfn_and_names_the_term()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/terms/3/tfn", "[7, 10, 12]"));

        var reason = errors.At("$.ratingScale.terms[3].tfn").Reason;
        Assert.Contains("\"E\"", reason);
        Assert.Contains("outside", reason);
    }

    [Fact]
    public void Terms_out_of_order_are_reported_at_the_later_term()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/terms/2/tfn", "[1, 2, 3]"));

        Assert.Contains("larger middle value than \"A\"", errors.At("$.ratingScale.terms[2].tfn").Reason);
    }

    [Fact]
    public void A_missing_label_is_required()
    {
        var node = Files.Pairwise();
        node["ratingScale"]!["terms"]![1]!.AsObject().Remove("label");

        Assert.StartsWith("required", Files.ErrorsOf(node).At("$.ratingScale.terms[1].label").Reason);
    }

    [Fact]
    public void Problems_after_an_unreadable_term_keep_their_own_index()
    {
        var node = Files.Pairwise()
            .Set("ratingScale/terms/1/tfn", "\"wide\"")
            .Set("ratingScale/terms/3/code", "\"S\"");

        var errors = Files.ErrorsOf(node);

        Assert.Contains("expected a triangular fuzzy number", errors.At("$.ratingScale.terms[1].tfn").Reason);
        Assert.Contains("\"S\" is already used", errors.At("$.ratingScale.terms[3].code").Reason);
    }

    [Fact]
    public void A_custom_scale_may_not_pass_itself_off_as_a_built_in_one()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/name", "\"chen-rating-7\""));

        Assert.Contains("built-in scale", errors.At("$.ratingScale.name").Reason);
    }

    [Fact]
    public void An_unknown_scale_name_lists_the_built_in_scales()
    {
        var errors = Files.ErrorsOf(Files.Minimal().Set("ratingScale", "\"chen-rating-9\""));

        var reason = errors.At("$.ratingScale").Reason;
        Assert.Contains("unknown scale \"chen-rating-9\"", reason);
        Assert.All(BuiltInScales.ByName.Keys, name => Assert.Contains(name, reason));
    }

    [Fact]
    public void A_range_of_one_number_is_reported()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/range", "[10]"));

        Assert.Contains("two numbers", errors.At("$.ratingScale.range").Reason);
    }

    [Fact]
    public void A_range_upside_down_is_reported_by_the_scale_rules()
    {
        var errors = Files.ErrorsOf(Files.Pairwise().Set("ratingScale/range", "[10, 1]"));

        Assert.Contains("the first below the second", errors.At("$.ratingScale.range").Reason);
    }
}
