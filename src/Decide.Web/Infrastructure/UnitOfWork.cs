using Decide.Data;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Runs one use case in a fresh, short-lived context and saves once. If another request took the same audit
/// position first (the chain's unique index), the whole use case runs again on fresh data; concurrency conflicts
/// on the item itself are the caller's to report (409).
/// </summary>
public static class UnitOfWork
{
    // Many writers on one evaluation (a whole panel saving at once, through several instances) collide on the audit
    // chain's next position; each retry waits a little longer, with jitter so that the colliders spread out.
    private const int Attempts = 40;

    public static async Task<T> RunAsync<T>(IDbContextFactory<DecideDbContext> factory, Func<DecideDbContext, Task<T>> work, CancellationToken ct = default)
    {
        for (var attempt = 1; ; attempt++)
        {
            await using var db = await factory.CreateDbContextAsync(ct);
            try
            {
                return await work(db);
            }
            catch (DbUpdateException e) when (attempt < Attempts && StoreErrors.IsAuditCollision(e))
            {
                await Task.Delay(Random.Shared.Next(2, 10 + 10 * Math.Min(attempt, 15)), ct);
            }
        }
    }
}
