using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Audit;

/// <summary>An audit entry as shown to readers of the record.</summary>
public sealed record AuditEntryView(long Index, DateTimeOffset At, string? UserName, string Action, string? Target, string? OldValue, string? NewValue, string Hash);

/// <summary>Reading and verifying the audit trail.</summary>
public sealed class AuditService(IDbContextFactory<DecideDbContext> factory, EvaluationAccess access, CurrentUser user)
{
    /// <summary>The evaluation's chain, oldest first (facilitator, observer, approver).</summary>
    public async Task<IReadOnlyList<AuditEntryView>> ListAsync(Guid id, CancellationToken ct)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
        var chain = id.ToString();
        return await db.Audit.AsNoTracking().Where(a => a.Chain == chain).OrderBy(a => a.Index)
            .Select(a => new AuditEntryView(a.Index, a.At, a.UserName, a.Action, a.Target, a.OldValue, a.NewValue, a.Hash))
            .ToListAsync(ct);
    }

    /// <summary>Verifies the evaluation's chain (facilitator, observer, approver).</summary>
    public async Task<AuditVerification> VerifyAsync(Guid id, CancellationToken ct)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
        return await AuditChain.VerifyAsync(db, id.ToString(), ct);
    }

    /// <summary>Verifies every chain (administrator).</summary>
    public async Task<AuditVerification> VerifyAllAsync(CancellationToken ct)
    {
        if (!user.IsAdministrator)
        {
            throw DomainProblem.Forbidden("Only an administrator verifies every chain; panel members verify their evaluation's chain.");
        }

        await using var db = await factory.CreateDbContextAsync(ct);
        return await AuditChain.VerifyAsync(db, null, ct);
    }
}
