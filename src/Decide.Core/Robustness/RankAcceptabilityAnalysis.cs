using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// Stochastic multicriteria acceptability analysis: how often each alternative takes each rank when the weights
/// and the ratings vary within what the panel said.
/// </summary>
/// <remarks>
/// Lahdelma, Hokkanen &amp; Salminen (1998), "SMAA – Stochastic multiobjective acceptability analysis", EJOR
/// 106:137–143; rank acceptability indices as in SMAA-2 (Lahdelma &amp; Salminen 2001, Operations Research
/// 49(3):444–454). Each draw takes a crisp weight per criterion from the triangular distribution on its aggregated
/// fuzzy weight (or a vector uniform on the simplex: sorted uniforms' successive differences), and a crisp rating
/// per cell from the triangular distribution on its aggregated TFN (numeric values stay as measured); then runs
/// TOPSIS with the evaluation's ideal points. Ranks within a draw are positions (ties, which have probability 0,
/// go by input order), so the shares sum to 1 over ranks and over alternatives.
/// Draws are split into blocks of <see cref="BlockSize"/>; block b uses its own generator stream (seed, b) and
/// block results are combined in block order, so the output does not depend on the number of threads.
/// The per-draw loop allocates nothing.
/// </remarks>
public static class RankAcceptabilityAnalysis
{
    /// <summary>Draws per block (the unit of parallel work and of random streams).</summary>
    public const int BlockSize = 256;

    /// <summary>z for a two-sided 95% interval.</summary>
    private const double Z = 1.959963984540054;

    /// <summary>Runs the analysis.</summary>
    /// <param name="prepared">The prepared evaluation.</param>
    /// <param name="draws">Number of draws, at least 1.</param>
    /// <param name="seed">Seed.</param>
    /// <param name="weights">Fuzzy (default) or uniform weights.</param>
    /// <param name="threads">Maximum degree of parallelism (1 = sequential).</param>
    /// <exception cref="ArgumentOutOfRangeException">draws or threads below 1.</exception>
    public static AcceptabilityResult Run(
        PreparedEvaluation prepared, int draws, ulong seed, AcceptabilityWeights weights = AcceptabilityWeights.Fuzzy, int threads = 1)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(draws, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(threads, 1);
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        var blocks = (draws + BlockSize - 1) / BlockSize;
        var counts = new long[blocks][];
        var central = new double[blocks][];
        var options = new ParallelOptions { MaxDegreeOfParallelism = threads };
        Parallel.For(0, blocks, options, b =>
        {
            var block = new Block(prepared, weights);
            var size = Math.Min(BlockSize, draws - (b * BlockSize));
            block.Run(seed, (ulong)b, size);
            counts[b] = block.Counts;
            central[b] = block.Central;
        });

        var totalCounts = new long[n * n];
        var totalCentral = new double[n * m];
        for (var b = 0; b < blocks; b++)
        {
            for (var x = 0; x < totalCounts.Length; x++)
            {
                totalCounts[x] += counts[b][x];
            }

            for (var x = 0; x < totalCentral.Length; x++)
            {
                totalCentral[x] += central[b][x];
            }
        }

        var alternatives = new RankAcceptability[n];
        var centralVectors = new List<CentralWeightVector>();
        var criteria = prepared.Criteria.Select(c => c.Id).ToArray();
        for (var i = 0; i < n; i++)
        {
            var shares = new double[n];
            var intervals = new ShareInterval[n];
            for (var r = 0; r < n; r++)
            {
                shares[r] = (double)totalCounts[(i * n) + r] / draws;
                intervals[r] = Wilson(shares[r], draws);
            }

            alternatives[i] = new RankAcceptability(prepared.Alternatives[i].Id, shares, intervals);
            var firsts = totalCounts[i * n];
            if (firsts > 0)
            {
                centralVectors.Add(new CentralWeightVector(prepared.Alternatives[i].Id, criteria,
                    Enumerable.Range(0, m).Select(j => totalCentral[(i * m) + j] / firsts).ToArray()));
            }
        }

        return new AcceptabilityResult(draws, seed, weights, alternatives, centralVectors);
    }

