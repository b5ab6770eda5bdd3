using Decide.Core.Robustness;

namespace Decide.Core.Tests.Published;

/// <summary>
/// Kendall's W with ties on a published data set: Hollander, M. &amp; Wolfe, D.A. (1973), Nonparametric Statistical
/// Methods, Wiley, the example for Friedman's test — 22 baseball players each timed rounding first base by three
/// methods (round out, narrow angle, wide angle), in seconds (the data [recalled]; also R's <c>RoundingTimes</c>).
/// Each player is a judge ranking the three methods by time; tied times share the average rank (four players
/// tie two methods). Friedman's statistic with the tie correction is m(n − 1)W, so the published χ² checks W as well.
/// </summary>
public sealed class HollanderWolfe1973RoundingFirstBase
{
    private static readonly double[][] Seconds =
    [
        [5.40, 5.50, 5.55], [5.85, 5.70, 5.75], [5.20, 5.60, 5.50], [5.55, 5.50, 5.40], [5.90, 5.85, 5.70],
        [5.45, 5.55, 5.60], [5.40, 5.40, 5.35], [5.45, 5.50, 5.35], [5.25, 5.15, 5.00], [5.85, 5.80, 5.70],
        [5.25, 5.20, 5.10], [5.65, 5.55, 5.45], [5.60, 5.35, 5.45], [5.05, 5.00, 4.95], [5.50, 5.50, 5.40],
        [5.45, 5.55, 5.50], [5.55, 5.55, 5.35], [5.45, 5.50, 5.55], [5.50, 5.45, 5.25], [5.65, 5.60, 5.40],
        [5.70, 5.65, 5.55], [6.30, 6.30, 6.25],
    ];

    /// <summary>
    /// Each player's ranks from the engine's own ranking helper. It ranks the highest value first, so times are
    /// negated to put the fastest method first; W does not depend on the direction (S is unchanged when every
    /// rank r becomes n + 1 − r).
    /// </summary>
    private static double[][] Ranks() => Seconds.Select(player =>
    {
        var ranks = new double[player.Length];
        RankStatistics.AverageRanks(player.Select(t => -t).ToArray(), ranks);
        return ranks;
    }).ToArray();

    [Fact]
    public void W_is_0_2532()
    {
        // W = 0.2532 as reported for this data set [recalled]; four decimals, so ±0.00005.
        var result = RankStatistics.KendallW(Ranks())!;
        Assert.InRange(result.W, 0.2532 - 0.00005, 0.2532 + 0.00005);
        Assert.Equal(22, result.Rankings);
        Assert.Equal(3, result.Objects);
    }

    [Fact]
    public void Friedman_chi_square_is_11_143_with_2_degrees_of_freedom_and_p_0_0038()
    {
        // Hollander & Wolfe (1973), Friedman's test on these data [recalled]: χ² = 11.143, 2 df, p = 0.0038.
        var result = RankStatistics.KendallW(Ranks())!;
        Assert.InRange(result.ChiSquare, 11.143 - 0.0005, 11.143 + 0.0005);
        Assert.Equal(2, result.DegreesOfFreedom);
        Assert.InRange(result.PValue, 0.0038 - 0.00005, 0.0038 + 0.00005);
    }

    [Fact]
    public void The_tie_correction_matters_here()
    {
        // By hand [derived]: rank sums 53, 47, 32 (rank 1 = fastest), S = 234, and four players tie two methods,
        // ΣT = 4 × (2³ − 2) = 24. Without the correction W would be 12·234/(22²·24) = 0.2417 and χ² = 10.636; the
        // published 11.143 needs the correction.
        var ranks = Ranks();
        Assert.Equal([53.0, 47.0, 32.0], Enumerable.Range(0, 3).Select(k => ranks.Sum(r => r[k])));
        Assert.Equal(4, ranks.Count(r => RankStatistics.TieCorrection(r) > 0));
        Assert.Equal(24, ranks.Sum(r => RankStatistics.TieCorrection(r)), 12);
        Assert.True(RankStatistics.KendallW(ranks)!.W > (12 * 234.0 / (22 * 22 * 24)) + 0.01);
    }
}
