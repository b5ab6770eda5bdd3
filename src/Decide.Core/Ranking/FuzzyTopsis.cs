using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Core.Ranking;

/// <summary>
/// Fuzzy TOPSIS (Chen 2000) on an aggregated decision matrix: normalise, weight, measure vertex distances to the
/// ideal points, and compute closeness coefficients. The kernel works on caller-provided buffers and allocates
/// nothing, so robustness analysis can call it many thousand times.
/// </summary>
/// <remarks>
/// Chen, C.-T. (2000), "Extensions of the TOPSIS for group decision-making under fuzzy environment", Fuzzy Sets
/// and Systems 114:1–9. Benefit (eq. 15): r̃ᵢⱼ = (aᵢⱼ/cⱼ*, bᵢⱼ/cⱼ*, cᵢⱼ/cⱼ*), cⱼ* = maxᵢ cᵢⱼ (r̃ = 0 when
/// cⱼ* = 0). Cost (eq. 15): r̃ᵢⱼ = (aⱼ⁻/cᵢⱼ, aⱼ⁻/bᵢⱼ, aⱼ⁻/aᵢⱼ), aⱼ⁻ = minᵢ aᵢⱼ, which needs every aᵢⱼ &gt; 0 (the
/// validator guarantees it). Weighted (eq. 16): ṽᵢⱼ = r̃ᵢⱼ ⊗ (w̃ⱼ / β), where β is the largest upper value of the
/// weights when it exceeds 1 and 1 otherwise (<see cref="WeightBound"/>): the paper's unit ideal points (1, 1, 1) and
/// (0, 0, 0) assume every ṽᵢⱼ lies in [0, 1] (§3, after eq. 16), and without β a weighted value above 1 would move
/// away from the ideal as it grows, so a dearer copy of a bid could overtake the original. Dividing every weight by
/// one number leaves the crisp shares unchanged. Distances (eqs. 17–18): d⁺ᵢ = Σⱼ d(ṽᵢⱼ, ṽⱼ*),
/// d⁻ᵢ = Σⱼ d(ṽᵢⱼ, ṽⱼ⁻); closeness (eq. 19): CCᵢ = d⁻ᵢ/(d⁺ᵢ + d⁻ᵢ). When d⁺ + d⁻ = 0 (every alternative identical
/// and crisp under extreme ideal points) CC = 0.5 for all. The tests check the paper's worked example, whose
/// printed tables have errata (docs/methods.md §6).
/// </remarks>
public static class FuzzyTopsis
{
    /// <summary>
    /// Runs fuzzy TOPSIS.
    /// </summary>
    /// <param name="matrix">Aggregated ratings x̃ᵢⱼ, alternative-major (n × m), non-negative.</param>
    /// <param name="criteria">m, the number of criteria.</param>
    /// <param name="isCost">Per criterion: true for a cost criterion.</param>
    /// <param name="weights">Fuzzy weight per criterion, non-negative.</param>
    /// <param name="ideal">Which ideal points.</param>
    /// <param name="weighted">Scratch and output: ṽᵢⱼ (n × m).</param>
    /// <param name="dPlus">Output: d⁺ per alternative.</param>
    /// <param name="dMinus">Output: d⁻ per alternative.</param>
    /// <param name="closeness">Output: CC per alternative.</param>
    /// <param name="dPlusByCriterion">Optional output (n × m or empty): each criterion's term of d⁺.</param>
    /// <param name="dMinusByCriterion">Optional output (n × m or empty): each criterion's term of d⁻.</param>
    public static void Evaluate(
        ReadOnlySpan<Tfn> matrix,
        int criteria,
        ReadOnlySpan<bool> isCost,
        ReadOnlySpan<Tfn> weights,
        IdealPoints ideal,
        Span<Tfn> weighted,
        Span<double> dPlus,
        Span<double> dMinus,
        Span<double> closeness,
        Span<double> dPlusByCriterion = default,
        Span<double> dMinusByCriterion = default)
    {
        var m = criteria;
        var n = m == 0 ? 0 : matrix.Length / m;
        if (matrix.Length != n * m || isCost.Length != m || weights.Length != m || weighted.Length != matrix.Length
            || dPlus.Length != n || dMinus.Length != n || closeness.Length != n)
        {
            throw new ArgumentException("Buffer sizes do not match the matrix.");
        }

        var detailed = dPlusByCriterion.Length == matrix.Length && dMinusByCriterion.Length == matrix.Length;
        Normalise(matrix, n, m, isCost, weights, weighted);

        dPlus.Clear();
        dMinus.Clear();
        for (var j = 0; j < m; j++)
        {
            Tfn best, worst;
            if (ideal == IdealPoints.Unit)
            {
                best = Tfn.One;
                worst = Tfn.Zero;
            }
            else
            {
                double hi = double.NegativeInfinity, lo = double.PositiveInfinity;
                for (var i = 0; i < n; i++)
                {
                    hi = Math.Max(hi, weighted[(i * m) + j].Upper);
                    lo = Math.Min(lo, weighted[(i * m) + j].Lower);
                }

                best = Tfn.Unchecked(hi, hi, hi);
                worst = Tfn.Unchecked(lo, lo, lo);
            }

            for (var i = 0; i < n; i++)
            {
                var v = weighted[(i * m) + j];
                var plus = Tfn.Distance(v, best);
                var minus = Tfn.Distance(v, worst);
                dPlus[i] += plus;
                dMinus[i] += minus;
                if (detailed)
                {
                    dPlusByCriterion[(i * m) + j] = plus;
                    dMinusByCriterion[(i * m) + j] = minus;
                }
            }
        }

        for (var i = 0; i < n; i++)
        {
            var total = dPlus[i] + dMinus[i];
            closeness[i] = total > 0 ? dMinus[i] / total : 0.5;
        }
    }

