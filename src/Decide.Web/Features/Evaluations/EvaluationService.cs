using System.Runtime.InteropServices;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using Decide.Core.Weighting;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Interchange.Plans;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Evaluations;

/// <summary>
/// The evaluation's lifecycle and setup: create, read, edit the plan, panel and bids, lock the plan, open scoring,
/// start moderation, open a new revision, legal hold. Shared by the API and the screens.
/// </summary>
public sealed class EvaluationService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    CurrentUser user,
    AuditWriter audit,
    EvaluationComposer composer,
    TimeProvider clock)
{
    /// <summary>Plan members of the portable file; everything else belongs to the panel, bids or inputs.</summary>
    private static readonly string[] PlanPaths =
        ["$.format", "$.title", "$.reference", "$.organisation", "$.description", "$.noun", "$.ratingScale",
         "$.importanceScale", "$.pairwiseScale", "$.groups", "$.criteria", "$.weighting", "$.options"];

    public async Task<EvaluationSummary> CreateAsync(CreateEvaluationRequest request, CancellationToken ct = default)
    {
        if (!user.IsAdministrator)
        {
            throw DomainProblem.Forbidden("Only an administrator creates evaluations.");
        }

        var errors = new Dictionary<string, string[]>();
        if (string.IsNullOrWhiteSpace(request.Reference) || request.Reference.Length > 100)
        {
            errors["reference"] = ["give the buyer's reference (1 to 100 characters)"];
        }

        if (string.IsNullOrWhiteSpace(request.Title) || request.Title.Length > 300)
        {
            errors["title"] = ["give a title (1 to 300 characters)"];
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }

        return await UnitOfWork.RunAsync(factory, async db =>
        {
            var facilitator = await db.Users.FirstOrDefaultAsync(u => u.NormalizedEmail == request.FacilitatorEmail.ToUpperInvariant(), ct)
                ?? throw DomainProblem.Invalid("facilitatorEmail", $"no account has the e-mail address {request.FacilitatorEmail}");
            var now = clock.GetUtcNow();
            var evaluation = new StoredEvaluation
            {
                Id = Guid.NewGuid(),
                Reference = request.Reference.Trim(),
                Title = request.Title.Trim(),
                Organisation = request.Organisation?.Trim(),
                Stage = EvaluationStage.Setup,
                PlanJson = StarterPlan(request),
                CreatedAt = now,
                CreatedBy = user.Id,
            };
            evaluation.Panel.Add(new PanelMember { UserId = facilitator.Id, Role = PanelRole.Facilitator });
            db.Evaluations.Add(evaluation);
            audit.Record(db, evaluation.Id, new AuditEvent("evaluation.created", $"evaluations/{evaluation.Id}", null,
                $"{evaluation.Reference} · {evaluation.Title}; facilitator {facilitator.Email}"));
            await db.SaveChangesAsync(ct);
            return Summarise(evaluation, [PanelRole.Facilitator]);
        }, ct);
    }

    public async Task<IReadOnlyList<EvaluationSummary>> ListAsync(CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var userId = user.Id;
        var query = db.Evaluations.AsNoTracking().Include(e => e.Panel).AsQueryable();
        if (!user.IsAdministrator)
        {
            query = query.Where(e => e.Panel.Any(p => p.UserId == userId));
        }

        var list = await query.OrderBy(e => e.Reference).ThenBy(e => e.Revision).ToListAsync(ct);
        return list.Select(e => Summarise(e, e.Panel.Where(p => p.UserId == userId).Select(p => p.Role))).ToArray();
    }

    public async Task<EvaluationDetail> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        var e = m.Evaluation;
        var assessorReady = m.Seat is { DeclarationSignedAt: not null };
        var seesPlan = m.ReadsEverything || assessorReady || m.IsAdministrator;
        var seesBids = m.ReadsEverything || (m.Seat is { NamesConfirmedAt: not null });
        var users = await db.Users.AsNoTracking().Where(u => e.Panel.Select(p => p.UserId).Contains(u.Id)).ToDictionaryAsync(u => u.Id, ct);
        var alternatives = seesBids
            ? await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id).OrderBy(a => a.Position).ThenBy(a => a.Id)
                .Select(a => new AlternativeView(a.Code, a.Name)).ToListAsync(ct)
            : null;
        var panel = e.Panel.OrderBy(p => p.Id).Select(p => new PanelSeat(
            p.UserId, users.TryGetValue(p.UserId, out var u) ? u.DisplayName : "", p.Role, p.AssessorCode, p.Weight,
            EvaluationComposer.Assigned(p), p.DeclarationSignedAt is not null,
            p.SubmittedAt is not null)).ToArray();

        return new EvaluationDetail(
            Summarise(e, m.Roles),
            new EvaluationSettings(e.MinRationaleLength, e.PricesVisibleToAssessors, e.RequiredApprovals),
            seesPlan ? JsonDocument.Parse(e.PlanJson).RootElement.Clone() : null,
            e.PlanHash,
            panel,
            alternatives,
            new StageDates(e.CreatedAt, e.PlanLockedAt, e.ScoringOpenedAt, e.ModerationStartedAt, e.SignedOffAt),
            e.PreviousRevisionId, e.RevisionReason, e.SupersededById, e.LegalHold);
    }

    /// <summary>
    /// What the facilitator's setup screen needs beyond <see cref="GetAsync"/>: the seats with their e-mail addresses
    /// (to edit the panel) and, at setup, what stops the plan from being locked and what the facilitator should know.
    /// </summary>
    public async Task<SetupView> GetSetupAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator);
        var e = m.Evaluation;
        var userIds = e.Panel.Select(p => p.UserId).ToArray();
        var emails = await db.Users.AsNoTracking().Where(u => userIds.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.Email ?? "", ct);
        var seats = e.Panel.Where(p => p.Role != PanelRole.Facilitator).OrderBy(p => p.Id).Select(p => new SeatRequest(
            emails.GetValueOrDefault(p.UserId, ""), p.Role, p.AssessorCode,
            p.Role is PanelRole.Assessor or PanelRole.PriceEvaluator ? p.Weight : null, EvaluationComposer.Assigned(p))).ToArray();
        return new SetupView(seats, e.Stage == EvaluationStage.Setup ? await ReadinessAsync(db, e, ct) : null);
    }

    public Task<EvaluationSummary> UpdatePlanAsync(Guid id, UpdatePlanRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage("change the plan", EvaluationStage.Setup);
            CheckVersion(m.Evaluation, request.Version);
            if (request.Plan.ValueKind != JsonValueKind.Object)
            {
                throw DomainProblem.Invalid("plan", "the plan must be a decide-evaluation/1 object");
            }

            // The body's own bytes: they may hold text that is not UTF-8, which the reader refuses by its path
            // (GetRawText would throw on it instead).
            var plan = ReadPlanOrThrow(JsonMarshal.GetRawUtf8Value(request.Plan).ToArray());
            if (request.Settings is { } s)
            {
                ValidateSettings(s);
                m.Evaluation.MinRationaleLength = s.MinRationaleLength;
                m.Evaluation.PricesVisibleToAssessors = s.PricesVisibleToAssessors;
                m.Evaluation.RequiredApprovals = s.RequiredApprovals;
            }

            var old = m.Evaluation.PlanJson;
            m.Evaluation.PlanJson = EvaluationFileWriter.ToJson(plan);
            m.Evaluation.Title = plan.Evaluation.Title;
            db.MarkChanged(m.Evaluation); // a plan saved unchanged still moves the version, as every save does
            audit.Record(db, id, new AuditEvent("plan.updated", $"evaluations/{id}/plan", old, m.Evaluation.PlanJson));
            await SaveAsync(db, m.Evaluation, ct);
            return Summarise(m.Evaluation, m.Roles);
        }, ct);

    public Task<EvaluationSummary> UpdatePanelAsync(Guid id, UpdatePanelRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage("change the panel", EvaluationStage.Setup);
            CheckVersion(m.Evaluation, request.Version);

            var errors = new Dictionary<string, string[]>();
            var emails = request.Seats.Select(s => s.Email.ToUpperInvariant()).Distinct().ToArray();
            var accounts = await db.Users.Where(u => emails.Contains(u.NormalizedEmail!)).ToDictionaryAsync(u => u.NormalizedEmail!, ct);
            var seats = new List<PanelMember>();
            var codes = new HashSet<string>(StringComparer.Ordinal);
            for (var i = 0; i < request.Seats.Count; i++)
            {
                var s = request.Seats[i];
                var at = $"seats[{i}]";
                if (!accounts.TryGetValue(s.Email.ToUpperInvariant(), out var account))
                {
                    errors[$"{at}.email"] = [$"no account has the e-mail address {s.Email}"];
                    continue;
                }

                if (s.Role == PanelRole.Facilitator)
                {
                    errors[$"{at}.role"] = ["facilitators are assigned by an administrator"];
                    continue;
                }

                if (m.Evaluation.Panel.Any(p => p.UserId == account.Id && p.Role == PanelRole.Facilitator)
                    && s.Role is PanelRole.Assessor or PanelRole.PriceEvaluator)
                {
                    errors[$"{at}.role"] = ["the facilitator runs the evaluation and never scores"];
                    continue;
                }

                string? code = null;
                if (s.Role is PanelRole.Assessor or PanelRole.PriceEvaluator)
                {
                    code = s.AssessorCode?.Trim();
                    if (string.IsNullOrEmpty(code) || code == WeightStructure.PanelId || !codes.Add(code + "/" + s.Role))
                    {
                        errors[$"{at}.assessorCode"] = ["give each assessor a unique code (not \"panel\")"];
                        continue;
                    }
                }

                if (s.Weight is { } w && !(w > 0 && double.IsFinite(w)))
                {
                    errors[$"{at}.weight"] = ["an assessor's weight must be a positive number"];
                    continue;
                }

                seats.Add(new PanelMember
                {
                    EvaluationId = id,
                    UserId = account.Id,
                    Role = s.Role,
                    AssessorCode = code,
                    Weight = s.Weight ?? 1,
                    AssignedCriteriaJson = s.Criteria is null ? null : JsonSerializer.Serialize(s.Criteria),
                });
            }

            if (seats.GroupBy(x => (x.UserId, x.Role)).Any(g => g.Count() > 1))
            {
                errors["seats"] = ["a person holds each role at most once"];
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var before = Describe(m.Evaluation.Panel);
            db.PanelMembers.RemoveRange(m.Evaluation.Panel.Where(p => p.Role != PanelRole.Facilitator));
            db.PanelMembers.AddRange(seats);
            db.MarkChanged(m.Evaluation); // the panel is the evaluation's: holders of the old version are refused
            audit.Record(db, id, new AuditEvent("panel.updated", $"evaluations/{id}/panel", before,
                Describe(m.Evaluation.Panel.Where(p => p.Role == PanelRole.Facilitator).Concat(seats))));
            await SaveAsync(db, m.Evaluation, ct);
            return Summarise(m.Evaluation, m.Roles);
        }, ct);

    public Task<EvaluationSummary> UpdateAlternativesAsync(Guid id, UpdateAlternativesRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage("change the list of bids", EvaluationStage.Setup, EvaluationStage.PlanLocked);
            CheckVersion(m.Evaluation, request.Version);
            var errors = new Dictionary<string, string[]>();
            var seen = new HashSet<string>(StringComparer.Ordinal);
            for (var i = 0; i < request.Alternatives.Count; i++)
            {
                var a = request.Alternatives[i];
                if (string.IsNullOrWhiteSpace(a.Code) || a.Code.Length > 100 || !seen.Add(a.Code.Trim()))
                {
                    errors[$"alternatives[{i}].code"] = ["give each bid a unique code (1 to 100 characters)"];
                }

                if (string.IsNullOrWhiteSpace(a.Name) || a.Name.Length > 300)
                {
                    errors[$"alternatives[{i}].name"] = ["give the bidder's name (1 to 300 characters)"];
                }
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var existing = await db.Alternatives.Where(a => a.EvaluationId == id).ToListAsync(ct);
            var before = string.Join("; ", existing.OrderBy(a => a.Position).Select(a => $"{a.Code}={a.Name}"));
            db.Alternatives.RemoveRange(existing);

            // A bid taken off the list takes its gate results and values with it (recorded in the audit entry).
            var kept = request.Alternatives.Select(a => a.Code.Trim()).ToHashSet(StringComparer.Ordinal);
            var orphanGates = await db.GateResults.Where(g => g.EvaluationId == id).ToListAsync(ct);
            var orphanValues = await db.NumericValues.Where(v => v.EvaluationId == id).ToListAsync(ct);
            db.GateResults.RemoveRange(orphanGates.Where(g => !kept.Contains(g.AlternativeCode)));
            db.NumericValues.RemoveRange(orphanValues.Where(v => !kept.Contains(v.AlternativeCode)));
            before += string.Concat(orphanGates.Where(g => !kept.Contains(g.AlternativeCode))
                .Select(g => $"; gate {g.AlternativeCode}/{g.CriterionId}={(g.Passed ? "pass" : "fail")}"));
            var now = clock.GetUtcNow();
            db.Alternatives.AddRange(request.Alternatives.Select((a, i) => new StoredAlternative
            {
                EvaluationId = id, Code = a.Code.Trim(), Name = a.Name.Trim(), Position = i, AddedAt = now,
            }));
            db.MarkChanged(m.Evaluation); // the bids are the evaluation's
            audit.Record(db, id, new AuditEvent("alternatives.updated", $"evaluations/{id}/alternatives", before,
                string.Join("; ", request.Alternatives.Select(a => $"{a.Code.Trim()}={a.Name.Trim()}"))));
            await SaveAsync(db, m.Evaluation, ct);
            return Summarise(m.Evaluation, m.Roles);
        }, ct);

    /// <summary>
    /// Setup → plan locked. The plan, the panel's weights and assignments and every weight judgement are frozen;
    /// refused while the plan or the weights are incomplete or invalid.
    /// </summary>
    public Task<TransitionResult> LockPlanAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, "lock the plan", EvaluationStage.Setup, EvaluationStage.PlanLocked, "plan.locked", async (db, m) =>
        {
            var check = await CheckLockAsync(db, m.Evaluation, ct);
            if (check.Blocking.Count > 0)
            {
                throw DomainProblem.Stage($"The plan cannot be locked yet. {string.Join(" ", check.Blocking)}");
            }

            if (check.Errors.Count > 0)
            {
                throw new InvalidEvaluationException(check.Errors);
            }

            m.Evaluation.PlanLockedAt = clock.GetUtcNow();
            m.Evaluation.PlanHash = Sha256(m.Evaluation.PlanJson);
            return check.Consistency;
        }, ct);

    /// <summary>Plan locked → scoring: bidders' names become visible to assessors who confirm their declaration.</summary>
    public Task<TransitionResult> OpenScoringAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, "open scoring", EvaluationStage.PlanLocked, EvaluationStage.Scoring, "scoring.opened", async (db, m) =>
        {
            if (!await db.Alternatives.AnyAsync(a => a.EvaluationId == id, ct))
            {
                throw DomainProblem.Stage("Cannot open scoring: no bid is registered.");
            }

            m.Evaluation.ScoringOpenedAt = clock.GetUtcNow();
            return [];
        }, ct);

    /// <summary>Scoring → moderation: every assessor must have submitted their sheet.</summary>
    public Task<TransitionResult> StartModerationAsync(Guid id, TransitionRequest request, CancellationToken ct = default) =>
        Transition(id, request, "start moderation", EvaluationStage.Scoring, EvaluationStage.Moderation, "moderation.started", (db, m) =>
        {
            var open = m.Evaluation.Panel.Where(p => p.Role == PanelRole.Assessor && p.SubmittedAt is null).Select(p => p.AssessorCode).ToArray();
            if (open.Length > 0)
            {
                throw DomainProblem.Stage($"Cannot start moderation: {string.Join(", ", open)} {(open.Length == 1 ? "has" : "have")} not submitted a rating sheet.");
            }

            m.Evaluation.ModerationStartedAt = clock.GetUtcNow();
            return Task.FromResult<IReadOnlyList<string>>([]);
        }, ct);

    /// <summary>
    /// Opens a new revision in setup, copying the plan, the panel (declarations to be signed again), the bids and
    /// the weight judgements; the old revision keeps everything and becomes superseded.
    /// </summary>
    public Task<EvaluationSummary> NewRevisionAsync(Guid id, RevisionRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage("open a new revision", EvaluationStage.PlanLocked, EvaluationStage.Scoring, EvaluationStage.Moderation, EvaluationStage.SignedOff);
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
                Stage = EvaluationStage.Setup,
                Revision = old.Revision + 1,
                PreviousRevisionId = old.Id,
                RevisionReason = request.Reason.Trim(),
                PlanJson = old.PlanJson,
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
            }));
            db.Evaluations.Add(next);
            var alternatives = await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id).ToListAsync(ct);
            db.Alternatives.AddRange(alternatives.Select(a => new StoredAlternative { EvaluationId = next.Id, Code = a.Code, Name = a.Name, Position = a.Position, AddedAt = now }));
            var judgements = await db.WeightJudgements.AsNoTracking().Where(w => w.EvaluationId == id).ToListAsync(ct);
            db.WeightJudgements.AddRange(judgements.Select(w => new WeightJudgement
            {
                EvaluationId = next.Id, AssessorCode = w.AssessorCode, Kind = w.Kind, Node = w.Node, Column = w.Column, Term = w.Term,
                Lower = w.Lower, Middle = w.Middle, Upper = w.Upper, UpdatedAt = now,
            }));
            old.Stage = EvaluationStage.Superseded;
            old.SupersededById = next.Id;
            audit.Record(db, old.Id, new AuditEvent("revision.opened", $"evaluations/{old.Id}", $"revision {old.Revision}",
                $"revision {next.Revision} ({next.Id}): {next.RevisionReason}"));
            audit.Record(db, next.Id, new AuditEvent("evaluation.created", $"evaluations/{next.Id}", null,
                $"revision {next.Revision} of {old.Id}: {next.RevisionReason}"));
            await SaveAsync(db, old, ct);
            return Summarise(next, m.Roles);
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
            await SaveAsync(db, m.Evaluation, ct);
            return Summarise(m.Evaluation, m.Roles);
        }, ct);

    /// <summary>The checks <see cref="LockPlanAsync"/> makes, as sentences, plus what the facilitator should know before locking.</summary>
    private async Task<LockReadiness> ReadinessAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        var check = await CheckLockAsync(db, e, ct);
        return new LockReadiness([.. check.Blocking, .. check.Errors.Select(x => $"{x.Path}: {x.Reason}")], [.. check.Warnings, .. check.Consistency]);
    }

    /// <summary>What stands in the way of locking the plan, and what the facilitator should know: one check for "can I lock?" and "lock".</summary>
    /// <param name="Blocking">Sentences: no assessor, weights not submitted.</param>
    /// <param name="Errors">The plan's and the weights' problems by place (bids are not in yet, so they are not judged).</param>
    /// <param name="Warnings">Assessors who gave no weights.</param>
    /// <param name="Consistency">Pairwise matrices above their consistency threshold (only when nothing blocks).</param>
    private sealed record LockCheck(
        IReadOnlyList<string> Blocking, IReadOnlyList<EvaluationError> Errors, IReadOnlyList<string> Warnings, IReadOnlyList<string> Consistency);

    private async Task<LockCheck> CheckLockAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        EvaluationFile file;
        try
        {
            file = await composer.ComposeAsync(db, e, ct);
        }
        catch (InvalidEvaluationException problem)
        {
            return new LockCheck([], problem.Errors, [], []);
        }

        var blocking = new List<string>();
        var warnings = new List<string>();
        var assessors = e.Panel.Where(p => p.Role == PanelRole.Assessor && p.AssessorCode is not null).OrderBy(p => p.Id).ToArray();
        if (assessors.Length == 0)
        {
            blocking.Add("The panel has no assessor yet: seat at least one under Panel.");
        }

        // Only submitted weights are frozen: an assessor still working on theirs must finish or withdraw them.
        var judges = file.Evaluation.Importance.Select(r => r.Assessor).Concat(file.Evaluation.Pairwise.Select(p => p.Assessor)).ToHashSet(StringComparer.Ordinal);
        foreach (var seat in assessors)
        {
            if (judges.Contains(seat.AssessorCode!) && seat.WeightsSubmittedAt is null)
            {
                blocking.Add($"Assessor {seat.AssessorCode} has weight judgements that are not submitted yet: they submit them, or clear them, before the plan is locked.");
            }
            else if (!judges.Contains(seat.AssessorCode!))
            {
                var others = judges.Count > 0 ? "; the panel's weights will come from the others" : "";
                warnings.Add(seat.DeclarationSignedAt is null
                    ? $"Assessor {seat.AssessorCode} has not signed the declaration yet, so has given no weights{others}."
                    : $"Assessor {seat.AssessorCode} has given no weights{others}.");
            }
        }

        // Bids are not in yet: judge the plan and the weights alone.
        var errors = EvaluationValidator.Validate(file.Evaluation)
            .Where(x => InScope(x.Path, [.. PlanPaths, "$.assessors", "$.importance", "$.pairwise"]))
            .ToArray();
        var consistency = new List<string>();
        if (blocking.Count == 0 && errors.Length == 0 && file.Evaluation.Weighting == Core.Model.WeightingMethod.Pairwise)
        {
            // The weights need no bid: derived from the plan and the judgements alone.
            var (_, reports) = Core.Weighting.CriterionWeights.Derive(file.Evaluation, file.Evaluation.Criteria.Where(c => c.Kind != Core.Model.CriterionKind.Gate).ToArray());
            consistency.AddRange(reports.Where(c => !c.Report.Acceptable).Select(c =>
                $"{(c.Assessor == WeightStructure.PanelId ? "The panel's" : $"Assessor {c.Assessor}'s")} comparisons{(c.Group is null ? "" : $" within {c.Group}")} have a consistency ratio of {c.Report.Ratio:0.000}, above {c.Report.Threshold:0.00}."));
        }

        return new LockCheck(blocking, errors, warnings, consistency);
    }

    internal static EvaluationSummary Summarise(StoredEvaluation e, IEnumerable<PanelRole> roles) =>
        new(e.Id, e.Reference, e.Title, e.Organisation, e.Stage, e.Revision, roles.Distinct().Order().ToArray(), e.Version);

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

    internal static bool InScope(string path, IEnumerable<string> prefixes) =>
        prefixes.Any(p => path == p || path.StartsWith(p + ".", StringComparison.Ordinal) || path.StartsWith(p + "[", StringComparison.Ordinal));

    private Task<TransitionResult> Transition(
        Guid id, TransitionRequest request, string action, EvaluationStage from, EvaluationStage to, string auditAction,
        Func<DecideDbContext, Membership, Task<IReadOnlyList<string>>> check, CancellationToken ct) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(action, from);
            CheckVersion(m.Evaluation, request.Version);
            var warnings = await check(db, m);
            m.Evaluation.Stage = to;
            audit.Record(db, id, new AuditEvent(auditAction, $"evaluations/{id}", from.ToString(),
                to + (warnings.Count > 0 ? $" (warnings: {string.Join(" ", warnings)})" : "")));
            await SaveAsync(db, m.Evaluation, ct);
            return new TransitionResult(Summarise(m.Evaluation, m.Roles), warnings);
        }, ct);

    private static EvaluationFile ReadPlanOrThrow(byte[] json)
    {
        try
        {
            return EvaluationFileReader.ReadPlan(json);
        }
        catch (InvalidEvaluationException e)
        {
            throw new InvalidEvaluationException(e.Errors.Select(x => x with { Path = "plan" + x.Path[1..] }).ToArray());
        }
    }

    private static void ValidateSettings(EvaluationSettings s)
    {
        var errors = new Dictionary<string, string[]>();
        if (s.MinRationaleLength is < 0 or > 2000)
        {
            errors["settings.minRationaleLength"] = ["between 0 and 2000 characters"];
        }

        if (s.RequiredApprovals is < 1 or > 2)
        {
            errors["settings.requiredApprovals"] = ["one or two approvers"];
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }
    }

    private static string StarterPlan(CreateEvaluationRequest r) =>
        PlanDocumentWriter.ToJson(PlanDocument.Starter(r.Title, r.Reference, r.Organisation));

    private static string Describe(IEnumerable<PanelMember> seats) =>
        string.Join("; ", seats.Select(p => $"{p.UserId}:{p.Role}{(p.AssessorCode is null ? "" : $":{p.AssessorCode}:w{p.Weight}")}"));

    private static string Sha256(string text) => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
}
