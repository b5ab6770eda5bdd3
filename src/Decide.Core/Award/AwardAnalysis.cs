using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Core.Award;

/// <summary>Where a cell's panel score came from.</summary>
public enum PanelScoreSource
{
    /// <summary>The mean of the assessors' points.</summary>
    Mean,

    /// <summary>The points of the term the panel agreed in moderation.</summary>
    Moderated,
}

/// <summary>One bid's score on one quality criterion, with what it came from.</summary>
/// <param name="Criterion">The criterion's id.</param>
/// <param name="Score">The panel's score on the scale (0–5 on a 0–5 scale).</param>
/// <param name="Source">The mean of the assessors' points or the moderated term.</param>
/// <param name="Term">The moderated term, when the score is the moderated one.</param>
/// <param name="Terms">The assessors' terms, in panel order (declined cells left out).</param>
public sealed record AwardCell(string Criterion, double Score, PanelScoreSource Source, string? Term, IReadOnlyList<string> Terms);

/// <summary>One row of the table a bidder can recompute: the bid's cells and its award.</summary>
/// <param name="Alternative">The bid's id.</param>
/// <param name="Cells">Its scores per quality criterion, in criterion order.</param>
/// <param name="Award">Its quality points, price points, total, rank or exclusion.</param>
/// <param name="Review">The record of its flagged price, if any.</param>
public sealed record AwardLine(string Alternative, IReadOnlyList<AwardCell> Cells, AwardedBid Award, LowPriceReview? Review);

/// <summary>The published award applied to an evaluation: the method, the table and what still awaits a decision.</summary>
/// <param name="Method">The award method of the plan.</param>
/// <param name="Formula">The price formula's description.</param>
/// <param name="QualityCriteria">The rated criteria that give quality points, in plan order.</param>
/// <param name="CriterionPoints">Their published points.</param>
/// <param name="PricePoints">The price criterion's published points (Smax).</param>
/// <param name="ScaleMaximum">The highest points of the rating scale.</param>
/// <param name="Result">The award.</param>
/// <param name="Lines">One line per bid, in the order given.</param>
/// <param name="AwaitingDecision">Bids whose price is flagged as abnormally low and has no recorded decision yet.</param>
/// <param name="Plan">The award plan the result was computed from (for the robustness checks).</param>
/// <param name="Inputs">The bids as the award saw them, in the order given (for the robustness checks).</param>
public sealed record AwardReport(
    AwardMethod Method,
    PriceFormulaInfo Formula,
    IReadOnlyList<string> QualityCriteria,
    IReadOnlyList<double> CriterionPoints,
    double PricePoints,
    double ScaleMaximum,
    AwardResult Result,
    IReadOnlyList<AwardLine> Lines,
    IReadOnlyList<string> AwaitingDecision,
    AwardPlan Plan,
    IReadOnlyList<AwardBid> Inputs)
{
    /// <summary>The bid the points award goes to, or null while prices are sealed, a tie remains, a flagged price awaits its decision or no bid is left.</summary>
    public string? Winner =>
        Result.PricesSealed || Result.UnresolvedTie || AwaitingDecision.Count > 0
            ? null
            : Result.Ranking.FirstOrDefault()?.Id;

    /// <summary>The bids the award excludes for a reason other than a gate (thresholds, abnormally low, over budget), with the reason.</summary>
    public IEnumerable<AwardedBid> ExcludedByAward =>
        Result.Bids.Where(b => b.Excluded is { } why && why != AwardExclusion.FailedGate);
}

/// <summary>
/// Applies an evaluation's published award method: the panel's score per bid and criterion (the mean of the
/// assessors' points, or the moderated term's), the gates, thresholds, abnormally low rule, the recorded decisions,
/// the price formula and the tie-breaks (<see cref="PointsAward"/>).
/// </summary>
public static class AwardAnalysis
{
    /// <summary>The award of a validated evaluation whose plan states an award method; prices absent for every bid read as sealed.</summary>
    /// <exception cref="InvalidOperationException">The evaluation has no award method or no published points.</exception>
    public static AwardReport Compute(Evaluation evaluation) => Compute(evaluation, evaluation.Assessors);

    /// <summary>
    /// The award while prices are sealed or not all entered: the evaluation is checked as for analysis except that
    /// bids may lack their price, and the award is computed with the prices there are (quality points and thresholds
    /// final; nothing ranked while a bid that passed quality has no price).
    /// </summary>
    /// <exception cref="InvalidEvaluationException">The evaluation has problems other than the sealed prices; every one is listed.</exception>
    /// <exception cref="InvalidOperationException">The evaluation has no award method.</exception>
    public static AwardReport QualityStage(Evaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        var method = evaluation.Award ?? throw new InvalidOperationException("The evaluation states no award method.");
        var priced = evaluation.Values.Where(v => v.Criterion == method.PriceCriterion).Select(v => v.Alternative).ToHashSet(StringComparer.Ordinal);
        var missing = evaluation.Alternatives.Where(a => !priced.Contains(a.Id))
            .Select(a => JsonPath.Keys("$.values", a.Id, method.PriceCriterion)).ToHashSet(StringComparer.Ordinal);
        var errors = Analysis.EvaluationValidator.Validate(evaluation).Where(e => !missing.Contains(e.Path)).ToArray();
        if (errors.Length > 0)
        {
            throw new InvalidEvaluationException(errors);
        }

        return Compute(evaluation);
    }

