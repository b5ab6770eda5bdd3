using Decide.Core.Aggregation;
using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Core.Tests.Aggregation;

public sealed class GroupAggregationTests
{
    private static readonly Tfn Poor = new(0, 1, 3);
    private static readonly Tfn Good = new(7, 9, 10);
    private static readonly Tfn Fair = new(3, 5, 7);

    [Fact]
    public void Mean_with_equal_weights_is_chens_average()
    {
        // Chen (2000) eqs. 13–14: (1/K)(x¹ ⊕ … ⊕ xᴷ) = ((0+7+3)/3, (1+9+5)/3, (3+10+7)/3).
        var mean = GroupAggregation.Aggregate([Poor, Good, Fair], [1, 1, 1], AggregationRule.Mean);
        AssertTfn(new Tfn(10.0 / 3, 5, 20.0 / 3), mean);
    }

    [Fact]
    public void Mean_weighs_each_assessor_by_their_share()
    {
        // Weights 1 and 3 are shares 1/4 and 3/4: (0·¼ + 7·¾, 1·¼ + 9·¾, 3·¼ + 10·¾).
        var mean = GroupAggregation.Aggregate([Poor, Good], [1, 3], AggregationRule.Mean);
        AssertTfn(new Tfn(5.25, 7, 8.25), mean);
    }

    [Fact]
    public void Geometric_mean_uses_the_shares_as_exponents()
    {
        // (3^¼ · 7^¾, 5^¼ · 9^¾, 7^¼ · 10^¾).
        var geometric = GroupAggregation.Aggregate([Fair, Good], [1, 3], AggregationRule.Geometric);
        AssertTfn(
            new Tfn(Math.Pow(3, 0.25) * Math.Pow(7, 0.75), Math.Pow(5, 0.25) * Math.Pow(9, 0.75), Math.Pow(7, 0.25) * Math.Pow(10, 0.75)),
            geometric);
    }

    [Fact]
    public void One_rating_with_a_zero_lower_value_vetoes_the_geometric_mean()
    {
        // Two "Good" (7, 9, 10) and one "Poor" (0, 1, 3) on Chen's rating scale: the product of the lower values is 0,
        // so the panel's lower value is 0 however good the others are, while the mean keeps 14/3. This is why the
        // validator refuses geometric aggregation on scales with such terms.
        var values = new[] { Good, Good, Poor };
        var mean = GroupAggregation.Aggregate(values, [1, 1, 1], AggregationRule.Mean);
        var geometric = GroupAggregation.Aggregate(values, [1, 1, 1], AggregationRule.Geometric);
        Assert.Equal(14.0 / 3, mean.Lower, 12);
        Assert.Equal(0, geometric.Lower);
        AssertTfn(new Tfn(14.0 / 3, 19.0 / 3, 23.0 / 3), mean);
        AssertTfn(new Tfn(0, Math.Cbrt(81), Math.Cbrt(300)), geometric); // by hand: (0·7·7)^⅓, (9·9·1)^⅓, (10·10·3)^⅓
    }

    [Theory]
    [InlineData(AggregationRule.Mean)]
    [InlineData(AggregationRule.Geometric)]
    public void Only_the_weights_of_those_present_count(AggregationRule rule)
    {
        // Renormalisation: with weights 2 and 6 of three assessors (the one of weight 5 absent), the result equals
        // the aggregate with shares ¼ and ¾, whatever the absent assessor's weight was.
        var twoOfThree = GroupAggregation.Aggregate([Fair, Good], [2, 6], rule);
        var shares = GroupAggregation.Aggregate([Fair, Good], [0.25, 0.75], rule);
        AssertTfn(shares, twoOfThree);
    }

    [Theory]
    [InlineData(AggregationRule.Mean, 7, 9, 10)]
    [InlineData(AggregationRule.Geometric, 7, 9, 10)]
    [InlineData(AggregationRule.Mean, 0.3, 0.3, 0.3)]
    [InlineData(AggregationRule.Geometric, 0.3, 0.3, 0.3)]
    [InlineData(AggregationRule.Geometric, 0, 0, 1)]
    public void Identical_inputs_give_that_input(AggregationRule rule, double l, double m, double u)
    {
        var x = new Tfn(l, m, u);
        var result = GroupAggregation.Aggregate([x, x, x, x], [0.7, 1, 1.3, 2.9], rule);
        AssertTfn(x, result);
        Assert.True(result.Lower <= result.Middle && result.Middle <= result.Upper);
    }

    [Fact]
    public void Bad_arguments_are_refused()
    {
        Assert.Throws<ArgumentException>(() => GroupAggregation.Aggregate([], [], AggregationRule.Mean));
        Assert.Throws<ArgumentException>(() => GroupAggregation.Aggregate([Good], [1, 2], AggregationRule.Mean));
        Assert.Throws<ArgumentException>(() => GroupAggregation.Aggregate([Good, Fair], [1, 0], AggregationRule.Mean));
        Assert.Throws<ArgumentException>(() => GroupAggregation.Aggregate([Good, Fair], [1, double.NaN], AggregationRule.Geometric));
    }

    private static void AssertTfn(Tfn expected, Tfn actual)
    {
        Assert.Equal(expected.Lower, actual.Lower, 1e-12);
        Assert.Equal(expected.Middle, actual.Middle, 1e-12);
        Assert.Equal(expected.Upper, actual.Upper, 1e-12);
    }
}
