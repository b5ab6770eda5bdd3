namespace Decide.Reports.Content;

/// <summary>A sign-off given in the service.</summary>
/// <param name="Name">Who signed off.</param>
/// <param name="Role">In what capacity (panel chair, assessor, approver).</param>
/// <param name="At">When.</param>
/// <param name="Statement">What they confirmed, in their words or the service's standard statement.</param>
public sealed record ApprovalOnRecord(string Name, string Role, DateTimeOffset At, string Statement);
