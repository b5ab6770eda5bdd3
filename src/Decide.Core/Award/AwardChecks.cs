using Decide.Core.Model;
using static System.FormattableString;

namespace Decide.Core.Award;

/// <summary>
/// The validator's checks of published points, the award method and the records of abnormally low prices, each
/// problem by its place in the portable file.
/// </summary>
internal static class AwardChecks
{
    private const string WeightsPath = PublishedWeights.Path;
    private const string AwardPath = AwardMethod.Path;
    private const string ReviewsPath = "$.lowPriceReviews";

    /// <summary>Problems of the plan: the published points and the award method.</summary>
    public static IEnumerable<EvaluationError> Plan(Evaluation e)
    {
        foreach (var error in Points(e))
        {
            yield return error;
        }

        if (e.Award is { } award)
        {
            foreach (var error in Method(e, award))
            {
                yield return error;
            }
        }
    }

    /// <summary>Problems of the inputs the award reads: positive prices and the records of flagged prices.</summary>
    public static IEnumerable<EvaluationError> Inputs(Evaluation e)
    {
        if (e.Award is not { } award)
        {
            if (e.LowPriceReviews.Count > 0)
            {
                yield return new(ReviewsPath, "records of abnormally low prices are given but the plan has no award method; remove them or state the award method under $.award");
            }

            yield break;
        }

        var bids = e.Alternatives.Select(a => a.Id).ToHashSet(StringComparer.Ordinal);
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var review in e.LowPriceReviews)
        {
            var at = JsonPath.Key(ReviewsPath, review.Alternative);
            if (!bids.Contains(review.Alternative))
            {
                yield return new(at, $"unknown alternative \"{review.Alternative}\"");
                continue;
            }

            if (!seen.Add(review.Alternative))
            {
                yield return new(at, "the bid's price is reviewed twice; keep one record per bid");
            }

            if (award.AbnormallyLow is null)
            {
                yield return new(at, "the plan has no rule for abnormally low prices, so no price is flagged; remove the record or state the rule under $.award.abnormallyLow");
            }

            if (string.IsNullOrWhiteSpace(review.Asked))
            {
                yield return new(JsonPath.Key(at, "asked"), "record the explanation asked of the bidder, as it was sent");
            }

            if (review.Decision is not null && string.IsNullOrWhiteSpace(review.Reasons))
            {
                yield return new(JsonPath.Key(at, "reasons"), "a decision about an abnormally low price needs its reasons, written so that the bidder can read them");
            }
        }
    }

    /// <summary>
    /// A bid the award excludes before price (a gate, a threshold) needs no price: in two stages its price is never
    /// opened. When the only problems left are such missing prices, they are dropped; otherwise nothing changes (the
    /// quality stage cannot be computed on an evaluation with other problems).
    /// </summary>
    public static IReadOnlyList<EvaluationError> ExcusePricesOfExcluded(Evaluation e, IReadOnlyList<EvaluationError> errors)
    {
        if (e.Award is not { } award || errors.Count == 0)
        {
            return errors;
        }

        var missing = e.Alternatives.ToDictionary(a => JsonPath.Keys("$.values", a.Id, award.PriceCriterion), a => a.Id, StringComparer.Ordinal);
        var priced = e.Values.Where(v => v.Criterion == award.PriceCriterion).Select(v => v.Alternative).ToHashSet(StringComparer.Ordinal);
        var unpriced = errors.Where(x => missing.TryGetValue(x.Path, out var bid) && !priced.Contains(bid)).ToArray();
        if (unpriced.Length == 0 || unpriced.Length != errors.Count)
        {
            return errors;
        }

        var quality = AwardAnalysis.Compute(e with { Values = e.Values.Where(v => v.Criterion != award.PriceCriterion).ToArray() });
        var excluded = quality.Result.Bids.Where(b => b.Excluded is not null).Select(b => b.Id).ToHashSet(StringComparer.Ordinal);
        return errors.Where(x => !(missing.TryGetValue(x.Path, out var bid) && excluded.Contains(bid))).ToArray();
    }

    private static IEnumerable<EvaluationError> Points(Evaluation e)
    {
        if (e.Weighting != WeightingMethod.Points)
        {
            if (e.Points is not null)
            {
                yield return new(WeightsPath, "published points are given but the weighting is not \"points\"; set \"weighting\": \"points\" or remove them");
            }

            yield break;
        }

        if (e.Points is not { } points)
        {
            yield return new(WeightsPath, "the weighting is \"points\" but no points are published; give the total and the points of every scored criterion (and of every group)");
            yield break;
        }

        var criteria = e.Criteria.ToDictionary(c => c.Id, StringComparer.Ordinal);
        var any = false;
        foreach (var c in points.Criteria)
        {
            if (!criteria.TryGetValue(c.Id, out var criterion))
            {
                any = true;
                yield return new(JsonPath.Keys(WeightsPath, "criteria", c.Id), $"unknown criterion \"{c.Id}\"");
            }
            else if (criterion.Kind == CriterionKind.Gate)
            {
                any = true;
                yield return new(JsonPath.Keys(WeightsPath, "criteria", c.Id), $"\"{c.Id}\" is a pass/fail gate and carries no points");
            }
        }

        foreach (var group in points.Groups.Keys.Where(g => !e.Groups.Any(x => x.Id == g)))
        {
            any = true;
            yield return new(JsonPath.Keys(WeightsPath, "groups", group), $"unknown group \"{group}\"");
        }

        foreach (var c in e.Criteria.Where(c => c.Kind != CriterionKind.Gate && points.PointsOf(c.Id) is null))
        {
            any = true;
            yield return new(JsonPath.Keys(WeightsPath, "criteria", c.Id), $"criterion \"{c.Id}\" has no points; every scored criterion needs its published points");
        }

        foreach (var g in e.Groups.Where(g => !points.Groups.ContainsKey(g.Id)))
        {
            any = true;
            yield return new(JsonPath.Keys(WeightsPath, "groups", g.Id), $"group \"{g.Id}\" has no points; give each group the sum of its criteria's points");
        }

        if (any)
        {
            yield break;
        }

        foreach (var error in points.Validate())
        {
            yield return error;
        }
    }

    private static IEnumerable<EvaluationError> Method(Evaluation e, AwardMethod award)
    {
        if (e.Weighting != WeightingMethod.Points)
        {
            yield return new(AwardPath, "an award by points needs published points: set \"weighting\": \"points\" and give the points under $.publishedWeights");
        }

        var price = e.Criteria.FirstOrDefault(c => c.Id == award.PriceCriterion);
        var priceAt = JsonPath.Keys(AwardPath, "price", "criterion");
        if (price is null)
        {
            yield return new(priceAt, $"unknown criterion \"{award.PriceCriterion}\"; name the measured criterion that holds each bid's price");
        }
        else if (price is not { Kind: CriterionKind.Numeric, Direction: Direction.Cost })
        {
            yield return new(priceAt, $"criterion \"{price.Id}\" holds the price, so it must be measured (numeric) with direction \"cost\"");
        }

        foreach (var c in e.Criteria.Where(c => c.Kind == CriterionKind.Numeric && c.Id != award.PriceCriterion))
        {
            yield return new(JsonPath.Key(AwardPath, "price"),
                $"criterion \"{c.Id}\" is measured but is not the price; the award gives points only to rated criteria and the price, so rate it on the scale or make it a pass/fail gate");
        }

        if (!e.Criteria.Any(c => c.Kind == CriterionKind.Linguistic))
        {
            yield return new("$.criteria", "an award by points needs at least one rated quality criterion besides the price");
        }

        if (e.RatingScale.Terms.Any(t => t.Points is null))
        {
            yield return new("$.ratingScale", $"the award scores each term by its points, and the rating scale \"{e.RatingScale.Name}\" has none; give every term its points or choose a built-in points scale (0–5 or 0–10)");
        }
        else if (!(e.RatingScale.Terms[^1].Points > 0))
        {
            yield return new("$.ratingScale", "the highest term of the rating scale must score above 0 points; quality points are the panel's score ÷ that maximum × the criterion's points");
        }

        foreach (var error in Formula(award))
        {
            yield return error;
        }

        if (award.MinimumQualityShare is { } share && !(share > 0 && share <= 1))
        {
            yield return new(JsonPath.Keys(AwardPath, "thresholds", "qualityShare"), Invariant($"the quality threshold is a share of all quality points, above 0 and at most 1 (0.6 for 60 %); got {share}"));
        }

        foreach (var (id, term) in award.MinimumTerms ?? new Dictionary<string, string>())
        {
            var at = JsonPath.Keys(AwardPath, "thresholds", "minimumTerms", id);
            var criterion = e.Criteria.FirstOrDefault(c => c.Id == id);
            if (criterion is not { Kind: CriterionKind.Linguistic })
            {
                yield return new(at, criterion is null ? $"unknown criterion \"{id}\"" : $"criterion \"{id}\" is not rated on the scale, so it has no least term");
            }
            else if (!e.RatingScale.TryFind(term, out _))
            {
                yield return new(at, $"unknown term \"{term}\"; the rating scale has {e.RatingScale.CodeList}");
            }
        }

        if (award.TieBreaks is { } rules && rules.Distinct().Count() != rules.Count)
        {
            yield return new(JsonPath.Key(AwardPath, "tieBreaks"), "a tie-break rule is listed twice; list each rule once, in the order it applies");
        }

        if (award.AbnormallyLow is { } low)
        {
            var at = JsonPath.Key(AwardPath, "abnormallyLow");
            if (low.BelowMeanOfOthersPercent is null && low.BelowEstimatePercent is null)
            {
                yield return new(at, "state when a price is flagged: \"belowMeanOfOthersPercent\", or \"estimate\" with \"belowEstimatePercent\", or both");
            }

            foreach (var (name, percent) in new[] { ("belowMeanOfOthersPercent", low.BelowMeanOfOthersPercent), ("belowEstimatePercent", low.BelowEstimatePercent) })
            {
                if (percent is { } p && !(p > 0 && p < 100))
                {
                    yield return new(JsonPath.Key(at, name), Invariant($"a percentage above 0 and below 100; got {p}"));
                }
            }

            if (low.BelowEstimatePercent is not null && !(low.Estimate > 0))
            {
                yield return new(JsonPath.Key(at, "estimate"), "the test against the estimate needs the estimate, a positive amount");
            }
        }
    }

    private static IEnumerable<EvaluationError> Formula(AwardMethod award)
    {
        var at = JsonPath.Key(AwardPath, "price");
        if (award.Formula == PriceFormula.BudgetBased)
        {
            if (!(award.Budget > 0))
            {
                yield return new(JsonPath.Key(at, "budget"), "the budget-based formula needs the budget, a positive amount; bids above it are excluded");
            }
            else if (award.Floor is { } floor && !(floor >= 0 && floor < award.Budget))
            {
                yield return new(JsonPath.Key(at, "floor"), Invariant($"the floor is the price at or below which a bid gets all the price points: 0 or more and below the budget of {award.Budget}; got {floor}"));
            }
        }
        else if (award.Budget is not null || award.Floor is not null)
        {
            yield return new(at, "a budget and a floor belong to the budget-based formula only; remove them or choose \"budget\"");
        }

        if (award.Formula == PriceFormula.QualityAdjustedPrice && !(award.ValuePerQualityPoint > 0))
        {
            yield return new(JsonPath.Key(at, "valuePerQualityPoint"), "the quality-adjusted price needs the money one quality point is worth, a positive amount");
        }
    }
}
