using Decide.Core.Analysis;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Analysis;

/// <summary>The baselines the bad-input tests break must themselves be valid, or those tests prove nothing.</summary>
public sealed class ValidSampleTests
{
    [Fact]
    public void Sample_weighted_by_importance_is_valid() =>
        Assert.Empty(EvaluationValidator.Validate(SampleEvaluation.WithImportance()));

    [Fact]
    public void Sample_weighted_pairwise_is_valid() =>
        Assert.Empty(EvaluationValidator.Validate(SampleEvaluation.WithPairwise()));

    [Fact]
    public void Sample_with_a_group_is_valid() =>
        Assert.Empty(EvaluationValidator.Validate(SampleEvaluation.WithGroupedPairwise()));

    [Fact]
    public void Sample_is_analysed_and_ranks_every_supplier()
    {
        var result = DecisionEngine.Analyse(SampleEvaluation.WithImportance());
        Assert.Equal(["S1", "S2", "S3"], result.Ranking.Select(r => r.Alternative).Order());
        Assert.All(result.Ranking, r => Assert.InRange(r.Closeness, 0, 1));
    }
}
