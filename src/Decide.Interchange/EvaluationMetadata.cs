namespace Decide.Interchange;

/// <summary>
/// What an evaluation file says about itself beyond what the engine needs: kept for screens and reports, never used
/// in the analysis.
/// </summary>
/// <param name="Reference">The buyer's reference for the procurement ("RFP-2027-014"), if given.</param>
/// <param name="Organisation">Who runs the evaluation, if given.</param>
/// <param name="Description">A longer description of the evaluation, if given.</param>
/// <param name="Noun">What is being chosen, plural and lower-case ("suppliers", "bids"), if given.</param>
/// <param name="CriterionDescriptions">Each criterion's <c>description</c> from the file, by criterion id (may be empty).</param>
public sealed record EvaluationMetadata(
    string? Reference = null,
    string? Organisation = null,
    string? Description = null,
    string? Noun = null,
    IReadOnlyDictionary<string, string>? CriterionDescriptions = null)
{
    /// <summary>Metadata with nothing set.</summary>
    public static EvaluationMetadata None { get; } = new();

    /// <summary>The description of a criterion, or null if the file gives none.</summary>
    public string? DescriptionOf(string criterionId) =>
        CriterionDescriptions is { } all && all.TryGetValue(criterionId, out var text) ? text : null;
}
