using Decide.Core.Fuzzy;

namespace Decide.Core.Tests.Fuzzy;

/// <summary>Defuzzification, distance, α-cuts and membership.</summary>
public sealed class TfnMeasureTests
{
    [Fact]
    public void Centroid_of_good_is_the_mean_of_its_vertices()
    {
        // Derived from the definition in Chen (2000): (7 + 9 + 10)/3 = 8.6667.
        Assert.Equal(8.6667, new Tfn(7, 9, 10).Centroid, 4);
    }

    [Fact]
    public void Graded_mean_of_good_weights_the_middle_four_times()
    {
        // Derived from the definition (Chen & Hsieh 1999): (7 + 4·9 + 10)/6 = 8.8333.
        Assert.Equal(8.8333, new Tfn(7, 9, 10).GradedMean, 4);
    }

    [Theory]
    // Derived from the definition in Chen (2000), eq. 12.
    [InlineData(7, 9, 10, 9, 10, 10, 1.2910)]
    [InlineData(0.7, 0.9, 1.0, 1, 1, 1, 0.1826)]
    [InlineData(0.7, 0.9, 1.0, 0, 0, 0, 0.8756)]
    public void Vertex_distance_matches_the_derived_values(double l1, double m1, double u1, double l2, double m2, double u2, double expected)
    {
        Assert.Equal(expected, Tfn.Distance(new Tfn(l1, m1, u1), new Tfn(l2, m2, u2)), 4);
    }

    [Fact]
    public void Alpha_cut_interpolates_between_support_and_peak()
    {
        var a = new Tfn(2, 6, 8);
        Assert.Equal((2.0, 8.0), a.AlphaCut(0));
        Assert.Equal((4.0, 7.0), a.AlphaCut(0.5));
        Assert.Equal((6.0, 6.0), a.AlphaCut(1));
    }

    [Fact]
    public void Alpha_cut_at_one_is_exactly_the_peak_even_when_subtraction_rounds()
    {
        // Found by TfnPropertyTests: l + 1·(m − l) gives 330.87800000000004 here, a 1-cut without its own peak.
        var a = new Tfn(-128.924, 330.878, 965.158);
        Assert.Equal((330.878, 330.878), a.AlphaCut(1));
        Assert.Equal(1, a.Membership(a.AlphaCut(1).Low));
    }

    [Theory]
    [InlineData(-0.1)]
    [InlineData(1.1)]
    [InlineData(double.NaN)]
    public void Alpha_outside_zero_to_one_is_refused(double alpha)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => new Tfn(2, 6, 8).AlphaCut(alpha));
    }

    [Theory]
    [InlineData(1, 0)]
    [InlineData(2, 0)]
    [InlineData(4, 0.5)]
    [InlineData(6, 1)]
    [InlineData(7, 0.5)]
    [InlineData(8, 0)]
    [InlineData(9, 0)]
    public void Membership_rises_to_one_at_the_peak_and_falls_to_zero(double x, double expected)
    {
        Assert.Equal(expected, new Tfn(2, 6, 8).Membership(x), 1e-12);
    }

    [Fact]
    public void Membership_of_a_crisp_number_is_one_only_at_that_number()
    {
        var a = Tfn.Crisp(3);
        Assert.Equal(1, a.Membership(3));
        Assert.Equal(0, a.Membership(2.999));
        Assert.Equal(0, a.Membership(3.001));
    }

    [Fact]
    public void Membership_at_the_ends_of_an_alpha_cut_is_alpha()
    {
        var a = new Tfn(0.1, 0.3, 0.5);
        foreach (var alpha in new[] { 0.1, 0.25, 0.6, 0.9 })
        {
            var (low, high) = a.AlphaCut(alpha);
            Assert.Equal(alpha, a.Membership(low), 1e-12);
            Assert.Equal(alpha, a.Membership(high), 1e-12);
        }
    }
}