    /// <summary>Wilson score interval for a share p̂ of N draws at 95%.</summary>
    public static ShareInterval Wilson(double share, int draws)
    {
        var z2 = Z * Z;
        var denominator = 1 + (z2 / draws);
        var centre = (share + (z2 / (2 * draws))) / denominator;
        var half = Z / denominator * Math.Sqrt((share * (1 - share) / draws) + (z2 / (4.0 * draws * draws)));
        // The interval always contains the share; clamping to it keeps rounding from excluding a share of exactly 0 or 1.
        return new ShareInterval(Math.Min(share, Math.Max(0, centre - half)), Math.Max(share, Math.Min(1, centre + half)));
    }

    /// <summary>One block's buffers and tallies.</summary>
    private sealed class Block
    {
        private readonly PreparedEvaluation _prepared;
        private readonly AcceptabilityWeights _mode;
        private readonly TopsisWorkspace _workspace;
        private readonly Tfn[] _matrix;
        private readonly double[] _crisp;
        private readonly double[] _uniforms;

        public Block(PreparedEvaluation prepared, AcceptabilityWeights mode)
        {
            _prepared = prepared;
            _mode = mode;
            int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
            _workspace = new TopsisWorkspace(n, m);
            _matrix = new Tfn[n * m];
            _crisp = new double[m];
            _uniforms = new double[m + 1];
            Counts = new long[n * n];
            Central = new double[n * m];
        }

        public long[] Counts { get; }

        public double[] Central { get; }

        public void Run(ulong seed, ulong stream, int draws)
        {
            var random = new SeededRandom(seed, stream);
            var source = _prepared.Matrix;
            var fuzzyWeights = _prepared.FuzzyWeights;
            var weights = _workspace.Weights;
            int n = _prepared.Alternatives.Count, m = _prepared.Criteria.Count;
            for (var d = 0; d < draws; d++)
            {
                DrawWeights(ref random, fuzzyWeights, m);
                double total = 0;
                for (var j = 0; j < m; j++)
                {
                    weights[j] = Tfn.Unchecked(_crisp[j], _crisp[j], _crisp[j]);
                    total += _crisp[j];
                }

                for (var x = 0; x < _matrix.Length; x++)
                {
                    var t = source[x];
                    var v = random.NextTriangular(t.Lower, t.Middle, t.Upper);
                    _matrix[x] = Tfn.Unchecked(v, v, v);
                }

                _workspace.Evaluate(_matrix, _prepared.IsCost, weights, _prepared.Source.Options.Ideal);
                var order = _workspace.Order;
                for (var position = 0; position < n; position++)
                {
                    Counts[(order[position] * n) + position]++;
                }

                if (total > 0)
                {
                    var first = order[0] * m;
                    for (var j = 0; j < m; j++)
                    {
                        Central[first + j] += _crisp[j] / total;
                    }
                }
            }
        }

        private void DrawWeights(ref SeededRandom random, Tfn[] fuzzy, int m)
        {
            if (_mode == AcceptabilityWeights.Fuzzy)
            {
                for (var j = 0; j < m; j++)
                {
                    _crisp[j] = random.NextTriangular(fuzzy[j].Lower, fuzzy[j].Middle, fuzzy[j].Upper);
                }

                return;
            }

            // Uniform on the simplex: m − 1 sorted uniforms between 0 and 1; the weights are the gaps.
            var cuts = _uniforms.AsSpan(0, m + 1);
            cuts[0] = 0;
            cuts[m] = 1;
            for (var j = 1; j < m; j++)
            {
                cuts[j] = random.NextDouble();
            }

            cuts[1..m].Sort();
            for (var j = 0; j < m; j++)
            {
                _crisp[j] = cuts[j + 1] - cuts[j];
            }
        }
    }
}
