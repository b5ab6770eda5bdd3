using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// Re-ranks under the other aggregation rule, the other ideal points, and the fuzzy weighted sum, each compared
/// with the main ranking by Kendall's tau-b.
/// </summary>
/// <remarks>
/// The fuzzy weighted sum (simple additive weighting) scores Sᵢ = centroid(Σⱼ ṽᵢⱼ) on the same normalised weighted
/// matrix TOPSIS uses: the conventional weighted-total score that procurement rules assume. Agreement between the
/// methods is reassurance, not proof; disagreement is a reason to look closer at the leading bids.
/// </remarks>
public static class MethodCrossCheck
{
    /// <summary>Three comparisons: other aggregation, other ideal points, weighted sum.</summary>
    public static IReadOnlyList<MethodComparison> Run(PreparedEvaluation prepared, AnalysisResult baseResult)
    {
        var options = prepared.Source.Options;
        var main = prepared.Alternatives.Select(a => baseResult.Ranking.Single(r => r.Alternative == a.Id).Closeness).ToArray();
        var winner = baseResult.Ranking.Count > 0 ? baseResult.Ranking[0].Alternative : null;

        var otherAggregation = options.Aggregation == AggregationRule.Mean ? AggregationRule.Geometric : AggregationRule.Mean;
        var otherIdeal = options.Ideal == IdealPoints.Unit ? IdealPoints.Extreme : IdealPoints.Unit;
        var results = new List<MethodComparison>();
        var aggregationVariant = prepared.Source with { Options = options with { Aggregation = otherAggregation } };
        if (EvaluationValidator.Validate(aggregationVariant).Count == 0)
        {
            results.Add(Compare(prepared, main, winner, $"aggregation:{Name(otherAggregation)}",
                otherAggregation == AggregationRule.Geometric ? "geometric mean of the assessors' ratings" : "arithmetic mean of the assessors' ratings",
                TopsisCloseness(aggregationVariant, prepared)));
        }

        results.Add(Compare(prepared, main, winner, $"ideal:{Name(otherIdeal)}",
            otherIdeal == IdealPoints.Extreme ? "ideal points at the best and worst weighted values received" : "ideal points (1,1,1) and (0,0,0)",
            TopsisCloseness(prepared.Source with { Options = options with { Ideal = otherIdeal } }, prepared)));
        results.Add(Compare(prepared, main, winner, "weighted-sum", "fuzzy weighted sum of the normalised ratings, defuzzified by centroid",
            WeightedSum(prepared)));
        return results;
    }

    /// <summary>Sᵢ = centroid(Σⱼ ṽᵢⱼ) per alternative, in input order.</summary>
    public static double[] WeightedSum(PreparedEvaluation prepared)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        var weighted = new Tfn[n * m];
        FuzzyTopsis.Normalise(prepared.Matrix, n, m, prepared.IsCost, prepared.FuzzyWeights, weighted);
        var scores = new double[n];
        for (var i = 0; i < n; i++)
        {
            var sum = Tfn.Zero;
            for (var j = 0; j < m; j++)
            {
                sum += weighted[(i * m) + j];
            }

            scores[i] = sum.Centroid;
        }

        return scores;
    }

    private static double[] TopsisCloseness(Evaluation variant, PreparedEvaluation prepared)
    {
        var result = DecisionEngine.Analyze(variant);
        return prepared.Alternatives.Select(a => result.Ranking.Single(r => r.Alternative == a.Id).Closeness).ToArray();
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
