namespace Decide.Data.Entities;

/// <summary>
/// A document issued at sign-off and kept unchanged: the signed evaluation record, or a feedback letter to one
/// bidder. Its bytes, their SHA-256 and the evaluation snapshot it was made from are stored together; one record
/// per evaluation and kind (and bidder, for letters), enforced by a unique index so that two instances racing to
/// issue it cannot both succeed.
/// </summary>
public sealed class ArchivedRecord
{
    public Guid Id { get; set; }

    public Guid EvaluationId { get; set; }

    /// <summary>"record" for the signed evaluation record, "feedback" for a letter to one bidder.</summary>
    public string Kind { get; set; } = "";

    /// <summary>The bidder a feedback letter is for; empty for the evaluation record.</summary>
    public string AlternativeCode { get; set; } = "";

    public string FileName { get; set; } = "";

    public byte[] Content { get; set; } = [];

    /// <summary>SHA-256 (lower-case hex) of <see cref="Content"/>.</summary>
    public string Sha256 { get; set; } = "";

    /// <summary>The portable evaluation file (decide-evaluation/1) the document was made from.</summary>
    public string SnapshotJson { get; set; } = "";

    /// <summary>SHA-256 (lower-case hex) of <see cref="SnapshotJson"/> as UTF-8: the record's fingerprint.</summary>
    public string SnapshotSha256 { get; set; } = "";

    /// <summary>SHA-1 thumbprint of the signing certificate.</summary>
    public string CertificateThumbprint { get; set; } = "";

    /// <summary>True when the service signed with its own self-signed certificate (proves integrity, not identity).</summary>
    public bool SelfSigned { get; set; }

    /// <summary>The evaluation's audit chain head when the document was issued: anchors the chain outside the database.</summary>
    public string AuditHead { get; set; } = "";

    public DateTimeOffset CreatedAt { get; set; }

    public string CreatedBy { get; set; } = "";
}
