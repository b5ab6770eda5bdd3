using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Core.Robustness;

/// <summary>
/// Re-ranks without each assessor in turn, to show whether one person's judgements decide the winner.
/// </summary>
/// <remarks>
/// The assessor's ratings, importance ratings and pairwise judgements are all removed (moderated values stay, as the
/// panel's, with the assessor taken off their list of who agreed) and the whole analysis is
/// re-run (validation included), so weights are re-derived from the remaining panel. When that is impossible
/// (a cell only they rated, the only one who gave weights) the entry says why instead of imputing.
/// </remarks>
public static class LeaveOneOut
{
    /// <summary>One entry per assessor, in panel order.</summary>
    /// <param name="prepared">The prepared evaluation.</param>
    /// <param name="baseResult">Its ranking.</param>
    /// <param name="threads">How many assessors to re-run at once (a round's panel of sixty is sixty analyses); the entries do not depend on it.</param>
    public static IReadOnlyList<LeaveOneOutResult> Run(PreparedEvaluation prepared, AnalysisResult baseResult, int threads = 1)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(threads, 1);
        var source = prepared.Source;
        var winners = Winners(baseResult);
        var results = new LeaveOneOutResult[source.Assessors.Count];
        Parallel.For(0, results.Length, new ParallelOptions { MaxDegreeOfParallelism = threads }, k =>
        {
            var assessor = source.Assessors[k];
            if (source.Assessors.Count == 1)
            {
                results[k] = new LeaveOneOutResult(assessor.Id, null, [], false, "the only assessor: without them there is no panel");
                return;
            }

            var without = Without(source, assessor.Id);
            try
            {
                var result = DecisionEngine.Analyse(without);
                var ranking = result.Ranking.Select(r => r.Alternative).ToArray();
                results[k] = new LeaveOneOutResult(assessor.Id, ranking.FirstOrDefault(), ranking, !winners.SetEquals(Winners(result)));
            }
            catch (InvalidEvaluationException e)
            {
                var reasons = string.Join("; ", e.Errors.Take(3).Select(x => x.Reason));
                results[k] = new LeaveOneOutResult(assessor.Id, null, [], false, $"no ranking without this assessor: {reasons}");
            }
        });

        return results;
    }

    /// <summary>The evaluation with every judgement of one assessor removed.</summary>
    public static Evaluation Without(Evaluation source, string assessor) => source with
    {
        Assessors = source.Assessors.Where(a => a.Id != assessor).ToArray(),
        Ratings = source.Ratings.Where(r => r.Assessor != assessor).ToArray(),
        Importance = source.Importance.Where(r => r.Assessor != assessor).ToArray(),
        Pairwise = source.Pairwise.Where(p => p.Assessor != assessor).ToArray(),

        // In a round, the others keep the applications they read; the plan's reviewers per application is no longer
        // asked of the rest (their cells only need one rating each, as everywhere).
        Reviews = source.Reviews is { } design
            ? design with { ReviewersPerApplication = 1, Assigned = design.Assigned.Where(a => a.Assessor != assessor).ToArray() }
            : null,

        // A moderated value is the panel's agreement, not one assessor's judgement: it stays, without their name.
        Moderated = source.Moderated.Select(m => m.AgreedBy is { } agreed && agreed.Contains(assessor)
            ? m with { AgreedBy = agreed.Where(a => a != assessor).ToArray() }
            : m).ToArray(),
    };

    private static HashSet<string> Winners(AnalysisResult result) =>
        result.Ranking.Where(r => r.Rank == 1).Select(r => r.Alternative).ToHashSet(StringComparer.Ordinal);
}
