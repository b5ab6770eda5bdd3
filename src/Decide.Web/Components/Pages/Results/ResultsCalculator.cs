using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Components.Pages.Results;

/// <summary>
/// Runs the engine for the results screen: composes the stored evaluation, ranks it, and runs the robustness checks
/// off the circuit's thread. Readers: facilitator, observer and approver, and assessors, once moderation has begun.
/// Each reading is recorded in the evaluation's audit trail.
/// </summary>
public sealed class ResultsCalculator(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    AuditWriter audit)
{
    /// <summary>Ranks the evaluation as stored now.</summary>
    /// <exception cref="DomainProblem">The reader may not see results, or not yet.</exception>
    /// <exception cref="Decide.Core.InvalidEvaluationException">The stored evaluation cannot be analysed (every problem listed).</exception>
    public async Task<ResultsReading> RankAsync(Guid id, CancellationToken ct = default)
    {
        EvaluationSummary summary;
        Decide.Interchange.EvaluationFile file;
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor);
            if (!(m.Evaluation.Stage is EvaluationStage.Moderation or EvaluationStage.SignedOff
                  || (m.Evaluation.Stage == EvaluationStage.Superseded && m.Evaluation.ModerationStartedAt is not null)))
            {
                throw DomainProblem.Stage(
                    $"Results of {m.Evaluation.Reference} are shown from the moderation stage on; it is at stage {m.Evaluation.Stage}.");
            }

            summary = EvaluationService.Summarise(m.Evaluation, m.Roles);
            file = await composer.ComposeAsync(db, m.Evaluation, ct);
        }

        var (prepared, analysis) = await Task.Run(() =>
        {
            var p = DecisionEngine.Prepare(file.Evaluation);
            return (p, p.Analyze());
        }, ct);

        await UnitOfWork.RunAsync(factory, async db =>
        {
            await audit.RecordAsync(db, id, new AuditEvent("results.viewed", $"evaluations/{id}/results", null,
                "ranking " + string.Join(" > ", analysis.Ranking.Select(r => r.Alternative))), ct);
            return await db.SaveChangesAsync(ct);
        }, ct);

        return new ResultsReading(summary, prepared, analysis, ResultNames.Of(file.Evaluation));
    }

    /// <summary>The robustness checks (sensitivity, rank acceptability, panel agreement) with the default draws and seed, on a worker thread.</summary>
    public Task<RobustnessResult> CheckRobustnessAsync(ResultsReading reading, CancellationToken ct = default) =>
        Task.Run(() => RobustnessAnalysis.Run(reading.Prepared, reading.Analysis, new RobustnessOptions()), ct);
}
