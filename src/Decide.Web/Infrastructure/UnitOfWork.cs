using Decide.Data;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Runs one use case in a fresh, short-lived context that it saves once. Audit entries are chained under the
/// chain's lock when the context saves (<see cref="DecideDbContext.SaveChangesAsync(bool, CancellationToken)"/>), so
/// writers on one evaluation queue rather than collide; concurrency conflicts on the item itself are the caller's to
/// report (409).
/// </summary>
public static class UnitOfWork
{
    public static async Task<T> RunAsync<T>(IDbContextFactory<DecideDbContext> factory, Func<DecideDbContext, Task<T>> work, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        return await work(db);
    }
}
