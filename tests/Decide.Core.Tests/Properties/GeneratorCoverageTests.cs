using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Properties;

/// <summary>
/// The properties are only as good as the evaluations they see: these check that the generator is valid,
/// reproducible and reaches every shape it promises.
/// </summary>
public sealed class GeneratorCoverageTests
{
    private static readonly Evaluation[] Samples = Enumerable.Range(0, 500).Select(seed => EvaluationGenerator.Generate(seed)).ToArray();

    [Fact]
    public void Every_generated_evaluation_is_valid()
    {
        Assert.All(Samples, e => Assert.Empty(EvaluationValidator.Validate(e)));
    }

    [Fact]
    public void The_same_seed_gives_the_same_evaluation()
    {
        var a = EvaluationGenerator.Generate(42);
        var b = EvaluationGenerator.Generate(42);
        Assert.Equal(a.Ratings, b.Ratings);
        Assert.Equal(a.Values, b.Values);
        Assert.Equal(a.Assessors, b.Assessors);
        Assert.NotEqual(a.Ratings, EvaluationGenerator.Generate(43).Ratings);
    }

    [Fact]
    public void Sizes_span_the_promised_ranges()
    {
        Assert.Equal([2, 3, 4, 5, 6], Samples.Select(e => e.Alternatives.Count).Distinct().Order());
        Assert.Equal([1, 2, 3, 4, 5, 6], Samples.Select(e => e.Criteria.Count).Distinct().Order());
        Assert.Equal([1, 2, 3, 4, 5], Samples.Select(e => e.Assessors.Count).Distinct().Order());
    }

    [Fact]
    public void Criteria_kinds_options_and_declines_all_occur()
    {
        var criteria = Samples.SelectMany(e => e.Criteria).ToArray();
        Assert.Contains(criteria, c => c.Kind == CriterionKind.Linguistic && c.Direction == Direction.Benefit);
        Assert.Contains(criteria, c => c.Kind == CriterionKind.Numeric && c.Direction == Direction.Benefit);
        Assert.Contains(criteria, c => c.Kind == CriterionKind.Numeric && c.Direction == Direction.Cost);
        Assert.Contains(Samples, e => e.Criteria.Any(c => c.Kind == CriterionKind.Linguistic) && e.Criteria.Any(c => c.Kind == CriterionKind.Numeric));
        Assert.Contains(Samples, e => e.Ratings.Any(r => r.Declined is not null));
        Assert.Equal(2, Samples.Select(e => e.Options.Aggregation).Distinct().Count());
        Assert.Equal(2, Samples.Select(e => e.Options.Ideal).Distinct().Count());
        Assert.Equal(2, Samples.Select(e => e.RatingScale.Name).Distinct().Count());
        Assert.Contains(Samples, e => e.Assessors.Select(a => a.Weight).Distinct().Count() > 1);
    }
}
