using Decide.Core.Robustness;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using MathNet.Numerics.Statistics;

namespace Decide.Core.Tests.Robustness;

/// <summary>Kendall's coefficient of concordance W, its tie correction and its chi-square test.</summary>
public sealed class KendallWTests
{
    [Fact]
    public void W_is_one_sixteenth_for_the_ProofWiki_example()
    {
        // ProofWiki, "Kendall's Coefficient of Concordance/Examples/Arbitrary Example 1" [published]: objects X, Y, Z
        // ranked by four judges, X = (1, 1, 2, 3), Y = (3, 2, 3, 1), Z = (2, 3, 1, 2) → W = 1/16.
        double[] x = [1, 1, 2, 3], y = [3, 2, 3, 1], z = [2, 3, 1, 2];
        var byJudge = Enumerable.Range(0, 4).Select(j => new[] { x[j], y[j], z[j] }).ToArray();

        var result = RankStatistics.KendallW(byJudge);

        Assert.NotNull(result);
        Assert.Equal(1.0 / 16, result.W, 1e-15);
        Assert.Equal(4 * 2 * (1.0 / 16), result.ChiSquare, 1e-15); // χ² = m(n − 1)W
        Assert.Equal(2, result.DegreesOfFreedom);
        Assert.Equal(Math.Exp(-result.ChiSquare / 2), result.PValue, 1e-13); // χ²(2) tail is e^(−χ²/2) [closed form]
        Assert.Equal(4, result.Rankings);
        Assert.Equal(3, result.Objects);
    }

    [Fact]
    public void Tie_term_is_2_5_for_Kotharis_example()
    {
        // Kothari (2004), Research Methodology, 2nd ed., pp. 307–310 [published]: ranks 1, 2, 3.5, 5, 6, 3.5, 8, 10, 8, 8
        // (a pair tied at 3.5 and a triple at 8) give Σ(t³ − t)/12 = 2.5.
        double[] ranks = [1, 2, 3.5, 5, 6, 3.5, 8, 10, 8, 8];
        Assert.Equal(2.5, RankStatistics.TieCorrection(ranks) / 12, 1e-15);
    }

    [Fact]
    public void Tie_term_is_zero_without_ties() =>
        Assert.Equal(0, RankStatistics.TieCorrection([3, 1, 4, 2, 5]));

    [Theory]
    [InlineData(2, 2)]
    [InlineData(3, 5)]
    [InlineData(7, 8)]
    public void Identical_rankings_give_W_1_and_chi_square_m_times_n_minus_1(int m, int n)
    {
        var ranking = Enumerable.Range(1, n).Select(r => (double)((r * 3 % n) + 1)).ToArray(); // a permutation of 1 … n (3 and n are coprime)
        var byJudge = Enumerable.Repeat(ranking, m).ToArray();

        var result = RankStatistics.KendallW(byJudge)!;

        Assert.Equal(1, result.W, 1e-12);
        Assert.Equal(m * (n - 1), result.ChiSquare, 1e-9);
        Assert.Equal(n - 1, result.DegreesOfFreedom);
    }

    [Fact]
    public void Identical_rankings_with_the_same_ties_give_W_1_only_thanks_to_the_tie_correction()
    {
        double[] ranking = [1, 2.5, 2.5, 4];
        var result = RankStatistics.KendallW([ranking, ranking, ranking])!;
        Assert.Equal(1, result.W, 1e-12);

        // By hand from the definition: R = (3, 7.5, 7.5, 12), R̄ = 7.5, S = 40.5, 12S = 486, m²(n³ − n) = 540 and
        // m·ΣT = 3·(3·6) = 54. Without the correction W would be 486/540 = 0.9; with it, 486/486 = 1.
        Assert.NotEqual(0.9, result.W, 1e-6);
    }

