using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Weighting;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Interchange;

namespace Decide.Web.Features.Evaluations;

/// <summary>
/// Whether the plan can be locked: one check behind both the setup screen's "what still stops the lock" and the
/// lock itself. The plan and the weights are judged alone (the bids are not in yet); pairwise weights are derived
/// from the judgements to report the consistency of each matrix.
/// </summary>
public sealed class PlanLockCheck(EvaluationComposer composer)
{
    /// <summary>Plan members of the portable file; everything else belongs to the panel, bids or inputs.</summary>
    private static readonly string[] PlanPaths =
        ["$.format", "$.title", "$.reference", "$.organisation", "$.description", "$.noun", "$.ratingScale",
         "$.importanceScale", "$.pairwiseScale", "$.groups", "$.criteria", "$.weighting", "$.publishedWeights", "$.award", "$.options"];

    /// <summary>The checks <see cref="EvaluationLifecycleService.LockPlanAsync"/> makes, as sentences, plus what the facilitator should know before locking.</summary>
    public async Task<LockReadiness> ReadinessAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        var check = await CheckAsync(db, e, ct);
        return new LockReadiness([.. check.Blocking, .. check.Errors.Select(x => $"{x.Path}: {x.Reason}")], [.. check.Warnings, .. check.Consistency]);
    }

    /// <summary>What stands in the way of locking the plan, and what the facilitator should know: one check for "can I lock?" and "lock".</summary>
    /// <param name="Blocking">Sentences: no assessor, weights not submitted.</param>
    /// <param name="Errors">The plan's and the weights' problems by place (bids are not in yet, so they are not judged).</param>
    /// <param name="Warnings">Assessors who gave no weights.</param>
    /// <param name="Consistency">Pairwise matrices above their consistency threshold (only when nothing blocks).</param>
    public sealed record Outcome(
        IReadOnlyList<string> Blocking, IReadOnlyList<EvaluationError> Errors, IReadOnlyList<string> Warnings, IReadOnlyList<string> Consistency);

    public async Task<Outcome> CheckAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        EvaluationFile file;
        try
        {
            file = await composer.ComposeAsync(db, e, ct);
        }
        catch (InvalidEvaluationException problem)
        {
            return new Outcome([], problem.Errors, [], []);
        }

        var blocking = new List<string>();
        var warnings = new List<string>();
        var assessors = e.Panel.Where(p => p.Role == PanelRole.Assessor && p.AssessorCode is not null).OrderBy(p => p.Id).ToArray();
        if (assessors.Length == 0)
        {
            blocking.Add("The panel has no assessor yet: seat at least one under Panel.");
        }

        // Only submitted weights are frozen: an assessor still working on theirs must finish or withdraw them.
        var published = file.Evaluation.Weighting == Core.Model.WeightingMethod.Points;
        var judges = file.Evaluation.Importance.Select(r => r.Assessor).Concat(file.Evaluation.Pairwise.Select(p => p.Assessor)).ToHashSet(StringComparer.Ordinal);
        foreach (var seat in assessors)
        {
            if (judges.Contains(seat.AssessorCode!) && seat.WeightsSubmittedAt is null)
            {
                blocking.Add($"Assessor {seat.AssessorCode} has weight judgements that are not submitted yet: they submit them, or clear them, before the plan is locked.");
            }
            else if (!judges.Contains(seat.AssessorCode!) && !published)
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

        return new Outcome(blocking, errors, warnings, consistency);
    }

    private static bool InScope(string path, IEnumerable<string> prefixes) =>
        prefixes.Any(p => path == p || path.StartsWith(p + ".", StringComparison.Ordinal) || path.StartsWith(p + "[", StringComparison.Ordinal));
}
