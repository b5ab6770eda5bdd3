using Decide.Core.Fuzzy;
using Decide.Core.Ranking;

namespace Decide.Core.Tests.Ranking;

/// <summary>
/// Linear normalisation and weighting of Chen (2000), Fuzzy Sets and Systems 114:1–9, on small
/// cases computed by hand from the paper's definitions.
/// </summary>
public sealed class NormalisationTests
{
    // Two alternatives; column 0 benefit, column 1 cost. Alternative-major.
    private static readonly Tfn[] Matrix = [new(1, 2, 3), new(2, 4, 5), new(2, 4, 5), new(4, 5, 8)];
    private static readonly bool[] IsCost = [false, true];

    [Fact]
    public void Benefit_divides_by_the_largest_upper_value()
    {
        // c* = max(3, 5) = 5: (1/5, 2/5, 3/5) and (2/5, 4/5, 5/5).
        var v = Weighted([Tfn.One, Tfn.One]);
        AssertTfn(new Tfn(0.2, 0.4, 0.6), v[0]);
        AssertTfn(new Tfn(0.4, 0.8, 1.0), v[2]);
    }

    [Fact]
    public void Cost_divides_the_smallest_lower_value_by_the_reversed_vertices()
    {
        // a⁻ = min(2, 4) = 2: (2/5, 2/4, 2/2) and (2/8, 2/5, 2/4); the cheapest reaches 1.
        var v = Weighted([Tfn.One, Tfn.One]);
        AssertTfn(new Tfn(0.4, 0.5, 1.0), v[1]);
        AssertTfn(new Tfn(0.25, 0.4, 0.5), v[3]);
    }

    [Fact]
    public void Weighting_multiplies_each_vertex_by_the_criterion_weight()
    {
        Tfn weight = new(0.5, 0.7, 0.9);
        var v = Weighted([weight, weight]);
        AssertTfn(new Tfn(0.2 * 0.5, 0.4 * 0.7, 0.6 * 0.9), v[0]);
        AssertTfn(new Tfn(0.4 * 0.5, 0.5 * 0.7, 1.0 * 0.9), v[1]);
        AssertTfn(new Tfn(0.25 * 0.5, 0.4 * 0.7, 0.5 * 0.9), v[3]);
    }

    [Fact]
    public void A_benefit_column_of_zeros_stays_zero()
    {
        var weighted = new Tfn[2];
        FuzzyTopsis.Normalise([Tfn.Zero, Tfn.Zero], 2, 1, [false], [Tfn.One], weighted);
        Assert.Equal([Tfn.Zero, Tfn.Zero], weighted);
    }

    [Fact]
    public void Crisp_cost_values_normalise_to_cheapest_over_price()
    {
        var weighted = new Tfn[3];
        FuzzyTopsis.Normalise([Tfn.Crisp(40_000), Tfn.Crisp(50_000), Tfn.Crisp(80_000)], 3, 1, [true], [Tfn.One], weighted);
        Assert.Equal([1.0, 0.8, 0.5], weighted.Select(t => t.Middle), (x, y) => Math.Abs(x - y) < 1e-12);
        Assert.All(weighted, t => Assert.True(t.IsCrisp));
    }

    private static Tfn[] Weighted(Tfn[] weights)
    {
        var weighted = new Tfn[Matrix.Length];
        FuzzyTopsis.Normalise(Matrix, 2, 2, IsCost, weights, weighted);
        return weighted;
    }

    private static void AssertTfn(Tfn expected, Tfn actual)
    {
        Assert.Equal(expected.Lower, actual.Lower, 1e-12);
        Assert.Equal(expected.Middle, actual.Middle, 1e-12);
        Assert.Equal(expected.Upper, actual.Upper, 1e-12);
    }
}
