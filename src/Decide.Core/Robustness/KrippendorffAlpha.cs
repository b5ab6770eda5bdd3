namespace Decide.Core.Robustness;

/// <summary>The level of measurement Krippendorff's alpha treats the values at, which sets how far apart two values are.</summary>
public enum AlphaMetric
{
    /// <summary>Values are names: two values either agree or they do not.</summary>
    Nominal,

    /// <summary>Values are ordered: the distance between two values grows with how many values lie between them.</summary>
    Ordinal,

    /// <summary>Values are numbers on an interval scale: the distance is the squared difference.</summary>
    Interval,

    /// <summary>Values are numbers with a true zero: the distance is the squared difference relative to the sum.</summary>
    Ratio,
}

/// <summary>Krippendorff's alpha with its bootstrap interval.</summary>
/// <param name="Metric">The level of measurement.</param>
/// <param name="Alpha">α: 1 for perfect agreement, 0 for agreement no better than chance, below 0 for systematic disagreement.</param>
/// <param name="Low">The 2.5th percentile of α over the bootstrap resamples.</param>
/// <param name="High">The 97.5th percentile of α over the bootstrap resamples.</param>
/// <param name="Units">Units with at least two values (the only ones that count).</param>
/// <param name="PairableValues">n: the values in those units.</param>
/// <param name="Draws">Bootstrap resamples taken.</param>
public sealed record AlphaEstimate(AlphaMetric Metric, double Alpha, double Low, double High, int Units, int PairableValues, int Draws);

/// <summary>
/// Krippendorff's alpha, the agreement coefficient that stays valid when coders rate different subsets of units
/// (missing values), for any number of coders and any level of measurement; computed from the coincidence matrix
/// as in Krippendorff, "Computing Krippendorff's Alpha-Reliability" (2011, Annenberg School for Communication,
/// University of Pennsylvania): α = 1 − (n − 1) Σ o_ck δ²_ck ∕ Σ n_c n_k δ²_ck.
/// </summary>
/// <remarks>
/// The interval is a bootstrap over units (cells resampled with replacement, each with all its values, seeded so the
/// same data always give the same interval): the reliability of the panel's data as a sample of cells. It is not
/// Krippendorff's own resampling of pairable values, which answers a slightly different question; both are in use.
/// </remarks>
public static class KrippendorffAlpha
{
    /// <summary>Bootstrap resamples taken by default.</summary>
    public const int DefaultDraws = 1000;

    /// <summary>
    /// α of the given reliability data, or null when it is not defined (fewer than two pairable values, or every
    /// pairable value the same so that no disagreement is expected).
    /// </summary>
    /// <param name="units">Per unit, the values the coders who coded it gave (a missing value is simply absent).</param>
    /// <param name="metric">The level of measurement.</param>
    public static double? Compute(IReadOnlyList<IReadOnlyList<double>> units, AlphaMetric metric)
    {
        ArgumentNullException.ThrowIfNull(units);
        var data = Prepare(units);
        return data.Alpha(metric, data.AllUnits());
    }

    /// <summary>α with a seeded 95% bootstrap interval over units; null when α is not defined.</summary>
    /// <param name="units">Per unit, the values given.</param>
    /// <param name="metric">The level of measurement.</param>
    /// <param name="draws">Bootstrap resamples; 0 gives the interval [α, α].</param>
    /// <param name="seed">Seed of the resampling.</param>
    public static AlphaEstimate? Estimate(IReadOnlyList<IReadOnlyList<double>> units, AlphaMetric metric, int draws = DefaultDraws, ulong seed = 1)
    {
        ArgumentNullException.ThrowIfNull(units);
        ArgumentOutOfRangeException.ThrowIfNegative(draws);
        var data = Prepare(units);
        var all = data.AllUnits();
        if (data.Alpha(metric, all) is not { } alpha)
        {
            return null;
        }

        var samples = new List<double>(draws);
        var pick = new int[all.Length];
        var random = new SeededRandom(seed, 0xA1FA);
        for (var d = 0; d < draws; d++)
        {
            for (var i = 0; i < pick.Length; i++)
            {
                pick[i] = all[(int)(random.NextDouble() * all.Length)];
            }

            if (data.Alpha(metric, pick) is { } resampled)
            {
                samples.Add(resampled);
            }
        }

        samples.Sort();
        var low = samples.Count == 0 ? alpha : Percentile(samples, 0.025);
        var high = samples.Count == 0 ? alpha : Percentile(samples, 0.975);
        return new AlphaEstimate(metric, alpha, low, high, all.Length, data.Pairable(all), draws);
    }

