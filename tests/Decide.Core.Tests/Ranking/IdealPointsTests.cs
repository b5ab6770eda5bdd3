using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Tests.Ranking;

/// <summary>Distances and closeness under both choices of ideal points.</summary>
public sealed class IdealPointsTests
{
    // One benefit criterion, weight (1, 1, 1): after normalisation v₁ = (0.2, 0.4, 0.6), v₂ = (0.4, 0.8, 1.0).
    private static readonly Tfn[] Matrix = [new(1, 2, 3), new(2, 4, 5)];

    [Fact]
    public void Unit_ideal_points_are_one_and_zero()
    {
        var (dPlus, dMinus, closeness) = Run(IdealPoints.Unit);
        Assert.Equal(Vertex(0.2, 0.4, 0.6, 1), dPlus[0], 1e-12);
        Assert.Equal(Vertex(0.2, 0.4, 0.6, 0), dMinus[0], 1e-12);
        Assert.Equal(Vertex(0.4, 0.8, 1.0, 1), dPlus[1], 1e-12);
        Assert.Equal(Vertex(0.4, 0.8, 1.0, 0), dMinus[1], 1e-12);
        Assert.Equal(dMinus[0] / (dPlus[0] + dMinus[0]), closeness[0], 1e-12);
    }

    [Fact]
    public void Extreme_ideal_points_are_the_column_extremes()
    {
        // Best = largest upper value 1.0, worst = smallest lower value 0.2, both crisp.
        var (dPlus, dMinus, closeness) = Run(IdealPoints.Extreme);
        Assert.Equal(Vertex(0.2, 0.4, 0.6, 1.0), dPlus[0], 1e-12);
        Assert.Equal(Vertex(0.2, 0.4, 0.6, 0.2), dMinus[0], 1e-12);
        Assert.Equal(Vertex(0.4, 0.8, 1.0, 1.0), dPlus[1], 1e-12);
        Assert.Equal(Vertex(0.4, 0.8, 1.0, 0.2), dMinus[1], 1e-12);
        Assert.True(closeness[1] > closeness[0]);
        Assert.Equal(dMinus[1] / (dPlus[1] + dMinus[1]), closeness[1], 1e-12);
    }

    [Fact]
    public void Extreme_points_give_the_best_and_worst_crisp_alternatives_closeness_one_and_zero()
    {
        var weighted = new Tfn[3];
        double[] dPlus = new double[3], dMinus = new double[3], closeness = new double[3];
        FuzzyTopsis.Evaluate([Tfn.Crisp(2), Tfn.Crisp(5), Tfn.Crisp(8)], 1, [false], [Tfn.One], IdealPoints.Extreme,
            weighted, dPlus, dMinus, closeness);
        Assert.Equal([0.0, 0.5, 1.0], closeness, (x, y) => Math.Abs(x - y) < 1e-12);
    }

    [Fact]
    public void Identical_crisp_alternatives_under_extreme_points_share_closeness_one_half()
    {
        var weighted = new Tfn[2];
        double[] dPlus = new double[2], dMinus = new double[2], closeness = new double[2];
        FuzzyTopsis.Evaluate([Tfn.Crisp(3), Tfn.Crisp(3)], 1, [false], [Tfn.One], IdealPoints.Extreme,
            weighted, dPlus, dMinus, closeness);
        Assert.Equal([0.5, 0.5], closeness);
    }

    [Fact]
    public void Buffers_of_the_wrong_size_are_refused()
    {
        Assert.Throws<ArgumentException>(() => FuzzyTopsis.Evaluate(Matrix, 1, [false], [Tfn.One], IdealPoints.Unit,
            new Tfn[2], new double[1], new double[2], new double[2]));
    }

    private static (double[] DPlus, double[] DMinus, double[] Closeness) Run(IdealPoints ideal)
    {
        var weighted = new Tfn[2];
        double[] dPlus = new double[2], dMinus = new double[2], closeness = new double[2];
        FuzzyTopsis.Evaluate(Matrix, 1, [false], [Tfn.One], ideal, weighted, dPlus, dMinus, closeness);
        return (dPlus, dMinus, closeness);
    }

    /// <summary>Vertex distance from (l, m, u) to the crisp point x, written out.</summary>
    private static double Vertex(double l, double m, double u, double x) =>
        Math.Sqrt((((l - x) * (l - x)) + ((m - x) * (m - x)) + ((u - x) * (u - x))) / 3);
}
