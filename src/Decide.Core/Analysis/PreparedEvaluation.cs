using Decide.Core.Aggregation;
using Decide.Core.Award;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;
using Decide.Core.Weighting;

namespace Decide.Core.Analysis;

/// <summary>
/// A validated evaluation compiled to arrays: the alternatives still in the running, the scored criteria, the
/// aggregated decision matrix, the weights, and each assessor's ratings as scale steps. Robustness analyses
/// re-rank from this without re-validating.
/// </summary>
public sealed class PreparedEvaluation
{
    internal PreparedEvaluation(Evaluation source)
    {
        Source = source;
        Award = source.Award is null ? null : AwardAnalysis.Compute(source);
        var byAward = Award?.ExcludedByAward.ToDictionary(b => b.Id, b => b.ExclusionDetail, StringComparer.Ordinal) ?? [];
        var excluded = source.Alternatives
            .Select(a => new ExcludedAlternative(a.Id, source.Gates.Where(g => g.Alternative == a.Id && !g.Passed)
                .Select(g => g.Criterion).OrderBy(id => IndexOfCriterion(source, id)).ToArray(), byAward.GetValueOrDefault(a.Id)))
            .Where(x => x.Gates.Count > 0 || x.Reason is not null)
            .ToArray();
        var excludedIds = excluded.Select(x => x.Alternative).ToHashSet(StringComparer.Ordinal);
        Excluded = excluded;
        Alternatives = source.Alternatives.Where(a => !excludedIds.Contains(a.Id)).ToArray();
        Criteria = source.Criteria.Where(c => c.Kind != CriterionKind.Gate).ToArray();
        Assessors = source.Assessors;
        IsCost = Criteria.Select(c => c.Direction == Direction.Cost).ToArray();

        int n = Alternatives.Count, m = Criteria.Count, k = Assessors.Count;
        var altIndex = Index(Alternatives.Select(a => a.Id));
        var critIndex = Index(Criteria.Select(c => c.Id));
        var assessorIndex = Index(Assessors.Select(a => a.Id));

        Steps = new int[k * n * m];
        Array.Fill(Steps, -1);
        Declines = new List<DeclinedCell>?[n * m];
        foreach (var r in source.Ratings)
        {
            if (!altIndex.TryGetValue(r.Alternative, out var i))
            {
                continue; // a rating of an excluded alternative takes no part
            }

            var cell = (i * m) + critIndex[r.Criterion];
            if (r.Term is { } term)
            {
                source.RatingScale.TryFind(term, out var step);
                Steps[(assessorIndex[r.Assessor] * n * m) + cell] = step;
            }
            else
            {
                (Declines[cell] ??= []).Add(new DeclinedCell(r.Assessor, r.Declined!));
            }
        }

        Values = new double[n * m];
        foreach (var v in source.Values)
        {
            if (altIndex.TryGetValue(v.Alternative, out var i))
            {
                Values[(i * m) + critIndex[v.Criterion]] = v.Value;
            }
        }

        ModeratedTerms = new string?[n * m];
        foreach (var moderated in source.Moderated)
        {
            if (altIndex.TryGetValue(moderated.Alternative, out var i))
            {
                ModeratedTerms[(i * m) + critIndex[moderated.Criterion]] = moderated.Term;
            }
        }

        AssessorWeights = Assessors.Select(a => a.Weight).ToArray();
        (Weights, Consistency) = CriterionWeights.Derive(source, Criteria);
        FuzzyWeights = Weights.Select(w => w.Fuzzy).ToArray();
        Matrix = Aggregate(AssessorWeights);
    }

    /// <summary>The evaluation this was prepared from.</summary>
    public Evaluation Source { get; }

    /// <summary>Alternatives that passed every gate and are not excluded by the award, in input order.</summary>
    public IReadOnlyList<Alternative> Alternatives { get; }

    /// <summary>Alternatives that failed a gate or that the published award excludes (thresholds, abnormally low, over budget).</summary>
    public IReadOnlyList<ExcludedAlternative> Excluded { get; }

    /// <summary>The published award applied to the evaluation, or null when the plan states no award method.</summary>
    public AwardReport? Award { get; }

    /// <summary>Scored (non-gate) criteria, in input order.</summary>
    public IReadOnlyList<Criterion> Criteria { get; }

    /// <summary>The panel, in input order.</summary>
    public IReadOnlyList<Assessor> Assessors { get; }

    /// <summary>Per scored criterion: true for cost.</summary>
    internal bool[] IsCost { get; }

    /// <summary>The derived criterion weights.</summary>
    public IReadOnlyList<CriterionWeight> Weights { get; }

    /// <summary>The fuzzy weights alone, in criterion order.</summary>
    internal Tfn[] FuzzyWeights { get; }

