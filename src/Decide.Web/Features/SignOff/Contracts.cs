using Decide.Data.Entities;

namespace Decide.Web.Features.SignOff;

/// <summary>An approver's approval: their password again (strong confirmation) and their statement.</summary>
/// <param name="Password">The approver's own password; checked, never stored or audited.</param>
/// <param name="Statement">What the approver approves and why (the decision-maker's own rationale).</param>
public sealed record ApprovalRequest(string? Password, string? Statement);

/// <summary>One recorded approval.</summary>
public sealed record ApprovalView(string Approver, string Statement, DateTimeOffset ApprovedAt);

/// <summary>Where sign-off stands.</summary>
/// <param name="Stage">The stage after the request (SignedOff once enough approvers approved).</param>
/// <param name="Required">Approvals the evaluation needs.</param>
/// <param name="SignedOffAt">When it was signed off, if it was.</param>
/// <param name="Approvals">Every approval so far, oldest first.</param>
public sealed record SignOffState(EvaluationStage Stage, int Required, DateTimeOffset? SignedOffAt, IReadOnlyList<ApprovalView> Approvals);
