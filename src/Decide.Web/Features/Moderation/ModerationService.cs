using System.Text.Json;
using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Moderation;

/// <summary>
/// Moderation: the panel compares each other's ratings cell by cell; the facilitator records the values the panel
/// agrees, each as a new entry with its reason and a snapshot of the original ratings, which are never changed; a
/// submitted sheet may be reopened with a reason.
/// </summary>
public sealed class ModerationService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    /// <summary>Shortest reason accepted for a moderated value or a reopened sheet, in characters.</summary>
    public const int MinReasonLength = 10;

    /// <summary>Longest reason accepted, in characters.</summary>
    public const int MaxReasonLength = 4000;

    private static readonly JsonSerializerOptions Json = JsonSerializerOptions.Web;

    /// <summary>
    /// The board (facilitator, observer, approver, assessor) from moderation on. An assessor does not see the cells
    /// of a bidder they declared a conflict with.
    /// </summary>
    public async Task<ModerationBoard> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor);
        RequireModerationReached(m, "compare the panel's ratings");
        return await BoardAsync(db, m, ct);
    }

    /// <summary>
    /// The cells the panel still has to discuss: flagged for divergence and without a moderated value. While any is
    /// left, quality moderation is open (a two-stage evaluation cannot open its prices).
    /// </summary>
    internal async Task<IReadOnlyList<ModerationCell>> UndiscussedAsync(DecideDbContext db, Membership m, CancellationToken ct) =>
        (await BoardAsync(db, m, ct)).Cells.Where(c => c.Flagged && c.InForce is null).ToArray();

    private async Task<ModerationBoard> BoardAsync(DecideDbContext db, Membership m, CancellationToken ct)
    {
        var id = m.Evaluation.Id;
        var plan = EvaluationComposer.ReadPlan(m.Evaluation).Evaluation;
        var scale = plan.RatingScale;
        var alternatives = await db.Alternatives.AsNoTracking().Where(a => a.EvaluationId == id)
            .OrderBy(a => a.Position).ThenBy(a => a.Id).ToListAsync(ct);
        var failed = await FailedGatesAsync(db, id, ct);
        var hidden = m.ReadsEverything
            ? []
            : (await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == id && c.UserId == user.Id).Select(c => c.AlternativeCode).ToListAsync(ct))
                .ToHashSet(StringComparer.Ordinal);
        var seats = m.Evaluation.Panel.Where(p => p.Role == PanelRole.Assessor).OrderBy(p => p.Id).ToArray();
        var ratings = await db.Ratings.AsNoTracking().Where(r => r.EvaluationId == id).ToListAsync(ct);
        var byCell = ratings.ToLookup(r => (r.AlternativeCode, r.CriterionId));
        var entries = await db.Moderation.AsNoTracking().Where(x => x.EvaluationId == id).OrderBy(x => x.Id).ToListAsync(ct);
        var names = await DisplayNamesAsync(db, entries.Select(x => x.RecordedBy), ct);
        var moderated = entries.ToLookup(x => (x.AlternativeCode, x.CriterionId));

        var cells = new List<(ModerationCell Cell, int Position)>();
        var position = 0;
        foreach (var alternative in alternatives.Where(a => !failed.ContainsKey(a.Code) && !hidden.Contains(a.Code)))
        {
            foreach (var criterion in plan.Criteria.Where(c => c.Kind == CriterionKind.Linguistic))
            {
                var given = byCell[(alternative.Code, criterion.Id)].ToDictionary(r => r.AssessorCode, StringComparer.Ordinal);
                var row = new List<CellRating>();
                foreach (var seat in seats)
                {
                    var assigned = EvaluationComposer.Assigned(seat);
                    var expected = assigned is null || assigned.Contains(criterion.Id);
                    if (given.TryGetValue(seat.AssessorCode ?? "", out var r))
                    {
                        int? step = r.Term is { } t && scale.TryFind(t, out var s) ? s : null;
                        row.Add(new CellRating(r.AssessorCode, r.Term, step, r.Rationale, r.DeclinedReason));
                    }
                    else if (expected)
                    {
                        row.Add(new CellRating(seat.AssessorCode ?? "", null, null, null, null));
                    }
                }

                var steps = row.Where(r => r.Step is not null).Select(r => r.Step!.Value).ToArray();
                var spread = steps.Length >= 2 ? steps.Max() - steps.Min() : 0;
                var history = moderated[(alternative.Code, criterion.Id)].Select(x => View(x, names)).ToArray();
                cells.Add((new ModerationCell(
                    alternative.Code, alternative.Name, criterion.Id, criterion.Name, spread, spread > plan.Options.DivergenceTolerance,
                    row, history.LastOrDefault(), history.Length > 1 ? history[..^1] : []), position++));
            }
        }

        var ordered = cells
            .OrderByDescending(c => c.Cell.Flagged)
            .ThenByDescending(c => c.Cell.Flagged ? c.Cell.Spread : 0)
            .ThenBy(c => c.Position)
            .Select(c => c.Cell)
            .ToArray();
        var excluded = alternatives.Where(a => failed.ContainsKey(a.Code))
            .Select(a => new ExcludedBidder(a.Code, a.Name, failed[a.Code])).ToArray();
        return new ModerationBoard(
            id, m.Evaluation.Reference, m.Evaluation.Stage, plan.Options.DivergenceTolerance, scale.Terms.Select(t => t.Code).ToArray(),
            ordered.Count(c => c.Flagged), ordered.Count(c => c.InForce is not null), excluded, ordered);
    }

    /// <summary>
    /// Records a moderated value for one cell (facilitator, moderation stage): a new entry that links to a snapshot
    /// of the original ratings. The ratings themselves are not touched; an earlier moderated value stays in the
    /// history.
    /// </summary>
    public Task<ModeratedValue> ModerateAsync(Guid id, string alternative, string criterion, ModerateRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.Moderate);
            m.RequireQualityOpen();

            var plan = EvaluationComposer.ReadPlan(m.Evaluation).Evaluation;
            var target = plan.Criteria.FirstOrDefault(c => c.Id == criterion) ?? throw DomainProblem.NotFound($"Criterion \"{criterion}\"");
            if (!await db.Alternatives.AnyAsync(a => a.EvaluationId == id && a.Code == alternative, ct))
            {
                throw DomainProblem.NotFound($"Bidder \"{alternative}\"");
            }

            var failed = await FailedGatesAsync(db, id, ct);
            var seats = m.Evaluation.Panel.Where(p => p.Role == PanelRole.Assessor).OrderBy(p => p.Id).ToArray();
            var recused = await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == id && c.AlternativeCode == alternative)
                .Select(c => c.UserId).ToListAsync(ct);

            var errors = new Dictionary<string, string[]>();
            if (target.Kind != CriterionKind.Linguistic)
            {
                errors["criterion"] = [$"criterion \"{criterion}\" is {(target.Kind == CriterionKind.Numeric ? "numeric" : "a pass/fail gate")}; only linguistic ratings are moderated"];
            }

            if (failed.TryGetValue(alternative, out var gates))
            {
                errors["alternative"] = [$"bidder \"{alternative}\" failed {string.Join(", ", gates)} and is not scored; there is nothing to moderate"];
            }

            var term = request.Term?.Trim() ?? "";
            if (!plan.RatingScale.TryFind(term, out _))
            {
                errors["term"] = [$"give a term of the rating scale {plan.RatingScale.Name} ({plan.RatingScale.CodeList})"];
            }

            var reason = request.Reason?.Trim() ?? "";
            if (reason.Length is < MinReasonLength or > MaxReasonLength)
            {
                errors["reason"] = [$"say why the panel agreed on this value ({MinReasonLength} to {MaxReasonLength} characters); it is a minute a bidder may read, so write it as one"];
            }

            var agreed = (request.AgreedBy ?? []).Select(a => a?.Trim() ?? "").ToArray();
            if (agreed.Length == 0)
            {
                errors["agreedBy"] = ["name the assessors who agreed (their assessor codes)"];
            }

            for (var i = 0; i < agreed.Length; i++)
            {
                var seat = seats.FirstOrDefault(s => s.AssessorCode == agreed[i]);
                if (seat is null)
                {
                    errors[$"agreedBy[{i}]"] = [$"\"{agreed[i]}\" is not an assessor on this panel ({string.Join(", ", seats.Select(s => s.AssessorCode))})"];
                }
                else if (Array.IndexOf(agreed, agreed[i]) != i)
                {
                    errors[$"agreedBy[{i}]"] = [$"\"{agreed[i]}\" is named twice"];
                }
                else if (recused.Contains(seat.UserId))
                {
                    errors[$"agreedBy[{i}]"] = [$"\"{agreed[i]}\" declared a conflict of interest with bidder \"{alternative}\" and is recused from it"];
                }
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var earlier = await db.Moderation.AsNoTracking()
                .Where(x => x.EvaluationId == id && x.AlternativeCode == alternative && x.CriterionId == criterion)
                .OrderBy(x => x.Id).ToListAsync(ct);
            var inForce = earlier.LastOrDefault();
            if (inForce?.Id != request.Replaces)
            {
                var names = await DisplayNamesAsync(db, earlier.Select(x => x.RecordedBy), ct);
                throw DomainProblem.Concurrency($"The moderated value of {alternative} on {criterion}", inForce is null ? null : View(inForce, names));
            }

            var order = seats.Select((s, i) => (s.AssessorCode ?? "", i)).ToDictionary(x => x.Item1, x => x.i, StringComparer.Ordinal);
            var originals = (await db.Ratings.AsNoTracking()
                    .Where(r => r.EvaluationId == id && r.AlternativeCode == alternative && r.CriterionId == criterion).ToListAsync(ct))
                .OrderBy(r => order.GetValueOrDefault(r.AssessorCode, int.MaxValue)).ThenBy(r => r.Id)
                .Select(r => new OriginalRating(r.AssessorCode, r.Term, r.Rationale, r.DeclinedReason, r.Version, r.UpdatedAt))
                .ToArray();

            var entry = new ModerationEntry
            {
                EvaluationId = id,
                AlternativeCode = alternative,
                CriterionId = criterion,
                Term = term,
                Reason = reason,
                AgreedByJson = JsonSerializer.Serialize(agreed, Json),
                OriginalsJson = JsonSerializer.Serialize(originals, Json),
                RecordedBy = user.Id,
                RecordedAt = clock.GetUtcNow(),
            };
            db.Moderation.Add(entry);
            db.MarkChanged(m.Evaluation); // a moderated value moves the evaluation's version
            audit.Record(db, id, new AuditEvent("moderation.recorded", $"moderation/{alternative}/{criterion}",
                inForce is null ? null : $"{inForce.Term}: {inForce.Reason}",
                $"{term}: {reason} (agreed by {string.Join(", ", agreed)}; originals {string.Join(", ", originals.Select(o => $"{o.Assessor}={o.Term ?? "declined"}"))})"));
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return View(entry, new Dictionary<string, string> { [user.Id] = await DisplayNameAsync(db, user.Id, ct) });
        }, ct);

    /// <summary>
    /// Reopens a submitted rating sheet (facilitator; scoring or moderation) so that its assessor can change it;
    /// the reason is audited.
    /// </summary>
    public Task<SheetState> ReopenSheetAsync(Guid id, string assessorCode, ReopenSheetRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ReopenSheet);
            m.RequireQualityOpen();
            var reason = request.Reason?.Trim() ?? "";
            if (reason.Length is < MinReasonLength or > MaxReasonLength)
            {
                throw DomainProblem.Invalid("reason", $"say why the sheet is reopened ({MinReasonLength} to {MaxReasonLength} characters); it becomes part of the record");
            }

            var seat = m.Evaluation.Panel.FirstOrDefault(p => p.Role == PanelRole.Assessor && p.AssessorCode == assessorCode)
                ?? throw DomainProblem.NotFound($"The rating sheet of assessor \"{assessorCode}\"");
            if (seat.SubmittedAt is not { } submitted)
            {
                throw DomainProblem.Stage($"The rating sheet of {assessorCode} is not submitted (it is open already); there is nothing to reopen.");
            }

            seat.SubmittedAt = null;
            db.MarkChanged(m.Evaluation); // a reopened sheet moves the evaluation's version
            audit.Record(db, id, new AuditEvent("sheet.reopened", $"sheets/{assessorCode}",
                $"submitted {submitted:O}", $"reopened: {reason}"));
            await EvaluationStore.SaveAsync(db, m.Evaluation, ct);
            return new SheetState(assessorCode, null, seat.Version);
        }, ct);

    /// <summary>
    /// Refuses before moderation: moderation, sign-off, or a superseded revision that had reached moderation.
    /// </summary>
    internal static void RequireModerationReached(Membership m, string action)
    {
        var e = m.Evaluation;
        if (StageRules.ResultsVisible(e))
        {
            return;
        }

        throw DomainProblem.Stage(
            $"Cannot {action}: evaluation {e.Reference} is at stage {e.Stage}; this is possible once moderation has started (Moderation or SignedOff).");
    }

    /// <summary>Bidders that failed at least one gate, with the gates failed.</summary>
    internal static async Task<Dictionary<string, IReadOnlyList<string>>> FailedGatesAsync(DecideDbContext db, Guid id, CancellationToken ct) =>
        (await db.GateResults.AsNoTracking().Where(g => g.EvaluationId == id && !g.Passed).OrderBy(g => g.Id).ToListAsync(ct))
            .GroupBy(g => g.AlternativeCode, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => (IReadOnlyList<string>)g.Select(x => x.CriterionId).ToArray(), StringComparer.Ordinal);

    private static ModeratedValue View(ModerationEntry x, IReadOnlyDictionary<string, string> names) => new(
        x.Id, x.Term, x.Reason,
        JsonSerializer.Deserialize<string[]>(x.AgreedByJson, Json) ?? [],
        names.GetValueOrDefault(x.RecordedBy, x.RecordedBy),
        x.RecordedAt,
        JsonSerializer.Deserialize<OriginalRating[]>(x.OriginalsJson, Json) ?? []);

    private static async Task<Dictionary<string, string>> DisplayNamesAsync(DecideDbContext db, IEnumerable<string> ids, CancellationToken ct)
    {
        var wanted = ids.Distinct().ToArray();
        return await db.Users.AsNoTracking().Where(u => wanted.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);
    }

    private static async Task<string> DisplayNameAsync(DecideDbContext db, string id, CancellationToken ct) =>
        await db.Users.AsNoTracking().Where(u => u.Id == id).Select(u => u.DisplayName).FirstOrDefaultAsync(ct) ?? id;
}
