using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// Re-ranks under the other aggregation rule, the other ideal points, and the conventional weighted total of scores
/// on the rating scale, each compared with the main ranking by Kendall's tau-b.
/// </summary>
/// <remarks>
/// The weighted total is the score procurement scoring rules assume, and it is computed without TOPSIS's
/// normalisation or ideal points: Tᵢ = Σⱼ ŵⱼ sᵢⱼ with ŵ the crisp weight shares and, for a linguistic criterion,
/// sᵢⱼ = centroid(x̃ᵢⱼ) / the top of the rating scale's declared range (an absolute score: it does not depend on the
/// other bids), or 1 minus that for a linguistic cost criterion; for a numeric criterion the relative ratio sᵢⱼ = minᵢ xᵢⱼ / xᵢⱼ (cost) or xᵢⱼ / maxᵢ xᵢⱼ (benefit;
/// 0 when every value is 0), the one relative part. Where the alternative method cannot be applied to the evaluation
/// (the engine refuses it), the comparison says why instead of failing. Agreement between methods is reassurance,
/// not proof; disagreement is a reason to look closer at the leading bids.
/// </remarks>
public static class MethodCrossCheck
{
    /// <summary>The method id of the weighted total.</summary>
    public const string WeightedTotalMethod = "weighted-total";

    /// <summary>The weighted total in words.</summary>
    public const string WeightedTotalDescription =
        "weighted total of scores on the rating scale (each rating's centre as a share of the scale's top; prices and other numbers relative to the best bid), with the crisp weight shares";

    /// <summary>Three comparisons: other aggregation, other ideal points, weighted total.</summary>
    public static IReadOnlyList<MethodComparison> Run(PreparedEvaluation prepared, AnalysisResult baseResult) =>
        Run(prepared, baseResult, DecisionEngine.Analyse);

    /// <summary>As <see cref="Run(PreparedEvaluation, AnalysisResult)"/>, analysing each TOPSIS variant with <paramref name="analyze"/>.</summary>
    internal static IReadOnlyList<MethodComparison> Run(PreparedEvaluation prepared, AnalysisResult baseResult, Func<Evaluation, AnalysisResult> analyze)
    {
        var options = prepared.Source.Options;
        var main = prepared.Alternatives.Select(a => baseResult.Ranking.Single(r => r.Alternative == a.Id).Closeness).ToArray();
        var winner = baseResult.Ranking.Count > 0 ? baseResult.Ranking[0].Alternative : null;

        var otherAggregation = options.Aggregation == AggregationRule.Mean ? AggregationRule.Geometric : AggregationRule.Mean;
        var otherIdeal = options.Ideal == IdealPoints.Unit ? IdealPoints.Extreme : IdealPoints.Unit;
        return
        [
            Topsis(prepared, main, winner, $"aggregation:{Name(otherAggregation)}",
                otherAggregation == AggregationRule.Geometric ? "geometric mean of the assessors' ratings" : "arithmetic mean of the assessors' ratings",
                prepared.Source with { Options = options with { Aggregation = otherAggregation } }, analyze),
            Topsis(prepared, main, winner, $"ideal:{Name(otherIdeal)}",
                otherIdeal == IdealPoints.Extreme ? "ideal points at the best and worst weighted values received" : "ideal points (1,1,1) and (0,0,0)",
                prepared.Source with { Options = options with { Ideal = otherIdeal } }, analyze),
            Compare(prepared, main, winner, WeightedTotalMethod, WeightedTotalDescription, WeightedTotal(prepared)),
        ];
    }

    /// <summary>
    /// The weighted total Tᵢ = Σⱼ ŵⱼ sᵢⱼ per alternative, in input order, in [0, 1]: sᵢⱼ = centroid of the aggregated
    /// (or moderated) cell / the rating scale's maximum for a linguistic criterion (1 minus that for a linguistic cost); minᵢ xᵢⱼ / xᵢⱼ for a numeric cost
    /// and xᵢⱼ / maxᵢ xᵢⱼ for a numeric benefit (0 when the maximum is 0); ŵ the crisp weight shares.
    /// </summary>
    public static double[] WeightedTotal(PreparedEvaluation prepared)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        var top = prepared.Source.RatingScale.Maximum;
        var scores = new double[n];
        for (var j = 0; j < m; j++)
        {
            var share = prepared.Weights[j].Crisp;
            if (prepared.Criteria[j].Kind == CriterionKind.Numeric)
            {
                double lowest = double.PositiveInfinity, highest = double.NegativeInfinity;
                for (var i = 0; i < n; i++)
                {
                    lowest = Math.Min(lowest, prepared.Values[(i * m) + j]);
                    highest = Math.Max(highest, prepared.Values[(i * m) + j]);
                }

                for (var i = 0; i < n; i++)
                {
                    var x = prepared.Values[(i * m) + j];
                    scores[i] += share * (prepared.IsCost[j] ? lowest / x : highest > 0 ? x / highest : 0);
                }
            }
            else
            {
                for (var i = 0; i < n; i++)
                {
                    // A linguistic cost (a risk rated on the scale) scores what it falls short of the top by.
                    var centre = prepared.Matrix[(i * m) + j].Centroid / top;
                    scores[i] += share * (prepared.IsCost[j] ? 1 - centre : centre);
                }
            }
        }

        return scores;
    }

    private static MethodComparison Topsis(
        PreparedEvaluation prepared, double[] main, string? winner, string method, string description, Evaluation variant,
        Func<Evaluation, AnalysisResult> analyze)
    {
        AnalysisResult result;
        try
        {
            result = analyze(variant);
        }
        catch (InvalidEvaluationException refused) when (refused.Errors.All(e => e.Path == "$.options.aggregation"))
        {
            // The geometric mean on scales that reach 0: say so in a line, not with the validator's advice.
            var zero = Aggregation.GroupAggregation.TermsAtZero(variant)
                .Select(x => $"{string.Join(", ", x.Terms.Select(t => $"\"{t.Label}\""))} on the {x.Scale}");
            return new MethodComparison(method, description, [], [], null, false,
                $"not applicable: the geometric mean needs scales whose terms all lie above 0, and {string.Join(" and ", zero)} reach 0 (one such rating would decide a cell alone)");
        }
        catch (InvalidEvaluationException refused)
        {
            var reasons = refused.Errors.Select(e => e.Reason.TrimEnd('.')).Distinct(StringComparer.Ordinal).ToArray();
            var why = string.Join("; ", reasons.Take(3)) + (reasons.Length > 3 ? $"; and {reasons.Length - 3} more" : "");
            return new MethodComparison(method, description, [], [], null, false, $"not applicable: {why}");
        }

        var scores = prepared.Alternatives.Select(a => result.Ranking.Single(r => r.Alternative == a.Id).Closeness).ToArray();
        return Compare(prepared, main, winner, method, description, scores);
    }

    private static MethodComparison Compare(
        PreparedEvaluation prepared, double[] main, string? winner, string method, string description, double[] scores)
    {
        var n = scores.Length;
        int[] ranks = new int[n], order = new int[n];
        FuzzyTopsis.Rank(scores, ranks, order);
        var ranking = order.Select(i => prepared.Alternatives[i].Id).ToArray();
        return new MethodComparison(method, description, ranking, order.Select(i => scores[i]).ToArray(),
            RankStatistics.KendallTauB(main, scores), ranking.FirstOrDefault() == winner);
    }

    private static string Name(AggregationRule rule) => rule == AggregationRule.Mean ? "mean" : "geometric";

    private static string Name(IdealPoints ideal) => ideal == IdealPoints.Unit ? "unit" : "extreme";
}
