using Decide.Interchange.Results;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Features.Award;

/// <summary>
/// The published points award of an evaluation as the panel sees it: the table a bidder can recompute (the results
/// document's <c>pointsAward</c> section), where the stages are, and the reviews of abnormally low prices.
/// </summary>
/// <param name="Summary">The evaluation as the reader sees it.</param>
/// <param name="TwoStage">True when prices stay sealed until quality moderation is closed.</param>
/// <param name="PricesSealed">True while they are sealed: the table then holds quality points and thresholds only.</param>
/// <param name="PricesOpenedAt">When the prices were opened.</param>
/// <param name="Award">The table, the method as stated, exclusions, flags and the agreement with the closeness ranking.</param>
/// <param name="Reviews">The reviews of flagged prices, with who recorded what and when.</param>
/// <param name="AssessorNames">The assessors' names by code, for the award recomputed without each of them.</param>
public sealed record AwardView(
    EvaluationSummary Summary,
    bool TwoStage,
    bool PricesSealed,
    DateTimeOffset? PricesOpenedAt,
    AwardSection Award,
    IReadOnlyList<LowPriceReviewView> Reviews,
    IReadOnlyDictionary<string, string> AssessorNames);

/// <summary>The review of one flagged price.</summary>
public sealed record LowPriceReviewView(
    string Bid,
    string Asked,
    string AskedBy,
    DateTimeOffset AskedAt,
    string? Answer,
    DateTimeOffset? AnsweredAt,
    string? Decision,
    string? Reasons,
    string? DecidedBy,
    DateTimeOffset? DecidedAt,
    long Version);

/// <summary>
/// Records (or corrects) the review of a flagged price: the explanation asked for, the bidder's answer, and the
/// decision (<c>accepted</c> or <c>rejected</c>) with reasons. <paramref name="Version"/> is the review's version
/// read, absent for the first record.
/// </summary>
public sealed record LowPriceReviewRequest(string? Asked, string? Answer, string? Decision, string? Reasons, long? Version = null);
