using System.Security.Cryptography;
using System.Text;
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
/// Minimal sign-off: each approver confirms with their password and a statement; when the plan's number of
/// approvals is reached the evaluation becomes SignedOff and read-only forever. Each approval is audited with the
/// SHA-256 of the evaluation file it approved.
/// </summary>
public sealed class SignOffService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    CurrentUser user,
    UserManager<DecideUser> users,
    AuditWriter audit,
    TimeProvider clock)
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
        return await UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            await CheckMayApproveAsync(db, m, ct);

            // What is approved is exactly what the engine would analyse now; it must be complete.
            var file = await composer.ComposeAsync(db, m.Evaluation, ct);
            DecisionEngine.Prepare(file.Evaluation);
            var hash = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(file))));

            var now = clock.GetUtcNow();
            db.Approvals.Add(new Approval { EvaluationId = id, UserId = user.Id, Statement = statement, ApprovedAt = now });
            var count = await db.Approvals.CountAsync(a => a.EvaluationId == id, ct) + 1;
            m.Evaluation.Version++;
            await audit.RecordAsync(db, id, new AuditEvent("approval.recorded", $"evaluations/{id}/approvals", null,
                $"approval {count} of {m.Evaluation.RequiredApprovals}: {statement} (evaluation file sha256 {hash})"), ct);
            if (count >= m.Evaluation.RequiredApprovals)
            {
                m.Evaluation.Stage = EvaluationStage.SignedOff;
                m.Evaluation.SignedOffAt = now;
                await audit.RecordAsync(db, id, new AuditEvent("evaluation.signed-off", $"evaluations/{id}",
                    EvaluationStage.Moderation.ToString(), $"{EvaluationStage.SignedOff} after {count} approval(s); evaluation file sha256 {hash}"), ct);
            }

            await EvaluationService.SaveAsync(db, m.Evaluation, ct);
            return await StateAsync(db, m.Evaluation, ct);
        }, ct);
    }

    private async Task CheckMayApproveAsync(DecideDbContext db, Membership m, CancellationToken ct)
    {
        m.Require(PanelRole.Approver);
        m.RequireStage("approve", EvaluationStage.Moderation);
        var mine = await db.Approvals.AsNoTracking().FirstOrDefaultAsync(a => a.EvaluationId == m.Evaluation.Id && a.UserId == user.Id, ct);
        if (mine is not null)
        {
            throw DomainProblem.Stage($"You approved evaluation {m.Evaluation.Reference} on {mine.ApprovedAt:yyyy-MM-dd HH:mm} UTC; each approver approves once.");
        }

        var open = m.Evaluation.Panel.Where(p => p.Role == PanelRole.Assessor && p.SubmittedAt is null).Select(p => p.AssessorCode).ToArray();
        if (open.Length > 0)
        {
            throw DomainProblem.Stage($"Cannot approve: the rating sheet of {string.Join(", ", open)} is reopened and not submitted again.");
        }
    }

    private Task RecordRefusalAsync(Guid id, string why, CancellationToken ct) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            await audit.RecordAsync(db, id, new AuditEvent("approval.refused", $"evaluations/{id}/approvals", null, why), ct);
            return await db.SaveChangesAsync(ct);
        }, ct);

    private static async Task<SignOffState> StateAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        var approvals = await db.Approvals.AsNoTracking().Where(a => a.EvaluationId == e.Id).OrderBy(a => a.Id).ToListAsync(ct);
        var ids = approvals.Select(a => a.UserId).ToArray();
        var names = await db.Users.AsNoTracking().Where(u => ids.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);
        return new SignOffState(e.Stage, e.RequiredApprovals, e.SignedOffAt,
            approvals.Select(a => new ApprovalView(names.GetValueOrDefault(a.UserId, a.UserId), a.Statement, a.ApprovedAt)).ToArray());
    }
}