    /// <summary>Pairwise consistency reports (empty for importance weighting).</summary>
    public IReadOnlyList<MatrixConsistency> Consistency { get; }

    /// <summary>The aggregated decision matrix x̃ᵢⱼ, alternative-major.</summary>
    internal Tfn[] Matrix { get; }

    /// <summary>
    /// Each assessor's rating as a step of the rating scale, indexed [assessor × n × m + alternative × m + criterion];
    /// −1 where they did not rate (declined, not assigned, or a numeric criterion).
    /// </summary>
    internal int[] Steps { get; }

    /// <summary>Numeric criterion values, alternative-major (0 for linguistic criteria).</summary>
    internal double[] Values { get; }

    /// <summary>Assessor weights as given in the plan.</summary>
    internal double[] AssessorWeights { get; }

    /// <summary>Per cell, the moderated term that replaces the aggregate, or null (alternative-major).</summary>
    internal string?[] ModeratedTerms { get; }

    internal List<DeclinedCell>?[] Declines { get; }

    /// <summary>
    /// The decision matrix aggregated with the given assessor weights; an assessor with weight 0 is left out (used by
    /// leave-one-out). A linguistic cell no one with positive weight rated stays (0, 0, 0) and is reported by the
    /// caller.
    /// </summary>
    public Tfn[] Aggregate(ReadOnlySpan<double> assessorWeights)
    {
        int n = Alternatives.Count, m = Criteria.Count, k = Assessors.Count;
        var matrix = new Tfn[n * m];
        Span<Tfn> values = k <= 128 ? stackalloc Tfn[k] : new Tfn[k];
        Span<double> weights = k <= 128 ? stackalloc double[k] : new double[k];
        var scale = Source.RatingScale;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < m; j++)
            {
                var cell = (i * m) + j;
                if (Criteria[j].Kind == CriterionKind.Numeric)
                {
                    matrix[cell] = Tfn.Crisp(Values[cell]);
                    continue;
                }

                if (ModeratedTerms[cell] is { } agreed)
                {
                    scale.TryFind(agreed, out var agreedStep);
                    matrix[cell] = scale[agreedStep].Value;
                    continue;
                }

                var count = 0;
                for (var a = 0; a < k; a++)
                {
                    var step = Steps[(a * n * m) + cell];
                    if (step >= 0 && assessorWeights[a] > 0)
                    {
                        values[count] = scale[step].Value;
                        weights[count] = assessorWeights[a];
                        count++;
                    }
                }

                matrix[cell] = count == 0 ? Tfn.Zero : GroupAggregation.Aggregate(values[..count], weights[..count], Source.Options.Aggregation);
            }
        }

        return matrix;
    }

    /// <summary>Runs fuzzy TOPSIS on the prepared matrix and weights and builds the full result.</summary>
    public AnalysisResult Analyse()
    {
        int n = Alternatives.Count, m = Criteria.Count;
        var weighted = new Tfn[n * m];
        double[] dPlus = new double[n], dMinus = new double[n], closeness = new double[n];
        double[] plusBy = new double[n * m], minusBy = new double[n * m];
        FuzzyTopsis.Evaluate(Matrix, m, IsCost, FuzzyWeights, Source.Options.Ideal, weighted, dPlus, dMinus, closeness, plusBy, minusBy);
        int[] ranks = new int[n], order = new int[n];
        FuzzyTopsis.Rank(closeness, ranks, order);

        var ranking = order.Select(i => new RankedAlternative(
            Alternatives[i].Id, ranks[i], closeness[i], dPlus[i], dMinus[i],
            Criteria.Select((c, j) => new CriterionDistance(c.Id, plusBy[(i * m) + j], minusBy[(i * m) + j])).ToArray())).ToArray();

        var cells = new List<MatrixCell>(n * m);
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < m; j++)
            {
                var cell = (i * m) + j;
                var raters = 0;
                for (var a = 0; a < Assessors.Count; a++)
                {
                    raters += Steps[(a * n * m) + cell] >= 0 ? 1 : 0;
                }

                cells.Add(new MatrixCell(Alternatives[i].Id, Criteria[j].Id, Matrix[cell], weighted[cell], raters,
                    (IReadOnlyList<DeclinedCell>?)Declines[cell] ?? [], ModeratedTerms[cell]));
            }
        }

        return new AnalysisResult(Source.Title, Source.Weighting, Source.Options, ranking, Excluded, Weights, Consistency, cells);
    }

    private static int IndexOfCriterion(Evaluation e, string id)
    {
        for (var i = 0; i < e.Criteria.Count; i++)
        {
            if (e.Criteria[i].Id == id)
            {
                return i;
            }
        }

        return int.MaxValue;
    }

    private static Dictionary<string, int> Index(IEnumerable<string> ids) =>
        ids.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i, StringComparer.Ordinal);
}
