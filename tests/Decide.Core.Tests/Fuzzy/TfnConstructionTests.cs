using Decide.Core.Fuzzy;

namespace Decide.Core.Tests.Fuzzy;

public sealed class TfnConstructionTests
{
    [Theory]
    [InlineData(double.NaN, 1, 2, "NaN")]
    [InlineData(0, double.NaN, 2, "NaN")]
    [InlineData(0, 1, double.NaN, "NaN")]
    [InlineData(double.NegativeInfinity, 1, 2, "-Infinity")]
    [InlineData(0, 1, double.PositiveInfinity, "Infinity")]
    public void A_value_that_is_not_finite_is_refused_and_shown(double l, double m, double u, string shown)
    {
        var error = Assert.Throws<ArgumentException>(() => new Tfn(l, m, u));
        Assert.Contains("finite", error.Message, StringComparison.Ordinal);
        Assert.Contains(shown, error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(3, 2, 4, "(3, 2, 4)")]
    [InlineData(1, 5, 4, "(1, 5, 4)")]
    [InlineData(0.3, 0.2, 0.1, "(0.3, 0.2, 0.1)")]
    public void Values_out_of_order_are_refused_and_shown(double l, double m, double u, string shown)
    {
        var error = Assert.Throws<ArgumentException>(() => new Tfn(l, m, u));
        Assert.Contains("lower ≤ middle ≤ upper", error.Message, StringComparison.Ordinal);
        Assert.Contains(shown, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Ordered_values_are_kept_as_given()
    {
        var a = new Tfn(0.1, 0.3, 0.5);
        Assert.Equal((0.1, 0.3, 0.5), (a.Lower, a.Middle, a.Upper));
        Assert.False(a.IsCrisp);
        Assert.Equal([0.1, 0.3, 0.5], a.ToArray());
    }

    [Fact]
    public void Crisp_zero_and_one_are_degenerate_triangles()
    {
        Assert.Equal(new Tfn(4.5, 4.5, 4.5), Tfn.Crisp(4.5));
        Assert.True(Tfn.Crisp(4.5).IsCrisp);
        Assert.Equal(new Tfn(0, 0, 0), Tfn.Zero);
        Assert.Equal(new Tfn(1, 1, 1), Tfn.One);
    }

    [Fact]
    public void Formats_with_invariant_culture()
    {
        Assert.Equal("(0.7, 0.9, 1)", new Tfn(0.7, 0.9, 1).ToString());
    }
}
