using Decide.Core.Robustness;
using MathNet.Numerics.Distributions;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// The chi-square tail and its building blocks against Math.NET Numerics (a general-purpose reference library) and
/// against closed forms.
/// </summary>
public sealed class SpecialFunctionsTests
{
    public static TheoryData<double, int> Grid()
    {
        var data = new TheoryData<double, int>();
        int[] degrees = [1, 2, 3, 4, 5, 7, 10, 15, 20, 30, 50, 100, 200];
        double[] xs = [1e-6, 0.001, 0.1, 0.5, 1, 1.5, 2, 3, 4, 5, 6, 8, 10, 15, 20, 30, 50, 75, 100, 150, 200, 300];
        foreach (var k in degrees)
        {
            foreach (var x in xs)
            {
                data.Add(x, k);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Grid))]
    public void Chi_square_survival_agrees_with_MathNet_to_1e10(double x, int k)
    {
        var reference = 1 - ChiSquared.CDF(k, x);
        Assert.Equal(reference, SpecialFunctions.ChiSquareSurvival(x, k), 1e-10);
    }

    [Theory]
    [InlineData(0.1)]
    [InlineData(1)]
    [InlineData(4.6)]
    [InlineData(13.8)]
    [InlineData(60)]
    public void Chi_square_survival_with_two_degrees_of_freedom_is_the_exponential_tail(double x)
    {
        // χ²(2) is the exponential distribution with mean 2: P(X ≥ x) = e^(−x/2) [closed form].
        Assert.Equal(Math.Exp(-x / 2), SpecialFunctions.ChiSquareSurvival(x, 2), 1e-13);
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(1)]
    [InlineData(2.5)]
    [InlineData(9)]
    public void Chi_square_survival_with_one_degree_of_freedom_is_the_two_sided_normal_tail(double z)
    {
        // χ²(1) is the square of a standard normal: P(X ≥ z²) = 2(1 − Φ(z)) [closed form; Φ from Math.NET].
        Assert.Equal(2 * (1 - Normal.CDF(0, 1, z)), SpecialFunctions.ChiSquareSurvival(z * z, 1), 1e-10);
    }

    [Theory]
    [InlineData(0, 3, 1.0)]
    [InlineData(-2, 3, 1.0)]
    [InlineData(double.PositiveInfinity, 3, 0.0)]
    public void Chi_square_survival_is_1_at_or_below_0_and_0_at_infinity(double x, int k, double expected) =>
        Assert.Equal(expected, SpecialFunctions.ChiSquareSurvival(x, k));

    [Fact]
    public void Chi_square_survival_rejects_zero_degrees_of_freedom_and_NaN()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SpecialFunctions.ChiSquareSurvival(1, 0));
        Assert.Throws<ArgumentException>(() => SpecialFunctions.ChiSquareSurvival(double.NaN, 2));
    }

    [Theory]
    [InlineData(1e-8)]
    [InlineData(0.1)]
    [InlineData(0.5)]
    [InlineData(1)]
    [InlineData(1.5)]
    [InlineData(2)]
    [InlineData(3.7)]
    [InlineData(10)]
    [InlineData(50.5)]
    [InlineData(171)]
    [InlineData(1e4)]
    public void Log_gamma_agrees_with_MathNet(double z)
    {
        var reference = MathNet.Numerics.SpecialFunctions.GammaLn(z);
        Assert.Equal(reference, SpecialFunctions.LogGamma(z), 1e-12 * Math.Max(1, Math.Abs(reference)));
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(2, 1)]
    [InlineData(6, 120)]
    public void Log_gamma_of_an_integer_is_the_log_of_a_factorial(double z, double factorial) =>
        Assert.Equal(Math.Log(factorial), SpecialFunctions.LogGamma(z), 1e-14);

    [Theory]
    [InlineData(0.3, 0.01)]
    [InlineData(0.3, 5)]
    [InlineData(2.5, 1)]
    [InlineData(2.5, 3.5)]
    [InlineData(2.5, 3.6)]
    [InlineData(40, 30)]
    [InlineData(40, 55)]
    [InlineData(500, 480)]
    [InlineData(500, 520)]
    public void Regularised_upper_gamma_agrees_with_MathNet(double a, double x) =>
        Assert.Equal(MathNet.Numerics.SpecialFunctions.GammaUpperRegularized(a, x), SpecialFunctions.RegularizedGammaQ(a, x), 1e-10);
}
