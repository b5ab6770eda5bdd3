using Decide.Core.Consistency;

namespace Decide.Core.Tests.Consistency;

/// <summary>
/// For a 3 × 3 reciprocal matrix everything depends on c = a₁₂·a₂₃/a₁₃: λmax = 1 + c^⅓ + c^−⅓ and
/// GCI = (ln c)²/3 (both derived from the definitions).
/// </summary>
public sealed class ThreeByThreeClosedFormTests
{
    [Theory]
    [InlineData(2, 3, 6)] // consistent: c = 1
    [InlineData(2, 3, 4)]
    [InlineData(3, 3, 1)]
    [InlineData(9, 9, 1.0 / 9)]
    [InlineData(1.0 / 5, 7, 1.0 / 2)]
    public void Lambda_max_and_gci_match_the_closed_form(double a12, double a23, double a13)
    {
        var report = PairwiseConsistency.Analyse(Matrix(a12, a23, a13), ["A", "B", "C"]);
        var c = a12 * a23 / a13;
        var lambda = 1 + Math.Cbrt(c) + (1 / Math.Cbrt(c));
        Assert.Equal(lambda, report.LambdaMax, 1e-10);
        Assert.Equal(Math.Max(0, (lambda - 3) / 2 / 0.58), report.Ratio, 1e-10);
        Assert.Equal(Math.Log(c) * Math.Log(c) / 3, report.Gci, 1e-10);
    }

    [Theory]
    [InlineData(2.5, true)] // GCI = (ln 2.5)²/3 ≈ 0.280 ≤ 0.31
    [InlineData(2.8, false)] // GCI = (ln 2.8)²/3 ≈ 0.353 > 0.31
    public void Gci_is_judged_against_its_threshold(double c, bool acceptable)
    {
        var report = PairwiseConsistency.Analyse(Matrix(c, 1, 1), ["A", "B", "C"]);
        Assert.Equal(acceptable, report.GciAcceptable);
        Assert.Equal(0.31, report.GciThreshold);
    }

    [Fact]
    public void Ratio_is_judged_against_the_stricter_threshold_for_three_items()
    {
        // c = 2: CR = (2^⅓ + 2^−⅓ − 2)/2/0.58 ≈ 0.046 ≤ 0.05. c = 2.5: CR ≈ 0.081 > 0.05, yet ≤ 0.10, the general threshold.
        Assert.True(PairwiseConsistency.Analyse(Matrix(2, 1, 1), ["A", "B", "C"]).Acceptable);
        var report = PairwiseConsistency.Analyse(Matrix(2.5, 1, 1), ["A", "B", "C"]);
        Assert.InRange(report.Ratio, 0.05, 0.10);
        Assert.False(report.Acceptable);
    }

    private static double[] Matrix(double a12, double a23, double a13) =>
    [
        1, a12, a13,
        1 / a12, 1, a23,
        1 / a13, 1 / a23, 1,
    ];
}
