using System.Text.Json;
using Decide.Core;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Interchange.Plans;

/// <summary>
/// A plan as it is being written (<c>decide-evaluation/1</c> without panel, bids or inputs): what the setup screens
/// edit and store. Unlike <see cref="EvaluationFileReader.ReadPlan(string)"/>, reading one is lenient — a plan in
/// the making may lack criteria or hold a name not yet unique — and checking it is left to the strict reader, which
/// the service runs on every stored plan. <see cref="PlanDocumentReader"/> reads it, <see cref="PlanDocumentWriter"/>
/// writes it; nothing else builds or parses a plan.
/// </summary>
public sealed record PlanDocument
{
    /// <summary>The plan's title.</summary>
    public string Title { get; init; } = "";

    /// <summary>The buyer's reference.</summary>
    public string? Reference { get; init; }

    /// <summary>Who runs the evaluation.</summary>
    public string? Organisation { get; init; }

    /// <summary>The purpose of the evaluation (the plan's <c>description</c>).</summary>
    public string? Description { get; init; }

    /// <summary>What is chosen, plural ("bids").</summary>
    public string? Noun { get; init; }

    /// <summary>The rating scale (<c>ratingScale</c>).</summary>
    public PlanScale RatingScale { get; init; } = PlanScale.Named(BuiltInScales.ChenRating7.Name);

    /// <summary>The importance scale (<c>importanceScale</c>).</summary>
    public PlanScale ImportanceScale { get; init; } = PlanScale.Named(BuiltInScales.ChenImportance7.Name);

    /// <summary>The pairwise scale (<c>pairwiseScale</c>).</summary>
    public PlanScale PairwiseScale { get; init; } = PlanScale.Named(BuiltInScales.Pairwise9.Name);

    /// <summary>Criterion groups, in order.</summary>
    public IReadOnlyList<CriterionGroup> Groups { get; init; } = [];

    /// <summary>Criteria, in order.</summary>
    public IReadOnlyList<PlanCriterion> Criteria { get; init; } = [];

    /// <summary>How the criteria are weighted.</summary>
    public WeightingMethod Weighting { get; init; } = WeightingMethod.Importance;

    /// <summary>The published points per group and criterion (<c>publishedWeights</c>), for points weighting.</summary>
    public PublishedWeights? Points { get; init; }

    /// <summary>The published award method (<c>award</c>), or null for a ranking by closeness alone.</summary>
    public AwardMethod? Award { get; init; }

    /// <summary>The analysis options.</summary>
    public AnalysisOptions Options { get; init; } = new();

    /// <summary>
    /// A round's design settings (reviewers per application, the most one reviewer may read), or null when every
    /// assessor rates every bid. Who reads what is not part of the plan document: it is proposed and frozen with the
    /// plan in the service, and written under <c>reviews.assigned</c> in a whole evaluation file.
    /// </summary>
    public ReviewDesign? Reviews { get; init; }

    /// <summary>A round's funding line, or null.</summary>
    public FundingPlan? Funding { get; init; }

    /// <summary>The plan a new evaluation starts from: its title, reference and organisation, Chen's scales, no criteria yet.</summary>
    public static PlanDocument Starter(string title, string? reference, string? organisation) =>
        new() { Title = title.Trim(), Reference = reference?.Trim(), Organisation = organisation?.Trim() };
}

/// <summary>One criterion of a plan being written.</summary>
/// <param name="Id">Id, unique among criteria and groups.</param>
/// <param name="Name">Name shown to people.</param>
/// <param name="Kind">Linguistic, numeric or pass/fail gate.</param>
/// <param name="Direction">Benefit or cost (not written for a gate).</param>
/// <param name="Group">The group's id, or null.</param>
/// <param name="Unit">A numeric criterion's unit ("EUR").</param>
/// <param name="Description">What the criterion assesses.</param>
/// <param name="Descriptors">A linguistic criterion's descriptor per rating-scale term code.</param>
public sealed record PlanCriterion(
    string Id,
    string Name,
    CriterionKind Kind = CriterionKind.Linguistic,
    Direction Direction = Direction.Benefit,
    string? Group = null,
    string? Unit = null,
    string? Description = null,
    IReadOnlyDictionary<string, string>? Descriptors = null);

/// <summary>
/// A scale as a plan names it: a built-in scale by <paramref name="Name"/>, or a scale of the evaluation's own
/// (<paramref name="Custom"/>, kept exactly as the plan has it; such scales come in with an imported file).
/// </summary>
public sealed record PlanScale(string Name, JsonElement? Custom = null)
{
    /// <summary>A built-in scale by name.</summary>
    public static PlanScale Named(string name) => new(name);

    /// <summary>The scale's terms, or null when it cannot be read (an unknown name, a custom scale that breaks a rule).</summary>
    /// <param name="member">The plan member it stands in: <c>ratingScale</c>, <c>importanceScale</c> or <c>pairwiseScale</c>.</param>
    public LinguisticScale? Resolve(string member)
    {
        if (Custom is null)
        {
            return BuiltInScales.ByName.GetValueOrDefault(Name);
        }

        try
        {
            return EvaluationFileReader.ReadScale(Custom.Value, member);
        }
        catch (InvalidEvaluationException)
        {
            return null;
        }
    }
}
