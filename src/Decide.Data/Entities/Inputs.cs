namespace Decide.Data.Entities;

/// <summary>A declared conflict of interest with one bidder; the declarer is recused from it.</summary>
public sealed class ConflictDeclaration
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string UserId { get; set; } = "";

    public string AlternativeCode { get; set; } = "";

    public string Statement { get; set; } = "";

    public DateTimeOffset DeclaredAt { get; set; }

    /// <summary>What was done about it (recorded by the facilitator; recusal is automatic).</summary>
    public string? Action { get; set; }
}

/// <summary>An assessor's importance term for a criterion or group, or a pairwise judgement.</summary>
public sealed class WeightJudgement : IVersioned
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AssessorCode { get; set; } = "";

    /// <summary>What <see cref="Kind"/> holds for an importance term of a criterion or group.</summary>
    public const string ImportanceKind = "importance";

    /// <summary>What <see cref="Kind"/> holds for a pairwise comparison of two items.</summary>
    public const string PairwiseKind = "pairwise";

    /// <summary><see cref="ImportanceKind"/> or <see cref="PairwiseKind"/>.</summary>
    public string Kind { get; set; } = ImportanceKind;

    /// <summary>Importance: the criterion or group. Pairwise: the row item.</summary>
    public string Node { get; set; } = "";

    /// <summary>Pairwise: the column item; null for importance.</summary>
    public string? Column { get; set; }

    /// <summary>Scale code, when given as one.</summary>
    public string? Term { get; set; }

    /// <summary>Pairwise TFN when given as numbers.</summary>
    public double? Lower { get; set; }

    public double? Middle { get; set; }

    public double? Upper { get; set; }

    public DateTimeOffset UpdatedAt { get; set; }

    public long Version { get; set; }
}

/// <summary>
/// An assessor's rating of one bid on one linguistic criterion: a term with its rationale, or a declined cell with
/// the reason. Never overwritten by moderation.
/// </summary>
public sealed class RatingEntry : IVersioned
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AssessorCode { get; set; } = "";

    public string AlternativeCode { get; set; } = "";

    public string CriterionId { get; set; } = "";

    public string? Term { get; set; }

    public string? Rationale { get; set; }

    public string? DeclinedReason { get; set; }

    public DateTimeOffset UpdatedAt { get; set; }

    public long Version { get; set; }
}

/// <summary>A measured value of a numeric criterion (price, days) for one bid.</summary>
public sealed class NumericEntry : IVersioned
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AlternativeCode { get; set; } = "";

    public string CriterionId { get; set; } = "";

    public double Value { get; set; }

    public string EnteredBy { get; set; } = "";

    public DateTimeOffset UpdatedAt { get; set; }

    public long Version { get; set; }
}

/// <summary>The pass/fail result of a gate for one bid.</summary>
public sealed class GateEntry : IVersioned
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AlternativeCode { get; set; } = "";

    public string CriterionId { get; set; } = "";

    public bool Passed { get; set; }

    public string? Note { get; set; }

    public string EnteredBy { get; set; } = "";

    public DateTimeOffset UpdatedAt { get; set; }

    public long Version { get; set; }
}

/// <summary>
/// A moderated value: a new entry with its reason and who agreed, linked to the original ratings it was agreed from
/// (a snapshot of them). The latest entry of a cell is the one in force; earlier ones stay.
/// </summary>
public sealed class ModerationEntry
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AlternativeCode { get; set; } = "";

    public string CriterionId { get; set; } = "";

    public string Term { get; set; } = "";

    public string Reason { get; set; } = "";

    /// <summary>JSON array of assessor codes who agreed.</summary>
    public string AgreedByJson { get; set; } = "[]";

    /// <summary>JSON snapshot of the original ratings (assessor, term, rationale, declined) at the time.</summary>
    public string OriginalsJson { get; set; } = "[]";

    public string RecordedBy { get; set; } = "";

    public DateTimeOffset RecordedAt { get; set; }
}

/// <summary>
/// The review of a price the published rule flagged as abnormally low: the explanation asked for, the bidder's
/// answer and the facilitator's decision with reasons. Only a recorded rejection excludes the bid.
/// </summary>
public sealed class LowPriceReviewEntry : IVersioned
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AlternativeCode { get; set; } = "";

    public string Asked { get; set; } = "";

    public string AskedBy { get; set; } = "";

    public DateTimeOffset AskedAt { get; set; }

    public string? Answer { get; set; }

    public DateTimeOffset? AnsweredAt { get; set; }

    /// <summary><c>accepted</c> or <c>rejected</c> (the file's words), or null while undecided.</summary>
    public string? Decision { get; set; }

    public string? Reasons { get; set; }

    public string? DecidedBy { get; set; }

    public DateTimeOffset? DecidedAt { get; set; }

    public long Version { get; set; }
}

/// <summary>An approver's approval of the evaluation (sign-off needs the plan's number of them).</summary>
public sealed class Approval
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string UserId { get; set; } = "";

    public string Statement { get; set; } = "";

    public DateTimeOffset ApprovedAt { get; set; }
}

/// <summary>
/// One review of a round: a reviewer (by assessor code) reads one application. Proposed by Decide or edited by the
/// facilitator before the plan is locked, frozen with it, and audited.
/// </summary>
public sealed class ReviewAssignmentEntry
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string AssessorCode { get; set; } = "";

    public string AlternativeCode { get; set; } = "";

    /// <summary><c>proposed</c>, <c>edited</c> or <c>imported</c>: how the review came to be assigned.</summary>
    public string Source { get; set; } = "";

    public string AssignedBy { get; set; } = "";

    public DateTimeOffset AssignedAt { get; set; }
}
