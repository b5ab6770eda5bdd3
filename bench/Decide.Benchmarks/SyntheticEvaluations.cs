using System.Globalization;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Benchmarks;

/// <summary>
/// Builds invented but plausible evaluations of any size from a seed, so every benchmark run measures the same
/// input. The shape follows a procurement panel: about 80% of the criteria are linguistic benefit criteria, the rest
/// numeric cost criteria (price, delivery days), plus one pass/fail gate that every bid passes. Every assessor rates
/// every linguistic cell with a term and a rationale.
/// </summary>
/// <remarks>
/// Ratings scatter around a hidden quality per bid and criterion; importance terms scatter around a hidden
/// importance per criterion. Pairwise judgements are the hidden weight ratios wᵢ/wⱼ with log-normal noise, snapped
/// to the nearest code of the pairwise-9 scale, so the matrices are nearly (not exactly) consistent. With more than
/// <see cref="MaxUngrouped"/> scored criteria, the criteria are put into groups of about <see cref="GroupSize"/> so
/// that no pairwise matrix exceeds the random-index table (10 items): 60 criteria give 6 groups, the typical 11 scored
/// criteria 2, with the gate outside them.
/// </remarks>
public static class SyntheticEvaluations
{
    /// <summary>Most scored criteria kept at the top level; above this the criteria are grouped.</summary>
    public const int MaxUngrouped = Decide.Core.Consistency.RandomIndex.MaxOrder;

    /// <summary>Target number of criteria per group when grouping.</summary>
    public const int GroupSize = 10;

    /// <summary>The seed used when none is given.</summary>
    public const int DefaultSeed = 20261201;

