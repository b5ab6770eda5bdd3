using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// One-at-a-time weight sensitivity: each criterion's crisp share is set to t ∈ [0, 1] and the others rescaled
/// so that the shares still sum to 1; the exact shares at which two alternatives swap order are found by
/// root-finding on their closeness difference.
/// </summary>
/// <remarks>
/// Sweep rule (docs/methods.md §7): w̃ₖ ← w̃ₖ · t/ŵₖ and w̃ⱼ ← w̃ⱼ · (1 − t)/(1 − ŵₖ) for j ≠ k, where ŵ are the crisp
/// (centroid) shares; the new crisp share of k is exactly t, and t = ŵₖ reproduces the base result. The closeness
/// difference of each pair is scanned on a grid of <see cref="GridIntervals"/> intervals; each sign change is
/// narrowed by bisection to 10⁻¹⁰ and confirmed by recomputing at t* ± 10⁻⁶. Two crossings closer together than one
/// grid interval (0.005) can be missed; the tests check every reported point on both sides.
/// </remarks>
public static class WeightSweeps
{
    /// <summary>Grid intervals on [0, 1] scanned for sign changes.</summary>
    public const int GridIntervals = 200;

    /// <summary>Every <see cref="SampleStride"/>-th grid point is reported as a chart sample (0.05 apart).</summary>
    public const int SampleStride = 10;

    private const double Tolerance = 1e-10;
    private const double ConfirmStep = 1e-6;
    private const double Zero = 1e-12;

