using System.Collections.Concurrent;
using System.Security.Cryptography;
using System.Text;
using Decide.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace Decide.Data;

/// <summary>
/// Saves a context whose changes include audit entries so that each chain grows one entry at a time: the chain is
/// locked, its last entry read, the new entries chained after it and everything saved, in one transaction.
/// <list type="bullet">
/// <item>PostgreSQL: a transaction-scoped advisory lock per chain, so writers on different evaluations do not wait
/// for each other and instances of the service on other machines queue on the same lock. Within one instance,
/// writers on a chain queue in process first, so that a waiting save holds no database connection.</item>
/// <item>SQLite: one writer at a time per database file anyway; writers queue on an in-process gate (asynchronously,
/// instead of polling the file lock), and the transaction is SQLite's immediate one, which also holds off any
/// other process.</item>
/// </list>
/// </summary>
internal static class ChainedSave
{
    private static readonly ConcurrentDictionary<string, SemaphoreSlim> Gates = new(StringComparer.Ordinal);

    public static async Task<int> SaveAsync(
        DecideDbContext db, IReadOnlyList<AuditEntry> added, Func<bool, CancellationToken, Task<int>> save, bool acceptAll, CancellationToken ct)
    {
        // Writers of this process queue here first, holding no connection while they wait: SQLite per file (one
        // writer at a time anyway), PostgreSQL per chain (the advisory lock then orders the instances).
        var database = db.Database.GetConnectionString() ?? "";
        var keys = db.Database.IsSqlite()
            ? [database]
            : added.Select(e => database + "|" + e.Chain).Distinct().Order(StringComparer.Ordinal).ToArray();
        var held = new List<SemaphoreSlim>(keys.Length);
        try
        {
            foreach (var key in keys)
            {
                var gate = Gates.GetOrAdd(key, _ => new SemaphoreSlim(1, 1));
                await gate.WaitAsync(ct);
                held.Add(gate);
            }

            return await SaveChainedAsync(db, added, save, acceptAll, ct);
        }
        finally
        {
            foreach (var gate in held)
            {
                gate.Release();
            }
        }
    }

    private static async Task<int> SaveChainedAsync(
        DecideDbContext db, IReadOnlyList<AuditEntry> added, Func<bool, CancellationToken, Task<int>> save, bool acceptAll, CancellationToken ct)
    {
        if (added.Count == 0)
        {
            return await save(acceptAll, ct);
        }

        if (db.Database.CurrentTransaction is not null)
        {
            // The caller's transaction: the locks are held until it commits or rolls back.
            await LockChainsAsync(db, added, ct);
            await AuditChain.SealAsync(db, added, ct);
            return await save(acceptAll, ct);
        }

        // The provider's execution strategy may run the whole transaction again after a transient failure; changes
        // are accepted only once it has committed.
        var saved = await db.Database.CreateExecutionStrategy().ExecuteAsync(async token =>
        {
            await using var transaction = await db.Database.BeginTransactionAsync(token);
            await LockChainsAsync(db, added, token);
            await AuditChain.SealAsync(db, added, token);
            var count = await save(false, token);
            await transaction.CommitAsync(token);
            return count;
        }, ct);
        if (acceptAll)
        {
            db.ChangeTracker.AcceptAllChanges();
        }

        return saved;
    }

    private static async Task LockChainsAsync(DecideDbContext db, IReadOnlyList<AuditEntry> added, CancellationToken ct)
    {
        if (!db.Database.IsNpgsql())
        {
            return;
        }

        // Always in the same order, so two writers needing the same two chains cannot wait for each other.
        foreach (var chain in added.Select(e => e.Chain).Distinct().Order(StringComparer.Ordinal))
        {
            var key = LockKey(chain);
            await db.Database.ExecuteSqlAsync($"SELECT pg_advisory_xact_lock({key})", ct);
        }
    }

    /// <summary>A stable 64-bit key for a chain (the first eight bytes of the SHA-256 of its name).</summary>
    internal static long LockKey(string chain) =>
        BitConverter.ToInt64(SHA256.HashData(Encoding.UTF8.GetBytes("decide.audit:" + chain)), 0);
}
