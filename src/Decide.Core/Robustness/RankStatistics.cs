namespace Decide.Core.Robustness;

/// <summary>
/// Rank statistics for comparing rankings: average ranks, Kendall's coefficient of concordance W (with the tie
/// correction) and Kendall's tau-b.
/// </summary>
/// <remarks>
/// <para>W: m rankings of n objects, Rᵢ = the sum of object i's ranks, S = Σᵢ (Rᵢ − R̄)²,
/// W = 12S / (m²(n³ − n) − m·ΣT) where T = Σ (t³ − t) over each ranking's groups of t tied ranks; χ² = m(n − 1)W
/// with n − 1 degrees of freedom (Kendall &amp; Babington Smith 1939, Ann. Math. Statist. 10:275–287; tie correction
/// as in Kothari 2004, Research Methodology, 2nd ed., pp. 307–310). The tests reproduce ProofWiki's example
/// (W = 1/16) and Kothari's tie term (ΣT/12 = 2.5).</para>
/// <para>Tau-b: (C − D) / √((n₀ − n₁)(n₀ − n₂)) with C, D the concordant and discordant pairs, n₀ = n(n − 1)/2 and
/// n₁, n₂ the pairs tied in x and in y (Kendall 1945, Biometrika 33:239–251), counted in O(n log n) by Knight's
/// method (1966, JASA 61:436–439). The tests compare it with a direct count of all pairs.</para>
/// <para>Degenerate inputs never throw: they return null, meaning "not defined" (fewer than two rankings or objects,
/// or no ranking that tells any objects apart).</para>
/// </remarks>
public static class RankStatistics
{
    /// <summary>Scores closer than this are tied (the same tolerance as <see cref="Ranking.FuzzyTopsis.TieTolerance"/>).</summary>
    public const double TieTolerance = Ranking.FuzzyTopsis.TieTolerance;

    /// <summary>
    /// Ranks scores with the highest first (rank 1); tied scores share the average of the ranks they span (two
    /// scores tied for second place both get 2.5). Scores within <see cref="TieTolerance"/> of their neighbour in
    /// sorted order are tied, so a chain of near-equal scores forms one group, as in the closeness ranking.
    /// </summary>
    /// <param name="scores">Scores, any finite values.</param>
    /// <param name="ranks">Output, the same length: each score's average rank (1 … n; they sum to n(n + 1)/2).</param>
    /// <exception cref="ArgumentException">The lengths differ or a score is not finite.</exception>
    public static void AverageRanks(ReadOnlySpan<double> scores, Span<double> ranks)
    {
        var n = scores.Length;
        if (ranks.Length != n)
        {
            throw new ArgumentException("The ranks buffer must have one place per score.", nameof(ranks));
        }

        foreach (var s in scores)
        {
            if (!double.IsFinite(s))
            {
                throw new ArgumentException("Scores must be finite numbers.", nameof(scores));
            }
        }

        // Sort the indices by descending score (negated keys, ascending). The order among exactly equal scores does
        // not matter: they land in one tie group either way.
        var order = n <= 256 ? stackalloc int[n] : new int[n];
        var keys = n <= 256 ? stackalloc double[n] : new double[n];
        for (var i = 0; i < n; i++)
        {
            order[i] = i;
            keys[i] = -scores[i];
        }

        keys.Sort(order);
        var start = 0;
        while (start < n)
        {
            var end = start + 1;
            while (end < n && scores[order[end - 1]] - scores[order[end]] <= TieTolerance)
            {
                end++;
            }

            // Positions start … end − 1 hold ranks start + 1 … end; their average is (start + 1 + end) / 2.
            var average = (start + 1 + end) / 2.0;
            for (var p = start; p < end; p++)
            {
                ranks[order[p]] = average;
            }

            start = end;
        }
    }

