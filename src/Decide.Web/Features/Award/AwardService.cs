using Decide.Core;
using Decide.Core.Award;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Results;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Award;

/// <summary>
/// The published points award: the table a bidder can recompute (from moderation on, for the panel; the quality
/// stage alone while a two-stage evaluation's prices are sealed) and the facilitator's reviews of prices the
/// published rule flags as abnormally low. Shared by the API and the screens.
/// </summary>
public sealed class AwardService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    /// <summary>The award's robustness as the screen and the API show it: 2,000 draws, the default seed.</summary>
    private static readonly Decide.Core.Robustness.RobustnessOptions ScreenChecks = new(2000);

    private const int MinText = 10;
    private const int MaxAsked = 8_000;
    private const int MaxAnswer = 20_000;
    private const int MaxReasons = 8_000;

    /// <summary>The award table and the reviews (facilitator, observer, approver, assessor; from moderation on).</summary>
    public async Task<AwardView> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        ResultsService.RequireResultsVisible(m, "see the award");
        return await ViewAsync(db, m, ct);
    }

    /// <summary>
    /// Records the review of a flagged price (facilitator; scoring or moderation, once prices are known). Refused for
    /// a price the rule does not flag; a decision needs its reasons. Every change is audited with what it replaced.
    /// </summary>
    public Task<AwardView> ReviewAsync(Guid id, string bid, LowPriceReviewRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ReviewLowPrice);
            var e = m.Evaluation;
            if (e.PricesSealed)
            {
                throw DomainProblem.Stage($"Cannot review a price yet: evaluation {e.Reference} keeps its prices sealed until quality moderation is closed and they are opened.");
            }

            if (e.SignOffRequestedAt is { } requested)
            {
                throw DomainProblem.Stage($"Cannot change the review of a price: sign-off was requested on {requested:yyyy-MM-dd HH:mm} UTC, and the approvers are reviewing the evaluation as it stood.");
            }

            var file = await composer.ComposeAsync(db, e, ct);
            if (file.Evaluation.Award is null)
            {
                throw DomainProblem.Stage($"Evaluation {e.Reference} publishes no points award, so no price is flagged as abnormally low.");
            }

            var flagged = AwardOf(e, file.Evaluation).Report.Result.Bids.FirstOrDefault(b => b.Id == bid)
                ?? throw DomainProblem.NotFound($"Bidder \"{bid}\"");
            var row = await db.LowPriceReviews.FirstOrDefaultAsync(r => r.EvaluationId == id && r.AlternativeCode == bid, ct);
            if (flagged.AbnormallyLowFlag is null && row?.Decision != FormatWords.Of(LowPriceDecision.Rejected))
            {
                throw DomainProblem.Stage($"The price of {file.Evaluation.AlternativeName(bid)} is not flagged as abnormally low by the published rule; there is nothing to review.");
            }

            if (row is not null && request.Version != row.Version)
            {
                throw DomainProblem.Concurrency($"The review of \"{bid}\"", View(row));
            }

            var (asked, answer, reasons) = (request.Asked?.Trim() ?? "", request.Answer?.Trim(), request.Reasons?.Trim());
            var errors = new Dictionary<string, string[]>();
            if (asked.Length is < MinText or > MaxAsked)
            {
                errors["asked"] = [$"write the explanation asked of the bidder, as sent ({MinText} to {MaxAsked} characters)"];
            }

            if (answer is { Length: > MaxAnswer })
            {
                errors["answer"] = [$"the answer is longer than {MaxAnswer} characters; attach the rest to the file and summarise it here"];
            }

            LowPriceDecision? decision = null;
            if (!string.IsNullOrWhiteSpace(request.Decision))
            {
                if (FormatWords.LowPriceDecisions.FirstOrDefault(d => d.Name == request.Decision.Trim()) is { Name: not null } chosen)
                {
                    decision = chosen.Value;
                }
                else
                {
                    errors["decision"] = ["choose \"accepted\" (the bid stays in the award) or \"rejected\" (the bid is excluded with the reasons)"];
                }
            }

            if (decision is not null && (reasons is null || reasons.Length < MinText))
            {
                errors["reasons"] = [$"give the reasons for the decision, written so that the bidder can read them (at least {MinText} characters)"];
            }
            else if (reasons is { Length: > MaxReasons })
            {
                errors["reasons"] = [$"keep the reasons within {MaxReasons} characters"];
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var now = clock.GetUtcNow();
            var before = row is null ? null : Describe(row);
            if (row is null)
            {
                row = new LowPriceReviewEntry { EvaluationId = id, AlternativeCode = bid, AskedBy = user.Id, AskedAt = now, Version = 1 };
                db.LowPriceReviews.Add(row);
            }

            if (row.Asked != asked)
            {
                (row.Asked, row.AskedBy, row.AskedAt) = (asked, user.Id, now);
            }

            if (row.Answer != answer)
            {
                (row.Answer, row.AnsweredAt) = (string.IsNullOrEmpty(answer) ? null : answer, string.IsNullOrEmpty(answer) ? null : now);
            }

            var word = decision is { } d2 ? FormatWords.Of(d2) : null;
            if (row.Decision != word || row.Reasons != reasons)
            {
                (row.Decision, row.Reasons, row.DecidedBy, row.DecidedAt) = (word, decision is null ? null : reasons, decision is null ? null : user.Id, decision is null ? null : now);
            }

            audit.Record(db, id, new AuditEvent("low-price.reviewed", $"evaluations/{id}/low-price-reviews/{bid}", before, Describe(row)));
            await db.SaveChangesAsync(ct);
            return await ViewAsync(db, m, ct);
        }, ct);

    /// <summary>
    /// The award of a composed evaluation: the quality stage while prices are sealed or not all entered (with the
    /// prices entered so far), else the full run with its agreement with the closeness ranking.
    /// </summary>
    internal static (AwardReport Report, AwardAgreement? Agreement) AwardOf(StoredEvaluation stored, Decide.Core.Model.Evaluation evaluation)
    {
        var quality = AwardAnalysis.QualityStage(evaluation);
        if (stored.PricesSealed || quality.Result.PricesSealed)
        {
            return (quality, null);
        }

        var run = DecisionRun.Of(evaluation);
        return (run.Award!, run.AwardAgreement);
    }

    private async Task<AwardView> ViewAsync(DecideDbContext db, Membership m, CancellationToken ct)
    {
        var e = m.Evaluation;
        var file = await composer.ComposeAsync(db, e, ct);
        if (file.Evaluation.Award is null)
        {
            throw DomainProblem.Stage($"Evaluation {e.Reference} publishes no points award: its plan ranks the bids by closeness alone.");
        }

        var (report, agreement) = AwardOf(e, file.Evaluation);
        var section = ResultsWriter.AwardSection(report, agreement, file.Evaluation);
        if (!report.Result.PricesSealed)
        {
            section = section with { Robustness = ResultsWriter.AwardRobustness(AwardRobustness.Run(file.Evaluation, report, ScreenChecks)) };
        }

        var rows = await db.LowPriceReviews.AsNoTracking().Where(r => r.EvaluationId == e.Id).OrderBy(r => r.Id).ToListAsync(ct);
        return new AwardView(EvaluationStore.Summarise(e, m.Roles), e.TwoStage, e.PricesSealed, e.PricesOpenedAt, section, rows.Select(View).ToArray(),
            file.Evaluation.Assessors.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal));
    }

    private static LowPriceReviewView View(LowPriceReviewEntry r) =>
        new(r.AlternativeCode, r.Asked, r.AskedBy, r.AskedAt, r.Answer, r.AnsweredAt, r.Decision, r.Reasons, r.DecidedBy, r.DecidedAt, r.Version);

    private static string Describe(LowPriceReviewEntry r) =>
        $"asked: {r.Asked}; answer: {r.Answer ?? "(none yet)"}; decision: {r.Decision ?? "(none yet)"}{(r.Reasons is null ? "" : $" — {r.Reasons}")}";
}
