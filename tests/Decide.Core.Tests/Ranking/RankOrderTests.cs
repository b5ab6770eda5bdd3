using Decide.Core.Ranking;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Ranking;

/// <summary>
/// The ranking of a large round is sorted by merging, of a tender by insertion: both must give the order a stable
/// sort by closeness gives (highest first, equal values in input order), which LINQ's OrderByDescending is documented
/// to be.
/// </summary>
public sealed class RankOrderTests
{
    [Theory]
    [InlineData(5)]
    [InlineData(32)]
    [InlineData(33)]
    [InlineData(97)]
    [InlineData(500)]
    [InlineData(4097)]
    public void Rank_orders_as_a_stable_sort_by_closeness_does_with_ties_in_input_order(int n)
    {
        var random = new SeededRandom((ulong)n, 5);
        var closeness = new double[n];
        for (var i = 0; i < n; i++)
        {
            // Few distinct values, so that ties are many.
            closeness[i] = Math.Round(random.NextDouble() * 20) / 20;
        }

        int[] ranks = new int[n], order = new int[n];
        FuzzyTopsis.Rank(closeness, ranks, order);
        var expected = Enumerable.Range(0, n).OrderByDescending(i => closeness[i]).ToArray();
        Assert.Equal(expected, order);
        for (var p = 0; p < n; p++)
        {
            var first = Array.FindIndex(expected, i => closeness[i] == closeness[expected[p]]);
            Assert.Equal(first + 1, ranks[expected[p]]);
        }
    }
}
