using System.Security.Cryptography;
using System.Text;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.SignOff;

/// <summary>
/// Sign-off: the facilitator asks for it once moderation is done and every sheet is submitted; each approver then
/// confirms with their password and a statement; when the plan's number of approvals is reached the evaluation
/// becomes SignedOff and read-only forever. Each step is audited with the SHA-256 of the evaluation file it concerned.
/// </summary>
public sealed class SignOffService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    CurrentUser user,
    UserManager<DecideUser> users,
    AuditWriter audit,
    TimeProvider clock,
    Records.RecordService records,
    ILogger<SignOffService> log)
{
    /// <summary>Shortest statement accepted, in characters.</summary>
    public const int MinStatementLength = 10;

    /// <summary>Longest statement accepted, in characters.</summary>
    public const int MaxStatementLength = 4000;

    /// <summary>Approvals so far (facilitator, observer, approver).</summary>
    public async Task<SignOffState> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
        return await StateAsync(db, m.Evaluation, ct);
    }

    /// <summary>Shortest note accepted with a sign-off request, in characters.</summary>
    public const int MinNoteLength = 10;

    /// <summary>
    /// The facilitator asks the approvers to sign off (moderation stage, every sheet submitted, the evaluation
    /// complete enough to analyse). Asked once; the approvers see the note beside the results.
    /// </summary>
    public Task<SignOffState> RequestAsync(Guid id, SignOffRequest request, CancellationToken ct = default)
    {
        var note = request.Note?.Trim() ?? "";
        return UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.AskSignOff);
            var e = m.Evaluation;
            if (request.Version is { } version && version != e.Version)
            {
                throw DomainProblem.Concurrency("The evaluation", await StateAsync(db, e, ct));
            }

            if (e.SignOffRequestedAt is { } asked)
            {
                throw DomainProblem.Stage($"Sign-off was already requested on {asked:yyyy-MM-dd HH:mm} UTC; the approvers have it.");
            }

            if (note.Length is < MinNoteLength or > MaxStatementLength)
            {
                throw DomainProblem.Invalid("note", $"tell the approvers what you recommend and why ({MinNoteLength} to {MaxStatementLength} characters); it becomes part of the record");
            }

            var open = OpenSheets(e);
            if (open.Length > 0)
            {
                throw DomainProblem.Stage($"Cannot ask for sign-off: the rating sheet of {string.Join(", ", open)} is not submitted.");
            }

            if (e.PricesSealed)
            {
                throw DomainProblem.Stage("Cannot ask for sign-off: the prices are still sealed; close quality moderation and open them first.");
            }

            var file = await composer.ComposeAsync(db, e, ct);
            Results.ResultsService.RequireEveryPrice(e, file.Evaluation, "ask for sign-off");
            var run = DecisionRun.Of(file.Evaluation);
            if (run.Award is { AwaitingDecision.Count: > 0 } award)
            {
                throw DomainProblem.Stage($"Cannot ask for sign-off: the price of {string.Join(", ", award.AwaitingDecision.Select(file.Evaluation.AlternativeName))} is flagged as abnormally low and the decision on its explanation is not recorded yet.");
            }

            var hash = Fingerprint(file);
            e.SignOffRequestedAt = clock.GetUtcNow();
            e.SignOffRequestedBy = user.Id;
            e.SignOffRequestNote = note;
            audit.Record(db, id, new AuditEvent("signoff.requested", $"evaluations/{id}/sign-off", null,
                $"{note} (evaluation file sha256 {hash})"));
            await EvaluationStore.SaveAsync(db, e, ct);
            return await StateAsync(db, e, ct);
        }, ct);
    }

    /// <summary>
    /// Records the caller's approval (approver; moderation stage) after checking their password again. A wrong
    /// password is refused and audited as a failed approval (the password never is), and counts towards lockout.
    /// </summary>
    public async Task<SignOffState> ApproveAsync(Guid id, ApprovalRequest request, CancellationToken ct = default)
    {
        var statement = request.Statement?.Trim() ?? "";
        var errors = new Dictionary<string, string[]>();
        if (string.IsNullOrEmpty(request.Password))
        {
            errors["password"] = ["confirm the approval with your password"];
        }

        if (statement.Length is < MinStatementLength or > MaxStatementLength)
        {
            errors["statement"] = [$"say what you approve and why ({MinStatementLength} to {MaxStatementLength} characters); it becomes part of the record"];
        }

        // Role and stage first: someone who may not approve learns that, not whether their password is right.
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var m = await access.LoadAsync(db, id, ct);
            await CheckMayApproveAsync(db, m, ct);
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }

        var account = await users.FindByIdAsync(user.Id) ?? throw DomainProblem.NotFound("Your account");
        if (await users.IsLockedOutAsync(account))
        {
            await RecordRefusalAsync(id, "account locked after repeated wrong passwords", ct);
            throw new DomainProblem(StatusCodes.Status423Locked, "Account locked",
                "Too many wrong passwords: your account is locked for a while, and the approval was not recorded. Try again later or ask an administrator.");
        }

        if (!await users.CheckPasswordAsync(account, request.Password!))
        {
            await users.AccessFailedAsync(account);
            await RecordRefusalAsync(id, "wrong password", ct);
            throw DomainProblem.Forbidden("The password is wrong; the approval was not recorded. The failed attempt is in the audit trail.");
        }

        await users.ResetAccessFailedCountAsync(account);
        var state = await UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            await CheckMayApproveAsync(db, m, ct);

            // What is approved is exactly what the engine would analyse now; it must be complete.
            var file = await composer.ComposeAsync(db, m.Evaluation, ct);
            DecisionEngine.Prepare(file.Evaluation);
            var hash = Fingerprint(file);

            var now = clock.GetUtcNow();
            db.Approvals.Add(new Approval { EvaluationId = id, UserId = user.Id, Statement = statement, ApprovedAt = now });
            var count = await db.Approvals.CountAsync(a => a.EvaluationId == id, ct) + 1;
            db.MarkChanged(m.Evaluation); // an approval moves the evaluation's version
            audit.Record(db, id, new AuditEvent("approval.recorded", $"evaluations/{id}/approvals", null,
                $"approval {count} of {m.Evaluation.RequiredApprovals}: {statement} (evaluation file sha256 {hash})"));
            if (count >= m.Evaluation.RequiredApprovals)
            {
                m.Evaluation.SignOff(now);
                audit.Record(db, id, new AuditEvent("evaluation.signed-off", $"evaluations/{id}",
                    EvaluationStage.Moderation.ToString(), $"{EvaluationStage.SignedOff} after {count} approval(s); evaluation file sha256 {hash}"));
            }

            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return await StateAsync(db, m.Evaluation, ct);
        }, ct);

        if (state.Stage == EvaluationStage.SignedOff)
        {
            // The record is issued from the evaluation exactly as signed off. If that fails, the sign-off stands and
            // the record is issued on first download instead; nothing is lost.
            try
            {
                await records.IssueAsync(id, ct);
            }
            catch (Exception e) when (e is not OperationCanceledException)
            {
                log.LogError(e, "Issuing the signed record of evaluation {Id} failed; it will be issued on first download", id);
            }
        }

        return state;
    }

    private async Task CheckMayApproveAsync(DecideDbContext db, Membership m, CancellationToken ct)
    {
        m.Require(PanelRole.Approver);
        m.RequireStage(StageRules.Approve);
        if (m.Evaluation.SignOffRequestedAt is null)
        {
            throw DomainProblem.Stage($"The facilitator has not asked for sign-off of evaluation {m.Evaluation.Reference} yet; approvals open once they do.");
        }

        var mine = await db.Approvals.AsNoTracking().FirstOrDefaultAsync(a => a.EvaluationId == m.Evaluation.Id && a.UserId == user.Id, ct);
        if (mine is not null)
        {
            throw DomainProblem.Stage($"You approved evaluation {m.Evaluation.Reference} on {mine.ApprovedAt:yyyy-MM-dd HH:mm} UTC; each approver approves once.");
        }

        var open = OpenSheets(m.Evaluation);
        if (open.Length > 0)
        {
            throw DomainProblem.Stage($"Cannot approve: the rating sheet of {string.Join(", ", open)} is reopened and not submitted again.");
        }
    }

    /// <summary>Assessors whose rating sheet is open (never submitted, or reopened and not submitted again).</summary>
    private static string?[] OpenSheets(StoredEvaluation e) =>
        e.Panel.Where(p => p.Role == PanelRole.Assessor && p.SubmittedAt is null).Select(p => p.AssessorCode).ToArray();

    private static string Fingerprint(EvaluationFile file) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(file))));

    private Task RecordRefusalAsync(Guid id, string why, CancellationToken ct) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            audit.Record(db, id, new AuditEvent("approval.refused", $"evaluations/{id}/approvals", null, why));
            return await db.SaveChangesAsync(ct);
        }, ct);

    private async Task<SignOffState> StateAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        var approvals = await db.Approvals.AsNoTracking().Where(a => a.EvaluationId == e.Id).OrderBy(a => a.Id).ToListAsync(ct);
        var ids = approvals.Select(a => a.UserId).Append(e.SignOffRequestedBy ?? "").ToArray();
        var names = await db.Users.AsNoTracking().Where(u => ids.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);
        return new SignOffState(e.Stage, e.RequiredApprovals, e.SignedOffAt,
            approvals.Select(a => new ApprovalView(names.GetValueOrDefault(a.UserId, a.UserId), a.Statement, a.ApprovedAt)).ToArray(),
            e.SignOffRequestedAt, e.SignOffRequestedBy is { } by ? names.GetValueOrDefault(by, by) : null, e.SignOffRequestNote, e.Version,
            approvals.Any(a => a.UserId == user.Id));
    }
}
