using Decide.Data.Entities;

namespace Decide.Web.Features.SignOff;

/// <summary>An approver's approval: their password again (strong confirmation) and their statement.</summary>
/// <param name="Password">The approver's own password; checked, never stored or audited.</param>
/// <param name="Statement">What the approver approves and why (the decision-maker's own rationale).</param>
public sealed record ApprovalRequest(string? Password, string? Statement);

/// <summary>The facilitator asks the approvers to sign off.</summary>
/// <param name="Note">What the facilitator tells the approvers: the recommendation and anything they should weigh.</param>
/// <param name="Version">The evaluation's version as last read; a stale one is refused.</param>
public sealed record SignOffRequest(string? Note, long? Version);

/// <summary>One recorded approval.</summary>
public sealed record ApprovalView(string Approver, string Statement, DateTimeOffset ApprovedAt);

/// <summary>Where sign-off stands.</summary>
/// <param name="Stage">The stage after the request (SignedOff once enough approvers approved).</param>
/// <param name="Required">Approvals the evaluation needs.</param>
/// <param name="SignedOffAt">When it was signed off, if it was.</param>
/// <param name="Approvals">Every approval so far, oldest first.</param>
/// <param name="RequestedAt">When the facilitator asked for sign-off; approvals are accepted only after that.</param>
/// <param name="RequestedBy">Who asked.</param>
/// <param name="RequestNote">What they told the approvers.</param>
/// <param name="Version">The evaluation's version, for the next change.</param>
/// <param name="YouApproved">True when the caller has approved.</param>
public sealed record SignOffState(
    EvaluationStage Stage, int Required, DateTimeOffset? SignedOffAt, IReadOnlyList<ApprovalView> Approvals,
    DateTimeOffset? RequestedAt, string? RequestedBy, string? RequestNote, long Version, bool YouApproved);
