using Decide.Core.Robustness;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Results;

/// <summary>
/// The evaluation's results with robustness, from what is stored (composed as a portable evaluation), for the panel
/// from moderation on. Every view is audited with the settings and the SHA-256 of the document shown.
/// </summary>
public sealed class ResultsService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    AuditWriter audit)
{
    public async Task<ResultsJson> GetAsync(Guid id, RobustnessOptions options, CancellationToken ct = default)
    {
        Interchange.EvaluationFile file;
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var m = await access.LoadAsync(db, id, ct);
            RequireResultsVisible(m, "see the results");
            file = await composer.ComposeAsync(db, m.Evaluation, ct);
        }

        var results = ResultsComputation.Run(file, options);
        await UnitOfWork.RunAsync(factory, async db =>
        {
            await audit.RecordAsync(db, id, new AuditEvent("results.viewed", $"evaluations/{id}/results", null,
                $"draws {options.Draws}, seed {options.Seed}; results sha256 {results.Sha256}"), ct);
            return await db.SaveChangesAsync(ct);
        }, ct);
        return results;
    }

    /// <summary>
    /// Results are visible to the facilitator, the observer, the approver and the assessors once moderation has
    /// started; never while assessors still rate independently.
    /// </summary>
    internal static void RequireResultsVisible(Membership m, string action)
    {
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor);
        Moderation.ModerationService.RequireModerationReached(m, action);
    }
}
