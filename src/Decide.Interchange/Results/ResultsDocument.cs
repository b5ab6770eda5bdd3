namespace Decide.Interchange.Results;

/// <summary>
/// The results document (<c>decide-results/1</c>): what the engine concluded, in the shape the JSON takes
/// (camelCase members; a null member is left out). See docs/evaluation-format.md, "Results document".
/// </summary>
/// <remarks>
/// New sections are added as further nullable properties (as <see cref="Sensitivity"/>, <see cref="Agreement"/> and
/// <see cref="Summary"/> were), each with its own entry records registered in the serialiser context; a section that
/// was not computed stays null and is not written. Adding a section keeps the format version; renaming or removing a
/// member bumps it.
/// </remarks>
public sealed record ResultsDocument
{
    /// <summary>Always <c>decide-results/1</c>.</summary>
    public string Format { get; init; } = EvaluationFormat.Results;

    /// <summary>The evaluation's title.</summary>
    public required string Title { get; init; }

    /// <summary>What computed the results.</summary>
    public required EngineDescription Engine { get; init; }

    /// <summary>The method choices the results rest on.</summary>
    public required MethodDescription Method { get; init; }

    /// <summary>Alternatives still in the running, best first.</summary>
    public required IReadOnlyList<RankingEntry> Ranking { get; init; }

    /// <summary>Alternatives that failed a gate (with the gates) or that the published award excludes (with the reason).</summary>
    public required IReadOnlyList<ExcludedEntry> Excluded { get; init; }

    /// <summary>Every scored criterion's weight.</summary>
    public required IReadOnlyList<WeightEntry> Weights { get; init; }

    /// <summary>Consistency of each pairwise matrix (empty for importance weighting).</summary>
    public required IReadOnlyList<ConsistencyEntry> Consistency { get; init; }

    /// <summary>The decision matrix, cell by cell.</summary>
    public required IReadOnlyList<MatrixEntry> Matrix { get; init; }

    /// <summary>The published points award applied, with the table a bidder can recompute; null when the plan states no award method.</summary>
    public AwardSection? PointsAward { get; init; }

    /// <summary>A round's funding line, bands and flips; null when the evaluation has neither a review design nor a funding line.</summary>
    public RoundSection? Round { get; init; }

    /// <summary>How the ranking responds to changes of weights, ratings, panel, bid set and method; null when robustness was not run.</summary>
    public SensitivitySection? Sensitivity { get; init; }

    /// <summary>How far the panel agrees; null when robustness was not run.</summary>
    public AgreementSection? Agreement { get; init; }

    /// <summary>The robustness findings as plain sentences, most important first; null when robustness was not run.</summary>
    public IReadOnlyList<string>? Summary { get; init; }
}
