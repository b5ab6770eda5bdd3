using Decide.Core.Fuzzy;
using Decide.Core.Tests.Support;
using Decide.Core.Weighting;

namespace Decide.Core.Tests.Weighting;

/// <summary>Buckley (1985), "Fuzzy hierarchical analysis", Fuzzy Sets and Systems 17:233–247.</summary>
public sealed class BuckleyWeightsTests
{
    [Fact]
    public void Two_items_judged_two_to_one_match_the_hand_computation()
    {
        // ã₁₂ = (1, 2, 3): r̃₁ = (1, √2, √3), r̃₂ = (1/√3, 1/√2, 1); derived from Buckley's definition.
        var matrix = new FuzzyPairwiseMatrix(["A", "B"]);
        matrix.Set(0, 1, new Tfn(1, 2, 3));
        var w = BuckleyWeights.Compute(matrix);

        double sumL = 1 + (1 / Math.Sqrt(3)), sumM = Math.Sqrt(2) + (1 / Math.Sqrt(2)), sumU = Math.Sqrt(3) + 1;
        Assert.Equal(1 / sumU, w[0].Lower, 1e-12);
        Assert.Equal(2.0 / 3, w[0].Middle, 1e-12);
        Assert.Equal(Math.Sqrt(3) / sumL, w[0].Upper, 1e-12);
        Assert.Equal(1 / Math.Sqrt(3) / sumU, w[1].Lower, 1e-12);
        Assert.Equal(1.0 / 3, w[1].Middle, 1e-12);
        Assert.Equal(1 / sumL, w[1].Upper, 1e-12);
    }

    [Theory]
    [InlineData(3, 11)]
    [InlineData(4, 12)]
    [InlineData(5, 13)]
    [InlineData(7, 14)]
    [InlineData(9, 15)]
    public void With_crisp_judgements_it_is_the_row_geometric_mean_method(int n, int seed)
    {
        // Crisp and usually inconsistent: weights are the normalised row geometric means.
        var a = ReciprocalMatrices.RandomSaaty(n, new Random(seed));
        var w = BuckleyWeights.Compute(ReciprocalMatrices.Crisp(a, n));

        var rowMeans = Enumerable.Range(0, n)
            .Select(i => Math.Pow(Enumerable.Range(0, n).Aggregate(1.0, (p, j) => p * a[(i * n) + j]), 1.0 / n))
            .ToArray();
        for (var i = 0; i < n; i++)
        {
            var expected = rowMeans[i] / rowMeans.Sum();
            Assert.Equal(expected, w[i].Lower, 1e-12);
            Assert.Equal(expected, w[i].Middle, 1e-12);
            Assert.Equal(expected, w[i].Upper, 1e-12);
        }
    }

    [Fact]
    public void Equal_judgements_give_equal_weights()
    {
        var matrix = new FuzzyPairwiseMatrix(ReciprocalMatrices.Items(4));
        var w = BuckleyWeights.Compute(matrix);
        Assert.All(w, x => Assert.Equal(0.25, x.Middle, 1e-12));
        Assert.All(CrispShares.FromCentroids(w), x => Assert.Equal(0.25, x, 1e-12));
    }

    [Fact]
    public void Crisp_shares_are_normalised_centroids()
    {
        Tfn[] weights = [new(0.1, 0.2, 0.3), new(0.2, 0.5, 0.8), Tfn.Zero];
        var shares = CrispShares.FromCentroids(weights);
        Assert.Equal([0.2 / 0.7, 0.5 / 0.7, 0], shares, (x, y) => Math.Abs(x - y) < 1e-12);
        Assert.Equal([0.0, 0.0], CrispShares.FromCentroids([Tfn.Zero, Tfn.Zero])); // all zeros stay zeros
    }
}
