using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

/// <summary>Properties any correct Krippendorff's alpha has, and a second published example.</summary>
public sealed class KrippendorffAlphaTests
{
    private static IReadOnlyList<IReadOnlyList<double>> U(params double[][] units) => units;

    [Fact]
    public void Perfect_agreement_is_one_at_every_level()
    {
        var units = U([1, 1, 1], [2, 2], [3, 3, 3], [5, 5]);
        foreach (var metric in Enum.GetValues<AlphaMetric>())
        {
            Assert.Equal(1.0, KrippendorffAlpha.Compute(units, metric)!.Value, 12);
        }
    }

    [Fact]
    public void It_is_not_defined_when_every_value_is_the_same_or_nothing_pairs()
    {
        Assert.Null(KrippendorffAlpha.Compute(U([2, 2], [2, 2, 2]), AlphaMetric.Interval));
        Assert.Null(KrippendorffAlpha.Compute(U([1], [2], [3]), AlphaMetric.Nominal));
    }

    [Fact]
    public void Interval_alpha_does_not_change_when_the_values_are_shifted_and_scaled()
    {
        var units = U([1, 2, 2], [3, 3], [4, 5, 4], [1, 1, 2], [5, 4]);
        var moved = units.Select(u => (IReadOnlyList<double>)u.Select(v => (3 * v) + 10).ToArray()).ToArray();
        Assert.Equal(KrippendorffAlpha.Compute(units, AlphaMetric.Interval)!.Value, KrippendorffAlpha.Compute(moved, AlphaMetric.Interval)!.Value, 12);
    }

    [Fact]
    public void Ordinal_alpha_depends_only_on_the_order_of_the_values()
    {
        var units = U([1, 2, 2], [3, 3], [4, 5, 4], [1, 1, 2], [5, 4]);
        var squared = units.Select(u => (IReadOnlyList<double>)u.Select(v => v * v * v).ToArray()).ToArray();
        Assert.Equal(KrippendorffAlpha.Compute(units, AlphaMetric.Ordinal)!.Value, KrippendorffAlpha.Compute(squared, AlphaMetric.Ordinal)!.Value, 12);
    }

    [Fact]
    public void Two_coders_on_binary_data_worked_by_hand()
    {
        // Ten units, two coders, 7 agreements. Coincidences: the 3 disagreements give o₀₁ = o₁₀ = 3; the values are
        // 0 eleven times and 1 nine times, n = 20. α = 1 − (n − 1) Σ o δ² / Σ n_c n_k δ² = 1 − 19 · 6 / (2 · 11 · 9)
        // = 1 − 114/198 = 0.424242…
        var units = U([0, 0], [0, 0], [0, 1], [1, 1], [1, 1], [0, 0], [1, 0], [1, 1], [0, 0], [0, 1]);
        Assert.Equal(1 - (114.0 / 198.0), KrippendorffAlpha.Compute(units, AlphaMetric.Nominal)!.Value, 12);
    }

    [Fact]
    public void The_bootstrap_interval_holds_the_estimate_and_repeats_with_its_seed()
    {
        var units = U([1, 2, 2], [3, 3], [4, 5, 4], [1, 1, 2], [5, 4], [2, 3], [3, 3, 4], [1, 2]);
        var a = KrippendorffAlpha.Estimate(units, AlphaMetric.Ordinal, 500, seed: 7)!;
        var b = KrippendorffAlpha.Estimate(units, AlphaMetric.Ordinal, 500, seed: 7)!;
        Assert.Equal(a, b);
        Assert.True(a.Low <= a.Alpha && a.Alpha <= a.High, $"{a.Low} ≤ {a.Alpha} ≤ {a.High}");
        Assert.True(a.High - a.Low > 0, "resampling eight units should move alpha");
    }
}
