using Decide.Core.Fuzzy;

namespace Decide.Core.Weighting;

/// <summary>
/// Fuzzy weights from a fuzzy pairwise matrix by Buckley's geometric-mean method.
/// </summary>
/// <remarks>
/// Buckley, J.J. (1985), "Fuzzy hierarchical analysis", Fuzzy Sets and Systems 17:233–247:
/// r̃ᵢ = (Πⱼ lᵢⱼ^(1/n), Πⱼ mᵢⱼ^(1/n), Πⱼ uᵢⱼ^(1/n)) and w̃ᵢ = (lᵢʳ/Σₖuₖʳ, mᵢʳ/Σₖmₖʳ, uᵢʳ/Σₖlₖʳ). With crisp
/// judgements it is the row-geometric-mean method, which returns the exact weights of a consistent matrix.
/// Chang's extent analysis is deliberately not offered (docs/decisions/0003-no-extent-analysis.md).
/// </remarks>
public static class BuckleyWeights
{
    /// <summary>The fuzzy weight of each item, in item order.</summary>
    public static Tfn[] Compute(FuzzyPairwiseMatrix matrix)
    {
        var n = matrix.Size;
        var r = new Tfn[n];
        double sumL = 0, sumM = 0, sumU = 0;
        for (var i = 0; i < n; i++)
        {
            double l = 0, m = 0, u = 0;
            for (var j = 0; j < n; j++)
            {
                var a = matrix[i, j];
                l += Math.Log(a.Lower);
                m += Math.Log(a.Middle);
                u += Math.Log(a.Upper);
            }

            r[i] = Tfn.Unchecked(Math.Exp(l / n), Math.Exp(m / n), Math.Exp(u / n));
            sumL += r[i].Lower;
            sumM += r[i].Middle;
            sumU += r[i].Upper;
        }

        var w = new Tfn[n];
        for (var i = 0; i < n; i++)
        {
            // l/Σu ≤ m/Σm ≤ u/Σl holds mathematically; min/max guard against rounding in crisp cases.
            double l = r[i].Lower / sumU, m = r[i].Middle / sumM, u = r[i].Upper / sumL;
            w[i] = Tfn.Unchecked(Math.Min(l, m), m, Math.Max(u, m));
        }

        return w;
    }
}