    /// <summary>The award with the panel limited to <paramref name="panel"/> (leave-one-assessor-out and similar checks).</summary>
    public static AwardReport Compute(Evaluation evaluation, IReadOnlyList<Assessor> panel)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        var method = evaluation.Award ?? throw new InvalidOperationException("The evaluation states no award method.");
        var points = evaluation.Points ?? throw new InvalidOperationException("An award needs published points.");
        var scale = evaluation.RatingScale;
        var quality = evaluation.Criteria.Where(c => c.Kind == CriterionKind.Linguistic).ToArray();
        var criterionPoints = quality.Select(c => points.PointsOf(c.Id) ?? 0).ToArray();
        var pricePoints = points.PointsOf(method.PriceCriterion) ?? 0;
        var maximum = scale.Terms[^1].Points ?? 0;

        var weightOf = panel.ToDictionary(a => a.Id, a => a.Weight, StringComparer.Ordinal);
        var ratings = evaluation.Ratings
            .Where(r => r.Term is not null && weightOf.ContainsKey(r.Assessor))
            .GroupBy(r => (r.Alternative, r.Criterion))
            .ToDictionary(g => g.Key, g => g.OrderBy(r => IndexOf(panel, r.Assessor)).ToArray());
        var moderated = evaluation.Moderated.ToDictionary(m => (m.Alternative, m.Criterion), m => m.Term);
        var useModerated = method.PanelScore == PanelScoreRule.Moderated;
        var prices = evaluation.Values.Where(v => v.Criterion == method.PriceCriterion)
            .ToDictionary(v => v.Alternative, v => v.Value, StringComparer.Ordinal);
        var reviews = evaluation.LowPriceReviews.ToDictionary(r => r.Alternative, StringComparer.Ordinal);
        var gateNames = evaluation.Criteria.Where(c => c.Kind == CriterionKind.Gate).ToDictionary(c => c.Id, c => c.Name, StringComparer.Ordinal);
        var failed = evaluation.Gates.Where(g => !g.Passed)
            .GroupBy(g => g.Alternative, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => string.Join(", ", g.Select(x => $"\"{gateNames.GetValueOrDefault(x.Criterion, x.Criterion)}\"")), StringComparer.Ordinal);

        var cells = new AwardCell[evaluation.Alternatives.Count][];
        var bids = new AwardBid[evaluation.Alternatives.Count];
        for (var b = 0; b < bids.Length; b++)
        {
            var bid = evaluation.Alternatives[b].Id;
            var row = new AwardCell[quality.Length];
            var scores = new double[quality.Length];
            for (var j = 0; j < quality.Length; j++)
            {
                var rated = ratings.GetValueOrDefault((bid, quality[j].Id), []);
                var agreed = moderated.GetValueOrDefault((bid, quality[j].Id));
                row[j] = Cell(scale, quality[j].Id, weightOf, rated, useModerated || rated.Length == 0 ? agreed : null);
                scores[j] = row[j].Score;
            }

            cells[b] = row;
            var rejected = reviews.TryGetValue(bid, out var review) && review.Decision == LowPriceDecision.Rejected;
            bids[b] = new AwardBid(bid, scores, prices.TryGetValue(bid, out var price) ? price : null, rejected, failed.GetValueOrDefault(bid));
        }

        var plan = new AwardPlan(
            criterionPoints,
            maximum,
            new PriceRule(method.Formula, pricePoints, method.Budget, method.Floor, method.ValuePerQualityPoint),
            method.MinimumQualityShare,
            quality.Select(c => method.MinimumTerms?.GetValueOrDefault(c.Id) is { } term && scale.TryFind(term, out var step) ? scale[step].Points : null).ToArray(),
            method.AppliedTieBreaks,
            method.AbnormallyLow,
            quality.Select(c => c.Name).ToArray());
        var result = PointsAward.Compute(plan, bids);
        var lines = result.Bids.Select((awarded, b) => new AwardLine(awarded.Id, cells[b], awarded, reviews.GetValueOrDefault(awarded.Id))).ToArray();
        var awaiting = result.Bids
            .Where(x => x.AbnormallyLowFlag is not null && x.Excluded is null && reviews.GetValueOrDefault(x.Id)?.Decision is null)
            .Select(x => x.Id)
            .ToArray();
        return new AwardReport(method, PriceFormulas.Describe(method.Formula), quality.Select(c => c.Id).ToArray(), criterionPoints, pricePoints, maximum, result, lines, awaiting, plan, bids);
    }

    /// <summary>The panel's score of one cell: the moderated term's points when given, else the weighted mean of the assessors' points.</summary>
    private static AwardCell Cell(LinguisticScale scale, string criterion, Dictionary<string, double> weightOf, Rating[] ratings, string? moderatedTerm)
    {
        var terms = ratings.Select(r => r.Term!).ToArray();
        double score;
        var source = PanelScoreSource.Mean;
        if (moderatedTerm is not null && scale.TryFind(moderatedTerm, out var agreed))
        {
            score = scale[agreed].Points ?? 0;
            source = PanelScoreSource.Moderated;
        }
        else
        {
            double sum = 0, total = 0;
            foreach (var r in ratings)
            {
                scale.TryFind(r.Term!, out var step);
                var w = weightOf[r.Assessor];
                sum += w * (scale[step].Points ?? 0);
                total += w;
            }

            score = total > 0 ? sum / total : 0;
        }

        return new AwardCell(criterion, score, source, source == PanelScoreSource.Moderated ? moderatedTerm : null, terms);
    }

    private static int IndexOf(IReadOnlyList<Assessor> panel, string id)
    {
        for (var i = 0; i < panel.Count; i++)
        {
            if (panel[i].Id == id)
            {
                return i;
            }
        }

        return int.MaxValue;
    }
}
