namespace Decide.Reports.Verification;

/// <summary>What a re-analysis check gets: the whole PDF and the evaluation file embedded in it.</summary>
/// <param name="Pdf">The record's bytes.</param>
/// <param name="Snapshot">The embedded evaluation file (decide-evaluation/1 JSON).</param>
/// <param name="Fingerprint">The fingerprint the record states (SHA-256 hex), if found.</param>
public sealed record EmbeddedRecord(ReadOnlyMemory<byte> Pdf, ReadOnlyMemory<byte> Snapshot, string? Fingerprint);
