namespace Decide.Core.Consistency;

/// <summary>
/// Saaty's consistency ratio, the geometric consistency index, the judgements that break consistency most and
/// the intransitive triads of a positive reciprocal matrix.
/// </summary>
/// <remarks>
/// λmax is found by power iteration started from the row geometric means; for a positive matrix it converges to
/// the Perron root (tests cross-check it against MathNet.Numerics' general eigenvalue solver to 1e-9).
/// CI = (λmax − n)/(n − 1), CR = CI/RI(n) (Saaty 1980). GCI = 2/((n−1)(n−2)) Σᵢ&lt;ⱼ (ln aᵢⱼ − ln wᵢ + ln wⱼ)² with w the
/// row geometric means (Aguarón &amp; Moreno-Jiménez 2003). A judgement's "consistent" value is what the other
/// judgements imply for it: the geometric mean of aᵢₖ·aₖⱼ over the other items. See docs/methods.md §5.
/// </remarks>
public static class PairwiseConsistency
{
    private const int MaxIterations = 10_000;
    private const double Tolerance = 1e-15;

    /// <summary>Analyses a crisp positive reciprocal matrix given row by row (n × n).</summary>
    /// <param name="matrix">aᵢⱼ, row-major, n × n; aᵢᵢ = 1, aⱼᵢ = 1/aᵢⱼ.</param>
    /// <param name="items">Item ids in row order, for naming judgements.</param>
    /// <exception cref="ArgumentException">The matrix is not n × n, not positive, or n exceeds the RI table.</exception>
    public static ConsistencyReport Analyse(ReadOnlySpan<double> matrix, IReadOnlyList<string> items)
    {
        var n = items.Count;
        if (n < 1 || matrix.Length != n * n)
        {
            throw new ArgumentException($"Expected an {n} × {n} matrix.", nameof(matrix));
        }

        foreach (var a in matrix)
        {
            if (!(a > 0) || !double.IsFinite(a))
            {
                throw new ArgumentException("Pairwise judgements must be positive and finite.", nameof(matrix));
            }
        }

        var ri = RandomIndex.For(n);
        var (lambda, w) = PrincipalEigen(matrix, n);
        if (n <= 2)
        {
            return new ConsistencyReport(n, n, 0, ri, RandomIndex.TableName, 0, RandomIndex.Threshold(n), true,
                0, RandomIndex.GciThreshold(n), true, w, [], []);
        }

        var ci = Math.Max(0, (lambda - n) / (n - 1));
        var cr = ci / ri;
        var gci = GeometricConsistencyIndex(matrix, n);
        var acceptable = cr <= RandomIndex.Threshold(n);
        var gciAcceptable = gci <= RandomIndex.GciThreshold(n);
        var worst = acceptable && gciAcceptable ? [] : WorstJudgements(matrix, items, 3);
        return new ConsistencyReport(n, lambda, ci, ri, RandomIndex.TableName, cr, RandomIndex.Threshold(n), acceptable,
            gci, RandomIndex.GciThreshold(n), gciAcceptable, w, worst, IntransitiveTriads(matrix, items));
    }

