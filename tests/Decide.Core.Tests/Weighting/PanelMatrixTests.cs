using Decide.Core.Fuzzy;
using Decide.Core.Weighting;

namespace Decide.Core.Tests.Weighting;

public sealed class PanelMatrixTests
{
    [Fact]
    public void Setting_a_judgement_sets_its_reciprocal()
    {
        var matrix = new FuzzyPairwiseMatrix(["A", "B", "C"]);
        matrix.Set(0, 2, new Tfn(2, 3, 4));
        Assert.Equal(new Tfn(2, 3, 4), matrix[0, 2]);
        Assert.Equal(new Tfn(0.25, 1.0 / 3, 0.5), matrix[2, 0]);
        Assert.Equal(Tfn.One, matrix[1, 1]);
        Assert.Equal(Tfn.One, matrix[0, 1]); // unset pairs start equal
        Assert.Equal([1, 1, 3, 1, 1, 1, 1.0 / 3, 1, 1], matrix.Middles());
    }

    [Fact]
    public void An_item_is_not_compared_with_itself()
    {
        Assert.Throws<ArgumentException>(() => new FuzzyPairwiseMatrix(["A", "B"]).Set(1, 1, new Tfn(2, 3, 4)));
    }

    [Fact]
    public void Panel_judgement_is_the_weighted_geometric_mean_of_the_assessors()
    {
        var first = new FuzzyPairwiseMatrix(["A", "B"]);
        first.Set(0, 1, new Tfn(2, 3, 4));
        var second = new FuzzyPairwiseMatrix(["A", "B"]);
        second.Set(0, 1, new Tfn(0.25, 1.0 / 3, 0.5)); // the opposite view

        // Equal weights: opposite views cancel to (√(2·¼), 1, √(4·½)) = (1/√2, 1, √2).
        var equal = FuzzyPairwiseMatrix.GeometricMean([first, second], [1, 1]);
        Assert.Equal(1 / Math.Sqrt(2), equal[0, 1].Lower, 1e-12);
        Assert.Equal(1, equal[0, 1].Middle, 1e-12);
        Assert.Equal(Math.Sqrt(2), equal[0, 1].Upper, 1e-12);

        // Weights 3 : 1 give exponents ¾ and ¼.
        var weighted = FuzzyPairwiseMatrix.GeometricMean([first, second], [3, 1]);
        Assert.Equal(Math.Pow(3, 0.75) * Math.Pow(1.0 / 3, 0.25), weighted[0, 1].Middle, 1e-12);
        Assert.Equal(1 / weighted[0, 1].Middle, weighted[1, 0].Middle, 1e-12);
    }

    [Fact]
    public void Panel_needs_one_weight_per_matrix()
    {
        var m = new FuzzyPairwiseMatrix(["A", "B"]);
        Assert.Throws<ArgumentException>(() => FuzzyPairwiseMatrix.GeometricMean([m, m], [1]));
        Assert.Throws<ArgumentException>(() => FuzzyPairwiseMatrix.GeometricMean([], []));
    }
}
