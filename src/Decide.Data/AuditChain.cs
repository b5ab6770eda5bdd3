using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using Decide.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace Decide.Data;

/// <summary>What happened, by whom, to what: the content of an audit entry before it is chained.</summary>
public sealed record AuditEvent(string Action, string? Target = null, string? OldValue = null, string? NewValue = null);

/// <summary>One problem found when verifying a chain.</summary>
/// <param name="Chain">The chain.</param>
/// <param name="Index">The position at which the chain breaks.</param>
/// <param name="EntryId">The database id of the entry involved, when there is one.</param>
/// <param name="Kind">"edited", "deleted" or "inserted".</param>
/// <param name="Detail">A sentence for the auditor.</param>
public sealed record AuditBreak(string Chain, long Index, long? EntryId, string Kind, string Detail);

/// <summary>The result of verifying audit chains.</summary>
/// <param name="Valid">True when every chain is intact.</param>
/// <param name="Entries">Entries checked.</param>
/// <param name="Chains">Chains checked.</param>
/// <param name="Breaks">Every break found, in chain and index order.</param>
public sealed record AuditVerification(bool Valid, long Entries, int Chains, IReadOnlyList<AuditBreak> Breaks);

/// <summary>
/// Appends to and verifies the hash-chained audit trail. Each entry's hash is SHA-256 over a canonical text of its
/// chain, index, time, user, action, target, old and new values and the previous entry's hash.
/// </summary>
public static class AuditChain
{
    /// <summary>The chain for events that belong to no evaluation (sign-ins, accounts).</summary>
    public const string SystemChain = "system";

    /// <summary>The previous hash of the first entry of a chain.</summary>
    public static readonly string Genesis = new('0', 64);

    /// <summary>
    /// Adds the entry for <paramref name="e"/> to <paramref name="db"/>. Its position and hashes are fixed when the
    /// context saves (<see cref="DecideDbContext"/>), under a lock on the chain, so that writers on the same chain —
    /// a whole panel saving at once, through one instance or several — queue for a moment instead of colliding.
    /// Save it in the same SaveChanges as the change it records.
    /// </summary>
    public static AuditEntry Append(DecideDbContext db, string chain, AuditEvent e, string? userId, string? userName, DateTimeOffset at)
    {
        var entry = new AuditEntry
        {
            Chain = chain,
            // Whole microseconds: the finest time PostgreSQL keeps, so the hashed text reads back identically.
            At = at.AddTicks(-(at.Ticks % TimeSpan.TicksPerMicrosecond)),
            UserId = userId,
            UserName = userName,
            Action = e.Action,
            Target = e.Target,
            OldValue = e.OldValue,
            NewValue = e.NewValue,
        };
        db.AppendToChain(entry);
        return entry;
    }

    /// <summary>
    /// Gives each added, not yet chained entry its position after the last entry of its chain as stored now, and
    /// its hashes. Call only while holding the chain's lock, inside the transaction that saves the entries.
    /// </summary>
    internal static async Task SealAsync(DecideDbContext db, IReadOnlyList<AuditEntry> added, CancellationToken ct)
    {
        var lastByChain = new Dictionary<string, (long Index, string Hash)>(StringComparer.Ordinal);
        foreach (var entry in added)
        {
            if (!lastByChain.TryGetValue(entry.Chain, out var last))
            {
                var stored = await db.Audit.AsNoTracking()
                    .Where(x => x.Chain == entry.Chain)
                    .OrderByDescending(x => x.Index)
                    .Select(x => new { x.Index, x.Hash })
                    .FirstOrDefaultAsync(ct);
                last = stored is null ? (0, Genesis) : (stored.Index, stored.Hash);
            }

            entry.Index = last.Index + 1;
            entry.PreviousHash = last.Hash;
            entry.Hash = HashOf(entry);
            lastByChain[entry.Chain] = (entry.Index, entry.Hash);
        }
    }

    /// <summary>Verifies one chain, or every chain when <paramref name="chain"/> is null.</summary>
    public static async Task<AuditVerification> VerifyAsync(DecideDbContext db, string? chain = null, CancellationToken ct = default)
    {
        var query = db.Audit.AsNoTracking();
        if (chain is not null)
        {
            query = query.Where(x => x.Chain == chain);
        }

        var entries = await query.OrderBy(x => x.Chain).ThenBy(x => x.Index).ThenBy(x => x.Id).ToListAsync(ct);
        var breaks = new List<AuditBreak>();
        foreach (var group in entries.GroupBy(x => x.Chain))
        {
            breaks.AddRange(VerifyChain(group.Key, group.ToList()));
        }

        return new AuditVerification(breaks.Count == 0, entries.Count, entries.Select(x => x.Chain).Distinct().Count(), breaks);
    }

    /// <summary>Checks one chain's entries (ordered by index) and names each break.</summary>
    public static IEnumerable<AuditBreak> VerifyChain(string chain, IReadOnlyList<AuditEntry> entries)
    {
        var expectedIndex = 1L;
        var previousHash = Genesis;
        foreach (var entry in entries)
        {
            if (entry.Index > expectedIndex)
            {
                yield return new AuditBreak(chain, expectedIndex, null, "deleted",
                    $"entries {expectedIndex}–{entry.Index - 1} of chain {chain} are missing");
            }
            else if (entry.Index < expectedIndex)
            {
                yield return new AuditBreak(chain, entry.Index, entry.Id, "inserted",
                    $"entry {entry.Id} repeats position {entry.Index} of chain {chain}");
                continue;
            }

            if (HashOf(entry) != entry.Hash)
            {
                yield return new AuditBreak(chain, entry.Index, entry.Id, "edited",
                    $"entry {entry.Index} of chain {chain} ({entry.Action}) does not match its hash: its content was changed after it was written");
            }
            else if (entry.PreviousHash != previousHash)
            {
                yield return new AuditBreak(chain, entry.Index, entry.Id, entry.Index == expectedIndex ? "inserted" : "deleted",
                    $"entry {entry.Index} of chain {chain} does not follow the entry before it: an entry was inserted or removed before it");
            }

            previousHash = entry.Hash;
            expectedIndex = entry.Index + 1;
        }
    }

    /// <summary>SHA-256 (lower-case hex) of the entry's canonical text.</summary>
    public static string HashOf(AuditEntry e)
    {
        var text = string.Join('\u001f',
            e.Chain,
            e.Index.ToString(CultureInfo.InvariantCulture),
            e.At.UtcDateTime.ToString("O", CultureInfo.InvariantCulture),
            e.UserId ?? "",
            e.UserName ?? "",
            e.Action,
            e.Target ?? "",
            e.OldValue ?? "",
            e.NewValue ?? "",
            e.PreviousHash);
        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
    }
}
