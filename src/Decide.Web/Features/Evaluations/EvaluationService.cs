using System.Runtime.InteropServices;
using System.Text.Json;
using Decide.Core;
using Decide.Core.Weighting;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Interchange.Plans;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Evaluations;

/// <summary>
/// An evaluation and its setup: create, list and read evaluations, and edit the plan, the panel and the bids while
/// the stage allows it (<see cref="StageRules"/>). The moves between stages are in
/// <see cref="EvaluationLifecycleService"/>. Shared by the API and the screens.
/// </summary>
public sealed class EvaluationService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    CurrentUser user,
    AuditWriter audit,
    PlanLockCheck lockCheck,
    TimeProvider clock)
{
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
                PlanJson = StarterPlan(request),
                CreatedAt = now,
                CreatedBy = user.Id,
            };
            evaluation.Panel.Add(new PanelMember { UserId = facilitator.Id, Role = PanelRole.Facilitator });
            db.Evaluations.Add(evaluation);
            audit.Record(db, evaluation.Id, new AuditEvent("evaluation.created", $"evaluations/{evaluation.Id}", null,
                $"{evaluation.Reference} · {evaluation.Title}; facilitator {facilitator.Email}"));
            await db.SaveChangesAsync(ct);
            return EvaluationStore.Summarise(evaluation, [PanelRole.Facilitator]);
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
        return list.Select(e => EvaluationStore.Summarise(e, e.Panel.Where(p => p.UserId == userId).Select(p => p.Role))).ToArray();
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
        var bids = seesBids
            ? await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id).OrderBy(a => a.Position).ThenBy(a => a.Id)
                .Select(a => new BidView(a.Code, a.Name, a.RequestedAmount, a.Topic)).ToListAsync(ct)
            : null;
        var panel = e.Panel.OrderBy(p => p.Id).Select(p => new PanelSeat(
            p.UserId, users.TryGetValue(p.UserId, out var u) ? u.DisplayName : "", p.Role, p.AssessorCode, p.Weight,
            EvaluationComposer.Assigned(p), p.DeclarationSignedAt is not null,
            p.SubmittedAt is not null)).ToArray();

        return new EvaluationDetail(
            EvaluationStore.Summarise(e, m.Roles),
            new EvaluationSettings(e.MinRationaleLength, e.PricesVisibleToAssessors, e.RequiredApprovals),
            seesPlan ? JsonDocument.Parse(e.PlanJson).RootElement.Clone() : null,
            e.PlanHash,
            panel,
            bids,
            new StageDates(e.CreatedAt, e.PlanLockedAt, e.ScoringOpenedAt, e.ModerationStartedAt, e.SignedOffAt),
            e.PreviousRevisionId, e.RevisionReason, e.SupersededById, e.LegalHold,
            e.MethodologyHash, e.PricesOpenedAt);
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
            p.Role is PanelRole.Assessor or PanelRole.PriceEvaluator ? p.Weight : null, EvaluationComposer.Assigned(p), EvaluationComposer.Topics(p))).ToArray();
        return new SetupView(seats, e.Stage == EvaluationStage.Setup ? await lockCheck.ReadinessAsync(db, e, ct) : null);
    }

    public Task<EvaluationSummary> UpdatePlanAsync(Guid id, UpdatePlanRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ChangePlan);
            EvaluationStore.CheckVersion(m.Evaluation, request.Version);
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
            m.Evaluation.IsRound = plan.Evaluation.Reviews is not null;
            m.Evaluation.Title = plan.Evaluation.Title;
            db.MarkChanged(m.Evaluation); // a plan saved unchanged still moves the version, as every save does
            audit.Record(db, id, new AuditEvent("plan.updated", $"evaluations/{id}/plan", old, m.Evaluation.PlanJson));
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return EvaluationStore.Summarise(m.Evaluation, m.Roles);
        }, ct);

    public Task<EvaluationSummary> UpdatePanelAsync(Guid id, UpdatePanelRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ChangePanel);
            EvaluationStore.CheckVersion(m.Evaluation, request.Version);

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
                    TopicsJson = s.Topics is { Count: > 0 } topics ? JsonSerializer.Serialize(topics.Select(t => t.Trim()).Where(t => t.Length > 0).Distinct(StringComparer.OrdinalIgnoreCase).ToArray()) : null,
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
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return EvaluationStore.Summarise(m.Evaluation, m.Roles);
        }, ct);

    /// <summary>
    /// Reads a list of bids or applications from a spreadsheet or CSV file: every problem by sheet, row and column,
    /// and nothing stored unless the whole file is sound; a preview stores nothing at all (facilitator, before scoring).
    /// </summary>
    public async Task<ImportBidsView> ImportBidsAsync(Guid id, ImportBidsRequest request, CancellationToken ct = default)
    {
        await using (var db = await factory.CreateDbContextAsync(ct))
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ChangeBids);
        }

        byte[] content;
        try
        {
            content = Convert.FromBase64String(request.Content ?? "");
        }
        catch (FormatException)
        {
            throw DomainProblem.Invalid("content", "the file's content must be sent base64-encoded");
        }

        var reading = Exchange.ApplicationSheet.Read(request.FileName ?? "", content);
        if (reading.Errors.Count > 0)
        {
            throw DomainProblem.Invalid(reading.Errors.GroupBy(e => e.Place).ToDictionary(g => g.Key, g => g.Select(e => e.Reason).ToArray()));
        }

        if (request.Preview)
        {
            return new ImportBidsView(reading.Rows, false, null);
        }

        var summary = await UpdateBidsAsync(id, new UpdateBidsRequest(reading.Rows, request.Version), ct);
        return new ImportBidsView(reading.Rows, true, summary);
    }

    public Task<EvaluationSummary> UpdateBidsAsync(Guid id, UpdateBidsRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ChangeBids);
            EvaluationStore.CheckVersion(m.Evaluation, request.Version);
            var errors = new Dictionary<string, string[]>();
            var seen = new HashSet<string>(StringComparer.Ordinal);
            for (var i = 0; i < request.Bids.Count; i++)
            {
                var a = request.Bids[i];
                if (string.IsNullOrWhiteSpace(a.Code) || a.Code.Length > 100 || !seen.Add(a.Code.Trim()))
                {
                    errors[$"bids[{i}].code"] = ["give each bid a unique code (1 to 100 characters)"];
                }

                if (string.IsNullOrWhiteSpace(a.Name) || a.Name.Length > 300)
                {
                    errors[$"bids[{i}].name"] = ["give the bidder's name (1 to 300 characters)"];
                }

                if (a.Requested is { } requested && !(requested > 0 && double.IsFinite(requested)))
                {
                    errors[$"bids[{i}].requested"] = ["the amount requested is a positive number, or left empty"];
                }

                if (a.Topic is { Length: > 200 })
                {
                    errors[$"bids[{i}].topic"] = ["keep the field within 200 characters"];
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
            var kept = request.Bids.Select(a => a.Code.Trim()).ToHashSet(StringComparer.Ordinal);
            var orphanGates = await db.GateResults.Where(g => g.EvaluationId == id).ToListAsync(ct);
            var orphanValues = await db.NumericValues.Where(v => v.EvaluationId == id).ToListAsync(ct);
            db.GateResults.RemoveRange(orphanGates.Where(g => !kept.Contains(g.AlternativeCode)));
            db.NumericValues.RemoveRange(orphanValues.Where(v => !kept.Contains(v.AlternativeCode)));
            before += string.Concat(orphanGates.Where(g => !kept.Contains(g.AlternativeCode))
                .Select(g => $"; gate {g.AlternativeCode}/{g.CriterionId}={(g.Passed ? "pass" : "fail")}"));
            var now = clock.GetUtcNow();
            db.Alternatives.AddRange(request.Bids.Select((a, i) => new StoredAlternative
            {
                EvaluationId = id, Code = a.Code.Trim(), Name = a.Name.Trim(), Position = i, AddedAt = now,
                RequestedAmount = a.Requested, Topic = string.IsNullOrWhiteSpace(a.Topic) ? null : a.Topic.Trim(),
            }));

            // A bid taken off the list leaves the assignment of reviewers too.
            db.ReviewAssignments.RemoveRange(await db.ReviewAssignments.Where(r => r.EvaluationId == id && !kept.Contains(r.AlternativeCode)).ToListAsync(ct));
            db.MarkChanged(m.Evaluation); // the bids are the evaluation's
            audit.Record(db, id, new AuditEvent("bids.updated", $"evaluations/{id}/bids", before,
                string.Join("; ", request.Bids.Select(a => $"{a.Code.Trim()}={a.Name.Trim()}"))));
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return EvaluationStore.Summarise(m.Evaluation, m.Roles);
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
}
