using Decide.Core.Robustness;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Robustness;

/// <summary>Kendall's tau-b, including ties, against the definition counted pair by pair.</summary>
public sealed class KendallTauBTests
{
    [Fact]
    public void Identical_orders_give_1() =>
        Assert.Equal(1, RankStatistics.KendallTauB([0.3, 0.9, 0.1, 0.5], [3, 9, 1, 5])!.Value, 1e-15);

    [Fact]
    public void Reversed_orders_give_minus_1() =>
        Assert.Equal(-1, RankStatistics.KendallTauB([1, 2, 3, 4, 5], [50, 40, 30, 20, 10])!.Value, 1e-15);

    [Fact]
    public void A_case_with_ties_in_both_series_matches_the_hand_count()
    {
        // Derived by hand from the definition, over the six pairs of x = (1, 2, 2, 3), y = (2, 3, 1, 3):
        // (0,1) concordant, (0,2) discordant, (0,3) concordant, (1,2) tied in x, (1,3) tied in y, (2,3) concordant.
        // C = 3, D = 1, n₀ = 6, n₁ = n₂ = 1: tau-b = (3 − 1)/√((6 − 1)(6 − 1)) = 0.4.
        Assert.Equal(0.4, RankStatistics.KendallTauB([1, 2, 2, 3], [2, 3, 1, 3])!.Value, 1e-15);
    }

    [Theory]
    // By hand: x = (1, 1, 2, 3) has one tied pair; y ties the same pair. C = 5, D = 0, n₀ = 6, n₁ = n₂ = 1, so
    // tau-b = ±5/√(5·5) = ±1 exactly: the bound is reached through the tie adjustment, not by clamping a value
    // that overshoots.
    [InlineData(new double[] { 10, 10, 20, 30 }, 1)]
    [InlineData(new double[] { 30, 30, 20, 10 }, -1)]
    public void Ties_shared_by_both_series_still_give_exactly_plus_or_minus_1(double[] y, double expected) =>
        Assert.Equal(expected, RankStatistics.KendallTauB([1, 1, 2, 3], y)!.Value, 1e-15);

    [Fact]
    public void Ties_in_one_series_only_keep_tau_b_below_1()
    {
        // By hand: x = (1, 1, 2), y = (1, 2, 3): C = 2, D = 0, n₀ = 3, n₁ = 1, n₂ = 0, tau-b = 2/√(2·3) = √(2/3).
        Assert.Equal(Math.Sqrt(2.0 / 3), RankStatistics.KendallTauB([1, 1, 2], [1, 2, 3])!.Value, 1e-15);
    }

    [Fact]
    public void Tau_b_is_undefined_for_fewer_than_two_pairs_or_a_series_that_ties_everything()
    {
        Assert.Null(RankStatistics.KendallTauB([], []));
        Assert.Null(RankStatistics.KendallTauB([0.5], [0.7]));
        Assert.Null(RankStatistics.KendallTauB([0.5, 0.5, 0.5], [1, 2, 3]));
        Assert.Null(RankStatistics.KendallTauB([1, 2, 3], [4, 4, 4]));
    }

    [Fact]
    public void Tau_b_rejects_series_of_different_lengths() =>
        Assert.Throws<ArgumentException>(() => RankStatistics.KendallTauB([1, 2, 3], [1, 2]));

    /// <summary>
    /// Integer values from a small range make ties frequent; the O(n²) count below is the textbook definition, so it
    /// checks the O(n log n) count including every tie adjustment.
    /// </summary>
    [Property(MaxTest = 500)]
    public Property Tau_b_equals_a_direct_count_of_all_pairs() =>
        Prop.ForAll(PairedSeries().ToArbitrary(), pair =>
        {
            var (x, y) = pair;
            var expected = BruteForce(x, y);
            var actual = RankStatistics.KendallTauB(x, y);
            return expected is null ? actual is null : actual is { } value && Math.Abs(value - expected.Value) < 1e-12;
        });

    private static Gen<(double[] X, double[] Y)> PairedSeries() =>
        from n in Gen.Choose(0, 40)
        from range in Gen.Choose(1, 8)
        from x in Gen.Choose(0, range).Select(v => (double)v).ArrayOf(n)
        from y in Gen.Choose(0, range).Select(v => (double)v).ArrayOf(n)
        select (x, y);

    private static double? BruteForce(double[] x, double[] y)
    {
        long concordant = 0, discordant = 0, tiedX = 0, tiedY = 0;
        for (var i = 0; i < x.Length; i++)
        {
            for (var j = i + 1; j < x.Length; j++)
            {
                var sx = Math.Sign(x[i] - x[j]);
                var sy = Math.Sign(y[i] - y[j]);
                tiedX += sx == 0 ? 1 : 0;
                tiedY += sy == 0 ? 1 : 0;
                concordant += sx * sy > 0 ? 1 : 0;
                discordant += sx * sy < 0 ? 1 : 0;
            }
        }

        long pairs = (long)x.Length * (x.Length - 1) / 2;
        var denominator = Math.Sqrt((double)(pairs - tiedX) * (pairs - tiedY));
        return denominator > 0 ? (concordant - discordant) / denominator : null;
    }
}
