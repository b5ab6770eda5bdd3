using Decide.Core.Model;

namespace Decide.Interchange;

/// <summary>The content of a portable evaluation file: what the engine analyses, and what the file says about itself.</summary>
/// <param name="Evaluation">The evaluation as the engine sees it.</param>
/// <param name="Metadata">Reference, organisation, description, noun and criterion descriptions.</param>
public sealed record EvaluationFile(Evaluation Evaluation, EvaluationMetadata Metadata)
{
    /// <summary>The plan part of the file: everything but the panel, the bids and the inputs (what is fixed before bids arrive).</summary>
    public EvaluationFile PlanOnly() => this with
    {
        Evaluation = Evaluation with
        {
            Alternatives = [], Assessors = [], Importance = [], Pairwise = [], Ratings = [], Values = [], Gates = [], Moderated = [], LowPriceReviews = [],
            Reviews = Evaluation.Reviews is { } design ? design with { Assigned = [] } : null,
        },
    };
}
