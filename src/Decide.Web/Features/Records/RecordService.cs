using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using Decide.Core.Robustness;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Recordkeeping;
using Decide.Reports.Content;
using Decide.Reports.Feedback;
using Decide.Reports.Signing;
using Decide.Reports.Verification;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Data.Storage;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Records;

/// <summary>
/// The signed evaluation record: issued once when the evaluation is signed off (from the evaluation exactly as
/// approved, with the audit chain's head anchored in it), archived with its bytes, SHA-256 and snapshot, and checked
/// for anyone who holds a copy. Feedback letters to bidders are made from the same archived snapshot.
/// </summary>
public sealed class RecordService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    SigningCertificate signing,
    AuditWriter audit,
    TimeProvider clock,
    ILogger<RecordService> log)
{
    /// <summary>The archive's kind for the evaluation record.</summary>
    public const string RecordKind = "record";

    /// <summary>The archive's kind for a feedback letter.</summary>
    public const string FeedbackKind = "feedback";

    /// <summary>Robustness settings of the record: fixed, so that anyone re-running the file gets the same figures.</summary>
    public static readonly RobustnessOptions RecordRobustness = new(RobustnessOptions.DefaultDraws, RobustnessOptions.DefaultSeed, Environment.ProcessorCount);

    /// <summary>The documents archived for an evaluation (facilitator, observer, approver).</summary>
    public async Task<IReadOnlyList<ArchivedRecordView>> ListAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
        var records = await db.Archive.AsNoTracking().Where(r => r.EvaluationId == id)
            .Select(r => new ArchivedRecordView(r.Kind, r.AlternativeCode, r.FileName, r.Content.Length, r.Sha256, r.SnapshotSha256, r.SelfSigned, r.CreatedAt))
            .ToListAsync(ct);
        return records.OrderBy(r => r.CreatedAt).ToArray();
    }

    /// <summary>The signed record of a signed-off evaluation (issued now if an earlier attempt failed); the download is audited.</summary>
    public async Task<RecordFile> GetRecordAsync(Guid id, CancellationToken ct = default)
    {
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
            m.RequireStage(StageRules.DownloadRecord);
        }

        var record = await IssueAsync(id, ct);
        await UnitOfWork.RunAsync(factory, async db =>
        {
            audit.Record(db, id, new AuditEvent("record.downloaded", $"evaluations/{id}/record", null, $"sha256 {record.Sha256}"));
            return await db.SaveChangesAsync(ct);
        }, ct);
        return new RecordFile(record.FileName, record.Content);
    }

    /// <summary>
    /// Issues the signed record of a signed-off evaluation unless it exists. Safe to call from any instance at any
    /// time: the archive's unique index lets one record in, and a loser of the race returns the winner's.
    /// </summary>
    public async Task<ArchivedRecord> IssueAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        if (await ExistingAsync(db, id, RecordKind, "", ct) is { } existing)
        {
            return existing;
        }

        var stored = await LoadAsync(db, id, ct) ?? throw DomainProblem.NotFound("The evaluation");
        if (stored.Stage != EvaluationStage.SignedOff)
        {
            throw DomainProblem.Stage($"Evaluation {stored.Reference} is at stage {stored.Stage}; the record is issued once it is signed off.");
        }

        var file = await composer.ComposeAsync(db, stored, ct);
        var verification = await AuditChain.VerifyAsync(db, id.ToString(), ct);
        var entries = await db.Audit.AsNoTracking().Where(a => a.Chain == id.ToString()).OrderBy(a => a.Index)
            .Select(a => new { a.Hash, a.At }).ToListAsync(ct);
        var content = await ContentAsync(db, stored, file, ct) with
        {
            Audit = new AuditSummary(entries.Count, entries.LastOrDefault()?.Hash ?? AuditChain.Genesis, verification.Valid,
                verification.Valid ? $"All {verification.Entries} entries verify from the first to the head." : $"{verification.Breaks.Count} break(s); first: {verification.Breaks[0].Detail}",
                entries.FirstOrDefault()?.At, entries.LastOrDefault()?.At),
        };
        var pdf = RecordSigner.Sign(content, signing.Certificate);
        var record = new ArchivedRecord
        {
            Id = Guid.NewGuid(), EvaluationId = id, Kind = RecordKind, AlternativeCode = "",
            FileName = $"{Safe(stored.Reference)}-record.pdf", Content = pdf, Sha256 = Sha256(pdf),
            SnapshotJson = Encoding.UTF8.GetString(content.Snapshot.Span), SnapshotSha256 = content.Fingerprint,
            CertificateThumbprint = signing.Certificate.Thumbprint, SelfSigned = signing.SelfSigned,
            AuditHead = content.Audit!.ChainHead, CreatedAt = clock.GetUtcNow(), CreatedBy = "service",
        };
        return await ArchiveAsync(record, $"signed record issued: sha256 {record.Sha256}, evaluation fingerprint {record.SnapshotSha256}, audit head {record.AuditHead}", ct);
    }

    /// <summary>
    /// A feedback letter for one bidder (facilitator, after sign-off): its own scores and the winner's per criterion
    /// with the panel's reasons, and nothing about other bidders. Made from the archived record's snapshot.
    /// </summary>
    public async Task<RecordFile> GetFeedbackAsync(Guid id, string alternative, CancellationToken ct = default)
    {
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.WriteFeedback);
            if (!await db.Alternatives.AnyAsync(a => a.EvaluationId == id && a.Code == alternative, ct))
            {
                throw DomainProblem.NotFound($"Bid '{alternative}'");
            }

            if (await ExistingAsync(db, id, FeedbackKind, alternative, ct) is { } letter)
            {
                return new RecordFile(letter.FileName, letter.Content);
            }
        }

        var record = await IssueAsync(id, ct);
        ArchivedRecord made;
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var stored = (await LoadAsync(db, id, ct))!;
            var file = EvaluationFileReader.Read(record.SnapshotJson);
            var content = await ContentAsync(db, stored, file, ct);
            var pdf = SupplierFeedbackLetter.Render(content, alternative);
            made = new ArchivedRecord
            {
                Id = Guid.NewGuid(), EvaluationId = id, Kind = FeedbackKind, AlternativeCode = alternative,
                FileName = $"{Safe(stored.Reference)}-feedback-{Safe(alternative)}.pdf", Content = pdf, Sha256 = Sha256(pdf),
                SnapshotJson = record.SnapshotJson, SnapshotSha256 = record.SnapshotSha256, CertificateThumbprint = "",
                SelfSigned = false, AuditHead = record.AuditHead, CreatedAt = clock.GetUtcNow(), CreatedBy = "service",
            };
        }

        var archived = await ArchiveAsync(made, $"feedback letter to {alternative}: sha256 {made.Sha256}", ct);
        return new RecordFile(archived.FileName, archived.Content);
    }

    /// <summary>
    /// Checks an uploaded record: the signature, that it is unchanged since signing, that its embedded evaluation
    /// matches its fingerprint and re-analyses to the printed figures, and whether the archive holds it. The check
    /// is recorded in the service's audit trail (not the file).
    /// </summary>
    public async Task<RecordVerificationView> VerifyAsync(byte[] pdf, CancellationToken ct = default)
    {
        if (pdf.Length == 0)
        {
            throw DomainProblem.Invalid("file", "choose the PDF record to check; the upload was empty");
        }

        var report = RecordVerifier.Verify(pdf, PrintedFigures.Check);
        var checks = report.Checks.Select(c => new CheckView(c.Name, c.Passed, c.Detail)).ToList();
        var sha = Sha256(pdf);
        string? reference = null;
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var match = await db.Archive.AsNoTracking().Where(r => r.Sha256 == sha)
                .Select(r => new { r.EvaluationId, r.CreatedAt, r.Kind }).FirstOrDefaultAsync(ct);
            if (match is not null)
            {
                reference = await db.Evaluations.AsNoTracking().Where(e => e.Id == match.EvaluationId).Select(e => e.Reference).FirstAsync(ct);
                checks.Add(new CheckView("matches an archived record", true,
                    $"Byte for byte the {match.Kind} archived for evaluation {reference} on {match.CreatedAt:yyyy-MM-dd HH:mm} UTC (sha256 {sha})."));
            }
            else
            {
                checks.Add(new CheckView("matches an archived record", false,
                    $"This service's archive holds no document with this file's SHA-256 ({sha}); it was changed, or issued elsewhere."));
            }
        }

        var all = checks.All(c => c.Passed);
        await UnitOfWork.RunAsync(factory, async db =>
        {
            audit.Record(db, null, new AuditEvent("record.verified", reference is null ? "records" : $"records/{reference}", null,
                $"sha256 {sha}: {(all ? "every check passed" : "failed: " + string.Join(", ", checks.Where(c => !c.Passed).Select(c => c.Name)))}"));
            return await db.SaveChangesAsync(ct);
        }, ct);
        return new RecordVerificationView(all, checks, reference);
    }

    private async Task<RecordContent> ContentAsync(DecideDbContext db, StoredEvaluation stored, EvaluationFile file, CancellationToken ct)
    {
        var content = RecordContentBuilder.Build(file, RecordRobustness, clock.GetUtcNow(), signing.SelfSigned ? SelfSignedCertificate.Note : null);
        var conflicts = await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == stored.Id).ToListAsync(ct);
        var panel = stored.Panel.OrderBy(p => p.Role).ThenBy(p => p.AssessorCode).Select(p =>
        {
            var mine = conflicts.Where(c => c.UserId == p.UserId).Select(c => $"{c.AlternativeCode}: {c.Statement}{(c.Action is null ? " (recused)" : $" ({c.Action})")}").ToArray();
            var declares = p.Role is PanelRole.Assessor or PanelRole.PriceEvaluator;
            return new MemberOnRecord(p.User?.DisplayName ?? p.UserId, RoleName(p.Role), p.AssessorCode,
                p.Role == PanelRole.Assessor ? p.Weight : null, p.DeclarationSignedAt,
                declares ? (mine.Length == 0 ? "none declared" : string.Join("; ", mine)) : null);
        }).ToArray();

        var users = await db.Users.AsNoTracking().ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);
        var moderation = (await db.Moderation.AsNoTracking().Where(x => x.EvaluationId == stored.Id).OrderBy(x => x.Id).ToListAsync(ct))
            .GroupBy(x => (x.AlternativeCode, x.CriterionId)).Select(g => g.Last())
            .Select(x => new ModerationOnRecord(x.AlternativeCode, x.CriterionId, Originals(x.OriginalsJson), x.Term, x.Reason,
                users.GetValueOrDefault(x.RecordedBy, x.RecordedBy), x.RecordedAt)).ToArray();

        var approvals = (await db.Approvals.AsNoTracking().Where(a => a.EvaluationId == stored.Id).OrderBy(a => a.Id).ToListAsync(ct))
            .Select(a => new ApprovalOnRecord(users.GetValueOrDefault(a.UserId, a.UserId), "Approver", a.ApprovedAt, a.Statement)).ToArray();

        var dates = new List<RecordDate> { new("Created", stored.CreatedAt) };
        void Add(string label, DateTimeOffset? when)
        {
            if (when is { } w)
            {
                dates.Add(new RecordDate(label, w));
            }
        }

        Add("Plan locked", stored.PlanLockedAt);
        Add("Scoring opened", stored.ScoringOpenedAt);
        Add("Moderation started", stored.ModerationStartedAt);
        Add("Sign-off requested", stored.SignOffRequestedAt);
        Add("Signed off", stored.SignedOffAt);
        var identity = new RecordIdentity(stored.Title, stored.Reference, stored.Organisation ?? "(organisation not given)",
            stored.Stage == EvaluationStage.SignedOff ? $"Signed off (revision {stored.Revision})" : $"{stored.Stage} (revision {stored.Revision})", dates);
        return content with { Identity = identity, Panel = panel, Moderation = moderation, Approvals = approvals, PublishedMethodology = stored.MethodologyHash };
    }

    private static IReadOnlyList<string> Originals(string json)
    {
        try
        {
            using var doc = JsonDocument.Parse(json);
            return doc.RootElement.EnumerateArray().Select(e => e.ValueKind == JsonValueKind.Object
                ? string.Join(" ", e.EnumerateObject().Where(p => p.Value.ValueKind is JsonValueKind.String && p.Name is "assessor" or "term").Select(p => p.Value.GetString()))
                : e.ToString()).ToArray();
        }
        catch (JsonException)
        {
            return [json];
        }
    }

    private async Task<ArchivedRecord> ArchiveAsync(ArchivedRecord record, string note, CancellationToken ct)
    {
        try
        {
            return await UnitOfWork.RunAsync(factory, async db =>
            {
                db.Archive.Add(record);
                audit.Record(db, record.EvaluationId, new AuditEvent($"{record.Kind}.archived", $"evaluations/{record.EvaluationId}/records", null, note));
                await db.SaveChangesAsync(ct);
                return record;
            }, ct);
        }
        catch (DbUpdateException e) when (StoreErrors.IsUniqueViolation(e))
        {
            // Another instance issued it first: theirs is the record.
            log.LogInformation("The {Kind} of evaluation {Id} was issued by another instance first", record.Kind, record.EvaluationId);
            await using var db = await factory.CreateDbContextAsync(ct);
            return await ExistingAsync(db, record.EvaluationId, record.Kind, record.AlternativeCode, ct)
                ?? throw new InvalidOperationException("The archive refused the record but holds none.");
        }
    }

    /// <summary>The stored evaluation with its panel (and their accounts) and bids, as the record prints them.</summary>
    private static Task<StoredEvaluation?> LoadAsync(DecideDbContext db, Guid id, CancellationToken ct) =>
        db.Evaluations.Include(e => e.Panel).ThenInclude(p => p.User).Include(e => e.Alternatives).AsSplitQuery()
            .FirstOrDefaultAsync(e => e.Id == id, ct);

    private static Task<ArchivedRecord?> ExistingAsync(DecideDbContext db, Guid id, string kind, string alternative, CancellationToken ct) =>
        db.Archive.AsNoTracking().FirstOrDefaultAsync(r => r.EvaluationId == id && r.Kind == kind && r.AlternativeCode == alternative, ct);

    private static string RoleName(PanelRole role) => role switch
    {
        PanelRole.PriceEvaluator => "Price evaluator",
        _ => role.ToString(),
    };

    private static string Sha256(byte[] bytes) => Convert.ToHexStringLower(SHA256.HashData(bytes));

    private static string Safe(string name) => string.Concat(name.Select(c => char.IsLetterOrDigit(c) || c is '-' or '_' ? c : '-'));
}
