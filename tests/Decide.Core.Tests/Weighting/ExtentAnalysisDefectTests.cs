using Decide.Core.Fuzzy;
using Decide.Core.Weighting;

namespace Decide.Core.Tests.Weighting;

/// <summary>
/// Why Decide weighs by Buckley's geometric mean and not by Chang's extent analysis (Chang 1996, EJOR 95:649–655):
/// extent analysis returns degrees of possibility, and a criterion whose synthetic extent lies wholly below
/// another's gets weight 0 however much the judgements say it matters (Wang, Luo &amp; Hua 2008, EJOR 186:735–747).
/// The matrix is our own; the numbers are derived.
/// </summary>
public sealed class ExtentAnalysisDefectTests
{
    /// <summary>
    /// Quality over delivery (3, 4, 5), quality over reporting (4, 5, 6), delivery over reporting (1, 2, 3):
    /// delivery is judged a quarter as important as quality and twice as important as reporting.
    /// </summary>
    private static FuzzyPairwiseMatrix Judgements()
    {
        var matrix = new FuzzyPairwiseMatrix(["QUALITY", "DELIVERY", "REPORTING"]);
        matrix.Set(0, 1, new Tfn(3, 4, 5));
        matrix.Set(0, 2, new Tfn(4, 5, 6));
        matrix.Set(1, 2, new Tfn(1, 2, 3));
        return matrix;
    }

    [Fact]
    public void Extent_analysis_gives_a_criterion_that_plainly_matters_weight_zero()
    {
        var s = RejectedChangExtentAnalysis.SyntheticExtents(Judgements());

        // Delivery's extent lies wholly below quality's: u(S_delivery) ≈ 0.370 < l(S_quality) ≈ 0.430.
        Assert.True(s[1].Upper < s[0].Lower);
        var weights = RejectedChangExtentAnalysis.Weights(Judgements());
        Assert.Equal([1.0, 0.0, 0.0], weights);
    }

    [Fact]
    public void Buckley_weights_for_the_same_judgements_give_delivery_a_clear_share()
    {
        var shares = CrispShares.FromCentroids(BuckleyWeights.Compute(Judgements()));

        // [derived] by an independent computation of Buckley (1985): row geometric means, each vertex divided by the
        // opposite sum, centroids normalised: 0.6750, 0.2006, 0.1244.
        Assert.Equal(0.6750, shares[0], 4);
        Assert.Equal(0.2006, shares[1], 4);
        Assert.Equal(0.1244, shares[2], 4);
        Assert.Equal(1, shares.Sum(), 1e-12);
    }

    [Fact]
    public void The_reference_implementation_treats_equal_judgements_equally()
    {
        // A check of the reference itself: all judgements (1, 1, 1) give equal extents and equal weights.
        var weights = RejectedChangExtentAnalysis.Weights(new FuzzyPairwiseMatrix(["A", "B", "C"]));
        Assert.All(weights, w => Assert.Equal(1.0 / 3, w, 1e-12));
    }

    [Theory]
    [InlineData(0.2, 0.4, 0.6, 0.1, 0.3, 0.5, 1)] // a's middle at least b's
    [InlineData(0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0)] // b wholly above a
    [InlineData(0.1, 0.3, 0.5, 0.2, 0.4, 0.6, 0.75)] // overlap: (0.2 − 0.5)/((0.3 − 0.5) − (0.4 − 0.2)) = 0.75
    public void Degree_of_possibility_follows_changs_definition(double la, double ma, double ua, double lb, double mb, double ub, double expected)
    {
        Assert.Equal(expected, RejectedChangExtentAnalysis.DegreeOfPossibility(new Tfn(la, ma, ua), new Tfn(lb, mb, ub)), 1e-12);
    }
}
