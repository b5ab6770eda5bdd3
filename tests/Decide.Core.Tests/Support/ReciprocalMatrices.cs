using Decide.Core.Fuzzy;
using Decide.Core.Scales;
using Decide.Core.Weighting;

namespace Decide.Core.Tests.Support;

/// <summary>Builds pairwise-comparison matrices for weighting and consistency tests.</summary>
public static class ReciprocalMatrices
{
    /// <summary>The 17 values of Saaty's scale: 1/9, 1/8, …, 1/2, 1, 2, …, 9.</summary>
    public static IReadOnlyList<double> SaatyValues { get; } =
        [.. Enumerable.Range(2, 8).Reverse().Select(k => 1.0 / k), .. Enumerable.Range(1, 9).Select(k => (double)k)];

    /// <summary>Item ids "A", "B", … for a matrix of order n.</summary>
    public static string[] Items(int n) => Enumerable.Range(0, n).Select(i => ((char)('A' + i)).ToString()).ToArray();

    /// <summary>The consistent matrix aᵢⱼ = wᵢ/wⱼ, row-major.</summary>
    public static double[] Consistent(IReadOnlyList<double> w)
    {
        var n = w.Count;
        var a = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                a[(i * n) + j] = i == j ? 1 : w[i] / w[j];
            }
        }

        return a;
    }

    /// <summary>A random reciprocal matrix whose upper triangle is drawn from Saaty's 17 values, row-major.</summary>
    public static double[] RandomSaaty(int n, Random random)
    {
        var a = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            a[(i * n) + i] = 1;
            for (var j = i + 1; j < n; j++)
            {
                var v = SaatyValues[random.Next(SaatyValues.Count)];
                a[(i * n) + j] = v;
                a[(j * n) + i] = 1 / v;
            }
        }

        return a;
    }

    /// <summary>A crisp row-major matrix as a fuzzy matrix of crisp TFNs (upper triangle set, lower its reciprocal).</summary>
    public static FuzzyPairwiseMatrix Crisp(double[] a, int n)
    {
        var matrix = new FuzzyPairwiseMatrix(Items(n));
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                matrix.Set(i, j, Tfn.Crisp(a[(i * n) + j]));
            }
        }

        return matrix;
    }

    /// <summary>A random fuzzy reciprocal matrix whose upper triangle is drawn from the built-in pairwise-9 scale.</summary>
    public static FuzzyPairwiseMatrix RandomFuzzy(int n, Random random)
    {
        var scale = BuiltInScales.Pairwise9;
        var matrix = new FuzzyPairwiseMatrix(Items(n));
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                matrix.Set(i, j, scale[random.Next(scale.Count)].Value);
            }
        }

        return matrix;
    }

    /// <summary>The row-major array as a two-dimensional array (for MathNet.Numerics).</summary>
    public static double[,] ToArray2D(double[] a, int n)
    {
        var result = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                result[i, j] = a[(i * n) + j];
            }
        }

        return result;
    }
}
