namespace Decide.Web.Features.Records;

/// <summary>A document issued at sign-off and archived.</summary>
/// <param name="Kind">"record" (the signed evaluation record) or "feedback" (a letter to one bidder).</param>
/// <param name="Alternative">The bidder a letter is for; empty for the record.</param>
/// <param name="FileName">The file's name.</param>
/// <param name="Bytes">Its size.</param>
/// <param name="Sha256">SHA-256 of the file.</param>
/// <param name="Fingerprint">SHA-256 of the evaluation snapshot it was made from (printed in its footers).</param>
/// <param name="SelfSigned">Signed with the service's own certificate: proves the file is unchanged, not who signed it.</param>
/// <param name="CreatedAt">When it was issued.</param>
public sealed record ArchivedRecordView(string Kind, string Alternative, string FileName, long Bytes, string Sha256, string Fingerprint, bool SelfSigned, DateTimeOffset CreatedAt);

/// <summary>A file and its name, for download.</summary>
public sealed record RecordFile(string FileName, byte[] Content);

/// <summary>One check of an uploaded record.</summary>
public sealed record CheckView(string Name, bool Passed, string Detail);

/// <summary>The answer to "is this record genuine?": each check separately, and whether all passed.</summary>
/// <param name="AllPassed">True only when every check passed.</param>
/// <param name="Checks">Signature, unchanged since signing, embedded evaluation, re-analysis, archive match.</param>
/// <param name="Reference">The evaluation the archive holds this record for, when it matches one the caller may see.</param>
public sealed record RecordVerificationView(bool AllPassed, IReadOnlyList<CheckView> Checks, string? Reference);
