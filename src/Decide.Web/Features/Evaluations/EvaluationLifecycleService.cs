using System.Security.Cryptography;
using System.Text;
using Decide.Core;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Evaluations;

/// <summary>
/// The moves of an evaluation through its stages: lock the plan, open scoring, start moderation (sign-off is in
/// <see cref="SignOff.SignOffService"/>, with the approvals), open a new revision, and the legal hold. Which stage
/// allows what is in <see cref="StageRules"/>; each move is a method of <see cref="StoredEvaluation"/>. Shared by the
/// API and the screens.
/// </summary>
public sealed class EvaluationLifecycleService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    CurrentUser user,
    AuditWriter audit,
    PlanLockCheck lockCheck,
    EvaluationComposer composer,
    Moderation.ModerationService moderation,
    Rounds.AssignmentService assignment,
    TimeProvider clock)
{
    /// <summary>
    /// Setup → plan locked. The plan, the panel's weights and assignments and every weight judgement are frozen;
    /// refused while the plan or the weights are incomplete or invalid.
    /// </summary>
    public Task<TransitionResult> LockPlanAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, StageRules.LockPlan, "plan.locked", async (db, m) =>
        {
            var check = await lockCheck.CheckAsync(db, m.Evaluation, ct);
            if (check.Blocking.Count > 0)
            {
                throw DomainProblem.Stage($"The plan cannot be locked yet. {string.Join(" ", check.Blocking)}");
            }

            if (check.Errors.Count > 0)
            {
                throw new InvalidEvaluationException(check.Errors);
            }

            var plan = EvaluationComposer.ReadPlan(m.Evaluation);
            var award = plan.Evaluation.Award;
            m.Evaluation.LockPlan(clock.GetUtcNow(), Sha256(m.Evaluation.PlanJson), award is not null, award?.TwoStage == true,
                Reports.Methodology.MethodologyDocument.Fingerprint(Recordkeeping.MethodologyInputs.From(plan)));
            return check.Consistency;
        }, ct);

    /// <summary>
    /// Plan locked → scoring: bidders' names become visible to assessors who confirm their declaration. In a round,
    /// the assignment is frozen here: refused, with every reason, unless it gives each application its reviewers
    /// within the cap, avoids every declared conflict and joins the design.
    /// </summary>
    public Task<TransitionResult> OpenScoringAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, StageRules.OpenScoring, "scoring.opened", async (db, m) =>
        {
            if (!await db.Alternatives.AnyAsync(a => a.EvaluationId == id, ct))
            {
                throw DomainProblem.Stage("Cannot open scoring: no bid is registered.");
            }

            if (await assignment.ProblemsAsync(db, m.Evaluation, ct) is { Count: > 0 } problems)
            {
                throw DomainProblem.Stage($"Cannot open scoring: the assignment of reviewers is not ready. {string.Join(" ", problems)}");
            }

            if (EvaluationComposer.ReadPlan(m.Evaluation).Evaluation.Reviews is not null)
            {
                var count = await db.ReviewAssignments.CountAsync(r => r.EvaluationId == id, ct);
                audit.Record(db, id, new AuditEvent("assignment.frozen", $"evaluations/{id}/assignment", null, $"{count} reviews frozen as assigned"));
            }

            m.Evaluation.OpenScoring(clock.GetUtcNow());
            return [];
        }, ct);

    /// <summary>Scoring → moderation: every assessor must have submitted their sheet.</summary>
    public Task<TransitionResult> StartModerationAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, StageRules.StartModeration, "moderation.started", (db, m) =>
        {
            var open = m.Evaluation.Panel.Where(p => p.Role == PanelRole.Assessor && p.SubmittedAt is null).Select(p => p.AssessorCode).ToArray();
            if (open.Length > 0)
            {
                throw DomainProblem.Stage($"Cannot start moderation: {string.Join(", ", open)} {(open.Length == 1 ? "has" : "have")} not submitted a rating sheet.");
            }

            m.Evaluation.StartModeration(clock.GetUtcNow());
            return Task.FromResult<IReadOnlyList<string>>([]);
        }, ct);

    /// <summary>
    /// Two stages: closes quality moderation and opens the prices (facilitator, moderation stage). Refused while a
    /// rating sheet is open or a flagged cell has no moderated value; from then on ratings and moderated values are
    /// final and the price evaluator enters the prices of the bids that passed every threshold. Audited.
    /// </summary>
    public Task<TransitionResult> OpenPricesAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, StageRules.OpenPrices, "prices.opened", async (db, m) =>
        {
            var e = m.Evaluation;
            if (!e.TwoStage)
            {
                throw DomainProblem.Stage($"Cannot open prices: evaluation {e.Reference} is evaluated in one stage; its prices were never sealed.");
            }

            if (e.PricesOpenedAt is { } opened)
            {
                throw DomainProblem.Stage($"Cannot open prices: they were opened on {opened:yyyy-MM-dd HH:mm} UTC.");
            }

            var open = e.Panel.Where(p => p.Role == PanelRole.Assessor && p.SubmittedAt is null).Select(p => p.AssessorCode).ToArray();
            if (open.Length > 0)
            {
                throw DomainProblem.Stage($"Cannot open prices: quality scoring is not closed; the rating sheet of {string.Join(", ", open)} is open.");
            }

            var undiscussed = await moderation.UndiscussedAsync(db, m, ct);
            if (undiscussed.Count > 0)
            {
                throw DomainProblem.Stage($"Cannot open prices: quality moderation is still open; the panel has not agreed a value for {undiscussed.Count} cell{(undiscussed.Count == 1 ? "" : "s")} it must discuss ({string.Join("; ", undiscussed.Take(5).Select(c => $"{c.AlternativeName}, {c.CriterionName}"))}{(undiscussed.Count > 5 ? "; …" : "")}).");
            }

            var file = await composer.ComposeAsync(db, e, ct);
            var quality = Decide.Core.Award.AwardAnalysis.QualityStage(file.Evaluation);
            e.OpenPrices(clock.GetUtcNow(), user.Id);
            db.MarkChanged(e);
            return quality.Result.Bids.Where(b => b.Excluded is not null)
                .Select(b => $"{file.Evaluation.AlternativeName(b.Id)} takes no part in price ({Decide.Core.Award.AwardText.Exclusion(b.Excluded!.Value)}: {b.ExclusionDetail}); its price is not opened.")
                .ToArray();
        }, ct, outcome: "quality closed and prices opened");

    /// <summary>
    /// Opens a new revision in setup, copying the plan, the panel (declarations to be signed again), the bids and
    /// the weight judgements; the old revision keeps everything and becomes superseded.
    /// </summary>
    public Task<EvaluationSummary> NewRevisionAsync(Guid id, RevisionRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.OpenRevision);
            if (string.IsNullOrWhiteSpace(request.Reason) || request.Reason.Trim().Length < 10)
            {
                throw DomainProblem.Invalid("reason", "say why a new revision is needed (at least 10 characters); it becomes part of the record");
            }

            var old = m.Evaluation;
            var now = clock.GetUtcNow();
            var next = new StoredEvaluation
            {
                Id = Guid.NewGuid(),
                Reference = old.Reference,
                Title = old.Title,
                Organisation = old.Organisation,
                Revision = old.Revision + 1,
                PreviousRevisionId = old.Id,
                RevisionReason = request.Reason.Trim(),
                PlanJson = old.PlanJson,
                IsRound = old.IsRound,
                MinRationaleLength = old.MinRationaleLength,
                PricesVisibleToAssessors = old.PricesVisibleToAssessors,
                RequiredApprovals = old.RequiredApprovals,
                CreatedAt = now,
                CreatedBy = user.Id,
                LegalHold = old.LegalHold,
                LegalHoldReason = old.LegalHoldReason,
            };
            next.Panel.AddRange(old.Panel.Select(p => new PanelMember
            {
                UserId = p.UserId, Role = p.Role, AssessorCode = p.AssessorCode, Weight = p.Weight, AssignedCriteriaJson = p.AssignedCriteriaJson,
                TopicsJson = p.TopicsJson,
            }));
            db.Evaluations.Add(next);
            var alternatives = await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id).ToListAsync(ct);
            db.Alternatives.AddRange(alternatives.Select(a => new StoredAlternative
            {
                EvaluationId = next.Id, Code = a.Code, Name = a.Name, Position = a.Position, AddedAt = now, RequestedAmount = a.RequestedAmount, Topic = a.Topic,
            }));
            var reviews = await db.ReviewAssignments.AsNoTracking().Where(r => r.EvaluationId == id).ToListAsync(ct);
            db.ReviewAssignments.AddRange(reviews.Select(r => new ReviewAssignmentEntry
            {
                EvaluationId = next.Id, AssessorCode = r.AssessorCode, AlternativeCode = r.AlternativeCode, Source = r.Source, AssignedBy = r.AssignedBy, AssignedAt = r.AssignedAt,
            }));
            var judgements = await db.WeightJudgements.AsNoTracking().Where(w => w.EvaluationId == id).ToListAsync(ct);
            db.WeightJudgements.AddRange(judgements.Select(w => new WeightJudgement
            {
                EvaluationId = next.Id, AssessorCode = w.AssessorCode, Kind = w.Kind, Node = w.Node, Column = w.Column, Term = w.Term,
                Lower = w.Lower, Middle = w.Middle, Upper = w.Upper, UpdatedAt = now,
            }));
            old.SupersedeBy(next.Id);
            audit.Record(db, old.Id, new AuditEvent("revision.opened", $"evaluations/{old.Id}", $"revision {old.Revision}",
                $"revision {next.Revision} ({next.Id}): {next.RevisionReason}"));
            audit.Record(db, next.Id, new AuditEvent("evaluation.created", $"evaluations/{next.Id}", null,
                $"revision {next.Revision} of {old.Id}: {next.RevisionReason}"));
            await EvaluationStore.SaveAsync(db, old, ct);
            return EvaluationStore.Summarise(next, m.Roles);
        }, ct);

    public Task<EvaluationSummary> SetLegalHoldAsync(Guid id, LegalHoldRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            if (!user.IsAdministrator)
            {
                throw DomainProblem.Forbidden("Only an administrator sets or lifts a legal hold.");
            }

            if (string.IsNullOrWhiteSpace(request.Reason))
            {
                throw DomainProblem.Invalid("reason", "say why the hold is set or lifted");
            }

            var m = await access.LoadAsync(db, id, ct);
            var before = m.Evaluation.LegalHold;
            m.Evaluation.LegalHold = request.Hold;
            m.Evaluation.LegalHoldReason = request.Reason.Trim();
            db.MarkChanged(m.Evaluation);
            audit.Record(db, id, new AuditEvent(request.Hold ? "legal-hold.set" : "legal-hold.lifted", $"evaluations/{id}",
                before.ToString(), $"{request.Hold}: {request.Reason.Trim()}"));
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return EvaluationStore.Summarise(m.Evaluation, m.Roles);
        }, ct);

    private Task<TransitionResult> Transition(
        Guid id, TransitionRequest request, StageRule rule, string auditAction,
        Func<DecideDbContext, Membership, Task<IReadOnlyList<string>>> move, CancellationToken ct, string? outcome = null) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(rule);
            EvaluationStore.CheckVersion(m.Evaluation, request.Version);
            var from = m.Evaluation.Stage;
            var warnings = await move(db, m); // checks what the move needs, makes it on the entity, says what to know
            var to = m.Evaluation.Stage;
            audit.Record(db, id, new AuditEvent(auditAction, $"evaluations/{id}", from.ToString(),
                (outcome ?? to.ToString()) + (warnings.Count > 0 ? $" (warnings: {string.Join(" ", warnings)})" : "")));
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return new TransitionResult(EvaluationStore.Summarise(m.Evaluation, m.Roles), warnings);
        }, ct);

    private static string Sha256(string text) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
}
