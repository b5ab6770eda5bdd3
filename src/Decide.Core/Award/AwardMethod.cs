namespace Decide.Core.Award;

/// <summary>Which result the award follows; the other is shown beside it as supporting analysis.</summary>
public enum BindingResult
{
    /// <summary>The published points total (what public procurement expects).</summary>
    Points,

    /// <summary>The fuzzy closeness coefficient of Chen (2000).</summary>
    Closeness,
}

/// <summary>How the assessors' terms on one criterion become the panel's one score.</summary>
public enum PanelScoreRule
{
    /// <summary>The mean of the assessors' points (weighted by the assessors' weights in the plan).</summary>
    Mean,

    /// <summary>The points of the term the panel agreed in moderation; a cell not moderated keeps the mean.</summary>
    Moderated,
}

/// <summary>
/// The award method a tender publishes before bids arrive: which numeric criterion is the price and how it is
/// scored, how the panel's terms become scores, the quality thresholds, the tie-breaks, the abnormally low rule, the
/// stage order and which result binds. The points themselves are the plan's published weights.
/// </summary>
/// <param name="PriceCriterion">The id of the numeric cost criterion that holds each bid's price.</param>
/// <param name="Formula">How price is scored.</param>
/// <param name="Binding">Which result the award follows.</param>
/// <param name="PanelScore">How the panel's terms become one score per criterion.</param>
/// <param name="Budget">B: the budget (budget-based formula).</param>
/// <param name="Floor">Pfloor: the price at or below which a bid gets all the price points (budget-based formula); 0 when not given.</param>
/// <param name="ValuePerQualityPoint">v: the money one quality point is worth (quality-adjusted price).</param>
/// <param name="MinimumQualityShare">The least share of all quality points a bid needs, between 0 and 1 (0.6 for 60 %), or null.</param>
/// <param name="MinimumTerms">Per quality criterion, the least term of the rating scale the panel's score must reach, or null.</param>
/// <param name="TieBreaks">The tie-break rules in the order they apply.</param>
/// <param name="AbnormallyLow">When a price is flagged as abnormally low, or null.</param>
/// <param name="TwoStage">True when prices stay sealed until quality is scored, moderated and the thresholds applied.</param>
public sealed record AwardMethod(
    string PriceCriterion,
    PriceFormula Formula,
    BindingResult Binding = BindingResult.Points,
    PanelScoreRule PanelScore = PanelScoreRule.Mean,
    double? Budget = null,
    double? Floor = null,
    double? ValuePerQualityPoint = null,
    double? MinimumQualityShare = null,
    IReadOnlyDictionary<string, string>? MinimumTerms = null,
    IReadOnlyList<TieBreak>? TieBreaks = null,
    AbnormallyLowRule? AbnormallyLow = null,
    bool TwoStage = false)
{
    /// <summary>Where the award method sits in the portable file.</summary>
    public const string Path = "$.award";

    /// <summary>The tie-breaks a plan gets when it states none: higher quality, then lower price, then the earlier submission.</summary>
    public static IReadOnlyList<TieBreak> DefaultTieBreaks { get; } = [TieBreak.HigherQuality, TieBreak.LowerPrice, TieBreak.EarlierSubmission];

    /// <summary>The tie-breaks that apply: the plan's, or the default order.</summary>
    public IReadOnlyList<TieBreak> AppliedTieBreaks => TieBreaks is { Count: > 0 } rules ? rules : DefaultTieBreaks;
}

/// <summary>What the facilitator decided about a price flagged as abnormally low.</summary>
public enum LowPriceDecision
{
    /// <summary>The explanation was accepted; the bid stays in the award.</summary>
    Accepted,

    /// <summary>The explanation did not account for the low price; the bid is rejected with the reasons.</summary>
    Rejected,
}

/// <summary>
/// The record of a flagged price: the explanation asked of the bidder, its answer and the decision with reasons.
/// A bid is excluded as abnormally low only by a recorded rejection, never by the flag alone.
/// </summary>
/// <param name="Alternative">The bid's id.</param>
/// <param name="Asked">The explanation asked for, as sent to the bidder.</param>
/// <param name="Answer">The bidder's answer, once received.</param>
/// <param name="Decision">The decision, once taken.</param>
/// <param name="Reasons">Why, in words a bidder may read (required with a decision).</param>
public sealed record LowPriceReview(string Alternative, string Asked, string? Answer = null, LowPriceDecision? Decision = null, string? Reasons = null);
