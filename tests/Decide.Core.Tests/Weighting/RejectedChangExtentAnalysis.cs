using Decide.Core.Fuzzy;
using Decide.Core.Weighting;

namespace Decide.Core.Tests.Weighting;

/// <summary>
/// Reference implementation, for tests only, of a method Decide deliberately rejects: Chang's extent analysis
/// (Chang, D.-Y. 1996, "Applications of the extent analysis method on fuzzy AHP", EJOR 95:649–655). It exists to
/// show the defect Wang, Luo &amp; Hua (2008, EJOR 186:735–747) pointed out; it is not part of the engine.
/// </summary>
/// <remarks>
/// Synthetic extent Sᵢ = Σⱼ M̃ᵢⱼ ⊗ [Σᵢ Σⱼ M̃ᵢⱼ]⁻¹. Degree of possibility V(S̃a ≥ S̃b) = 1 if ma ≥ mb, 0 if lb ≥ ua,
/// otherwise (lb − ua)/((ma − ua) − (mb − lb)). d(Aᵢ) = minₖ≠ᵢ V(S̃ᵢ ≥ S̃ₖ); weights = d normalised to sum 1.
/// </remarks>
public static class RejectedChangExtentAnalysis
{
    /// <summary>The synthetic extents S̃ᵢ.</summary>
    public static Tfn[] SyntheticExtents(FuzzyPairwiseMatrix matrix)
    {
        var n = matrix.Size;
        var rows = new Tfn[n];
        var total = Tfn.Zero;
        for (var i = 0; i < n; i++)
        {
            rows[i] = Tfn.Zero;
            for (var j = 0; j < n; j++)
            {
                rows[i] += matrix[i, j];
            }

            total += rows[i];
        }

        return rows.Select(r => r * total.Reciprocal()).ToArray();
    }

    /// <summary>V(S̃a ≥ S̃b): the degree of possibility that a is at least b.</summary>
    public static double DegreeOfPossibility(Tfn a, Tfn b)
    {
        if (a.Middle >= b.Middle)
        {
            return 1;
        }

        if (b.Lower >= a.Upper)
        {
            return 0;
        }

        return (b.Lower - a.Upper) / ((a.Middle - a.Upper) - (b.Middle - b.Lower));
    }

    /// <summary>The extent-analysis "weights": minimum degrees of possibility, normalised.</summary>
    public static double[] Weights(FuzzyPairwiseMatrix matrix)
    {
        var s = SyntheticExtents(matrix);
        var d = new double[s.Length];
        for (var i = 0; i < s.Length; i++)
        {
            d[i] = Enumerable.Range(0, s.Length).Where(k => k != i).Select(k => DegreeOfPossibility(s[i], s[k])).Min();
        }

        var sum = d.Sum();
        return d.Select(x => x / sum).ToArray();
    }
}
