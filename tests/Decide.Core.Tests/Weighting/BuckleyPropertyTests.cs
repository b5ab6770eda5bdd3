using Decide.Core.Tests.Support;
using Decide.Core.Weighting;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Weighting;

[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class BuckleyPropertyTests
{
    [Property]
    public void A_consistent_crisp_matrix_returns_its_weights(PositiveWeights weights)
    {
        // aᵢⱼ = wᵢ/wⱼ; Buckley (1985) with crisp judgements returns w exactly.
        var n = weights.Values.Length;
        var w = BuckleyWeights.Compute(ReciprocalMatrices.Crisp(ReciprocalMatrices.Consistent(weights.Values), n));
        var expected = weights.Normalised;
        for (var i = 0; i < n; i++)
        {
            Assert.Equal(expected[i], w[i].Lower, 1e-12);
            Assert.Equal(expected[i], w[i].Middle, 1e-12);
            Assert.Equal(expected[i], w[i].Upper, 1e-12);
        }
    }

    [Property]
    public void Fuzzy_weights_are_ordered_and_crisp_shares_sum_to_one(Seed seed)
    {
        var random = seed.Random();
        var n = random.Next(2, 10);
        var w = BuckleyWeights.Compute(ReciprocalMatrices.RandomFuzzy(n, random));

        Assert.All(w, x => Assert.True(0 < x.Lower && x.Lower <= x.Middle && x.Middle <= x.Upper, $"{x} is out of order"));
        Assert.Equal(1, w.Sum(x => x.Middle), 1e-12); // middles are normalised by their own sum
        var shares = CrispShares.FromCentroids(w);
        Assert.Equal(1, shares.Sum(), 1e-12);
        Assert.All(shares, s => Assert.InRange(s, 0, 1));
    }

    [Property]
    public void The_panel_matrix_of_reciprocal_matrices_is_reciprocal(Seed seed)
    {
        var random = seed.Random();
        var n = random.Next(2, 8);
        var k = random.Next(1, 6);
        var matrices = Enumerable.Range(0, k).Select(_ => ReciprocalMatrices.RandomFuzzy(n, random)).ToArray();
        var weights = Enumerable.Range(0, k).Select(_ => 0.1 + random.NextDouble()).ToArray();
        var panel = FuzzyPairwiseMatrix.GeometricMean(matrices, weights);

        for (var i = 0; i < n; i++)
        {
            Assert.Equal(Core.Fuzzy.Tfn.One, panel[i, i]);
            for (var j = 0; j < n; j++)
            {
                var ij = panel[i, j];
                var ji = panel[j, i];
                Assert.True(ij.Lower <= ij.Middle && ij.Middle <= ij.Upper);
                Assert.Equal(1 / ij.Upper, ji.Lower, 1e-12);
                Assert.Equal(1 / ij.Middle, ji.Middle, 1e-12);
                Assert.Equal(1 / ij.Lower, ji.Upper, 1e-12);
            }
        }
    }
}
