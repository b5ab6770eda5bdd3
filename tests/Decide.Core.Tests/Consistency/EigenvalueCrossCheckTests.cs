using Decide.Core.Consistency;
using Decide.Core.Tests.Support;
using MathNet.Numerics.LinearAlgebra;

namespace Decide.Core.Tests.Consistency;

/// <summary>
/// λmax and the principal eigenvector from the engine's power iteration, cross-checked against MathNet.Numerics'
/// general eigenvalue decomposition (a general-purpose reference library, independent of Decide).
/// </summary>
public sealed class EigenvalueCrossCheckTests
{
    private const double Tolerance = 1e-9;

    public static TheoryData<int, int> RandomMatrices()
    {
        var data = new TheoryData<int, int>();
        for (var n = 3; n <= 8; n++)
        {
            foreach (var seed in new[] { 1, 2, 3 })
            {
                data.Add(n, (100 * n) + seed);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(RandomMatrices))]
    public void Random_reciprocal_matrices_agree_with_mathnet(int n, int seed)
    {
        AssertAgreesWithMathNet(ReciprocalMatrices.RandomSaaty(n, new Random(seed)), n);
    }

    [Fact]
    public void A_textbook_style_inconsistent_matrix_agrees_with_mathnet()
    {
        // Four suppliers judged on service; B over C and C over D, yet D judged over B: visibly inconsistent.
        double[] a =
        [
            1, 5, 3, 7,
            1.0 / 5, 1, 3, 1.0 / 4,
            1.0 / 3, 1.0 / 3, 1, 5,
            1.0 / 7, 4, 1.0 / 5, 1,
        ];
        var report = AssertAgreesWithMathNet(a, 4);
        Assert.False(report.Acceptable);
        Assert.True(report.Ratio > 0.1, $"CR = {report.Ratio}");
    }

    [Fact]
    public void A_seeded_matrix_of_order_ten_the_largest_allowed_agrees_with_mathnet()
    {
        AssertAgreesWithMathNet(ReciprocalMatrices.RandomSaaty(10, new Random(10)), 10);
    }

    [Fact]
    public void The_power_iteration_agrees_with_mathnet_beyond_the_random_index_table()
    {
        // Order 12 has no random index (so no CR), but λmax and the eigenvector are still well defined.
        var a = ReciprocalMatrices.RandomSaaty(12, new Random(12));
        var (lambda, vector) = PairwiseConsistency.PrincipalEigen(a, 12);
        var evd = Matrix<double>.Build.DenseOfArray(ReciprocalMatrices.ToArray2D(a, 12)).Evd();
        var principal = Enumerable.Range(0, 12).MaxBy(i => evd.EigenValues[i].Real);
        Assert.InRange(lambda, evd.EigenValues[principal].Real - Tolerance, evd.EigenValues[principal].Real + Tolerance);
        var reference = evd.EigenVectors.Column(principal);
        var sum = reference.Sum();
        for (var i = 0; i < 12; i++)
        {
            Assert.InRange(vector[i], (reference[i] / sum) - Tolerance, (reference[i] / sum) + Tolerance);
        }
    }

    private static ConsistencyReport AssertAgreesWithMathNet(double[] a, int n)
    {
        var report = PairwiseConsistency.Analyse(a, ReciprocalMatrices.Items(n));

        var evd = Matrix<double>.Build.DenseOfArray(ReciprocalMatrices.ToArray2D(a, n)).Evd();
        var eigenvalues = evd.EigenValues;
        var principal = 0;
        for (var i = 1; i < n; i++)
        {
            if (eigenvalues[i].Real > eigenvalues[principal].Real)
            {
                principal = i;
            }
        }

        var lambda = eigenvalues[principal].Real;
        Assert.Equal(0, eigenvalues[principal].Imaginary, 1e-12);
        Assert.InRange(report.LambdaMax, lambda - Tolerance, lambda + Tolerance);

        // CI and CR follow from λmax by Saaty's definitions.
        Assert.Equal((lambda - n) / (n - 1), report.ConsistencyIndex, 1e-9);
        Assert.Equal((lambda - n) / (n - 1) / RandomIndex.For(n), report.Ratio, 1e-9);
        Assert.Equal(report.Ratio <= RandomIndex.Threshold(n), report.Acceptable);

        // The eigenvector for λmax, scaled to sum 1.
        var vector = evd.EigenVectors.Column(principal);
        var sum = vector.Sum();
        for (var i = 0; i < n; i++)
        {
            Assert.InRange(report.Eigenvector[i], (vector[i] / sum) - Tolerance, (vector[i] / sum) + Tolerance);
        }

        return report;
    }
}
