using Decide.Core.Fuzzy;

namespace Decide.Core.Weighting;

/// <summary>Turns fuzzy weights into the crisp percentages a panel publishes.</summary>
public static class CrispShares
{
    /// <summary>
    /// The centroid (l + m + u)/3 of each fuzzy weight, normalised to sum 1. All zeros stay zeros.
    /// </summary>
    public static double[] FromCentroids(ReadOnlySpan<Tfn> weights)
    {
        var shares = new double[weights.Length];
        double total = 0;
        for (var i = 0; i < weights.Length; i++)
        {
            shares[i] = weights[i].Centroid;
            total += shares[i];
        }

        if (total > 0)
        {
            for (var i = 0; i < shares.Length; i++)
            {
                shares[i] /= total;
            }
        }

        return shares;
    }
}