    private static double Percentile(List<double> sorted, double p)
    {
        var position = p * (sorted.Count - 1);
        var below = (int)Math.Floor(position);
        var above = Math.Min(below + 1, sorted.Count - 1);
        return sorted[below] + ((position - below) * (sorted[above] - sorted[below]));
    }

    private static Data Prepare(IReadOnlyList<IReadOnlyList<double>> units)
    {
        var values = units.SelectMany(u => u).Where(double.IsFinite).Distinct().Order().ToArray();
        var index = values.Select((v, i) => (v, i)).ToDictionary(x => x.v, x => x.i);
        var counts = new List<int[]>();
        foreach (var unit in units)
        {
            var finite = unit.Where(double.IsFinite).ToArray();
            if (finite.Length < 2)
            {
                continue; // a value nobody else gave to the unit cannot be paired: it takes no part
            }

            var c = new int[values.Length];
            foreach (var v in finite)
            {
                c[index[v]]++;
            }

            counts.Add(c);
        }

        return new Data(values, counts.ToArray());
    }

    /// <summary>The distinct values and, per pairable unit, how often each value was given.</summary>
    private sealed class Data
    {
        private readonly double[] _values;
        private readonly int[][] _counts;

        // Per unit, its non-zero coincidences as (cell a·v + b, pairs ∕ (m − 1)): a unit of three ratings has at most
        // nine, so a bootstrap resample adds a few numbers per unit instead of a v × v table.
        private readonly (int Cell, double Weight)[][] _coincidences;

        public Data(double[] values, int[][] counts)
        {
            _values = values;
            _counts = counts;
            var v = values.Length;
            _coincidences = counts.Select(c =>
            {
                var m = c.Sum();
                var list = new List<(int, double)>();
                for (var a = 0; a < v; a++)
                {
                    if (c[a] == 0)
                    {
                        continue;
                    }

                    for (var b = 0; b < v; b++)
                    {
                        // Pairs of values within the unit, each ordered pair of different coders once.
                        var pairs = a == b ? c[a] * (c[a] - 1) : c[a] * c[b];
                        if (pairs > 0)
                        {
                            list.Add(((a * v) + b, pairs / (double)(m - 1)));
                        }
                    }
                }

                return list.ToArray();
            }).ToArray();
        }

        public int[] AllUnits() => Enumerable.Range(0, _counts.Length).ToArray();

        public int Pairable(int[] units) => units.Sum(u => _counts[u].Sum());

        public double? Alpha(AlphaMetric metric, int[] units)
        {
            var v = _values.Length;
            var o = new double[v * v];
            foreach (var u in units)
            {
                foreach (var (cell, weight) in _coincidences[u])
                {
                    o[cell] += weight;
                }
            }

            var marginal = new double[v];
            double n = 0;
            for (var a = 0; a < v; a++)
            {
                for (var b = 0; b < v; b++)
                {
                    marginal[a] += o[(a * v) + b];
                }

                n += marginal[a];
            }

            if (n < 2)
            {
                return null;
            }

            double observed = 0, expected = 0;
            for (var a = 0; a < v; a++)
            {
                for (var b = 0; b < v; b++)
                {
                    if (a == b)
                    {
                        continue;
                    }

                    var d = Distance(metric, a, b, marginal);
                    observed += o[(a * v) + b] * d;
                    expected += marginal[a] * marginal[b] * d;
                }
            }

            return expected <= 0 ? null : 1 - ((n - 1) * observed / expected);
        }

        private double Distance(AlphaMetric metric, int a, int b, double[] marginal)
        {
            switch (metric)
            {
                case AlphaMetric.Nominal:
                    return 1;
                case AlphaMetric.Interval:
                    var diff = _values[a] - _values[b];
                    return diff * diff;
                case AlphaMetric.Ratio:
                    var sum = _values[a] + _values[b];
                    var rel = sum == 0 ? 0 : (_values[a] - _values[b]) / sum;
                    return rel * rel;
                default:
                    // Ordinal: the marginal frequencies from one value to the other, the two ends counted by half.
                    int lo = Math.Min(a, b), hi = Math.Max(a, b);
                    double between = 0;
                    for (var g = lo; g <= hi; g++)
                    {
                        between += marginal[g];
                    }

                    between -= (marginal[lo] + marginal[hi]) / 2;
                    return between * between;
            }
        }
    }
}
