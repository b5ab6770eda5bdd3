using System.Globalization;
using Decide.Core.Weighting;
using Decide.Core;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// An assessor's weight judgements during setup — importance terms or pairwise comparisons, as the plan weighs —
/// with live feedback on completeness and consistency, and their submission. Frozen once the plan is locked.
/// </summary>
public sealed class WeightsService(
    IDbContextFactory<DecideDbContext> factory,
    InputAccess access,
    AuditWriter audit,
    TimeProvider clock)
{
    private const string ImportanceKind = WeightJudgement.ImportanceKind;
    private const string PairwiseKind = WeightJudgement.PairwiseKind;

    public async Task<WeightsView> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var x = await access.LoadAsync(db, id, ct);
        var seat = x.RequireAssessor();
        x.RequireDeclaration();
        return View(x, seat, await JudgementsAsync(db, x, seat, tracked: false, ct));
    }

    /// <summary>Replaces the caller's judgements (validated as a whole; nothing is saved if any is wrong).</summary>
    public Task<WeightsView> PutAsync(Guid id, WeightsRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            var seat = x.RequireAssessor();
            x.RequireDeclaration();
            x.Membership.RequireStage(StageRules.ChangeWeights);
            RequireJudgedWeights(x);
            var existing = await JudgementsAsync(db, x, seat, tracked: true, ct);
            if (request.Version is { } version && version != seat.Version)
            {
                throw DomainProblem.Concurrency("Your weight judgements", View(x, seat, existing));
            }

            var plan = x.Plan.Evaluation;
            var wanted = plan.Weighting == WeightingMethod.Importance ? ReadImportance(plan, request) : ReadPairwise(plan, request);
            var now = clock.GetUtcNow();
            var before = existing.Count == 0 ? null : Describe(existing);
            var byKey = existing.ToDictionary(j => (j.Kind, j.Node, j.Column));
            foreach (var w in wanted)
            {
                if (byKey.Remove((w.Kind, w.Node, w.Column), out var row))
                {
                    if (row.Term != w.Term || row.Lower != w.Lower || row.Middle != w.Middle || row.Upper != w.Upper)
                    {
                        (row.Term, row.Lower, row.Middle, row.Upper) = (w.Term, w.Lower, w.Middle, w.Upper);
                        row.UpdatedAt = now;
                    }
                }
                else
                {
                    w.EvaluationId = id;
                    w.AssessorCode = seat.AssessorCode!;
                    w.UpdatedAt = now;
                    w.Version = 1;
                    db.WeightJudgements.Add(w);
                }
            }

            db.WeightJudgements.RemoveRange(byKey.Values);
            var withdrawn = seat.WeightsSubmittedAt is not null;
            seat.WeightsSubmittedAt = null;
            db.MarkChanged(seat); // new weights withdraw a submission and move the seat's version even when it was not submitted
            audit.Record(db, id, new AuditEvent("weights.updated", $"weights/{seat.AssessorCode}", before,
                Describe(wanted) + (withdrawn ? " (the earlier submission is withdrawn until submitted again)" : "")));
            await InputStore.SaveAsync(db, "Your weight judgements", async () => await GetAsync(id, ct), ct);
            return View(x, seat, wanted);
        }, ct);

    /// <summary>Submits the caller's judgements: refused while incomplete; an inconsistent matrix is accepted with a warning.</summary>
    public Task<WeightsSubmitted> SubmitAsync(Guid id, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var x = await access.LoadAsync(db, id, ct);
            var seat = x.RequireAssessor();
            x.RequireDeclaration();
            x.Membership.RequireStage(StageRules.SubmitWeights);
            RequireJudgedWeights(x);
            if (seat.WeightsSubmittedAt is { } at)
            {
                throw new DomainProblem(StatusCodes.Status409Conflict, "Already submitted",
                    $"You already submitted your weight judgements on {at:yyyy-MM-dd HH:mm} UTC; changing them withdraws the submission until you submit again.");
            }

            var judgements = await JudgementsAsync(db, x, seat, tracked: false, ct);
            var feedback = WeightsFeedbackBuilder.Build(x.Plan.Evaluation, seat.AssessorCode!, judgements);
            if (!feedback.Complete)
            {
                var errors = new Dictionary<string, string[]>();
                foreach (var node in feedback.MissingNodes)
                {
                    errors[JsonPath.Key(ImportanceKind, node)] = ["not rated yet; rate the importance of every criterion and group before submitting"];
                }

                foreach (var pair in feedback.Matrices.SelectMany(m => m.MissingPairs))
                {
                    errors[JsonPath.Keys(PairwiseKind, pair[0], pair[1])] = [$"{pair[0]} and {pair[1]} are not compared yet; compare every pair before submitting"];
                }

                throw DomainProblem.Invalid(errors);
            }

            seat.WeightsSubmittedAt = clock.GetUtcNow();
            audit.Record(db, id, new AuditEvent("weights.submitted", $"weights/{seat.AssessorCode}", null,
                Describe(judgements) + (feedback.Warnings.Count > 0 ? $" (warnings: {string.Join(" ", feedback.Warnings)})" : "")));
            await InputStore.SaveAsync(db, "Your weight judgements", async () => await GetAsync(id, ct), ct);
            return new WeightsSubmitted(View(x, seat, judgements), feedback.Warnings);
        }, ct);

    /// <summary>Under published points the weights are fixed in the plan: nobody judges them.</summary>
    private static void RequireJudgedWeights(InputContext x)
    {
        if (x.Plan.Evaluation.Weighting == WeightingMethod.Points)
        {
            throw DomainProblem.Stage($"The weights of evaluation {x.Evaluation.Reference} are the points published in the plan; assessors give no weight judgements.");
        }
    }

    private static async Task<List<WeightJudgement>> JudgementsAsync(DecideDbContext db, InputContext x, PanelMember seat, bool tracked, CancellationToken ct)
    {
        var query = db.WeightJudgements.Where(w => w.EvaluationId == x.Id && w.AssessorCode == seat.AssessorCode);
        return await (tracked ? query : query.AsNoTracking()).OrderBy(w => w.Id).ToListAsync(ct);
    }

    private static WeightsView View(InputContext x, PanelMember seat, IReadOnlyList<WeightJudgement> judgements)
    {
        var plan = x.Plan.Evaluation;
        var scale = plan.Weighting == WeightingMethod.Importance ? plan.ImportanceScale : plan.PairwiseScale;
        return new WeightsView(
            seat.AssessorCode!,
            plan.Weighting switch { WeightingMethod.Importance => ImportanceKind, WeightingMethod.Points => "points", _ => PairwiseKind },
            WeightsFeedbackBuilder.Nodes(plan),
            Terms(scale),
            judgements.Where(j => j.Kind == ImportanceKind).ToDictionary(j => j.Node, j => j.Term ?? "", StringComparer.Ordinal),
            judgements.Where(j => j.Kind == PairwiseKind)
                .Select(j => new PairwiseEntry(j.Node, j.Column, j.Term, j.Term is null ? [j.Lower ?? 1, j.Middle ?? 1, j.Upper ?? 1] : null)).ToArray(),
            WeightsFeedbackBuilder.Build(plan, seat.AssessorCode!, judgements),
            seat.WeightsSubmittedAt,
            StageRules.ChangeWeights.AllowsAt(x.Evaluation.Stage) && plan.Weighting != WeightingMethod.Points,
            seat.Version);
    }

    internal static IReadOnlyList<ScaleTermView> Terms(LinguisticScale scale) =>
        scale.Terms.Select(t => new ScaleTermView(t.Code, t.Label, t.Value.ToArray())).ToArray();

    private static List<WeightJudgement> ReadImportance(Evaluation plan, WeightsRequest request)
    {
        var errors = new Dictionary<string, string[]>();
        if (request.Pairwise is not null)
        {
            errors[PairwiseKind] = ["this plan weighs by importance: give {\"importance\": {\"criterion or group\": \"term\"}}, not pairwise comparisons"];
        }

        if (request.Importance is null)
        {
            errors[ImportanceKind] = [$"give an importance term for each criterion and group ({plan.ImportanceScale.CodeList})"];
        }

        var nodes = WeightsFeedbackBuilder.Nodes(plan).Select(n => n.Id).ToHashSet(StringComparer.Ordinal);
        var wanted = new List<WeightJudgement>();
        foreach (var (node, term) in request.Importance ?? new Dictionary<string, string?>())
        {
            var at = JsonPath.Key(ImportanceKind, node);
            if (!nodes.Contains(node))
            {
                errors[at] = [UnknownNode(plan, node)];
            }
            else if (term is null || !plan.ImportanceScale.TryFind(term, out _))
            {
                errors[at] = [$"unknown term \"{term}\"; the importance scale has {plan.ImportanceScale.CodeList}"];
            }
            else
            {
                wanted.Add(new WeightJudgement { Kind = ImportanceKind, Node = node, Term = term });
            }
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }

        return wanted;
    }

    private static List<WeightJudgement> ReadPairwise(Evaluation plan, WeightsRequest request)
    {
        var errors = new Dictionary<string, string[]>();
        if (request.Importance is not null)
        {
            errors[ImportanceKind] = ["this plan weighs by pairwise comparison: give {\"pairwise\": [{\"row\", \"col\", \"term\" or \"tfn\"}]}, not importance terms"];
        }

        if (request.Pairwise is null)
        {
            errors[PairwiseKind] = [$"give the pairwise comparisons as a list of {{row, col, term}} ({plan.PairwiseScale.CodeList}) or {{row, col, tfn: [l, m, u]}}"];
        }

        var matrixOf = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var (group, items) in WeightStructure.Matrices(plan))
        {
            foreach (var item in items)
            {
                matrixOf[item] = group ?? "the top level";
            }
        }

        var pairs = new Dictionary<(string, string), int>();
        var wanted = new List<WeightJudgement>();
        var entries = request.Pairwise ?? [];
        for (var i = 0; i < entries.Count; i++)
        {
            var e = entries[i];
            var at = $"{PairwiseKind}[{i}]";
            var ok = true;
            foreach (var (field, id) in new[] { ("row", e.Row), ("col", e.Col) })
            {
                if (string.IsNullOrEmpty(id))
                {
                    errors[$"{at}.{field}"] = ["give a criterion or group id"];
                    ok = false;
                }
                else if (!matrixOf.ContainsKey(id))
                {
                    errors[$"{at}.{field}"] = [UnknownNode(plan, id)];
                    ok = false;
                }
            }

            if (!ok)
            {
                continue;
            }

            if (e.Row == e.Col)
            {
                errors[at] = [$"\"{e.Row}\" is compared with itself"];
                continue;
            }

            if (matrixOf[e.Row!] != matrixOf[e.Col!])
            {
                errors[at] = [$"\"{e.Row}\" ({Where(matrixOf[e.Row!])}) and \"{e.Col}\" ({Where(matrixOf[e.Col!])}) are not in the same matrix; compare criteria within a group, and groups with each other and with top-level criteria"];
                continue;
            }

            var key = string.CompareOrdinal(e.Row, e.Col) < 0 ? (e.Row!, e.Col!) : (e.Col!, e.Row!);
            if (!pairs.TryAdd(key, i))
            {
                errors[at] = [$"the pair {e.Row}–{e.Col} is already judged at {PairwiseKind}[{pairs[key]}]; give each pair once"];
                continue;
            }

            var judgement = new WeightJudgement { Kind = PairwiseKind, Node = e.Row!, Column = e.Col };
            if (e.Term is null == e.Tfn is null)
            {
                errors[at] = ["give either a term of the pairwise scale or a tfn [l, m, u], not both and not neither"];
                continue;
            }

            if (e.Term is { } term)
            {
                if (!plan.PairwiseScale.TryFind(term, out _))
                {
                    errors[$"{at}.term"] = [$"unknown term \"{term}\"; the pairwise scale has {plan.PairwiseScale.CodeList}"];
                    continue;
                }

                judgement.Term = term;
            }
            else if (e.Tfn is not [var l, var m, var u] || !double.IsFinite(l) || !double.IsFinite(m) || !double.IsFinite(u) || !(l > 0) || l > m || m > u)
            {
                errors[$"{at}.tfn"] = [$"a pairwise judgement as a tfn is three finite numbers [l, m, u] with 0 < l ≤ m ≤ u; got [{string.Join(", ", e.Tfn!.Select(v => v.ToString(CultureInfo.InvariantCulture)))}]"];
                continue;
            }
            else
            {
                (judgement.Lower, judgement.Middle, judgement.Upper) = (l, m, u);
            }

            wanted.Add(judgement);
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }

        return wanted;
    }

    private static string Where(string matrix) => matrix == "the top level" ? matrix : $"within {matrix}";

    private static string UnknownNode(Evaluation plan, string id) =>
        plan.Criteria.FirstOrDefault(c => c.Id == id) is { Kind: CriterionKind.Gate }
            ? $"\"{id}\" is a pass/fail gate and carries no weight"
            : $"unknown criterion or group \"{id}\"; weights are given for {string.Join(", ", WeightsFeedbackBuilder.Nodes(plan).Select(n => n.Id))}";

    private static string Describe(IEnumerable<WeightJudgement> judgements) =>
        string.Join("; ", judgements.Select(j => j.Kind == ImportanceKind
            ? $"{j.Node}={j.Term}"
            : $"{j.Node}/{j.Column}={j.Term ?? string.Create(CultureInfo.InvariantCulture, $"({j.Lower}, {j.Middle}, {j.Upper})")}"));
}