    /// <summary>
    /// Writes the weighted normalised matrix ṽᵢⱼ = r̃ᵢⱼ ⊗ (w̃ⱼ / β) (Chen 2000, eqs. 15–16) into
    /// <paramref name="weighted"/>; β = <see cref="WeightBound(ReadOnlySpan{Tfn})"/>, so every ṽᵢⱼ lies in [0, 1].
    /// </summary>
    public static void Normalise(
        ReadOnlySpan<Tfn> matrix, int n, int m, ReadOnlySpan<bool> isCost, ReadOnlySpan<Tfn> weights, Span<Tfn> weighted)
    {
        var bound = WeightBound(weights);
        for (var j = 0; j < m; j++)
        {
            var w = bound == 1 ? weights[j] : Tfn.Unchecked(weights[j].Lower / bound, weights[j].Middle / bound, weights[j].Upper / bound);
            if (isCost[j])
            {
                var aMin = double.PositiveInfinity;
                for (var i = 0; i < n; i++)
                {
                    aMin = Math.Min(aMin, matrix[(i * m) + j].Lower);
                }

                for (var i = 0; i < n; i++)
                {
                    var x = matrix[(i * m) + j];
                    weighted[(i * m) + j] = Tfn.Unchecked(
                        aMin / x.Upper * w.Lower, aMin / x.Middle * w.Middle, aMin / x.Lower * w.Upper);
                }
            }
            else
            {
                var cMax = 0.0;
                for (var i = 0; i < n; i++)
                {
                    cMax = Math.Max(cMax, matrix[(i * m) + j].Upper);
                }

                var scale = cMax > 0 ? 1 / cMax : 0;
                for (var i = 0; i < n; i++)
                {
                    var x = matrix[(i * m) + j];
                    weighted[(i * m) + j] = Tfn.Unchecked(
                        x.Lower * scale * w.Lower, x.Middle * scale * w.Middle, x.Upper * scale * w.Upper);
                }
            }
        }
    }

