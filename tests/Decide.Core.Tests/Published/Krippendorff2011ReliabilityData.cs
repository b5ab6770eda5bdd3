using Decide.Core.Robustness;

namespace Decide.Core.Tests.Published;

/// <summary>
/// Krippendorff's alpha on the published reliability data with missing values: Krippendorff, K. (2011), "Computing
/// Krippendorff's Alpha-Reliability", Annenberg School for Communication, University of Pennsylvania — four
/// observers, twelve units, values 1–5, with gaps (unit 12 has a single value and so takes no part). The data are as
/// the paper tabulates them (the same matrix appears in the documentation of R's DescTools::KrippAlpha and of the
/// Python krippendorff package); the printed alphas, to three decimals, are recalled from the paper [recalled].
/// </summary>
public sealed class Krippendorff2011ReliabilityData
{
    private static readonly double?[][] ByObserver =
    [
        [1, 2, 3, 3, 2, 1, 4, 1, 2, null, null, null], // A
        [1, 2, 3, 3, 2, 2, 4, 1, 2, 5, null, 3], // B
        [null, 3, 3, 3, 2, 3, 4, 2, 2, 5, 1, null], // C
        [1, 2, 3, 3, 2, 4, 4, 1, 2, 5, 1, null], // D
    ];

    private static IReadOnlyList<IReadOnlyList<double>> Units() => Enumerable.Range(0, 12)
        .Select(u => (IReadOnlyList<double>)ByObserver.Where(o => o[u] is not null).Select(o => o[u]!.Value).ToArray())
        .ToArray();

    [Theory]
    [InlineData(AlphaMetric.Nominal, 0.743)]
    [InlineData(AlphaMetric.Ordinal, 0.815)]
    [InlineData(AlphaMetric.Interval, 0.849)]
    [InlineData(AlphaMetric.Ratio, 0.797)]
    public void Alpha_matches_the_printed_value(AlphaMetric metric, double printed)
    {
        var alpha = KrippendorffAlpha.Compute(Units(), metric);
        Assert.NotNull(alpha);
        Assert.InRange(alpha.Value, printed - 0.0005, printed + 0.0005);
    }

    [Fact]
    public void Only_the_pairable_values_count()
    {
        // The paper's n = 40: the 41 values less unit 12's lone value.
        var estimate = KrippendorffAlpha.Estimate(Units(), AlphaMetric.Nominal, draws: 0)!;
        Assert.Equal(40, estimate.PairableValues);
        Assert.Equal(11, estimate.Units);
    }
}
