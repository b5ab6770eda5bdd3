using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Core;

/// <summary>
/// The engine's one pipeline, in the order every caller needs it: validate and prepare the evaluation, analyse it
/// (weights, consistency, aggregation, ranking) and, when asked, check the ranking's robustness on the same prepared
/// evaluation. The command line, the service and the record all start here, so the three cannot drift apart.
/// </summary>
/// <param name="Prepared">The validated evaluation compiled for analysis.</param>
/// <param name="Analysis">Weights, consistency, the decision matrix and the ranking.</param>
/// <param name="Robustness">Sensitivity, agreement and summary; null when not asked for.</param>
public sealed record DecisionRun(PreparedEvaluation Prepared, AnalysisResult Analysis, RobustnessResult? Robustness)
{
    /// <summary>Validates, prepares and analyses; with <paramref name="robustness"/>, runs the robustness checks too.</summary>
    /// <exception cref="InvalidEvaluationException">The evaluation has problems; every one is listed with its place.</exception>
    public static DecisionRun Of(Evaluation evaluation, RobustnessOptions? robustness = null)
    {
        var prepared = DecisionEngine.Prepare(evaluation);
        var analysis = prepared.Analyse();
        var run = new DecisionRun(prepared, analysis, null) { Round = Rounds.RoundAnalysis.Of(prepared, analysis, prepared.Award, null) };
        return robustness is null ? run : run.WithRobustness(robustness);
    }

    /// <summary>The published award applied, or null when the plan states no award method.</summary>
    public Award.AwardReport? Award => Prepared.Award;

    /// <summary>How the points award and the closeness ranking agree, or null when the plan states no award method.</summary>
    public Award.AwardAgreement? AwardAgreement => Award is null ? null : Core.Award.AwardAgreement.Of(Award, Analysis);

    /// <summary>The robustness of the points award (the binding rule the tender published); null when not asked for or when the plan states no award.</summary>
    public Award.AwardRobustnessResult? AwardRobustness { get; init; }

    /// <summary>
    /// A round's funding line, bands, funding flips and leave-one-reviewer-out, or null when the plan has neither a
    /// review design nor a funding line; bands and flips are filled once robustness has been run.
    /// </summary>
    public Rounds.RoundReport? Round { get; init; }

    /// <summary>The same run with its robustness checked (or checked again with other settings), the award's too when the plan states one.</summary>
    public DecisionRun WithRobustness(RobustnessOptions options)
    {
        var robustness = RobustnessAnalysis.Run(Prepared, Analysis, options);
        return this with
        {
            Robustness = robustness,
            AwardRobustness = Award is { } award ? Core.Award.AwardRobustness.Run(Prepared.Source, award, options) : null,
            Round = Rounds.RoundAnalysis.Of(Prepared, Analysis, Prepared.Award, robustness),
        };
    }
}
