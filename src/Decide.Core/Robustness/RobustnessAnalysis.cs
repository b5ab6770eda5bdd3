using Decide.Core.Analysis;

namespace Decide.Core.Robustness;

/// <summary>
/// The front door of robustness: runs every sensitivity analysis and the panel-agreement measures on a prepared
/// evaluation and writes the plain-words summary. Diagnostic only: nothing here changes the ranking or re-weights
/// anyone.
/// </summary>
public static class RobustnessAnalysis
{
    /// <summary>Runs everything.</summary>
    /// <param name="prepared">From <see cref="DecisionEngine.Prepare"/>.</param>
    /// <param name="baseResult">From <see cref="PreparedEvaluation.Analyse"/>.</param>
    /// <param name="options">Draws, seed, threads. Zero draws skips rank acceptability (its result then has no entries).</param>
    public static RobustnessResult Run(PreparedEvaluation prepared, AnalysisResult baseResult, RobustnessOptions? options = null)
    {
        options ??= new RobustnessOptions();
        var sweeps = WeightSweeps.Run(prepared, options.Threads);
        var sensitivity = new SensitivityResult(
            sweeps,
            CriticalChanges.Compute(prepared, baseResult, sweeps),
            prepared.Alternatives.Count > 0 && options.Draws > 0
                ? RankAcceptabilityAnalysis.Run(prepared, options.Draws, options.Seed, prepared.Source.Options.AcceptabilityWeights, options.Threads)
                : new AcceptabilityResult(0, options.Seed, prepared.Source.Options.AcceptabilityWeights, [], []),
            LeaveOneOut.Run(prepared, baseResult, options.Threads),
            WithoutAlternative.Run(prepared),
            prepared.Alternatives.Count > 0 ? MethodCrossCheck.Run(prepared, baseResult) : []);
        var agreement = PanelAgreement.Measure(prepared, prepared.Source.Options.DivergenceTolerance);
        return new RobustnessResult(sensitivity, agreement, RobustnessSummary.Write(prepared, baseResult, sensitivity, agreement));
    }
}
