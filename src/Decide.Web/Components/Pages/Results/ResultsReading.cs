using Decide.Core.Analysis;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Results;

namespace Decide.Web.Components.Pages.Results;

/// <summary>What the results screen shows before the robustness checks: the evaluation, the engine's analysis and the names.</summary>
/// <param name="Summary">The evaluation as the reader sees it.</param>
/// <param name="Prepared">The compiled evaluation (input to the robustness checks).</param>
/// <param name="Analysis">Weights, matrix and ranking.</param>
/// <param name="Names">Names of the bids, criteria and assessors.</param>
public sealed record ResultsReading(EvaluationSummary Summary, PreparedEvaluation Prepared, AnalysisResult Analysis, ResultNames Names)
{
    /// <summary>What the results service ranked, with the names the screen shows.</summary>
    public static ResultsReading Of(RankedEvaluation ranked) =>
        new(ranked.Summary, ranked.Prepared, ranked.Analysis, ResultNames.Of(ranked.File.Evaluation));

    /// <summary>The colour of a bid in every chart of the screen, by its place in the ranking.</summary>
    public string Colour(string alternative)
    {
        for (var i = 0; i < Analysis.Ranking.Count; i++)
        {
            if (Analysis.Ranking[i].Alternative == alternative)
            {
                return Shared.ChartColours.ForSeries(i);
            }
        }

        return "#46565E";
    }
}
