using Decide.Core.Model;
using Decide.Data.Entities;

namespace Decide.Web.Features.Moderation;

/// <summary>
/// The moderation board: every cell (bidder × linguistic criterion) with the assessors' ratings side by side,
/// flagged cells first (largest spread first), then the rest in bidder and criterion order.
/// </summary>
/// <param name="Evaluation">Evaluation id.</param>
/// <param name="Reference">The buyer's reference.</param>
/// <param name="Stage">Current stage.</param>
/// <param name="Tolerance">The plan's divergence tolerance in scale steps; a cell whose spread exceeds it is flagged.</param>
/// <param name="RatingScale">The rating scale's term codes, lowest first (a term's step is its position).</param>
/// <param name="Flagged">How many cells are flagged.</param>
/// <param name="Moderated">How many cells have a moderated value in force.</param>
/// <param name="Excluded">Bidders that failed a gate: not scored, so not listed.</param>
/// <param name="Cells">The cells.</param>
public sealed record ModerationBoard(
    Guid Evaluation,
    string Reference,
    EvaluationStage Stage,
    int Tolerance,
    IReadOnlyList<string> RatingScale,
    int Flagged,
    int Moderated,
    IReadOnlyList<ExcludedBidder> Excluded,
    IReadOnlyList<ModerationCell> Cells);

/// <summary>A bidder removed by a failed gate.</summary>
public sealed record ExcludedBidder(string Alternative, string Name, IReadOnlyList<string> FailedGates);

/// <summary>One cell of the board.</summary>
/// <param name="Alternative">Bidder code.</param>
/// <param name="AlternativeName">Bidder name.</param>
/// <param name="Criterion">Linguistic criterion id.</param>
/// <param name="CriterionName">Criterion name.</param>
/// <param name="Spread">Highest step minus lowest step of the terms given (0 with fewer than two terms).</param>
/// <param name="Flagged">The spread exceeds the tolerance: discuss this cell.</param>
/// <param name="Ratings">Each assessor expected to rate the cell (or who rated it), in panel order.</param>
/// <param name="InForce">The moderated value in force, if the panel moderated the cell.</param>
/// <param name="History">Earlier moderated values of the cell, oldest first (kept; never changed).</param>
public sealed record ModerationCell(
    string Alternative,
    string AlternativeName,
    string Criterion,
    string CriterionName,
    int Spread,
    bool Flagged,
    IReadOnlyList<CellRating> Ratings,
    ModeratedValue? InForce,
    IReadOnlyList<ModeratedValue> History);

/// <summary>One assessor's original rating of a cell: a term with its rationale, a declined reason, or nothing yet.</summary>
/// <param name="Assessor">Assessor code.</param>
/// <param name="Term">The term given, or null.</param>
/// <param name="Step">The term's position on the rating scale (0 = lowest), or null.</param>
/// <param name="Rationale">The rationale given with the term.</param>
/// <param name="Declined">The reason for declining, if declined.</param>
public sealed record CellRating(string Assessor, string? Term, int? Step, string? Rationale, string? Declined);

/// <summary>A moderated value: a new entry with its reason, who agreed, and the original ratings it was agreed from.</summary>
/// <param name="Id">Entry id (send it as <c>replaces</c> to moderate the cell again).</param>
/// <param name="Term">The agreed term.</param>
/// <param name="Reason">The minute of the discussion.</param>
/// <param name="AgreedBy">Assessor codes who agreed.</param>
/// <param name="RecordedBy">Who recorded it (display name).</param>
/// <param name="RecordedAt">When.</param>
/// <param name="Originals">The original ratings as they stood when the value was agreed.</param>
public sealed record ModeratedValue(
    long Id, string Term, string Reason, IReadOnlyList<string> AgreedBy, string RecordedBy, DateTimeOffset RecordedAt,
    IReadOnlyList<OriginalRating> Originals);

/// <summary>An original rating as snapshotted in a moderation entry.</summary>
public sealed record OriginalRating(string Assessor, string? Term, string? Rationale, string? Declined, long Version, DateTimeOffset UpdatedAt);

