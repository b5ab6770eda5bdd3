using Decide.Data;
using Decide.Web.Infrastructure;

namespace Decide.Web.Features.Audit;

/// <summary>
/// Adds audit entries for the current user to a unit of work. They are chained and saved with the change they
/// record, in the same SaveChanges.
/// </summary>
public sealed class AuditWriter(CurrentUser user, TimeProvider clock)
{
    /// <summary>Records <paramref name="e"/> in the evaluation's chain (or the system chain when null).</summary>
    public void Record(DecideDbContext db, Guid? evaluation, AuditEvent e) =>
        AuditChain.Append(db, evaluation?.ToString() ?? AuditChain.SystemChain, e,
            user.IsSignedIn ? user.Id : null, user.IsSignedIn ? user.Name : null, clock.GetUtcNow());

    /// <summary>Records an event for a user who is not (yet) signed in, such as a sign-in attempt.</summary>
    public void RecordFor(DecideDbContext db, string? userId, string? userName, AuditEvent e) =>
        AuditChain.Append(db, AuditChain.SystemChain, e, userId, userName, clock.GetUtcNow());
}
