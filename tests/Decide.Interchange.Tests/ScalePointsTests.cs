using System.Text.Json;
using Decide.Core;
using Decide.Core.Fuzzy;
using Decide.Core.Scales;

namespace Decide.Interchange.Tests;

/// <summary>Points beside each rating term (for a published points award): read, written back, and refused by place when inconsistent.</summary>
public sealed class ScalePointsTests
{
    private const string Scored = """
        {"name":"points-0-5-house","range":[0,5],"terms":[
          {"code":"U","label":"Unacceptable","tfn":[0,0,1],"points":0},
          {"code":"A","label":"Adequate","tfn":[1,2.5,4],"points":2.5},
          {"code":"E","label":"Excellent","tfn":[4,5,5],"points":5}]}
        """;

    [Fact]
    public void Points_are_read_beside_each_terms_triangle_and_written_back_unchanged()
    {
        using var json = JsonDocument.Parse(Scored);
        var scale = EvaluationFileReader.ReadScale(json.RootElement, "ratingScale");
        Assert.Equal([0, 2.5, 5], scale.Terms.Select(t => t.Points!.Value));
        Assert.Equal(new Tfn(1, 2.5, 4), scale.Terms[1].Value);

        // Through a whole plan: written by the file writer, read again, the same terms (points included).
        var plan = EvaluationFileReader.ReadPlan(System.Text.Encoding.UTF8.GetBytes(
            $$"""{"format":"decide-evaluation/1","title":"Points","ratingScale":{{Scored}},"criteria":[{"id":"q","name":"Quality"}]}"""));
        var again = EvaluationFileReader.ReadPlan(System.Text.Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(plan)));
        Assert.Equal(plan.Evaluation.RatingScale.Terms, again.Evaluation.RatingScale.Terms);
    }

    [Fact]
    public void A_scale_without_points_reads_as_before()
    {
        Assert.All(BuiltInScales.ChenRating7.Terms, t => Assert.Null(t.Points));
        Assert.DoesNotContain("points", EvaluationFileWriter.ToJson(EvaluationFileReader.ReadPlan(System.Text.Encoding.UTF8.GetBytes(
            """{"format":"decide-evaluation/1","title":"Words only","criteria":[{"id":"q","name":"Quality"}]}"""))), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("""{"code":"U","label":"Unacceptable","tfn":[0,0,1]}""", "$.ratingScale.terms[0].points", "give every term its points, or none")]
    [InlineData("""{"code":"U","label":"Unacceptable","tfn":[0,0,1],"points":3}""", "$.ratingScale.terms[1].points", "may not decrease")]
    [InlineData("""{"code":"U","label":"Unacceptable","tfn":[0,0,1],"points":-1}""", "$.ratingScale.terms[0].points", "zero or more")]
    public void Inconsistent_points_are_refused_at_the_term_with_the_reason(string first, string path, string reason)
    {
        using var json = JsonDocument.Parse($$"""
            {"name":"house","range":[0,5],"terms":[{{first}},
              {"code":"A","label":"Adequate","tfn":[1,2.5,4],"points":2.5},
              {"code":"E","label":"Excellent","tfn":[4,5,5],"points":5}]}
            """);
        var errors = Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.ReadScale(json.RootElement, "ratingScale")).Errors;
        Assert.Contains(errors, e => e.Path == path && e.Reason.Contains(reason, StringComparison.Ordinal));
    }
}
