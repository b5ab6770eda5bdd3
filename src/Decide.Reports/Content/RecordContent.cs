using Decide.Core.Analysis;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Reports.Content;

/// <summary>
/// Everything the signed evaluation record prints, assembled by the caller (the web service from its database, the
/// command line from an evaluation file). The report adds nothing of its own beyond layout and wording.
/// </summary>
/// <param name="Evaluation">The evaluation as the engine saw it (plan, panel, ratings).</param>
/// <param name="Analysis">The engine's result for <paramref name="Evaluation"/>.</param>
/// <param name="Robustness">The robustness checks for <paramref name="Analysis"/>.</param>
/// <param name="Identity">Title, reference, organisation, dates and status for the cover.</param>
/// <param name="Panel">Everyone on the panel with their role and declaration.</param>
/// <param name="Consistency">Consistency of each assessor's judgements (see <see cref="AssessorConsistency.FromAnalysis"/>).</param>
/// <param name="Moderation">The moderation record: each cell the panel changed, and why.</param>
/// <param name="Audit">Summary of the audit trail, or null when the record is made outside the service (no trail exists).</param>
/// <param name="Approvals">Sign-offs already given; the sign-off page leaves lines for the rest.</param>
/// <param name="SoftwareVersion">Version of the software that computed the figures.</param>
/// <param name="Snapshot">
/// The portable evaluation file (decide-evaluation/1 JSON, UTF-8) the figures were computed from. Embedded in the PDF
/// as <c>evaluation.json</c>; its SHA-256 is the record's fingerprint printed in every footer.
/// </param>
/// <param name="GeneratedAt">When the record was produced (printed, and used as the PDF's creation date).</param>
/// <param name="Award">The published points award applied, when the plan states one.</param>
/// <param name="AwardAgreement">How the award and the closeness ranking agree.</param>
/// <param name="AwardRobustness">The award's robustness checks.</param>
/// <param name="Methodology">SHA-256 of the methodology's text version made from the plan the figures were computed with.</param>
/// <param name="PublishedMethodology">SHA-256 of the methodology stored when the plan was locked (what was published), or null when not known.</param>
/// <param name="Round">A round's funding line, bands and flips, when the evaluation is a round or has a funding line.</param>
/// <param name="CertificateNote">
/// What the reader should know about the signing certificate (for a self-signed one,
/// <see cref="Signing.SelfSignedCertificate.Note"/>); null prints nothing.
/// </param>
public sealed record RecordContent(
    Evaluation Evaluation,
    AnalysisResult Analysis,
    RobustnessResult Robustness,
    RecordIdentity Identity,
    IReadOnlyList<MemberOnRecord> Panel,
    IReadOnlyList<AssessorConsistency> Consistency,
    IReadOnlyList<ModerationOnRecord> Moderation,
    AuditSummary? Audit,
    IReadOnlyList<ApprovalOnRecord> Approvals,
    string SoftwareVersion,
    ReadOnlyMemory<byte> Snapshot,
    DateTimeOffset GeneratedAt,
    string? CertificateNote = null,
    AwardReport? Award = null,
    AwardAgreement? AwardAgreement = null,
    AwardRobustnessResult? AwardRobustness = null,
    string? Methodology = null,
    string? PublishedMethodology = null,
    Decide.Core.Rounds.RoundReport? Round = null)
{
    /// <summary>The SHA-256 of <see cref="Snapshot"/>, lower-case hex: the record's fingerprint.</summary>
    public string Fingerprint => RecordFingerprint.Of(Snapshot.Span);
}
