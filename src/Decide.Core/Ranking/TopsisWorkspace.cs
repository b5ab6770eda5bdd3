using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Core.Ranking;

/// <summary>
/// Reusable buffers for repeated fuzzy TOPSIS runs on matrices of one size (sweeps, Monte Carlo draws). After
/// construction, <see cref="Evaluate"/> allocates nothing.
/// </summary>
public sealed class TopsisWorkspace
{
    /// <summary>Buffers for <paramref name="alternatives"/> × <paramref name="criteria"/>.</summary>
    public TopsisWorkspace(int alternatives, int criteria)
    {
        Alternatives = alternatives;
        Criteria = criteria;
        Weighted = new Tfn[alternatives * criteria];
        DPlus = new double[alternatives];
        DMinus = new double[alternatives];
        Closeness = new double[alternatives];
        Ranks = new int[alternatives];
        Order = new int[alternatives];
        Weights = new Tfn[criteria];
    }

    /// <summary>n.</summary>
    public int Alternatives { get; }

    /// <summary>m.</summary>
    public int Criteria { get; }

    /// <summary>Weighted normalised matrix of the last run.</summary>
    public Tfn[] Weighted { get; }

    /// <summary>d⁺ of the last run.</summary>
    public double[] DPlus { get; }

    /// <summary>d⁻ of the last run.</summary>
    public double[] DMinus { get; }

    /// <summary>Closeness of the last run.</summary>
    public double[] Closeness { get; }

    /// <summary>Competition ranks of the last run (1 = best).</summary>
    public int[] Ranks { get; }

    /// <summary>Alternative indices best first, from the last run.</summary>
    public int[] Order { get; }

    /// <summary>A scratch weight vector callers may fill before calling <see cref="Evaluate"/>.</summary>
    public Tfn[] Weights { get; }

    /// <summary>Runs fuzzy TOPSIS without ranking (sweeps and root-finding need the closeness alone).</summary>
    public void EvaluateCloseness(ReadOnlySpan<Tfn> matrix, ReadOnlySpan<bool> isCost, ReadOnlySpan<Tfn> weights, IdealPoints ideal) =>
        FuzzyTopsis.Evaluate(matrix, Criteria, isCost, weights, ideal, Weighted, DPlus, DMinus, Closeness);

    /// <summary>Runs fuzzy TOPSIS and ranks; results stay in this workspace's arrays.</summary>
    public void Evaluate(ReadOnlySpan<Tfn> matrix, ReadOnlySpan<bool> isCost, ReadOnlySpan<Tfn> weights, IdealPoints ideal)
    {
        FuzzyTopsis.Evaluate(matrix, Criteria, isCost, weights, ideal, Weighted, DPlus, DMinus, Closeness);
        FuzzyTopsis.Rank(Closeness, Ranks, Order);
    }
}
