using Decide.Core.Fuzzy;

namespace Decide.Core.Tests.Fuzzy;

/// <summary>Arithmetic as defined in Chen (2000), Fuzzy Sets and Systems 114:1–9, §2.</summary>
public sealed class TfnArithmeticTests
{
    private const double Tolerance = 1e-12;

    [Fact]
    public void Addition_adds_each_vertex()
    {
        AssertTfn(new Tfn(1.5, 4, 8), new Tfn(1, 3, 5) + new Tfn(0.5, 1, 3));
    }

    [Fact]
    public void Scalar_product_scales_each_vertex_from_either_side()
    {
        AssertTfn(new Tfn(2.5, 7.5, 12.5), 2.5 * new Tfn(1, 3, 5));
        AssertTfn(new Tfn(2.5, 7.5, 12.5), new Tfn(1, 3, 5) * 2.5);
        AssertTfn(Tfn.Zero, 0 * new Tfn(1, 3, 5));
    }

    [Theory]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void Scalar_product_refuses_a_negative_or_non_finite_factor(double k)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => k * new Tfn(1, 3, 5));
    }

    [Fact]
    public void Product_of_two_non_negative_tfns_multiplies_each_vertex()
    {
        // (5, 7, 9) ⊗ (0.7, 0.9, 1) = (3.5, 6.3, 9), the vertex-wise product (Chen 2000, eq. 7) by hand.
        AssertTfn(new Tfn(3.5, 6.3, 9), new Tfn(5, 7, 9) * new Tfn(0.7, 0.9, 1));
    }

    [Fact]
    public void Product_refuses_a_negative_operand()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Tfn(-1, 2, 3) * new Tfn(1, 2, 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => new Tfn(1, 2, 3) * new Tfn(-1, 2, 3));
    }

    [Fact]
    public void Reciprocal_swaps_and_inverts_the_ends()
    {
        AssertTfn(new Tfn(0.2, 0.25, 0.5), new Tfn(2, 4, 5).Reciprocal());
        AssertTfn(Tfn.One, Tfn.One.Reciprocal());
    }

    [Theory]
    [InlineData(0, 1, 2)]
    [InlineData(-1, 1, 2)]
    public void Reciprocal_needs_a_lower_value_above_zero(double l, double m, double u)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Tfn(l, m, u).Reciprocal());
    }

    [Fact]
    public void Division_by_a_positive_tfn_multiplies_by_its_reciprocal()
    {
        // (2, 4, 6) ⊘ (1, 2, 4) = (2/4, 4/2, 6/1).
        AssertTfn(new Tfn(0.5, 2, 6), new Tfn(2, 4, 6) / new Tfn(1, 2, 4));
    }

    [Fact]
    public void Division_by_a_tfn_that_reaches_zero_is_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Tfn(2, 4, 6) / new Tfn(0, 2, 4));
    }

    private static void AssertTfn(Tfn expected, Tfn actual)
    {
        Assert.Equal(expected.Lower, actual.Lower, Tolerance);
        Assert.Equal(expected.Middle, actual.Middle, Tolerance);
        Assert.Equal(expected.Upper, actual.Upper, Tolerance);
    }
}
