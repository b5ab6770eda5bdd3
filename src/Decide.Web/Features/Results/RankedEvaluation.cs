using Decide.Core;
using Decide.Core.Analysis;
using Decide.Interchange;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Features.Results;

/// <summary>An evaluation as stored, ranked by the engine: what a results screen shows before the robustness checks.</summary>
/// <param name="Summary">The evaluation as the reader sees it.</param>
/// <param name="File">The portable evaluation the engine ranked (names of bids, criteria and assessors).</param>
/// <param name="Run">The engine's run, without robustness yet (<see cref="ResultsService.CheckRobustnessAsync"/> adds it).</param>
public sealed record RankedEvaluation(EvaluationSummary Summary, EvaluationFile File, DecisionRun Run)
{
    /// <summary>The compiled evaluation (input to the robustness checks).</summary>
    public PreparedEvaluation Prepared => Run.Prepared;

    /// <summary>Weights, matrix and ranking.</summary>
    public AnalysisResult Analysis => Run.Analysis;
}
