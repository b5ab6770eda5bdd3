using Decide.Core.Model;

namespace Decide.Core.Analysis;

/// <summary>
/// The engine's front door: validate an evaluation, derive weights, aggregate the panel's ratings and rank the
/// alternatives by fuzzy TOPSIS.
/// </summary>
public static class DecisionEngine
{
    /// <summary>Validates and compiles an evaluation for analysis.</summary>
    /// <exception cref="InvalidEvaluationException">The evaluation has problems; every one is listed with its place.</exception>
    public static PreparedEvaluation Prepare(Evaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        EvaluationValidator.EnsureValid(evaluation);
        return new PreparedEvaluation(evaluation);
    }

    /// <summary>Analyses an evaluation: weights, consistency, decision matrix and ranking.</summary>
    /// <exception cref="InvalidEvaluationException">The evaluation has problems; every one is listed with its place.</exception>
    public static AnalysisResult Analyse(Evaluation evaluation) => Prepare(evaluation).Analyse();
}