    /// <summary>Sweeps every scored criterion, <paramref name="threads"/> criteria at a time (the results do not depend on it).</summary>
    public static IReadOnlyList<WeightSweepResult> Run(PreparedEvaluation prepared, int threads = 1)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(threads, 1);
        var results = new WeightSweepResult[prepared.Criteria.Count];
        Parallel.For(0, results.Length, new ParallelOptions { MaxDegreeOfParallelism = threads }, k => results[k] = Sweep(prepared, k));
        return results;
    }

    /// <summary>Sweeps criterion <paramref name="k"/> (index among the scored criteria).</summary>
    public static WeightSweepResult Sweep(PreparedEvaluation prepared, int k)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        var id = prepared.Criteria[k].Id;
        var current = prepared.Weights[k].Crisp;
        var samples = Enumerable.Range(0, (GridIntervals / SampleStride) + 1).Select(s => (double)s * SampleStride / GridIntervals).ToArray();
        if (m == 1 || !(current > 0) || n < 1)
        {
            var note = m == 1 ? "the only scored criterion: its share is always 100%" : n < 1 ? "no alternative to rank" : "its weight is 0, so it cannot be rescaled";
            return new WeightSweepResult(id, current, [], [], [], note);
        }

        var sweep = new Sweeper(prepared, k);
        var grid = new double[(GridIntervals + 1) * n];
        for (var g = 0; g <= GridIntervals; g++)
        {
            sweep.Closeness((double)g / GridIntervals).CopyTo(grid.AsSpan(g * n, n));
        }

        var reversals = new List<SweepReversal>();
        for (var a = 0; a < n; a++)
        {
            for (var b = a + 1; b < n; b++)
            {
                FindCrossings(sweep, grid, n, a, b, reversals);
            }
        }

        var series = prepared.Alternatives.Select((alt, i) => new SweepSeries(alt.Id,
            samples.Select((_, s) => grid[(s * SampleStride * n) + i]).ToArray())).ToArray();
        return new WeightSweepResult(id, current, samples, series, reversals.OrderBy(r => r.Weight).ToArray());
    }

    private static void FindCrossings(Sweeper sweep, double[] grid, int n, int a, int b, List<SweepReversal> found)
    {
        var ids = sweep.Prepared.Alternatives;
        var previous = Sign(grid[a] - grid[b]);
        var previousT = 0.0;
        for (var g = 1; g <= GridIntervals; g++)
        {
            var sign = Sign(grid[(g * n) + a] - grid[(g * n) + b]);
            if (sign == 0)
            {
                continue; // a tie at a grid point: wait for the next non-zero side
            }

            var t = (double)g / GridIntervals;
            if (previous != 0 && sign != previous)
            {
                var root = Bisect(sweep, a, b, previousT, t, previous);
                var below = Sign(Difference(sweep, a, b, Math.Max(0, root - ConfirmStep)));
                var above = Sign(Difference(sweep, a, b, Math.Min(1, root + ConfirmStep)));
                var confirmed = below != 0 && above != 0 && below != above;
                var (first, second) = previous > 0 ? (ids[a].Id, ids[b].Id) : (ids[b].Id, ids[a].Id);
                found.Add(new SweepReversal(root, first, second, confirmed));
            }

            previous = sign;
            previousT = t;
        }
    }

    private static double Bisect(Sweeper sweep, int a, int b, double lo, double hi, int signAtLo)
    {
        while (hi - lo > Tolerance)
        {
            var mid = 0.5 * (lo + hi);
            var s = Sign(Difference(sweep, a, b, mid));
            if (s == signAtLo)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return 0.5 * (lo + hi);
    }

    private static double Difference(Sweeper sweep, int a, int b, double t) => sweep.ClosenessOf(a, t) - sweep.ClosenessOf(b, t);

    private static int Sign(double x) => x > Zero ? 1 : x < -Zero ? -1 : 0;

    /// <summary>Re-ranks with criterion k's share set to t, reusing one workspace.</summary>
    internal sealed class Sweeper
    {
        private readonly TopsisWorkspace _workspace;
        private readonly int _k;
        private readonly double _current;

        // For one alternative's closeness at a time (root-finding between two of them): the normalised matrix before
        // weighting and each column's largest upper and smallest lower value, so that a step costs m, not n × m.
        private readonly Tfn[] _normalised;
        private readonly double[] _columnUpper;
        private readonly double[] _columnLower;
        private readonly Tfn[] _scratch;

        public Sweeper(PreparedEvaluation prepared, int k)
        {
            Prepared = prepared;
            _k = k;
            _current = prepared.Weights[k].Crisp;
            _workspace = new TopsisWorkspace(prepared.Alternatives.Count, prepared.Criteria.Count);
            int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
            _normalised = new Tfn[n * m];
            _columnUpper = new double[m];
            _columnLower = new double[m];
            _scratch = new Tfn[m];
            var ones = new Tfn[m];
            Array.Fill(ones, Tfn.One);

            // The same products FuzzyTopsis.Normalise forms, with unit weights: (x · scale) and (aMin / x).
            FuzzyTopsis.Normalise(prepared.Matrix, n, m, prepared.IsCost, ones, _normalised);
            for (var j = 0; j < m; j++)
            {
                double hi = double.NegativeInfinity, lo = double.PositiveInfinity;
                for (var i = 0; i < n; i++)
                {
                    hi = Math.Max(hi, _normalised[(i * m) + j].Upper);
                    lo = Math.Min(lo, _normalised[(i * m) + j].Lower);
                }

                (_columnUpper[j], _columnLower[j]) = (hi, lo);
            }
        }

        public PreparedEvaluation Prepared { get; }

        public ReadOnlySpan<double> Closeness(double t)
        {
            var w = Prepared.FuzzyWeights;
            var weights = _workspace.Weights;
            var own = t / _current;
            var others = (1 - t) / (1 - _current);
            for (var j = 0; j < weights.Length; j++)
            {
                weights[j] = (j == _k ? own : others) * w[j];
            }

            _workspace.EvaluateCloseness(Prepared.Matrix, Prepared.IsCost, weights, Prepared.Source.Options.Ideal);
            return _workspace.Closeness;
        }

        /// <summary>
        /// Alternative <paramref name="i"/>'s closeness with the share set to <paramref name="t"/>: the same
        /// arithmetic as <see cref="Closeness"/> in the same order, so the same number to the last bit, for one row.
        /// Multiplying by a positive weight keeps the order of a column, so its extreme values are those of the
        /// unweighted column times the weight.
        /// </summary>
        public double ClosenessOf(int i, double t)
        {
            var w = Prepared.FuzzyWeights;
            var m = w.Length;
            var own = t / _current;
            var others = (1 - t) / (1 - _current);
            for (var j = 0; j < m; j++)
            {
                _scratch[j] = (j == _k ? own : others) * w[j];
            }

            var bound = FuzzyTopsis.WeightBound(_scratch);
            var extreme = Prepared.Source.Options.Ideal == Model.IdealPoints.Extreme;
            double plus = 0, minus = 0;
            for (var j = 0; j < m; j++)
            {
                var wj = bound == 1 ? _scratch[j] : Tfn.Unchecked(_scratch[j].Lower / bound, _scratch[j].Middle / bound, _scratch[j].Upper / bound);
                var r = _normalised[(i * m) + j];
                var v = Tfn.Unchecked(r.Lower * wj.Lower, r.Middle * wj.Middle, r.Upper * wj.Upper);
                Tfn best, worst;
                if (extreme)
                {
                    double hi = _columnUpper[j] * wj.Upper, lo = _columnLower[j] * wj.Lower;
                    (best, worst) = (Tfn.Unchecked(hi, hi, hi), Tfn.Unchecked(lo, lo, lo));
                }
                else
                {
                    (best, worst) = (Tfn.One, Tfn.Zero);
                }

                plus += Tfn.Distance(v, best);
                minus += Tfn.Distance(v, worst);
            }

            var total = plus + minus;
            return total > 0 ? minus / total : 0.5;
        }
    }
}
