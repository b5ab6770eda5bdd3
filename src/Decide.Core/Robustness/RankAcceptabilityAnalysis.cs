using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// Stochastic multicriteria acceptability analysis: how often each alternative takes each rank when the weights
/// and the ratings vary within what the panel said, the weights under which each wins, and how sure a win is at
/// those weights.
/// </summary>
/// <remarks>
/// Lahdelma, Hokkanen &amp; Salminen (1998), "SMAA – Stochastic multiobjective acceptability analysis", EJOR
/// 106:137–143; rank acceptability indices, central weight vectors, confidence factors and the holistic
/// acceptability index as in SMAA-2 (Lahdelma &amp; Salminen 2001, Operations Research 49(3):444–454). Each draw
/// takes a crisp weight per criterion from the triangular distribution on its aggregated fuzzy weight (or a vector
/// uniform on the simplex: sorted uniforms' successive differences), and a crisp rating per cell from the
/// triangular distribution on its aggregated TFN (numeric values stay as measured); then runs TOPSIS with the
/// evaluation's ideal points. Alternatives whose closeness ties within <see cref="FuzzyTopsis.TieTolerance"/> (as
/// crisp cells make likely) share the draw: k tied at positions p … p + k − 1 each get 1/k of a draw at each of
/// those positions, and 1/k of the draw's weight vector towards their central weights; so the shares sum to 1
/// over ranks and over alternatives. A second pass per alternative that ever ranks first fixes the weights at its
/// central weight vector and draws only the ratings (the same number of draws), giving its confidence factor.
/// Draws are split into blocks of <see cref="BlockSize"/>; block b of the first pass uses the generator stream
/// (seed, b), block b of alternative i's confidence pass the stream (seed, (i + 1)·2³² + b), and block results are
/// combined in block order, so the output does not depend on the number of threads. The per-draw loop allocates
/// nothing.
/// </remarks>
public static class RankAcceptabilityAnalysis
{
    /// <summary>Draws per block (the unit of parallel work and of random streams).</summary>
    public const int BlockSize = 256;

    /// <summary>
    /// The most central weight vectors (each with its confidence factor) computed: those of the alternatives that
    /// rank first most often. A tender's handful of winners are all kept; a large round's rare winners are not.
    /// </summary>
    public const int MaxCentralVectors = 8;

    /// <summary>z for a two-sided 95% interval.</summary>
    private const double Z = 1.959963984540054;

    /// <summary>Runs the analysis.</summary>
    /// <param name="prepared">The prepared evaluation.</param>
    /// <param name="draws">Number of draws, at least 1 (each confidence pass makes as many again).</param>
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
        var counts = new double[blocks][];
        var central = new double[blocks][];
        var options = new ParallelOptions { MaxDegreeOfParallelism = threads };
        Parallel.For(0, blocks, options, b =>
        {
            var block = new Block(prepared, weights);
            block.Run(seed, (ulong)b, Size(draws, b));
            counts[b] = block.Counts;
            central[b] = block.Central;
        });

        var totalCounts = new double[n * n];
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

        // Central weight vectors wᵢᶜ for the alternatives that rank first in some draw: every one of them in a tender,
        // but in a round of hundreds, where dozens win a draw now and then and each confidence factor costs as many
        // draws again, the most frequent winners only (see MaxCentralVectors).
        var winners = new List<(int Index, double[] Weights)>();
        var byFirsts = Enumerable.Range(0, n).Where(i => totalCounts[i * n] > 0).OrderByDescending(i => totalCounts[i * n]).ThenBy(i => i).ToArray();
        var kept = byFirsts.Length <= MaxCentralVectors ? byFirsts : byFirsts.Take(MaxCentralVectors).ToArray();
        foreach (var i in kept.Order())
        {
            var firsts = totalCounts[i * n];
            winners.Add((i, Enumerable.Range(0, m).Select(j => totalCentral[(i * m) + j] / firsts).ToArray()));
        }

