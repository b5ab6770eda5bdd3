using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// The declaration an assessor or price evaluator accepts before seeing anything of an evaluation, its
/// confirmation once the bidders are known, and conflicts of interest, each of which recuses the declarer from
/// that bidder.
/// </summary>
public sealed class DeclarationService(
    IDbContextFactory<DecideDbContext> factory,
    InputAccess access,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    /// <summary>Longest statement of an interest, in characters.</summary>
    public const int MaxStatementLength = 4000;

    private static readonly EvaluationStage[] NamesKnown =
        [EvaluationStage.Scoring, EvaluationStage.Moderation, EvaluationStage.SignedOff, EvaluationStage.Superseded];

    /// <summary>The declaration text in force.</summary>
    public static DeclarationView Current() =>
        new(Declaration.Version, Declaration.Title, Declaration.Paragraphs, Declaration.NamesConfirmation);

    /// <summary>The caller's declaration in an evaluation; once scoring is open and they have signed, the bidders to confirm it against.</summary>
    public async Task<MyDeclarationView> GetMineAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var x = await access.LoadAsync(db, id, ct);
        x.Membership.Require(PanelRole.Assessor, PanelRole.PriceEvaluator);
        return await ViewAsync(db, x, ct);
    }

    /// <summary>Accepts the current declaration for every assessor and price-evaluator seat the caller holds.</summary>
    public Task<MyDeclarationView> SignAsync(Guid id, SignDeclarationRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            x.Membership.Require(PanelRole.Assessor, PanelRole.PriceEvaluator);
            x.Membership.RequireStage(StageRules.SignDeclaration);
            var errors = new Dictionary<string, string[]>();
            if (request.Version != Declaration.Version)
            {
                errors["version"] = [$"the declaration in force is version {Declaration.Version}{(request.Version is null ? "" : $", not {request.Version}")}; read it (GET /api/declaration) and sign that version"];
            }

            if (!request.Accepted)
            {
                errors["accepted"] = ["the declaration is signed by accepting it (accepted: true)"];
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            if (x.Seats.All(s => s.DeclarationVersion == Declaration.Version && s.DeclarationSignedAt is not null))
            {
                throw new DomainProblem(StatusCodes.Status409Conflict, "Already signed",
                    $"You already signed version {Declaration.Version} of the declaration on {x.Seats[0].DeclarationSignedAt:yyyy-MM-dd HH:mm} UTC; nothing was changed.");
            }

            var now = clock.GetUtcNow();
            var before = x.Seats[0].DeclarationVersion;
            foreach (var seat in x.Seats)
            {
                seat.DeclarationSignedAt = now;
                seat.DeclarationVersion = Declaration.Version;
            }

            audit.Record(db, id, new AuditEvent("declaration.signed", $"declarations/{x.Code}",
                before is null ? null : $"version {before}",
                $"version {Declaration.Version} accepted as {string.Join(" and ", x.Seats.Select(s => s.Role.ToString().ToLowerInvariant()))}"));
            await db.SaveChangesAsync(ct);
            return await ViewAsync(db, x, ct);
        }, ct);

    /// <summary>
    /// Confirms the declaration again now that the bidders are known, records every declared conflict and recuses
    /// the caller from each of those bidders.
    /// </summary>
    public Task<MyDeclarationView> ConfirmNamesAsync(Guid id, ConfirmNamesRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            x.Membership.Require(PanelRole.Assessor, PanelRole.PriceEvaluator);
            x.RequireDeclaration();
            x.Membership.RequireStage(StageRules.ConfirmDeclarationFor(x.Evaluation.IsRound));
            if (x.NamesConfirmed)
            {
                throw new DomainProblem(StatusCodes.Status409Conflict, "Already confirmed",
                    $"You already confirmed your declaration against the bidders' names on {x.Seats[0].NamesConfirmedAt:yyyy-MM-dd HH:mm} UTC; declare a further conflict with POST /api/evaluations/{id}/conflicts.");
            }

            var bidders = await InputStore.BiddersAsync(db, id, ct);
            var existing = await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == id && c.UserId == user.Id).Select(c => c.AlternativeCode).ToListAsync(ct);
            var conflicts = request.Conflicts ?? [];
            var errors = new Dictionary<string, string[]>();
            var seen = new HashSet<string>(existing, StringComparer.Ordinal);
            for (var i = 0; i < conflicts.Count; i++)
            {
                Check(conflicts[i], $"conflicts[{i}]", bidders, seen, errors);
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var now = clock.GetUtcNow();
            foreach (var seat in x.Seats)
            {
                seat.NamesConfirmedAt = now;
            }

            audit.Record(db, id, new AuditEvent("declaration.names-confirmed", $"declarations/{x.Code}", null,
                conflicts.Count == 0
                    ? $"version {Declaration.Version} confirmed against {bidders.Count} bidders; no conflict of interest declared"
                    : $"version {Declaration.Version} confirmed against {bidders.Count} bidders; conflicts of interest declared with {string.Join(", ", conflicts.Select(c => c.Alternative!.Trim()))}"));
            foreach (var conflict in conflicts)
            {
                await DeclareAsync(db, x, conflict.Alternative!.Trim(), conflict.Statement!.Trim(), now, ct);
            }

            await InputStore.SaveAsync(db, "Your declaration", () => Task.FromResult<object?>(null), ct);
            return await ViewAsync(db, x, ct);
        }, ct);

    /// <summary>Declares one more conflict of interest (after the names were confirmed) and recuses the caller from that bidder.</summary>
    public Task<MyDeclarationView> DeclareConflictAsync(Guid id, ConflictRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            x.Membership.Require(PanelRole.Assessor, PanelRole.PriceEvaluator);
            x.Membership.RequireStage(StageRules.DeclareConflictFor(x.Evaluation.IsRound));
            x.RequireNamesConfirmed();
            var bidders = await InputStore.BiddersAsync(db, id, ct);
            var existing = await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == id && c.UserId == user.Id).Select(c => c.AlternativeCode).ToListAsync(ct);
            var errors = new Dictionary<string, string[]>();
            Check(request, "", bidders, new HashSet<string>(existing, StringComparer.Ordinal), errors);
            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            await DeclareAsync(db, x, request.Alternative!.Trim(), request.Statement!.Trim(), clock.GetUtcNow(), ct);
            await InputStore.SaveAsync(db, "Your declaration", () => Task.FromResult<object?>(null), ct);
            return await ViewAsync(db, x, ct);
        }, ct);

    /// <summary>Declared conflicts: all of them for the facilitator, observer and approver; one's own for an assessor or price evaluator.</summary>
    public async Task<IReadOnlyList<ConflictView>> ListConflictsAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var x = await access.LoadAsync(db, id, ct);
        if (x.Membership.ReadsEverything)
        {
            return await ConflictsAsync(db, x, null, ct);
        }

        x.Membership.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor, PanelRole.PriceEvaluator);
        x.RequireNamesConfirmed();
        return await ConflictsAsync(db, x, user.Id, ct);
    }

    private static void Check(ConflictRequest c, string at, IReadOnlyList<StoredAlternative> bidders, HashSet<string> seen, Dictionary<string, string[]> errors)
    {
        var prefix = at.Length == 0 ? "" : at + ".";
        var code = c.Alternative?.Trim();
        if (string.IsNullOrEmpty(code) || bidders.All(b => b.Code != code))
        {
            errors[$"{prefix}alternative"] = [$"unknown bidder \"{code}\"; the bidders are {string.Join(", ", bidders.Select(b => b.Code))}"];
        }
        else if (!seen.Add(code))
        {
            errors[$"{prefix}alternative"] = [$"a conflict of interest with \"{code}\" is already declared"];
        }

        if (string.IsNullOrWhiteSpace(c.Statement) || c.Statement.Trim().Length < 10 || c.Statement.Length > MaxStatementLength)
        {
            errors[$"{prefix}statement"] = [$"say what the interest is (10 to {MaxStatementLength} characters); it becomes part of the record"];
        }
    }

    /// <summary>Records the conflict and turns every cell the declarer rates on that bidder into a recusal.</summary>
    private async Task DeclareAsync(DecideDbContext db, InputContext x, string alternative, string statement, DateTimeOffset now, CancellationToken ct)
    {
        db.Conflicts.Add(new ConflictDeclaration
        {
            EvaluationId = x.Id, UserId = user.Id, AlternativeCode = alternative, Statement = statement, DeclaredAt = now,
        });
        audit.Record(db, x.Id, new AuditEvent("conflict.declared", $"conflicts/{x.Code}/{alternative}", null, statement));
        if (x.AssessorSeat is not { } seat)
        {
            return;
        }

        var code = seat.AssessorCode!;
        if (await InputStore.AssignedAsync(db, x.Id, x.Plan.Evaluation, code, ct) is { } mine
            && (!mine.Contains(alternative) || x.Evaluation.Stage == EvaluationStage.PlanLocked))
        {
            // A round: nothing to recuse from an application not assigned to them; before scoring opens the
            // assignment is still being made, and the proposal (and the check when scoring opens) keeps them off it.
            return;
        }

        var criteria = AssignedLinguistic(x.Plan.Evaluation, seat);
        var ratings = await db.Ratings.Where(r => r.EvaluationId == x.Id && r.AssessorCode == code && r.AlternativeCode == alternative)
            .ToDictionaryAsync(r => r.CriterionId, StringComparer.Ordinal, ct);
        foreach (var criterion in criteria)
        {
            var target = $"ratings/{code}/{alternative}/{criterion}";
            if (ratings.TryGetValue(criterion, out var rating))
            {
                if (rating.DeclinedReason == Declaration.RecusalReason)
                {
                    continue;
                }

                var old = InputStore.Describe(rating);
                rating.Term = null;
                rating.Rationale = null;
                rating.DeclinedReason = Declaration.RecusalReason;
                rating.UpdatedAt = now;
                audit.Record(db, x.Id, new AuditEvent("rating.recused", target, old, InputStore.Describe(rating)));
            }
            else
            {
                var added = new RatingEntry
                {
                    EvaluationId = x.Id, AssessorCode = code, AlternativeCode = alternative, CriterionId = criterion,
                    DeclinedReason = Declaration.RecusalReason, UpdatedAt = now, Version = 1,
                };
                db.Ratings.Add(added);
                audit.Record(db, x.Id, new AuditEvent("rating.recused", target, null, InputStore.Describe(added)));
            }
        }
    }

    /// <summary>The linguistic criteria an assessor rates: those assigned, or every linguistic criterion.</summary>
    internal static IReadOnlyList<string> AssignedLinguistic(Evaluation plan, PanelMember seat)
    {
        var assigned = EvaluationComposer.Assigned(seat);
        return plan.Criteria.Where(c => c.Kind == CriterionKind.Linguistic && (assigned is null || assigned.Contains(c.Id)))
            .Select(c => c.Id).ToArray();
    }

    private async Task<MyDeclarationView> ViewAsync(DecideDbContext db, InputContext x, CancellationToken ct)
    {
        var seat = x.Seats[0];
        var signed = x.DeclarationSigned;
        var namesKnown = NamesKnown.Contains(x.Evaluation.Stage);
        var bidders = signed && namesKnown
            ? (await InputStore.BiddersAsync(db, x.Id, ct)).Select(b => new BidderView(b.Code, b.Name)).ToArray()
            : null;
        return new MyDeclarationView(
            Declaration.Version, signed ? seat.DeclarationVersion : null, signed ? seat.DeclarationSignedAt : null,
            x.NamesConfirmed ? seat.NamesConfirmedAt : null,
            signed && !x.NamesConfirmed && StageRules.ConfirmDeclarationFor(x.Evaluation.IsRound).AllowsAt(x.Evaluation.Stage),
            bidders, await ConflictsAsync(db, x, user.Id, ct));
    }

    private static async Task<IReadOnlyList<ConflictView>> ConflictsAsync(DecideDbContext db, InputContext x, string? userId, CancellationToken ct)
    {
        var query = db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == x.Id);
        if (userId is not null)
        {
            query = query.Where(c => c.UserId == userId);
        }

        var conflicts = await query.OrderBy(c => c.Id).ToListAsync(ct);
        var ids = conflicts.Select(c => c.UserId).Distinct().ToArray();
        var names = await db.Users.AsNoTracking().Where(u => ids.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);
        var codes = x.Evaluation.Panel.Where(p => p.AssessorCode is not null).GroupBy(p => p.UserId).ToDictionary(g => g.Key, g => g.First().AssessorCode);
        return conflicts.Select(c => new ConflictView(codes.GetValueOrDefault(c.UserId), names.GetValueOrDefault(c.UserId) ?? "", c.AlternativeCode,
            c.Statement, c.DeclaredAt, c.Action)).ToArray();
    }
}
