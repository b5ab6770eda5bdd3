using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Data.Storage;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Inputs;

/// <summary>Look-ups and saving shared by the input use cases.</summary>
internal static class InputStore
{
    /// <summary>The bids, in display order.</summary>
    public static Task<List<StoredAlternative>> BiddersAsync(DecideDbContext db, Guid id, CancellationToken ct) =>
        db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id).OrderBy(a => a.Position).ThenBy(a => a.Id).ToListAsync(ct);

    /// <summary>The bid with code <paramref name="code"/>, or 404 naming it.</summary>
    /// <summary>
    /// The applications assigned to reviewer <paramref name="code"/> in a round, or null when the plan has no review
    /// design (every assessor rates every bid).
    /// </summary>
    public static async Task<HashSet<string>?> AssignedAsync(DecideDbContext db, Guid id, Decide.Core.Model.Evaluation plan, string code, CancellationToken ct) =>
        plan.Reviews is null
            ? null
            : (await db.ReviewAssignments.AsNoTracking().Where(r => r.EvaluationId == id && r.AssessorCode == code)
                .Select(r => r.AlternativeCode).ToListAsync(ct)).ToHashSet(StringComparer.Ordinal);

    public static StoredAlternative Bidder(IEnumerable<StoredAlternative> bidders, string code) =>
        bidders.FirstOrDefault(a => a.Code == code) ?? throw DomainProblem.NotFound($"Bid \"{code}\"");

    /// <summary>The criterion with id <paramref name="id"/>, or 404 naming it.</summary>
    public static Criterion Criterion(Evaluation plan, string id) =>
        plan.Criteria.FirstOrDefault(c => c.Id == id) ?? throw DomainProblem.NotFound($"Criterion \"{id}\"");

    /// <summary>Refuses a change whose version does not match the stored row (409 with the current state).</summary>
    /// <param name="what">The item, for the sentence ("Your rating of northgate on quality").</param>
    /// <param name="stored">The stored version, or null when nothing is stored yet.</param>
    /// <param name="sent">The version the client read, or null on a first save.</param>
    /// <param name="current">The current state to return with a conflict.</param>
    public static void CheckVersion(string what, long? stored, long? sent, object? current)
    {
        if (stored is null && sent is not null)
        {
            throw DomainProblem.Invalid("version", $"{what} has not been saved yet; leave the version out on the first save");
        }

        if (stored is not null && sent != stored)
        {
            throw DomainProblem.Concurrency(what, current);
        }
    }

    /// <summary>
    /// Saves once. A row changed or first created by someone else in between becomes a 409 carrying the state
    /// <paramref name="current"/> reads afresh. An audit-chain collision cannot happen (chains grow under a lock)
    /// and is not dressed up as a conflict if it ever does.
    /// </summary>
    public static async Task SaveAsync(DecideDbContext db, string what, Func<Task<object?>> current, CancellationToken ct)
    {
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateConcurrencyException)
        {
            throw DomainProblem.Concurrency(what, await current());
        }
        catch (DbUpdateException e) when (StoreErrors.IsUniqueViolation(e) && !StoreErrors.IsAuditCollision(e))
        {
            throw DomainProblem.Concurrency(what, await current());
        }
    }

    /// <summary>"rated G: …" or "declined: …", for the audit trail.</summary>
    public static string? Describe(RatingEntry? r) => r is null
        ? null
        : r.DeclinedReason is { } reason ? $"declined: {reason}" : $"{r.Term}: {r.Rationale}";
}