        var confidence = Confidence(prepared, winners, ConfidenceDraws(n, draws), seed, options);
        var alpha = MetaWeights(n);
        var alternatives = new RankAcceptability[n];
        for (var i = 0; i < n; i++)
        {
            var shares = new double[n];
            var intervals = new ShareInterval[n];
            double holistic = 0;
            for (var r = 0; r < n; r++)
            {
                // A share is a sum of draws and fractions of tied draws; the clamp keeps rounding inside [0, 1].
                shares[r] = Math.Clamp(totalCounts[(i * n) + r] / draws, 0, 1);
                intervals[r] = Wilson(shares[r], draws);
                holistic += alpha[r] * shares[r];
            }

            alternatives[i] = new RankAcceptability(prepared.Alternatives[i].Id, shares, intervals, Math.Clamp(holistic, 0, 1));
        }

        var criteria = prepared.Criteria.Select(c => c.Id).ToArray();
        var centralVectors = winners.Select((w, k) =>
            new CentralWeightVector(prepared.Alternatives[w.Index].Id, criteria, w.Weights, confidence[k])).ToArray();
        return new AcceptabilityResult(draws, seed, weights, alternatives, centralVectors);
    }

    /// <summary>
    /// Draws of each confidence factor: as many as the run's in a tender; in a round of more than
    /// <see cref="CriticalChanges.EveryPairUpTo"/> applications a tenth of them, at least 1,000 (or all, when fewer),
    /// because each of up to <see cref="MaxCentralVectors"/> factors costs a full pass over the matrix per draw. The
    /// factor's binomial error is then at most 0.016 (95%) instead of 0.005 at 10,000 draws.
    /// </summary>
    public static int ConfidenceDraws(int alternatives, int draws) =>
        alternatives <= CriticalChanges.EveryPairUpTo ? draws : Math.Min(draws, Math.Max(1000, draws / 10));

    /// <summary>
    /// The meta-weights αʳ of the holistic acceptability index aᵢʰ = Σᵣ αʳ bᵢʳ (Lahdelma &amp; Salminen 2001): the
    /// linear choice αʳ = (n − r)/(n − 1), so α¹ = 1 ≥ α² ≥ … ≥ αⁿ = 0 (a single alternative gets α¹ = 1).
    /// </summary>
    /// <param name="alternatives">n, the number of alternatives ranked (0 gives an empty list).</param>
    /// <returns>α¹ … αⁿ, each in [0, 1].</returns>
    public static double[] MetaWeights(int alternatives)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(alternatives);
        var alpha = new double[alternatives];
        for (var r = 1; r <= alternatives; r++)
        {
            alpha[r - 1] = alternatives == 1 ? 1 : (double)(alternatives - r) / (alternatives - 1);
        }

        return alpha;
    }

    /// <summary>
    /// Confidence factors pᵢᶜ (Lahdelma &amp; Salminen 2001): per winner, the share of draws of the ratings alone in
    /// which it ranks first when the weights are its central weight vector (tied firsts share the draw).
    /// </summary>
    private static double[] Confidence(
        PreparedEvaluation prepared, List<(int Index, double[] Weights)> winners, int draws, ulong seed, ParallelOptions options)
    {
        var blocks = (draws + BlockSize - 1) / BlockSize;
        var firsts = new double[winners.Count * blocks];
        Parallel.For(0, firsts.Length, options, x =>
        {
            var (k, b) = Math.DivRem(x, blocks);
            var (index, weights) = winners[k];
            var block = new Block(prepared, AcceptabilityWeights.Fuzzy, counting: false);
            firsts[x] = block.RunFixed(seed, ((ulong)(index + 1) << 32) + (ulong)b, Size(draws, b), weights, index);
        });

        var confidence = new double[winners.Count];
        for (var k = 0; k < winners.Count; k++)
        {
            double total = 0;
            for (var b = 0; b < blocks; b++)
            {
                total += firsts[(k * blocks) + b];
            }

            confidence[k] = Math.Clamp(total / draws, 0, 1);
        }

        return confidence;
    }

    private static int Size(int draws, int block) => Math.Min(BlockSize, draws - (block * BlockSize));

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

        public Block(PreparedEvaluation prepared, AcceptabilityWeights mode, bool counting = true)
        {
            _prepared = prepared;
            _mode = mode;
            int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
            _workspace = new TopsisWorkspace(n, m);
            _matrix = new Tfn[n * m];
            _crisp = new double[m];
            _uniforms = new double[m + 1];
            // A confidence pass counts firsts only: the n × n table (2 MB for 500 applications) is not made for it.
            Counts = counting ? new double[n * n] : [];
            Central = counting ? new double[n * m] : [];
        }

        /// <summary>Draws (and fractions of tied draws) per alternative i and position r, at i·n + r.</summary>
        public double[] Counts { get; }

        /// <summary>Per alternative i and criterion j (at i·m + j): the sum of the weight shares of the draws it wins.</summary>
        public double[] Central { get; }

        public void Run(ulong seed, ulong stream, int draws)
        {
            var random = new SeededRandom(seed, stream);
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

                DrawRatings(ref random);
                _workspace.Evaluate(_matrix, _prepared.IsCost, weights, _prepared.Source.Options.Ideal);
                var order = _workspace.Order;
                var closeness = _workspace.Closeness;
                for (var start = 0; start < n;)
                {
                    // The tied group at positions start … end − 1 (each within the tolerance of the one before, as
                    // FuzzyTopsis.Rank groups them) shares those positions equally.
                    var end = start + 1;
                    while (end < n && closeness[order[end - 1]] - closeness[order[end]] <= FuzzyTopsis.TieTolerance)
                    {
                        end++;
                    }

                    var share = 1.0 / (end - start);
                    for (var q = start; q < end; q++)
                    {
                        var row = order[q] * n;
                        for (var r = start; r < end; r++)
                        {
                            Counts[row + r] += share;
                        }

                        if (start == 0 && total > 0)
                        {
                            var first = order[q] * m;
                            for (var j = 0; j < m; j++)
                            {
                                Central[first + j] += share * _crisp[j] / total;
                            }
                        }
                    }

                    start = end;
                }
            }
        }

        /// <summary>
        /// Draws the ratings only, with the weights fixed at <paramref name="shares"/>, and returns in how many draws
        /// (tied firsts counting 1/k) alternative <paramref name="alternative"/> ranks first.
        /// </summary>
        public double RunFixed(ulong seed, ulong stream, int draws, double[] shares, int alternative)
        {
            var random = new SeededRandom(seed, stream);
            var weights = _workspace.Weights;
            int n = _prepared.Alternatives.Count, m = _prepared.Criteria.Count;
            for (var j = 0; j < m; j++)
            {
                weights[j] = Tfn.Unchecked(shares[j], shares[j], shares[j]);
            }

            double firsts = 0;
            var order = _workspace.Order;
            for (var d = 0; d < draws; d++)
            {
                DrawRatings(ref random);

                // Only whether it is among the first matters: the ranking is sorted only when the draw puts it within
                // reach of the top (always, in a tender of a few bids; rarely, in a round of hundreds).
                _workspace.EvaluateCloseness(_matrix, _prepared.IsCost, weights, _prepared.Source.Options.Ideal);
                var closeness = _workspace.Closeness;
                var best = double.NegativeInfinity;
                for (var i = 0; i < n; i++)
                {
                    best = Math.Max(best, closeness[i]);
                }

                if (best - closeness[alternative] > n * FuzzyTopsis.TieTolerance)
                {
                    continue; // not within a chain of ties of the first: no share of first place
                }

                FuzzyTopsis.Rank(closeness, _workspace.Ranks, order);
                var tied = 1;
                var among = order[0] == alternative;
                while (tied < n && closeness[order[tied - 1]] - closeness[order[tied]] <= FuzzyTopsis.TieTolerance)
                {
                    among |= order[tied] == alternative;
                    tied++;
                }

                if (among)
                {
                    firsts += 1.0 / tied;
                }
            }

            return firsts;
        }

        private void DrawRatings(ref SeededRandom random)
        {
            var source = _prepared.Matrix;
            for (var x = 0; x < _matrix.Length; x++)
            {
                var t = source[x];
                var v = random.NextTriangular(t.Lower, t.Middle, t.Upper);
                _matrix[x] = Tfn.Unchecked(v, v, v);
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