    /// <summary>
    /// β, the number every weight is divided by before it enters TOPSIS: the largest upper value of
    /// <paramref name="weights"/> when that exceeds 1, otherwise 1. Normalised ratings lie in [0, 1], so weights
    /// within [0, 1] keep every weighted value within [0, 1], as the unit ideal points assume (Chen 2000, §3 after
    /// eq. 16). One divisor for all criteria leaves the crisp shares unchanged.
    /// </summary>
    public static double WeightBound(ReadOnlySpan<Tfn> weights)
    {
        var largest = 0.0;
        foreach (var w in weights)
        {
            largest = Math.Max(largest, w.Upper);
        }

        return largest > 1 ? largest : 1;
    }

    /// <summary>
    /// Competition ranks by closeness, best = 1; closeness values within 1e-12 of each other share a rank
    /// (ranks 1, 2, 2, 4). <paramref name="order"/> receives the alternatives best first (ties in input order).
    /// </summary>
    public static void Rank(ReadOnlySpan<double> closeness, Span<int> ranks, Span<int> order)
    {
        var n = closeness.Length;
        for (var i = 0; i < n; i++)
        {
            order[i] = i;
        }

        if (n <= InsertionLimit)
        {
            // Insertion sort: stable and allocation-free; the quickest for the tens of bids of a tender.
            for (var i = 1; i < n; i++)
            {
                var current = order[i];
                var k = i - 1;
                while (k >= 0 && closeness[order[k]] < closeness[current])
                {
                    order[k + 1] = order[k];
                    k--;
                }

                order[k + 1] = current;
            }
        }
        else
        {
            // A round of hundreds of applications: a stable bottom-up merge sort gives the same order in n log n.
            var scratch = n <= 4096 ? stackalloc int[n] : new int[n];
            MergeSort(closeness, order[..n], scratch);
        }

        for (var position = 0; position < n; position++)
        {
            var i = order[position];
            ranks[i] = position > 0 && closeness[order[position - 1]] - closeness[i] <= TieTolerance
                ? ranks[order[position - 1]]
                : position + 1;
        }
    }

    /// <summary>Up to this many alternatives <see cref="Rank"/> sorts by insertion; above it by merging.</summary>
    private const int InsertionLimit = 32;

    /// <summary>
    /// Sorts <paramref name="order"/> by closeness, highest first, keeping the input order of equal values (the
    /// order insertion sort gives): runs of 16 by insertion, then merges of doubling width between the two buffers.
    /// </summary>
    private static void MergeSort(ReadOnlySpan<double> closeness, Span<int> order, Span<int> scratch)
    {
        var n = order.Length;
        const int run = 16;
        for (var start = 0; start < n; start += run)
        {
            var end = Math.Min(start + run, n);
            for (var i = start + 1; i < end; i++)
            {
                var current = order[i];
                var k = i - 1;
                while (k >= start && closeness[order[k]] < closeness[current])
                {
                    order[k + 1] = order[k];
                    k--;
                }

                order[k + 1] = current;
            }
        }

        var from = order;
        var to = scratch;
        for (var width = run; width < n; width *= 2)
        {
            for (var left = 0; left < n; left += 2 * width)
            {
                int mid = Math.Min(left + width, n), right = Math.Min(left + (2 * width), n);
                int a = left, b = mid, o = left;
                while (a < mid && b < right)
                {
                    // Take from the left on equal closeness: earlier input stays first.
                    to[o++] = closeness[from[b]] > closeness[from[a]] ? from[b++] : from[a++];
                }

                while (a < mid)
                {
                    to[o++] = from[a++];
                }

                while (b < right)
                {
                    to[o++] = from[b++];
                }
            }

            var swap = from;
            from = to;
            to = swap;
        }

        if (from != order)
        {
            from.CopyTo(order);
        }
    }

    /// <summary>Closeness values closer than this are an exact tie (summation order alone can differ by ~1e-16).</summary>
    public const double TieTolerance = 1e-12;
}
