using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// Pass/fail results of the gate criteria, recorded by the facilitator once the plan is locked and until scoring
/// closes. A fail needs a note: it is the written reason the bid goes no further.
/// </summary>
public sealed class GateService(
    IDbContextFactory<DecideDbContext> factory,
    InputAccess access,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    public async Task<GatesView> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var x = await access.LoadAsync(db, id, ct);
        if (!x.Membership.ReadsEverything)
        {
            x.Membership.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor, PanelRole.PriceEvaluator);
            x.RequireNamesConfirmed();
        }

        return await ViewAsync(db, x, ct);
    }

    /// <summary>Records or corrects one gate result (facilitator; plan locked or scoring).</summary>
    public Task<GateCell> SaveAsync(Guid id, string alternative, string criterion, GateRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            x.Membership.Require(PanelRole.Facilitator);
            x.Membership.RequireStage(StageRules.RecordGate);
            var bidder = InputStore.Bidder(await InputStore.BiddersAsync(db, id, ct), alternative);
            var c = InputStore.Criterion(x.Plan.Evaluation, criterion);
            if (c.Kind != CriterionKind.Gate)
            {
                throw DomainProblem.Invalid("criterion", $"criterion \"{c.Id}\" is {(c.Kind == CriterionKind.Numeric ? "numeric" : "linguistic")}, not a pass/fail gate");
            }

            var row = await db.GateResults.FirstOrDefaultAsync(g => g.EvaluationId == id && g.AlternativeCode == bidder.Code && g.CriterionId == c.Id, ct);
            var what = $"The result of \"{bidder.Code}\" on gate \"{c.Id}\"";
            InputStore.CheckVersion(what, row?.Version, request.Version, row is null ? null : Cell(row, await NumericValueService.NamesAsync(db, [row.EnteredBy], ct)));
            var errors = new Dictionary<string, string[]>();
            if (request.Passed is null)
            {
                errors["passed"] = ["say whether the bid passes the gate (true) or fails it (false)"];
            }
            else if (request.Passed == false && string.IsNullOrWhiteSpace(request.Note))
            {
                errors["note"] = ["a failed gate needs a note giving the reason; it is the written reason the bid goes no further"];
            }

            if (request.Note is { Length: > 4000 })
            {
                errors["note"] = ["a note is at most 4000 characters"];
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var old = Describe(row);
            if (row is null)
            {
                row = new GateEntry { EvaluationId = id, AlternativeCode = bidder.Code, CriterionId = c.Id, Version = 1 };
                db.GateResults.Add(row);
            }

            row.Passed = request.Passed!.Value;
            row.Note = string.IsNullOrWhiteSpace(request.Note) ? null : request.Note.Trim();
            row.EnteredBy = user.Id;
            row.UpdatedAt = clock.GetUtcNow();
            audit.Record(db, id, new AuditEvent("gate.saved", $"gates/{bidder.Code}/{c.Id}", old, Describe(row)));
            await InputStore.SaveAsync(db, what, () => CurrentAsync(id, bidder.Code, c.Id, ct), ct);
            return Cell(row, await NumericValueService.NamesAsync(db, [user.Id], ct));
        }, ct);

    private static async Task<GatesView> ViewAsync(DecideDbContext db, InputContext x, CancellationToken ct)
    {
        var plan = x.Plan;
        var criteria = plan.Evaluation.Criteria.Where(c => c.Kind == CriterionKind.Gate).ToArray();
        var bidders = await InputStore.BiddersAsync(db, x.Id, ct);
        var rows = await db.GateResults.AsNoTracking().Where(g => g.EvaluationId == x.Id).ToListAsync(ct);
        var names = await NumericValueService.NamesAsync(db, rows.Select(r => r.EnteredBy), ct);
        var byCell = rows.ToDictionary(r => (r.AlternativeCode, r.CriterionId));
        var cells = bidders.SelectMany(b => criteria.Select(c => byCell.TryGetValue((b.Code, c.Id), out var r)
            ? Cell(r, names)
            : new GateCell(b.Code, c.Id, null, null, null, null, null))).ToArray();
        return new GatesView(
            criteria.Select(c => new GateCriterionView(c.Id, c.Name, plan.Metadata.DescriptionOf(c.Id))).ToArray(),
            bidders.Select(b => new BidderView(b.Code, b.Name)).ToArray(),
            cells,
            x.Membership.Has(PanelRole.Facilitator) && StageRules.RecordGate.AllowsAt(x.Evaluation.Stage));
    }

    private static GateCell Cell(GateEntry r, IReadOnlyDictionary<string, string> names) =>
        new(r.AlternativeCode, r.CriterionId, r.Passed, r.Note, r.Version, names.GetValueOrDefault(r.EnteredBy, r.EnteredBy), r.UpdatedAt);

    private async Task<object?> CurrentAsync(Guid id, string alternative, string criterion, CancellationToken ct)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var row = await db.GateResults.AsNoTracking().FirstOrDefaultAsync(g => g.EvaluationId == id && g.AlternativeCode == alternative && g.CriterionId == criterion, ct);
        return row is null ? null : Cell(row, await NumericValueService.NamesAsync(db, [row.EnteredBy], ct));
    }

    private static string? Describe(GateEntry? g) => g is null ? null : $"{(g.Passed ? "passed" : "failed")}{(g.Note is null ? "" : $": {g.Note}")}";
}
