using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// Values of the numeric criteria (price, days), entered by the price evaluator during scoring. Quality assessors
/// do not see them unless the plan makes prices visible to assessors.
/// </summary>
public sealed class NumericValueService(
    IDbContextFactory<DecideDbContext> factory,
    InputAccess access,
    CurrentUser user,
    AuditWriter audit,
    EvaluationComposer composer,
    TimeProvider clock)
{
    public async Task<ValuesView> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var x = await access.LoadAsync(db, id, ct);
        RequireReader(x);
        return await ViewAsync(db, x, ct);
    }

    /// <summary>Enters or corrects one value (price evaluator, scoring stage).</summary>
    public Task<ValueCell> SaveAsync(Guid id, string alternative, string criterion, ValueRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            x.Membership.Require(PanelRole.PriceEvaluator);
            x.RequireDeclaration();
            if (StageRules.ValuesRefusal(x.Evaluation) is { } refusal)
            {
                throw DomainProblem.Stage(refusal);
            }

            x.RequireNamesConfirmed();
            var plan = x.Plan.Evaluation;
            var bidder = InputStore.Bidder(await InputStore.BiddersAsync(db, id, ct), alternative);
            var c = InputStore.Criterion(plan, criterion);
            if (c.Kind != CriterionKind.Numeric)
            {
                throw DomainProblem.Invalid("criterion", c.Kind == CriterionKind.Linguistic
                    ? $"criterion \"{c.Id}\" is linguistic; assessors rate it, it takes no value"
                    : $"criterion \"{c.Id}\" is a pass/fail gate; the facilitator records its result, it takes no value");
            }

            if (x.Evaluation.TwoStage && plan.Award is { } award && award.PriceCriterion == c.Id)
            {
                var quality = Decide.Core.Award.AwardAnalysis.QualityStage((await composer.ComposeAsync(db, x.Evaluation, ct)).Evaluation);
                if (quality.Result.Bids.FirstOrDefault(b => b.Id == bidder.Code) is { Excluded: { } why } excluded)
                {
                    throw DomainProblem.Stage($"{bidder.Name} takes no part in price ({Decide.Core.Award.AwardText.Exclusion(why)}: {excluded.ExclusionDetail}), so its price stays sealed.");
                }
            }

            if (await db.Conflicts.AnyAsync(k => k.EvaluationId == id && k.UserId == user.Id && k.AlternativeCode == bidder.Code, ct))
            {
                throw DomainProblem.Forbidden($"You declared a conflict of interest with \"{bidder.Code}\" and are recused from it; another price evaluator enters its values.");
            }

            var row = await db.NumericValues.FirstOrDefaultAsync(v => v.EvaluationId == id && v.AlternativeCode == bidder.Code && v.CriterionId == c.Id, ct);
            var what = $"The value of \"{bidder.Code}\" on \"{c.Id}\"";
            var names = await NamesAsync(db, row is null ? [] : [row.EnteredBy], ct);
            InputStore.CheckVersion(what, row?.Version, request.Version, row is null ? null : Cell(row, names));
            if (request.Value is not { } value)
            {
                throw DomainProblem.Invalid("value", $"give the value as a number{(c.Unit is null ? "" : $" in {c.Unit}")}");
            }

            // The engine's own rules and wording for a value (finite; not negative; above 0 for a cost criterion).
            var check = plan with { Alternatives = [new Alternative(bidder.Code, bidder.Name)], Values = [new NumericValue(bidder.Code, c.Id, value)] };
            var path = JsonPath.Keys("$.values", bidder.Code, c.Id);
            if (EvaluationValidator.Validate(check).Where(e => e.Path == path).Select(e => e.Reason).ToArray() is { Length: > 0 } reasons)
            {
                throw DomainProblem.Invalid(new Dictionary<string, string[]> { ["value"] = reasons });
            }

            var old = row is null ? null : Format(row.Value, c);
            if (row is null)
            {
                row = new NumericEntry { EvaluationId = id, AlternativeCode = bidder.Code, CriterionId = c.Id, Version = 1 };
                db.NumericValues.Add(row);
            }

            row.Value = value;
            row.EnteredBy = user.Id;
            row.UpdatedAt = clock.GetUtcNow();
            audit.Record(db, id, new AuditEvent("value.saved", $"values/{bidder.Code}/{c.Id}", old, Format(value, c)));
            await InputStore.SaveAsync(db, what, () => CurrentAsync(id, bidder.Code, c.Id, ct), ct);
            return Cell(row, await NamesAsync(db, [user.Id], ct));
        }, ct);

    private static void RequireReader(InputContext x)
    {
        var m = x.Membership;
        if (m.ReadsEverything)
        {
            return;
        }

        if (m.Has(PanelRole.PriceEvaluator) || (m.Has(PanelRole.Assessor) && x.Evaluation.PricesVisibleToAssessors))
        {
            x.RequireNamesConfirmed();
            return;
        }

        if (m.Has(PanelRole.Assessor))
        {
            throw DomainProblem.Forbidden(
                $"Prices and other numeric values are withheld from quality assessors in evaluation {x.Evaluation.Reference}, so that quality is scored on its own; the price evaluator, facilitator, observer and approver see them.");
        }

        m.Require(PanelRole.PriceEvaluator, PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver);
    }

    private static async Task<ValuesView> ViewAsync(DecideDbContext db, InputContext x, CancellationToken ct)
    {
        var plan = x.Plan.Evaluation;
        var criteria = plan.Criteria.Where(c => c.Kind == CriterionKind.Numeric).ToArray();
        var bidders = await InputStore.BiddersAsync(db, x.Id, ct);
        var rows = await db.NumericValues.AsNoTracking().Where(v => v.EvaluationId == x.Id).ToListAsync(ct);
        var names = await NamesAsync(db, rows.Select(r => r.EnteredBy), ct);
        var byCell = rows.ToDictionary(r => (r.AlternativeCode, r.CriterionId));
        var cells = bidders.SelectMany(b => criteria.Select(c => byCell.TryGetValue((b.Code, c.Id), out var r)
            ? Cell(r, names)
            : new ValueCell(b.Code, c.Id, null, null, null, null))).ToArray();
        return new ValuesView(
            criteria.Select(c => new NumericCriterionView(c.Id, c.Name, c.Unit, FormatWords.Of(c.Direction))).ToArray(),
            bidders.Select(b => new BidderView(b.Code, b.Name)).ToArray(),
            cells,
            x.Membership.Has(PanelRole.PriceEvaluator) && StageRules.ValuesRefusal(x.Evaluation) is null);
    }

    private static ValueCell Cell(NumericEntry r, IReadOnlyDictionary<string, string> names) =>
        new(r.AlternativeCode, r.CriterionId, r.Value, r.Version, names.GetValueOrDefault(r.EnteredBy, r.EnteredBy), r.UpdatedAt);

    private async Task<object?> CurrentAsync(Guid id, string alternative, string criterion, CancellationToken ct)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var row = await db.NumericValues.AsNoTracking().FirstOrDefaultAsync(v => v.EvaluationId == id && v.AlternativeCode == alternative && v.CriterionId == criterion, ct);
        return row is null ? null : Cell(row, await NamesAsync(db, [row.EnteredBy], ct));
    }

    internal static async Task<IReadOnlyDictionary<string, string>> NamesAsync(DecideDbContext db, IEnumerable<string> ids, CancellationToken ct)
    {
        var wanted = ids.Distinct().ToArray();
        return await db.Users.AsNoTracking().Where(u => wanted.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, ct);
    }

    private static string Format(double value, Criterion c) =>
        value.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + (c.Unit is null ? "" : $" {c.Unit}");
}