    /// <summary>
    /// The tie term Σ (t³ − t) of one ranking, summed over its groups of t equal ranks (a group of one adds 0).
    /// Kendall's W subtracts m times the sum of this over the m rankings from its denominator; Kothari (2004)
    /// writes it divided by 12.
    /// </summary>
    /// <param name="ranks">One ranking (any order); ranks within <see cref="TieTolerance"/> are equal.</param>
    public static double TieCorrection(ReadOnlySpan<double> ranks)
    {
        var n = ranks.Length;
        var sorted = n <= 256 ? stackalloc double[n] : new double[n];
        ranks.CopyTo(sorted);
        sorted.Sort();
        double total = 0;
        var start = 0;
        while (start < n)
        {
            var end = start + 1;
            while (end < n && sorted[end] - sorted[end - 1] <= TieTolerance)
            {
                end++;
            }

            double t = end - start;
            total += (t * t * t) - t;
            start = end;
        }

        return total;
    }

    /// <summary>
    /// Kendall's coefficient of concordance W of several rankings of the same objects, corrected for ties, with
    /// χ² = m(n − 1)W, its n − 1 degrees of freedom and the upper-tail p-value.
    /// </summary>
    /// <param name="ranksByAssessor">
    /// One ranking per row (m rows), each the ranks of the same n objects in the same order: 1 … n with ties
    /// averaged, as <see cref="AverageRanks"/> writes them.
    /// </param>
    /// <returns>
    /// The concordance, or null when it is not defined: fewer than two rankings (nothing to agree with), fewer than
    /// two objects (nothing to rank), or every ranking ties every object (no preference to agree on; the
    /// denominator is 0).
    /// </returns>
    /// <exception cref="ArgumentException">
    /// A row is missing or of a different length, holds a value that is not finite, or does not sum to
    /// n(n + 1)/2 (it is not a ranking).
    /// </exception>
    public static Concordance? KendallW(double[][] ranksByAssessor)
    {
        ArgumentNullException.ThrowIfNull(ranksByAssessor);
        var m = ranksByAssessor.Length;
        var n = m == 0 ? 0 : ranksByAssessor[0]?.Length ?? 0;
        var expectedSum = n * (n + 1) / 2.0;
        for (var a = 0; a < m; a++)
        {
            var row = ranksByAssessor[a];
            if (row is null || row.Length != n)
            {
                throw new ArgumentException($"Ranking {a} must rank the same {n} objects as ranking 0.", nameof(ranksByAssessor));
            }

            double sum = 0;
            foreach (var r in row)
            {
                if (!double.IsFinite(r))
                {
                    throw new ArgumentException($"Ranking {a} holds a rank that is not a finite number.", nameof(ranksByAssessor));
                }

                sum += r;
            }

            if (Math.Abs(sum - expectedSum) > 1e-9 * Math.Max(1, expectedSum))
            {
                throw new ArgumentException(
                    $"Ranking {a} sums to {sum} but ranks of {n} objects sum to {expectedSum}; pass ranks 1 … n with ties averaged, not scores.",
                    nameof(ranksByAssessor));
            }
        }

        if (m < 2 || n < 2)
        {
            return null;
        }

        var rankSums = new double[n];
        double ties = 0;
        foreach (var row in ranksByAssessor)
        {
            for (var i = 0; i < n; i++)
            {
                rankSums[i] += row[i];
            }

            ties += TieCorrection(row);
        }

        double mean = m * (n + 1) / 2.0, s = 0;
        foreach (var r in rankSums)
        {
            s += (r - mean) * (r - mean);
        }

        double full = (double)m * m * (((double)n * n * n) - n);
        var denominator = full - (m * ties);
        if (!(denominator > 1e-9 * full))
        {
            return null;
        }

        var w = Math.Clamp(12 * s / denominator, 0, 1);
        var chiSquare = m * (n - 1) * w;
        return new Concordance(w, chiSquare, n - 1, SpecialFunctions.ChiSquareSurvival(chiSquare, n - 1), m, n);
    }

