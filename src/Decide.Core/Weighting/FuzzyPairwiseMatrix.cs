using Decide.Core.Fuzzy;

namespace Decide.Core.Weighting;

/// <summary>
/// A complete fuzzy reciprocal matrix over a set of items (criteria or groups): ãᵢᵢ = (1,1,1), ãⱼᵢ = ãᵢⱼ⁻¹.
/// </summary>
public sealed class FuzzyPairwiseMatrix
{
    private readonly Tfn[] _cells;

    /// <summary>Creates the identity matrix over <paramref name="items"/>; fill it with <see cref="Set"/>.</summary>
    public FuzzyPairwiseMatrix(IReadOnlyList<string> items)
    {
        Items = items;
        _cells = new Tfn[items.Count * items.Count];
        Array.Fill(_cells, Tfn.One);
    }

    /// <summary>Item ids in row order.</summary>
    public IReadOnlyList<string> Items { get; }

    /// <summary>Order n.</summary>
    public int Size => Items.Count;

    /// <summary>ãᵢⱼ.</summary>
    public Tfn this[int row, int col] => _cells[(row * Size) + col];

    /// <summary>Sets ãᵢⱼ = <paramref name="value"/> and ãⱼᵢ to its reciprocal.</summary>
    /// <exception cref="ArgumentException">i = j, or the value's lower bound is not above 0.</exception>
    public void Set(int row, int col, Tfn value)
    {
        if (row == col)
        {
            throw new ArgumentException("An item is not compared with itself.");
        }

        _cells[(row * Size) + col] = value;
        _cells[(col * Size) + row] = value.Reciprocal();
    }

    /// <summary>The middle values, row-major (the crisp matrix consistency is judged on).</summary>
    public double[] Middles() => _cells.Select(c => c.Middle).ToArray();

    /// <summary>
    /// Element-wise weighted geometric mean of several assessors' matrices over the same items (assessor
    /// weights as exponents, renormalised). The result is again reciprocal.
    /// </summary>
    public static FuzzyPairwiseMatrix GeometricMean(IReadOnlyList<FuzzyPairwiseMatrix> matrices, IReadOnlyList<double> weights)
    {
        if (matrices.Count == 0 || matrices.Count != weights.Count)
        {
            throw new ArgumentException("Need one weight per matrix and at least one matrix.");
        }

        var items = matrices[0].Items;
        var total = weights.Sum();
        var result = new FuzzyPairwiseMatrix(items);
        for (var i = 0; i < items.Count; i++)
        {
            for (var j = i + 1; j < items.Count; j++)
            {
                double l = 1, m = 1, u = 1;
                for (var k = 0; k < matrices.Count; k++)
                {
                    var e = weights[k] / total;
                    var a = matrices[k][i, j];
                    l *= Math.Pow(a.Lower, e);
                    m *= Math.Pow(a.Middle, e);
                    u *= Math.Pow(a.Upper, e);
                }

                result.Set(i, j, Tfn.Unchecked(Math.Min(l, m), m, Math.Max(u, m)));
            }
        }

        return result;
    }
}