    /// <summary>Creates an evaluation of the given size, weighted by importance ratings or pairwise judgements.</summary>
    /// <param name="size">Alternatives, criteria (including the gate, at least 3) and assessors.</param>
    /// <param name="weighting">Importance ratings or pairwise judgements.</param>
    /// <param name="seed">Seed of the random generator; the same seed gives the same evaluation.</param>
    public static Evaluation Create(PanelSize size, WeightingMethod weighting, int seed = DefaultSeed)
    {
        ArgumentNullException.ThrowIfNull(size);
        ArgumentOutOfRangeException.ThrowIfLessThan(size.Alternatives, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(size.Criteria, 3);
        ArgumentOutOfRangeException.ThrowIfLessThan(size.Assessors, 1);

        var random = new Random(seed);
        int n = size.Alternatives, m = size.Criteria, k = size.Assessors;
        var scored = m - 1;
        var linguistic = Math.Max(1, (int)Math.Floor(0.8 * m));
        var numeric = scored - linguistic;
        var groupCount = scored > MaxUngrouped ? (scored + GroupSize - 1) / GroupSize : 0;

        var groups = Enumerable.Range(0, groupCount)
            .Select(g => new CriterionGroup($"G{g + 1}", $"Award area {g + 1}"))
            .ToArray();

        var numericAt = new HashSet<int>();
        for (var t = 0; t < numeric; t++)
        {
            numericAt.Add((int)((t + 0.5) * scored / numeric));
        }

        var criteria = new List<Criterion>(m) { new("EXCL", "Exclusion grounds cleared", CriterionKind.Gate) };
        var unitOf = new Dictionary<string, string>(StringComparer.Ordinal);
        for (var j = 0; j < scored; j++)
        {
            var id = Id("C", j, scored);
            var group = groupCount > 0 ? groups[j * groupCount / scored].Id : null;
            if (numericAt.Contains(j))
            {
                var unit = unitOf.Count % 2 == 0 ? "EUR" : "days";
                unitOf[id] = unit;
                criteria.Add(new Criterion(id, unit == "EUR" ? $"Price, lot {j + 1}" : $"Delivery time, lot {j + 1}",
                    CriterionKind.Numeric, Direction.Cost, group, Unit: unit));
            }
            else
            {
                criteria.Add(new Criterion(id, $"Quality aspect {j + 1}", CriterionKind.Linguistic, Direction.Benefit, group));
            }
        }

        var alternatives = Enumerable.Range(0, n).Select(i => new Alternative(Id("B", i, n), $"Bid {i + 1}")).ToArray();
        var assessors = Enumerable.Range(0, k).Select(a => new Assessor(Id("D", a, k), $"Assessor {a + 1}")).ToArray();

        var evaluation = new Evaluation
        {
            Title = $"Synthetic {size} ({weighting}, seed {seed})",
            Groups = groups,
            Criteria = criteria,
            Alternatives = alternatives,
            Assessors = assessors,
            Weighting = weighting,
            Gates = alternatives.Select(a => new GateResult(a.Id, "EXCL", true)).ToArray(),
        };

        var scoredCriteria = criteria.Where(c => c.Kind != CriterionKind.Gate).ToArray();
        evaluation = weighting == WeightingMethod.Importance
            ? evaluation with { Importance = ImportanceRatings(random, evaluation, scoredCriteria) }
            : evaluation with { Pairwise = PairwiseJudgements(random, evaluation, scoredCriteria) };

        return evaluation with
        {
            Ratings = Ratings(random, evaluation),
            Values = Values(random, evaluation, unitOf),
        };
    }

    private static ImportanceRating[] ImportanceRatings(Random random, Evaluation e, IReadOnlyList<Criterion> scored)
    {
        var scale = e.ImportanceScale;
        var nodes = e.Groups.Select(g => g.Id).Concat(scored.Select(c => c.Id)).ToArray();
        var hidden = nodes.Select(_ => 2 + (4 * random.NextDouble())).ToArray();
        var ratings = new List<ImportanceRating>(nodes.Length * e.Assessors.Count);
        foreach (var assessor in e.Assessors)
        {
            for (var i = 0; i < nodes.Length; i++)
            {
                var step = Snap(hidden[i] + (0.8 * Gaussian(random)), scale.Count);
                ratings.Add(new ImportanceRating(assessor.Id, nodes[i], scale[step].Code));
            }
        }

        return [.. ratings];
    }

    private static PairwiseJudgement[] PairwiseJudgements(Random random, Evaluation e, IReadOnlyList<Criterion> scored)
    {
        var matrices = new List<string[]>
        {
            e.Groups.Select(g => g.Id).Concat(scored.Where(c => c.Group is null).Select(c => c.Id)).ToArray(),
        };
        matrices.AddRange(e.Groups.Select(g => scored.Where(c => c.Group == g.Id).Select(c => c.Id).ToArray()));

        var hidden = new Dictionary<string, double>(StringComparer.Ordinal);
        foreach (var id in matrices.SelectMany(items => items))
        {
            hidden[id] = 1 + (4 * random.NextDouble());
        }

        var judgements = new List<PairwiseJudgement>();
        foreach (var assessor in e.Assessors)
        {
            foreach (var items in matrices)
            {
                for (var i = 0; i < items.Length; i++)
                {
                    for (var j = i + 1; j < items.Length; j++)
                    {
                        var ratio = hidden[items[i]] / hidden[items[j]] * Math.Exp(0.2 * Gaussian(random));
                        var code = PairwiseCode(ratio);
                        e.PairwiseScale.TryFind(code, out var step);
                        judgements.Add(new PairwiseJudgement(assessor.Id, items[i], items[j], e.PairwiseScale[step].Value, code));
                    }
                }
            }
        }

        return [.. judgements];
    }

    private static Rating[] Ratings(Random random, Evaluation e)
    {
        var scale = e.RatingScale;
        var linguistic = e.Criteria.Where(c => c.Kind == CriterionKind.Linguistic).ToArray();
        var quality = new double[e.Alternatives.Count, linguistic.Length];
        for (var i = 0; i < e.Alternatives.Count; i++)
        {
            var bid = 1.5 + (3.5 * random.NextDouble());
            for (var j = 0; j < linguistic.Length; j++)
            {
                quality[i, j] = bid + (0.8 * Gaussian(random));
            }
        }

        var ratings = new List<Rating>(e.Assessors.Count * e.Alternatives.Count * linguistic.Length);
        foreach (var assessor in e.Assessors)
        {
            for (var i = 0; i < e.Alternatives.Count; i++)
            {
                for (var j = 0; j < linguistic.Length; j++)
                {
                    var term = scale[Snap(quality[i, j] + (0.7 * Gaussian(random)), scale.Count)];
                    var alternative = e.Alternatives[i].Id;
                    var rationale = string.Create(CultureInfo.InvariantCulture,
                        $"{term.Label}: the response of {alternative} to {linguistic[j].Id} covers {random.Next(40, 101)}% of the requirements (section {j + 1}.{random.Next(1, 9)}).");
                    ratings.Add(new Rating(assessor.Id, alternative, linguistic[j].Id, term.Code, rationale));
                }
            }
        }

        return [.. ratings];
    }

    private static NumericValue[] Values(Random random, Evaluation e, Dictionary<string, string> unitOf)
    {
        var values = new List<NumericValue>();
        foreach (var alternative in e.Alternatives)
        {
            foreach (var criterion in e.Criteria.Where(c => c.Kind == CriterionKind.Numeric))
            {
                var value = unitOf[criterion.Id] == "EUR"
                    ? Math.Round(80_000 + (60_000 * random.NextDouble()), 2)
                    : random.Next(10, 91);
                values.Add(new NumericValue(alternative.Id, criterion.Id, value));
            }
        }

        return [.. values];
    }

    /// <summary>The pairwise-9 code nearest to a ratio: "1" … "9" in favour of the row, "1/2" … "1/9" against.</summary>
    public static string PairwiseCode(double ratio)
    {
        var favoursRow = ratio >= 1;
        var n = (int)Math.Clamp(Math.Round(favoursRow ? ratio : 1 / ratio), 1, 9);
        return n == 1 ? "1" : favoursRow ? n.ToString(CultureInfo.InvariantCulture) : $"1/{n.ToString(CultureInfo.InvariantCulture)}";
    }

    private static int Snap(double step, int count) => (int)Math.Clamp(Math.Round(step), 0, count - 1);

    /// <summary>A standard normal draw (Box–Muller).</summary>
    private static double Gaussian(Random random)
    {
        var u = 1 - random.NextDouble();
        var v = random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u)) * Math.Cos(2 * Math.PI * v);
    }

    private static string Id(string prefix, int index, int count) =>
        prefix + (index + 1).ToString(new string('0', count.ToString(CultureInfo.InvariantCulture).Length), CultureInfo.InvariantCulture);
}
