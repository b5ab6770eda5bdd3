using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Evaluations;

/// <summary>What every use case does with an evaluation's row: summarise it, refuse a stale version, save it.</summary>
internal static class EvaluationStore
{
    internal static EvaluationSummary Summarise(StoredEvaluation e, IEnumerable<PanelRole> roles) =>
        new(e.Id, e.Reference, e.Title, e.Organisation, e.Stage, e.Revision, roles.Distinct().Order().ToArray(), e.Version, e.PointsAward, e.PricesSealed, e.IsRound);

    /// <summary>Refuses a change made on a stale view of the evaluation (409 with the current summary).</summary>
    internal static void CheckVersion(StoredEvaluation e, long version)
    {
        if (e.Version != version)
        {
            throw DomainProblem.Concurrency($"Evaluation {e.Reference}", new { e.Version, e.Stage, e.Title });
        }
    }

    /// <summary>Saves; a concurrent change of the evaluation row becomes a 409 with the current state.</summary>
    internal static async Task SaveAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateConcurrencyException)
        {
            throw DomainProblem.Concurrency($"Evaluation {e.Reference}", null);
        }
    }
}