    [Fact]
    public void Two_judges_in_complete_reversal_give_W_0()
    {
        var result = RankStatistics.KendallW([[1, 2, 3, 4, 5], [5, 4, 3, 2, 1]])!;
        Assert.Equal(0, result.W, 1e-15);
        Assert.Equal(0, result.ChiSquare, 1e-15);
        Assert.Equal(1, result.PValue, 1e-15);
    }

    [Fact]
    public void W_is_undefined_for_one_judge_one_object_or_no_preference_at_all()
    {
        Assert.Null(RankStatistics.KendallW([]));
        Assert.Null(RankStatistics.KendallW([[1, 2, 3]]));
        Assert.Null(RankStatistics.KendallW([[1], [1], [1]]));
        Assert.Null(RankStatistics.KendallW([[2, 2, 2], [2, 2, 2]])); // everyone ties everything: denominator 0
    }

    [Fact]
    public void W_rejects_rows_that_are_not_rankings_of_the_same_objects()
    {
        Assert.Throws<ArgumentException>(() => RankStatistics.KendallW([[1, 2, 3], [1, 2]]));
        Assert.Throws<ArgumentException>(() => RankStatistics.KendallW([[0.2, 0.9, 0.4], [1, 2, 3]])); // scores, not ranks
        Assert.Throws<ArgumentException>(() => RankStatistics.KendallW([[1, double.NaN, 3], [1, 2, 3]]));
    }

    /// <summary>
    /// Without ties, W and the mean pairwise Spearman correlation ρ̄ satisfy ρ̄ = (mW − 1)/(m − 1) (Kendall &amp; Babington
    /// Smith 1939; a standard identity). Spearman's ρ comes from Math.NET, so this is an independent check.
    /// </summary>
    [Property(MaxTest = 200)]
    public Property W_matches_the_mean_Spearman_correlation_when_there_are_no_ties() =>
        Prop.ForAll(Rankings().ToArbitrary(), rankings =>
        {
            var m = rankings.Length;
            var w = RankStatistics.KendallW(rankings)!.W;
            var rhos = new List<double>();
            for (var a = 0; a < m; a++)
            {
                for (var b = a + 1; b < m; b++)
                {
                    rhos.Add(Correlation.Spearman(rankings[a], rankings[b]));
                }
            }

            return Math.Abs(rhos.Average() - (((m * w) - 1) / (m - 1))) < 1e-9;
        });

    [Fact]
    public void Average_ranks_put_the_highest_score_first_and_share_ranks_among_ties()
    {
        double[] closeness = [0.4, 0.9, 0.4, 0.1, 0.9, 0.4];
        var ranks = new double[closeness.Length];

        RankStatistics.AverageRanks(closeness, ranks);

        // Hand-ranked: the two 0.9s share places 1–2 (1.5), the three 0.4s places 3–5 (4), 0.1 is sixth.
        Assert.Equal([4, 1.5, 4, 6, 1.5, 4], ranks);
    }

    [Fact]
    public void Average_ranks_treat_scores_within_1e12_as_tied()
    {
        var ranks = new double[3];
        RankStatistics.AverageRanks([0.5, 0.5 + 1e-13, 0.2], ranks);
        Assert.Equal([1.5, 1.5, 3], ranks);

        RankStatistics.AverageRanks([0.5, 0.5 + 1e-9, 0.2], ranks);
        Assert.Equal([2, 1, 3], ranks);
    }

    [Fact]
    public void Average_ranks_reject_a_buffer_of_the_wrong_length() =>
        Assert.Throws<ArgumentException>(() => RankStatistics.AverageRanks([1, 2, 3], new double[2]));

    /// <summary>2–6 judges, each a random permutation of 1 … n for the same n in 3–9.</summary>
    private static Gen<double[][]> Rankings() =>
        from n in Gen.Choose(3, 9)
        from m in Gen.Choose(2, 6)
        from rows in Gen.Shuffle(Enumerable.Range(1, n).Select(r => (double)r).ToArray()).ArrayOf(m)
        select rows;
}