    /// <summary>
    /// Kendall's tau-b between two paired series: +1 when they order every pair the same way, −1 when every pair is
    /// reversed, adjusted for ties in either series. Values within <see cref="TieTolerance"/> are tied (each series
    /// is first reduced to its <see cref="AverageRanks"/>, which leaves tau-b unchanged).
    /// </summary>
    /// <param name="x">First series, finite values.</param>
    /// <param name="y">Second series, the same length.</param>
    /// <returns>
    /// Tau-b in [−1, 1], or null when it is not defined: fewer than two pairs, or one series ties every value (it
    /// orders nothing, so there is no order to compare).
    /// </returns>
    /// <exception cref="ArgumentException">The lengths differ or a value is not finite.</exception>
    public static double? KendallTauB(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        var n = x.Length;
        if (y.Length != n)
        {
            throw new ArgumentException("Kendall's tau-b needs two series of the same length.", nameof(y));
        }

        var rx = new double[n];
        var ry = new double[n];
        AverageRanks(x, rx);
        AverageRanks(y, ry);
        if (n < 2)
        {
            return null;
        }

        // Knight (1966): sort by (x, y); pairs tied in x, and in both, are counted from runs; the discordant pairs
        // are the inversions a stable merge sort by y removes; pairs tied in y are counted from runs afterwards.
        // The average ranks are exact multiples of ½, so exact comparisons are safe here.
        var order = new int[n];
        for (var i = 0; i < n; i++)
        {
            order[i] = i;
        }

        Array.Sort(order, (i, j) => rx[i] != rx[j] ? rx[i].CompareTo(rx[j]) : ry[i].CompareTo(ry[j]));

        long pairs = (long)n * (n - 1) / 2;
        long tiedX = 0, tiedBoth = 0;
        long runX = 1, runBoth = 1;
        for (var p = 1; p <= n; p++)
        {
            var sameX = p < n && rx[order[p]] == rx[order[p - 1]];
            var sameBoth = sameX && ry[order[p]] == ry[order[p - 1]];
            runBoth = sameBoth ? runBoth + 1 : Close(runBoth, ref tiedBoth);
            runX = sameX ? runX + 1 : Close(runX, ref tiedX);
        }

        var buffer = new int[n];
        var swaps = MergeSortCountingInversions(order, buffer, ry, 0, n);

        long tiedY = 0, runY = 1;
        for (var p = 1; p <= n; p++)
        {
            var sameY = p < n && ry[order[p]] == ry[order[p - 1]];
            runY = sameY ? runY + 1 : Close(runY, ref tiedY);
        }

        // C − D = n₀ − n₁ − n₂ + n₃ − 2·swaps (the pairs tied in neither series are C + D).
        var difference = pairs - tiedX - tiedY + tiedBoth - (2 * swaps);
        var denominator = Math.Sqrt((double)(pairs - tiedX) * (pairs - tiedY));
        return denominator > 0 ? Math.Clamp(difference / denominator, -1, 1) : null;
    }

    /// <summary>Adds the t(t − 1)/2 pairs of a finished run of t equal values; returns 1 to start the next run.</summary>
    private static long Close(long run, ref long tied)
    {
        tied += run * (run - 1) / 2;
        return 1;
    }

    /// <summary>Sorts order[lo..hi) stably by key, returning the number of pairs it had in strictly the wrong order.</summary>
    private static long MergeSortCountingInversions(int[] order, int[] buffer, double[] key, int lo, int hi)
    {
        if (hi - lo < 2)
        {
            return 0;
        }

        var mid = (lo + hi) / 2;
        var inversions = MergeSortCountingInversions(order, buffer, key, lo, mid)
            + MergeSortCountingInversions(order, buffer, key, mid, hi);
        int left = lo, right = mid, k = lo;
        while (left < mid && right < hi)
        {
            if (key[order[right]] < key[order[left]])
            {
                inversions += mid - left; // the right element jumps every remaining left element
                buffer[k++] = order[right++];
            }
            else
            {
                buffer[k++] = order[left++];
            }
        }

        while (left < mid)
        {
            buffer[k++] = order[left++];
        }

        while (right < hi)
        {
            buffer[k++] = order[right++];
        }

        Array.Copy(buffer, lo, order, lo, hi - lo);
        return inversions;
    }
}