    /// <summary>
    /// The judgements ranked by how far each lies from the value the other judgements imply, largest first; at most
    /// <paramref name="count"/>. The implied value for (i, j) is the geometric mean of the indirect judgements
    /// aᵢₖ·aₖⱼ over every other item k: what the rest of the matrix says about i over j, untouched by the judgement
    /// itself. Needs n ≥ 3.
    /// </summary>
    public static IReadOnlyList<InconsistentJudgement> WorstJudgements(ReadOnlySpan<double> matrix, IReadOnlyList<string> items, int count)
    {
        var n = items.Count;
        if (n < 3)
        {
            return [];
        }

        var all = new List<InconsistentJudgement>(n * (n - 1) / 2);
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                double logSum = 0;
                for (var k = 0; k < n; k++)
                {
                    if (k != i && k != j)
                    {
                        logSum += Math.Log(matrix[(i * n) + k]) + Math.Log(matrix[(k * n) + j]);
                    }
                }

                var given = matrix[(i * n) + j];
                var consistent = Math.Exp(logSum / (n - 2));
                all.Add(new InconsistentJudgement(items[i], items[j], given, consistent, Math.Abs(Math.Log(given / consistent))));
            }
        }

        return all.OrderByDescending(j => j.Deviation).Take(count).ToArray();
    }

    /// <summary>Every three items whose middle judgements form a cycle (a &gt; b, b &gt; c, c &gt; a).</summary>
    public static IReadOnlyList<IReadOnlyList<string>> IntransitiveTriads(ReadOnlySpan<double> matrix, IReadOnlyList<string> items)
    {
        var n = items.Count;
        var triads = new List<IReadOnlyList<string>>();
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                for (var k = j + 1; k < n; k++)
                {
                    double ij = matrix[(i * n) + j], jk = matrix[(j * n) + k], ki = matrix[(k * n) + i];
                    if (ij > 1 && jk > 1 && ki > 1)
                    {
                        triads.Add([items[i], items[j], items[k]]);
                    }
                    else if (ij < 1 && jk < 1 && ki < 1)
                    {
                        triads.Add([items[i], items[k], items[j]]);
                    }
                }
            }
        }

        return triads;
    }

    /// <summary>GCI = 2/((n−1)(n−2)) Σᵢ&lt;ⱼ (ln aᵢⱼ − ln wᵢ + ln wⱼ)², w = row geometric means; 0 for n ≤ 2.</summary>
    public static double GeometricConsistencyIndex(ReadOnlySpan<double> matrix, int n)
    {
        if (n <= 2)
        {
            return 0;
        }

        Span<double> logW = n <= 64 ? stackalloc double[n] : new double[n];
        for (var i = 0; i < n; i++)
        {
            double sum = 0;
            for (var j = 0; j < n; j++)
            {
                sum += Math.Log(matrix[(i * n) + j]);
            }

            logW[i] = sum / n;
        }

        double total = 0;
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                var e = Math.Log(matrix[(i * n) + j]) - logW[i] + logW[j];
                total += e * e;
            }
        }

        return 2 * total / ((n - 1) * (n - 2));
    }

    /// <summary>Perron root and eigenvector (normalised to sum 1) of a positive n × n matrix.</summary>
    public static (double LambdaMax, double[] Eigenvector) PrincipalEigen(ReadOnlySpan<double> matrix, int n)
    {
        var w = new double[n];
        var next = new double[n];
        for (var i = 0; i < n; i++)
        {
            double sum = 0;
            for (var j = 0; j < n; j++)
            {
                sum += Math.Log(matrix[(i * n) + j]);
            }

            w[i] = Math.Exp(sum / n);
        }

        Normalise(w);
        var lambda = double.NaN;
        for (var iteration = 0; iteration < MaxIterations; iteration++)
        {
            double total = 0;
            for (var i = 0; i < n; i++)
            {
                double s = 0;
                for (var j = 0; j < n; j++)
                {
                    s += matrix[(i * n) + j] * w[j];
                }

                next[i] = s;
                total += s;
            }

            // w sums to 1, so the sum of Aw is the Rayleigh-like estimate of λ that converges to λmax.
            lambda = total;
            double change = 0;
            for (var i = 0; i < n; i++)
            {
                var v = next[i] / total;
                change = Math.Max(change, Math.Abs(v - w[i]));
                w[i] = v;
            }

            if (change < Tolerance)
            {
                break;
            }
        }

        return (lambda, w);
    }

    private static void Normalise(Span<double> w)
    {
        double sum = 0;
        foreach (var x in w)
        {
            sum += x;
        }

        for (var i = 0; i < w.Length; i++)
        {
            w[i] /= sum;
        }
    }
}
