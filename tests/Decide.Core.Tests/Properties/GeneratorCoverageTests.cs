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
        Assert.All(Samples.Where(e => e.Options.Aggregation == AggregationRule.Geometric), e => Assert.All(e.RatingScale.Terms, t => Assert.True(t.Value.Lower > 0)));
        Assert.Equal(2, Samples.Select(e => e.Options.Ideal).Distinct().Count());
        Assert.Equal(2, Samples.Select(e => e.RatingScale.Name).Distinct().Count());
        Assert.Contains(Samples, e => e.Assessors.Select(a => a.Weight).Distinct().Count() > 1);
    }

    private static readonly Evaluation[] Panels = Enumerable.Range(0, 500).Select(PanelGenerator.Generate).ToArray();

    [Fact]
    public void Every_generated_panel_is_valid_and_reproducible()
    {
        Assert.All(Panels, e => Assert.Empty(EvaluationValidator.Validate(e)));
        Assert.Equal(PanelGenerator.Generate(7).Ratings, PanelGenerator.Generate(7).Ratings);
        Assert.Equal(PanelGenerator.Generate(7).Pairwise, PanelGenerator.Generate(7).Pairwise);
    }

    [Fact]
    public void Panels_reach_every_shape_the_format_allows()
    {
        Assert.Contains(Panels, e => e.Groups.Count == 2);
        Assert.Contains(Panels, e => e.Weighting == WeightingMethod.Pairwise && e.Groups.Count > 0);
        Assert.Contains(Panels, e => e.Weighting == WeightingMethod.Pairwise && e.Pairwise.Select(p => p.Assessor).Distinct().Count() < e.Assessors.Count);
        Assert.Contains(Panels, e => e.Weighting == WeightingMethod.Importance && e.ImportanceScale == PanelGenerator.WideImportance);
        Assert.Contains(Panels, e => e.Weighting == WeightingMethod.Importance && e.ImportanceScale == PanelGenerator.PositiveImportance && e.Options.Aggregation == AggregationRule.Geometric);
        Assert.Contains(Panels, e => e.Options.Aggregation == AggregationRule.Geometric && e.Criteria.Any(c => c.Kind == CriterionKind.Linguistic));
        Assert.Contains(Panels, e => e.Criteria.Any(c => c.Kind == CriterionKind.Linguistic && c.Direction == Direction.Cost));
        Assert.Contains(Panels, e => e.Criteria.Any(c => c.Kind == CriterionKind.Numeric && c.Direction == Direction.Cost));
        Assert.Contains(Panels, e => e.Gates.Any(g => !g.Passed));
        Assert.Contains(Panels, e => e.Moderated.Count > 0);
        Assert.Contains(Panels, e => e.Assessors.Any(a => a.Criteria is not null));
        Assert.Contains(Panels, e => e.Ratings.Any(r => r.Declined is not null));
        Assert.Equal(2, Panels.Select(e => e.Options.AcceptabilityWeights).Distinct().Count());
        Assert.Equal(2, Panels.Select(e => e.Options.Ideal).Distinct().Count());
    }

    [Fact]
    public void Weights_on_a_scale_reaching_10_are_brought_within_0_and_1_and_keep_their_shares()
    {
        // On the [0, 10] importance scale every aggregated weight's upper value is at least 3 before the bound, so the
        // bound must apply: the largest upper value becomes exactly 1, and the shares are the centroids' shares.
        var wide = Panels.Where(e => e.Weighting == WeightingMethod.Importance && e.ImportanceScale == PanelGenerator.WideImportance)
            .Select(DecisionEngine.Prepare).ToArray();
        Assert.True(wide.Length > 20, $"only {wide.Length} panels use the wide importance scale");
        Assert.All(wide, p => Assert.Equal(1, p.Weights.Max(w => w.Fuzzy.Upper), 12));
        Assert.All(wide, p => Assert.All(p.Weights, w => Assert.Equal(w.Fuzzy.Centroid / p.Weights.Sum(x => x.Fuzzy.Centroid), w.Crisp, 12)));
        Assert.All(Panels.Select(DecisionEngine.Prepare), p => Assert.All(p.Weights, w => Assert.InRange(w.Fuzzy.Upper, 0, 1)));
    }
}
