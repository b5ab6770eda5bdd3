namespace Decide.Reports.Content;

/// <summary>Summary of the evaluation's append-only audit trail at the time the record was made.</summary>
/// <param name="Entries">Number of entries in the chain.</param>
/// <param name="ChainHead">Hash of the last entry (the chain head).</param>
/// <param name="Verified">Whether the chain verified from its first entry to its head.</param>
/// <param name="VerificationResult">The verifier's sentence ("All 412 entries verify.", or the first break found).</param>
/// <param name="First">Time of the first entry, if any.</param>
/// <param name="Last">Time of the last entry, if any.</param>
public sealed record AuditSummary(
    int Entries, string ChainHead, bool Verified, string VerificationResult, DateTimeOffset? First = null, DateTimeOffset? Last = null);
