using Decide.Core.Consistency;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Consistency;

[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class ConsistentMatrixTests
{
    [Property]
    public void A_consistent_matrix_has_ratio_zero_and_returns_its_weights(PositiveWeights weights)
    {
        var n = weights.Values.Length;
        var report = PairwiseConsistency.Analyse(ReciprocalMatrices.Consistent(weights.Values), ReciprocalMatrices.Items(n));

        Assert.InRange(report.Ratio, 0, 1e-12);
        Assert.InRange(report.ConsistencyIndex, 0, 1e-12);
        Assert.Equal(n, report.LambdaMax, 1e-10);
        Assert.InRange(report.Gci, 0, 1e-12);
        Assert.True(report.Acceptable && report.GciAcceptable);
        Assert.Empty(report.WorstJudgements);
        Assert.Empty(report.IntransitiveTriads);
        var expected = weights.Normalised;
        for (var i = 0; i < n; i++)
        {
            Assert.Equal(expected[i], report.Eigenvector[i], 1e-12);
        }
    }

    [Fact]
    public void A_single_item_is_consistent()
    {
        var report = PairwiseConsistency.Analyse([1], ["A"]);
        Assert.True(report.Acceptable);
        Assert.Equal(0, report.Ratio);
        Assert.Equal([1.0], report.Eigenvector);
    }

    [Theory]
    [InlineData(9)]
    [InlineData(1.0 / 7)]
    [InlineData(1)]
    public void Two_items_are_always_consistent(double a12)
    {
        var report = PairwiseConsistency.Analyse([1, a12, 1 / a12, 1], ["A", "B"]);
        Assert.True(report.Acceptable);
        Assert.True(report.GciAcceptable);
        Assert.Equal(0, report.Ratio);
        Assert.Equal(0, report.Gci);
        Assert.Equal(a12 / (1 + a12), report.Eigenvector[0], 1e-12);
    }

    [Fact]
    public void A_matrix_that_is_not_square_or_not_positive_is_refused()
    {
        Assert.Throws<ArgumentException>(() => PairwiseConsistency.Analyse([1, 2, 0.5], ["A", "B"]));
        Assert.Throws<ArgumentException>(() => PairwiseConsistency.Analyse([1, 0, 0, 1], ["A", "B"]));
        Assert.Throws<ArgumentException>(() => PairwiseConsistency.Analyse([1, double.NaN, 1, 1], ["A", "B"]));
    }
}