/// <summary>Record a moderated value for one cell (facilitator, moderation stage).</summary>
/// <param name="Term">The agreed term of the rating scale.</param>
/// <param name="Reason">Why the panel agreed on it: a minute a bidder may read.</param>
/// <param name="AgreedBy">Assessor codes of the panel members who agreed.</param>
/// <param name="Replaces">The id of the moderated value in force that this one replaces; null when there is none.</param>
public sealed record ModerateRequest(string Term, string Reason, IReadOnlyList<string>? AgreedBy, long? Replaces = null);

/// <summary>Reopen a submitted rating sheet, with the reason (it becomes part of the record).</summary>
public sealed record ReopenSheetRequest(string Reason);

/// <summary>A rating sheet after reopening.</summary>
public sealed record SheetState(string AssessorCode, DateTimeOffset? SubmittedAt, long Version);

/// <summary>The scoring board: who has done what, never what anyone rated.</summary>
/// <param name="Evaluation">Evaluation id.</param>
/// <param name="Stage">Current stage.</param>
/// <param name="Weighting">How weights are derived (consistency applies to pairwise weighting).</param>
/// <param name="ScoredBidders">Bidders counted in the totals (those that failed a gate are left out).</param>
/// <param name="Assessors">One line per assessor seat, in panel order.</param>
/// <param name="PriceEvaluators">One line per price-evaluator seat.</param>
public sealed record ScoringBoard(
    Guid Evaluation,
    EvaluationStage Stage,
    WeightingMethod Weighting,
    int ScoredBidders,
    IReadOnlyList<AssessorProgress> Assessors,
    IReadOnlyList<PriceEvaluatorProgress> PriceEvaluators);

/// <summary>An assessor's progress.</summary>
/// <param name="AssessorCode">Assessor code.</param>
/// <param name="Name">Display name.</param>
/// <param name="DeclarationSignedAt">When the declaration was signed.</param>
/// <param name="DeclarationVersion">Which declaration text.</param>
/// <param name="NamesConfirmedAt">When they confirmed it again after seeing the bidders' names.</param>
/// <param name="WeightsSubmittedAt">When they submitted their weight judgements.</param>
/// <param name="Consistency">Pairwise weighting: each of their matrices' consistency; null for importance weighting.</param>
/// <param name="InconsistentMatrices">True when any complete matrix of theirs is above its consistency threshold.</param>
/// <param name="RatingsDone">Cells rated or declined.</param>
/// <param name="RatingsTotal">Scored bidders × criteria assigned to them.</param>
/// <param name="SubmittedAt">When they submitted their sheet; null while open or reopened.</param>
public sealed record AssessorProgress(
    string AssessorCode,
    string Name,
    DateTimeOffset? DeclarationSignedAt,
    string? DeclarationVersion,
    DateTimeOffset? NamesConfirmedAt,
    DateTimeOffset? WeightsSubmittedAt,
    IReadOnlyList<MatrixProgress>? Consistency,
    bool InconsistentMatrices,
    int RatingsDone,
    int RatingsTotal,
    DateTimeOffset? SubmittedAt);

/// <summary>One pairwise matrix of one assessor.</summary>
/// <param name="Group">Null for the top-level matrix; otherwise the group compared within.</param>
/// <param name="Judgements">Pairs judged.</param>
/// <param name="Needed">Pairs the matrix has (n(n−1)/2).</param>
/// <param name="Ratio">Consistency ratio, once the matrix is complete; null before.</param>
/// <param name="Threshold">Largest acceptable ratio for this size, once complete.</param>
/// <param name="Flagged">Complete and above the threshold: ask the assessor to revise.</param>
public sealed record MatrixProgress(string? Group, int Judgements, int Needed, double? Ratio, double? Threshold, bool Flagged);

/// <summary>A price evaluator's progress: numeric values entered for the scored bidders.</summary>
public sealed record PriceEvaluatorProgress(string AssessorCode, string Name, int ValuesEntered, int ValuesTotal);
