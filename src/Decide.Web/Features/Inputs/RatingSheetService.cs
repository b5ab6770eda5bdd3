using Decide.Core;
using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// An assessor's own rating sheet: the bids × the linguistic criteria assigned to them, each cell a term with its
/// rationale or a declined cell with its reason. Only the assessor's own cells are ever read or written here.
/// </summary>
public sealed class RatingSheetService(
    IDbContextFactory<DecideDbContext> factory,
    InputAccess access,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    /// <summary>Longest rationale or reason for declining a cell, in characters.</summary>
    public const int MaxTextLength = 4000;

    private static readonly EvaluationStage[] SheetStages =
        [EvaluationStage.Scoring, EvaluationStage.Moderation, EvaluationStage.SignedOff, EvaluationStage.Superseded];

    public async Task<RatingSheetView> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var (x, seat) = await OpenAsync(db, id, ct);
        return await SheetAsync(db, x, seat, ct);
    }

    /// <summary>Saves one cell: a term with a rationale, or a declined cell with its reason.</summary>
    public Task<SheetCell> SaveAsync(Guid id, string alternative, string criterion, RatingRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var (x, seat) = await OpenAsync(db, id, ct);
            RequireEditable(x, seat);
            var plan = x.Plan.Evaluation;
            var bidder = InputStore.Bidder(await InputStore.BiddersAsync(db, id, ct), alternative);
            var c = InputStore.Criterion(plan, criterion);
            if (c.Kind != CriterionKind.Linguistic)
            {
                throw DomainProblem.Invalid("criterion", c.Kind == CriterionKind.Numeric
                    ? $"criterion \"{c.Id}\" is numeric; its values are entered by the price evaluator, not rated"
                    : $"criterion \"{c.Id}\" is a pass/fail gate; the facilitator records its result, it is not rated");
            }

            if (!DeclarationService.AssignedLinguistic(plan, seat).Contains(c.Id))
            {
                throw DomainProblem.Invalid("criterion", $"criterion \"{c.Id}\" is not assigned to you; your sheet has {string.Join(", ", DeclarationService.AssignedLinguistic(plan, seat))}");
            }

            if (plan.Reviews is not null
                && !await db.ReviewAssignments.AnyAsync(r => r.EvaluationId == id && r.AssessorCode == seat.AssessorCode && r.AlternativeCode == bidder.Code, ct))
            {
                throw DomainProblem.Forbidden($"\"{bidder.Name}\" is not assigned to you; in this round you rate only the applications on your sheet.");
            }

            if (await RecusedAsync(db, id, bidder.Code, ct))
            {
                throw DomainProblem.Forbidden($"You declared a conflict of interest with \"{bidder.Code}\" and are recused from assessing it; its cells stay declined.");
            }

            var failed = await FailedGatesAsync(db, id, bidder.Code, ct);
            if (failed.Count > 0)
            {
                throw DomainProblem.Stage($"Bid \"{bidder.Code}\" failed the gate {string.Join(", ", failed)}; a bid that fails a gate is not rated.");
            }

            var code = seat.AssessorCode!;
            var row = await db.Ratings.FirstOrDefaultAsync(r => r.EvaluationId == id && r.AssessorCode == code && r.AlternativeCode == bidder.Code && r.CriterionId == c.Id, ct);
            var what = $"Your rating of \"{bidder.Code}\" on \"{c.Id}\"";
            InputStore.CheckVersion(what, row?.Version, request.Version, row is null ? null : Cell(row, bidder.Code, c.Id, x.Evaluation.MinRationaleLength, true));
            Validate(plan, c, request, x.Evaluation.MinRationaleLength);

            var old = InputStore.Describe(row);
            var now = clock.GetUtcNow();
            if (row is null)
            {
                row = new RatingEntry { EvaluationId = id, AssessorCode = code, AlternativeCode = bidder.Code, CriterionId = c.Id, Version = 1 };
                db.Ratings.Add(row);
            }

            row.Term = request.Declined is null ? request.Term!.Trim() : null;
            row.Rationale = request.Declined is null ? request.Rationale!.Trim() : null;
            row.DeclinedReason = request.Declined?.Trim();
            row.UpdatedAt = now;
            audit.Record(db, id, new AuditEvent(request.Declined is null ? "rating.saved" : "rating.declined",
                $"ratings/{code}/{bidder.Code}/{c.Id}", old, InputStore.Describe(row)));
            await InputStore.SaveAsync(db, what, () => CurrentCellAsync(id, code, bidder.Code, c.Id, x.Evaluation.MinRationaleLength, ct), ct);
            return Cell(row, bidder.Code, c.Id, x.Evaluation.MinRationaleLength, true);
        }, ct);

    /// <summary>Submits the sheet: refused, listing every cell still missing, unless every required cell is done. Read-only afterwards.</summary>
    public Task<RatingSheetView> SubmitAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var (x, seat) = await OpenAsync(db, id, ct);
            RequireEditable(x, seat);
            var sheet = await SheetAsync(db, x, seat, ct);
            var errors = new Dictionary<string, string[]>();
            foreach (var cell in sheet.Cells.Where(c => c.Required && !c.Done))
            {
                errors[JsonPath.Keys("ratings", cell.Alternative, cell.Criterion)] =
                [
                    cell.Term is null && cell.Declined is null
                        ? $"\"{cell.Alternative}\" is neither rated nor declined on \"{cell.Criterion}\""
                        : $"the rationale for \"{cell.Alternative}\" on \"{cell.Criterion}\" is shorter than {x.Evaluation.MinRationaleLength} characters",
                ];
            }

            if (errors.Count > 0)
            {
                throw new DomainProblem(StatusCodes.Status400BadRequest, "Sheet incomplete",
                    $"{errors.Count} cell(s) still need a rating with its rationale, or a reason for declining; nothing was submitted. The first: {errors.First().Value[0]}.", errors);
            }

            seat.SubmittedAt = clock.GetUtcNow();
            audit.Record(db, id, new AuditEvent("sheet.submitted", $"sheets/{seat.AssessorCode}", null,
                $"{sheet.Progress.Done} of {sheet.Progress.Total} cells done ({sheet.Cells.Count(c => c.Declined is not null)} declined)"));
            await InputStore.SaveAsync(db, "Your rating sheet", () => Task.FromResult<object?>(null), ct);
            return await SheetAsync(db, x, seat, ct);
        }, ct);

    private async Task<(InputContext, PanelMember)> OpenAsync(DecideDbContext db, Guid id, CancellationToken ct)
    {
        var x = await access.LoadAsync(db, id, ct);
        var seat = x.RequireAssessor();
        x.RequireDeclaration();
        if (!SheetStages.Contains(x.Evaluation.Stage))
        {
            throw DomainProblem.Stage($"The rating sheet opens when scoring opens; evaluation {x.Evaluation.Reference} is at stage {x.Evaluation.Stage}.");
        }

        x.RequireNamesConfirmed();
        return (x, seat);
    }

    private static void RequireEditable(InputContext x, PanelMember seat)
    {
        if (StageRules.QualityClosedRefusal(x.Evaluation) is { } closed)
        {
            throw DomainProblem.Stage(closed);
        }

        if (Editable(x, seat))
        {
            return;
        }

        throw DomainProblem.Stage(seat.SubmittedAt is { } at && StageRules.Rate.AllowsAt(x.Evaluation.Stage)
            ? $"You submitted your rating sheet on {at:yyyy-MM-dd HH:mm} UTC; it is read-only unless the facilitator reopens it."
            : $"Cannot change ratings: evaluation {x.Evaluation.Reference} is at stage {x.Evaluation.Stage}; ratings are entered at Scoring (or at Moderation on a sheet the facilitator reopened).");
    }

    /// <summary>Scoring and not submitted, or Scoring/Moderation on a sheet the facilitator reopened (submission cleared).</summary>
    private static bool Editable(InputContext x, PanelMember seat) =>
        seat.SubmittedAt is null && StageRules.Rate.AllowsAt(x.Evaluation.Stage) && !x.Evaluation.QualityClosed;

    private static void Validate(Evaluation plan, Criterion c, RatingRequest r, int minimum)
    {
        var errors = new Dictionary<string, string[]>();
        if (r.Declined is not null)
        {
            if (r.Term is not null)
            {
                errors["term"] = ["give either a term with a rationale or a reason for declining, not both"];
            }

            if (r.Rationale is not null)
            {
                errors["rationale"] = ["a declined cell carries its reason under \"declined\"; leave the rationale out"];
            }

            if (string.IsNullOrWhiteSpace(r.Declined) || r.Declined.Length > MaxTextLength)
            {
                errors["declined"] = [$"say why you decline to rate this cell (for example: outside my expertise); up to {MaxTextLength} characters"];
            }
        }
        else
        {
            if (string.IsNullOrWhiteSpace(r.Term))
            {
                errors["term"] = [$"give a term of the rating scale ({plan.RatingScale.CodeList}), or decline the cell with a reason"];
            }
            else if (!plan.RatingScale.TryFind(r.Term.Trim(), out _))
            {
                errors["term"] = [$"unknown term \"{r.Term}\"; the rating scale has {plan.RatingScale.CodeList}"];
            }

            var rationale = r.Rationale?.Trim() ?? "";
            if (rationale.Length < Math.Max(1, minimum))
            {
                errors["rationale"] = [$"give a rationale of at least {Math.Max(1, minimum)} characters that cites the bid's content (got {rationale.Length})"];
            }
            else if (rationale.Length > MaxTextLength)
            {
                errors["rationale"] = [$"a rationale is at most {MaxTextLength} characters"];
            }
            else if (Restates(c, rationale))
            {
                errors["rationale"] = ["the rationale repeats the criterion or a descriptor; say what in the bid supports the rating"];
            }
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }
    }

    private static bool Restates(Criterion c, string rationale) =>
        string.Equals(rationale, c.Name, StringComparison.OrdinalIgnoreCase)
        || (c.Descriptors?.Values.Any(d => string.Equals(rationale, d.Trim(), StringComparison.OrdinalIgnoreCase)) ?? false);

    private async Task<RatingSheetView> SheetAsync(DecideDbContext db, InputContext x, PanelMember seat, CancellationToken ct)
    {
        var plan = x.Plan.Evaluation;
        var code = seat.AssessorCode!;
        var minimum = x.Evaluation.MinRationaleLength;
        var assigned = DeclarationService.AssignedLinguistic(plan, seat);
        var criteria = plan.Criteria.Where(c => assigned.Contains(c.Id)).ToArray();
        var bidders = await InputStore.BiddersAsync(db, x.Id, ct);
        if (await InputStore.AssignedAsync(db, x.Id, plan, code, ct) is { } mine)
        {
            // A round: the sheet holds the applications assigned to this reviewer and nothing else.
            bidders = bidders.Where(b => mine.Contains(b.Code)).ToList();
        }

        var recused = (await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == x.Id && c.UserId == user.Id).Select(c => c.AlternativeCode).ToListAsync(ct))
            .ToHashSet(StringComparer.Ordinal);
        var failed = (await db.GateResults.AsNoTracking().Where(g => g.EvaluationId == x.Id && !g.Passed).ToListAsync(ct))
            .GroupBy(g => g.AlternativeCode).ToDictionary(g => g.Key, g => g.Select(r => r.CriterionId).Order(StringComparer.Ordinal).ToArray(), StringComparer.Ordinal);

        // Only the caller's own cells: other assessors' ratings never reach this sheet.
        var ratings = await db.Ratings.AsNoTracking().Where(r => r.EvaluationId == x.Id && r.AssessorCode == code)
            .ToDictionaryAsync(r => (r.AlternativeCode, r.CriterionId), ct);
        var cells = new List<SheetCell>();
        foreach (var b in bidders)
        {
            var required = !failed.ContainsKey(b.Code);
            foreach (var c in criteria)
            {
                cells.Add(ratings.TryGetValue((b.Code, c.Id), out var r)
                    ? Cell(r, b.Code, c.Id, minimum, required)
                    : new SheetCell(b.Code, c.Id, null, null, null, null, false, required));
            }
        }

        return new RatingSheetView(
            code, x.Evaluation.Stage,
            bidders.Select(b => new SheetBidder(b.Code, b.Name, recused.Contains(b.Code), failed.GetValueOrDefault(b.Code, []))).ToArray(),
            criteria.Select(c => new SheetCriterion(c.Id, c.Name, x.Plan.Metadata.DescriptionOf(c.Id), c.Group,
                c.Descriptors ?? new Dictionary<string, string>())).ToArray(),
            WeightsService.Terms(plan.RatingScale),
            cells,
            new SheetProgress(cells.Count(c => c.Required && c.Done), cells.Count(c => c.Required)),
            seat.SubmittedAt, seat.SubmittedAt is not null, Editable(x, seat), minimum);
    }

    private static SheetCell Cell(RatingEntry r, string alternative, string criterion, int minimum, bool required) =>
        new(alternative, criterion, r.Term, r.Rationale, r.DeclinedReason, r.Version,
            r.DeclinedReason is { Length: > 0 } || (r.Term is not null && (r.Rationale?.Trim().Length ?? 0) >= Math.Max(1, minimum)),
            required);

    private async Task<object?> CurrentCellAsync(Guid id, string code, string alternative, string criterion, int minimum, CancellationToken ct)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var row = await db.Ratings.AsNoTracking().FirstOrDefaultAsync(r => r.EvaluationId == id && r.AssessorCode == code && r.AlternativeCode == alternative && r.CriterionId == criterion, ct);
        return row is null ? null : Cell(row, alternative, criterion, minimum, true);
    }

    private Task<bool> RecusedAsync(DecideDbContext db, Guid id, string alternative, CancellationToken ct) =>
        db.Conflicts.AnyAsync(c => c.EvaluationId == id && c.UserId == user.Id && c.AlternativeCode == alternative, ct);

    private static async Task<IReadOnlyList<string>> FailedGatesAsync(DecideDbContext db, Guid id, string alternative, CancellationToken ct) =>
        await db.GateResults.AsNoTracking().Where(g => g.EvaluationId == id && g.AlternativeCode == alternative && !g.Passed)
            .Select(g => g.CriterionId).ToListAsync(ct);
}
