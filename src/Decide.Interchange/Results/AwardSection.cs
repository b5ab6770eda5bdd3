namespace Decide.Interchange.Results;

/// <summary>
/// The published points award applied (<c>pointsAward</c>): the method as stated, then per bid the table a bidder
/// can recompute — panel score and quality points per criterion, price, price points or figure, total and rank.
/// </summary>
/// <param name="Binding"><c>points</c> or <c>closeness</c>: which result the award follows.</param>
/// <param name="PanelScore"><c>mean</c> or <c>moderated</c>.</param>
/// <param name="Formula">The price formula as stated.</param>
/// <param name="PricePoints">Smax, the price criterion's published points.</param>
/// <param name="ScaleMaximum">The rating scale's highest points.</param>
/// <param name="Criteria">The quality criteria and their points, in plan order.</param>
/// <param name="Thresholds">The thresholds in words.</param>
/// <param name="TieBreaks">The tie-break rules in the order they apply (file words).</param>
/// <param name="Bids">One entry per bid, in the order given.</param>
/// <param name="PricesSealed">True while prices are sealed (nothing ranked yet).</param>
/// <param name="UnresolvedTie">True when bids were still tied after every tie-break.</param>
/// <param name="AwaitingDecision">Bids whose flagged price has no recorded decision yet.</param>
/// <param name="Winner">The winner under the binding result, or null when there is none yet.</param>
/// <param name="Agreement">How the points award and the closeness ranking agree; null while prices are sealed (nothing is ranked).</param>
/// <param name="Robustness">The award's robustness checks; null when robustness was not run.</param>
public sealed record AwardSection(
    string Binding,
    string PanelScore,
    FormulaEntry Formula,
    double PricePoints,
    double ScaleMaximum,
    IReadOnlyList<AwardCriterionEntry> Criteria,
    string Thresholds,
    IReadOnlyList<string> TieBreaks,
    IReadOnlyList<AwardBidEntry> Bids,
    bool PricesSealed,
    bool UnresolvedTie,
    IReadOnlyList<string> AwaitingDecision,
    string? Winner,
    AwardAgreementEntry? Agreement,
    AwardRobustnessEntry? Robustness = null);

/// <summary>The robustness of the points award.</summary>
/// <param name="WithoutBid">The award without each bid that reached price.</param>
/// <param name="WithoutAssessor">The award without each assessor.</param>
/// <param name="Sweeps">Each criterion's weight swept: the nearest shares at which the first place changes.</param>
/// <param name="Acceptability">Per bid, the share of draws at each rank (panel resampled).</param>
/// <param name="Draws">How many draws.</param>
/// <param name="Seed">Their seed.</param>
/// <param name="CriticalChanges">For each pair of neighbours in the award's order, the criterion and share that reverse them soonest.</param>
public sealed record AwardRobustnessEntry(
    IReadOnlyList<AwardWithoutEntry> WithoutBid,
    IReadOnlyList<AwardWithoutEntry> WithoutAssessor,
    IReadOnlyList<AwardSweepEntry> Sweeps,
    IReadOnlyList<AwardAcceptabilityEntry> Acceptability,
    int Draws,
    ulong Seed,
    IReadOnlyList<AwardCriticalChangeEntry> CriticalChanges);

/// <summary>The smallest change of one criterion's share that reverses two neighbours of the award's order.</summary>
public sealed record AwardCriticalChangeEntry(IReadOnlyList<string> Pair, string Criterion, double Published, double Share);

/// <summary>The award without one bid or assessor: the winner then and the pairs of the others reversed.</summary>
public sealed record AwardWithoutEntry(string Without, string? Winner, bool WinnerChanged, IReadOnlyList<IReadOnlyList<string>> Reversed);

/// <summary>A criterion's weight swept: the published share and the nearest shares below and above at which another bid comes first.</summary>
public sealed record AwardSweepEntry(string Criterion, double Published, double? Lower, string? LowerWinner, double? Upper, string? UpperWinner);

/// <summary>A bid's share of draws at each rank, its first-place share and the share of draws that excluded it.</summary>
public sealed record AwardAcceptabilityEntry(string Bid, IReadOnlyList<double> Ranks, double First, double Excluded);

/// <summary>A price formula as the tender states it.</summary>
/// <param name="Formula">The file's word for it.</param>
/// <param name="Name">Its name.</param>
/// <param name="Equation">The equation.</param>
/// <param name="Properties">What a bidder should know about it.</param>
/// <param name="Source">Where it is stated.</param>
/// <param name="Relative">True when a bid's price score depends on the other bids.</param>
public sealed record FormulaEntry(string Formula, string Name, string Equation, string Properties, string Source, bool Relative);

/// <summary>A quality criterion of the award.</summary>
public sealed record AwardCriterionEntry(string Criterion, string Name, double Points);

/// <summary>One bid's line of the award.</summary>
/// <param name="Alternative">Bid id.</param>
/// <param name="Name">Bid name.</param>
/// <param name="Cells">Per quality criterion: the panel's score and the quality points.</param>
/// <param name="QualityPoints">The sum of the cells' points.</param>
/// <param name="QualityShare">Quality points ÷ all quality points.</param>
/// <param name="Price">The price, or null while sealed.</param>
/// <param name="PricePoints">Price points, for a formula that gives points.</param>
/// <param name="Figure">The ranking figure, lowest first, for a formula that gives no points.</param>
/// <param name="Total">Quality points + price points.</param>
/// <param name="Rank">The bid's place, or null when excluded or not ranked yet.</param>
/// <param name="Excluded">Why it takes no part (in words), or null.</param>
/// <param name="ExclusionDetail">The threshold or rule that excluded it.</param>
/// <param name="AbnormallyLow">Why its price is flagged, or null.</param>
/// <param name="Review">The record of its flagged price.</param>
/// <param name="DecidedBy">The tie-break that placed it above the next bid (file word).</param>
public sealed record AwardBidEntry(
    string Alternative,
    string Name,
    IReadOnlyList<AwardCellEntry> Cells,
    double QualityPoints,
    double QualityShare,
    double? Price,
    double? PricePoints,
    double? Figure,
    double? Total,
    int? Rank,
    string? Excluded,
    string? ExclusionDetail,
    string? AbnormallyLow,
    LowPriceReviewEntry? Review,
    string? DecidedBy);

/// <summary>One bid's score on one quality criterion.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Score">The panel's score on the scale.</param>
/// <param name="Source"><c>mean</c> or <c>moderated</c>.</param>
/// <param name="Term">The moderated term, when the score is the moderated one.</param>
/// <param name="Terms">The assessors' terms.</param>
/// <param name="Points">Quality points: score ÷ scale maximum × the criterion's points.</param>
public sealed record AwardCellEntry(string Criterion, double Score, string Source, string? Term, IReadOnlyList<string> Terms, double Points);

/// <summary>The record of a flagged price.</summary>
public sealed record LowPriceReviewEntry(string Asked, string? Answer, string? Decision, string? Reasons);

/// <summary>The points award beside the closeness ranking.</summary>
/// <param name="PointsWinner">First place by points.</param>
/// <param name="ClosenessWinner">First place by closeness.</param>
/// <param name="SameWinner">True when they agree.</param>
/// <param name="KendallTau">τ-b between the two orders over the bids both rank.</param>
/// <param name="Compared">How many bids both rank.</param>
public sealed record AwardAgreementEntry(string? PointsWinner, string? ClosenessWinner, bool SameWinner, double? KendallTau, int Compared);
