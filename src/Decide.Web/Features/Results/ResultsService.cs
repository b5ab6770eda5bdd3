using Decide.Core;
using Decide.Core.Analysis;
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
/// from moderation on. Every view is audited: the API's with the settings and the SHA-256 of the document shown,
/// a screen's with the ranking shown.
/// </summary>
public sealed class ResultsService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    AuditWriter audit)
{
    public async Task<ResultsJson> GetAsync(Guid id, RobustnessOptions options, CancellationToken ct = default)
    {
        var (_, file) = await ComposeAsync(id, ct);
        var results = ResultsComputation.Run(file, options);
        await AuditViewAsync(id, $"draws {options.Draws}, seed {options.Seed}; results sha256 {results.Sha256}", ct);
        return results;
    }

    /// <summary>
    /// The ranking for a screen, computed on a worker thread; the robustness checks follow separately
    /// (<see cref="CheckRobustnessAsync"/>) so that the ranking can be shown while they run.
    /// </summary>
    /// <exception cref="DomainProblem">The reader may not see results, or not yet.</exception>
    /// <exception cref="Decide.Core.InvalidEvaluationException">The stored evaluation cannot be analysed (every problem listed).</exception>
    public async Task<RankedEvaluation> RankAsync(Guid id, CancellationToken ct = default)
    {
        var (summary, file) = await ComposeAsync(id, ct);
        var run = await Task.Run(() => DecisionRun.Of(file.Evaluation), ct);
        await AuditViewAsync(id, "ranking " + string.Join(" > ", run.Analysis.Ranking.Select(r => r.Alternative)), ct);
        return new RankedEvaluation(summary, file, run);
    }

    /// <summary>The robustness checks (sensitivity, rank acceptability, panel agreement) of a ranking, on a worker thread.</summary>
    public static Task<RobustnessResult> CheckRobustnessAsync(RankedEvaluation ranked, RobustnessOptions options, CancellationToken ct = default) =>
        Task.Run(() => ranked.Run.WithRobustness(options).Robustness!, ct);

    /// <summary>
    /// Results are visible to the facilitator, the observer, the approver and the assessors once moderation has
    /// started; never while assessors still rate independently.
    /// </summary>
    internal static void RequireResultsVisible(Membership m, string action)
    {
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor);
        Moderation.ModerationService.RequireModerationReached(m, action);
    }

    /// <summary>
    /// After the prices of a two-stage evaluation are opened, the ranking needs every one of them: refused, naming the
    /// bids still without a price, until the price evaluator has entered them all.
    /// </summary>
    internal static void RequireEveryPrice(StoredEvaluation stored, Decide.Core.Model.Evaluation evaluation, string action)
    {
        if (!stored.TwoStage || evaluation.Award is null)
        {
            return;
        }

        var quality = Decide.Core.Award.AwardAnalysis.QualityStage(evaluation);
        if (quality.Result.PricesSealed)
        {
            var missing = quality.Result.Bids.Where(b => b.Excluded is null && b.Price is null).Select(b => evaluation.AlternativeName(b.Id)).ToArray();
            throw DomainProblem.Stage($"Cannot {action} yet: the price of {string.Join(", ", missing)} is not entered; the price evaluator enters every opened price first.");
        }
    }

    /// <summary>The ranking needs every price: refused while a two-stage evaluation's prices are sealed.</summary>
    internal static void RequirePricesOpen(Membership m, string action)
    {
        if (m.Evaluation.PricesSealed)
        {
            throw DomainProblem.Stage($"Cannot {action} yet: evaluation {m.Evaluation.Reference} is evaluated in two stages and its prices stay sealed until quality moderation is closed and they are opened. The quality stage of the award (quality points and thresholds) is shown on its own until then.");
        }
    }

    private async Task<(EvaluationSummary Summary, Interchange.EvaluationFile File)> ComposeAsync(Guid id, CancellationToken ct)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        RequireResultsVisible(m, "see the results");
        RequirePricesOpen(m, "rank the bids");
        var file = await composer.ComposeAsync(db, m.Evaluation, ct);
        RequireEveryPrice(m.Evaluation, file.Evaluation, "rank the bids");
        return (EvaluationStore.Summarise(m.Evaluation, m.Roles), file);
    }

    private Task AuditViewAsync(Guid id, string shown, CancellationToken ct) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            audit.Record(db, id, new AuditEvent("results.viewed", $"evaluations/{id}/results", null, shown));
            return await db.SaveChangesAsync(ct);
        }, ct);
}
