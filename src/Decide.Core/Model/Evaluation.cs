using Decide.Core.Award;
using Decide.Core.Fuzzy;
using Decide.Core.Scales;

namespace Decide.Core.Model;

/// <summary>A set of criteria that share a group weight (one level deep).</summary>
/// <param name="Id">Unique among groups and criteria.</param>
/// <param name="Name">Shown to people.</param>
public sealed record CriterionGroup(string Id, string Name);

/// <summary>A criterion the alternatives are judged on.</summary>
/// <param name="Id">Unique among criteria and groups.</param>
/// <param name="Name">Shown to people.</param>
/// <param name="Kind">Linguistic, numeric or gate.</param>
/// <param name="Direction">Benefit or cost (ignored for gates).</param>
/// <param name="Group">Id of the group it belongs to, or null for a top-level criterion.</param>
/// <param name="Descriptors">
/// Optional: for each rating-scale term code, what that term means for this criterion (shown to assessors).
/// </param>
/// <param name="Unit">Optional unit of a numeric criterion ("EUR", "days").</param>
public sealed record Criterion(
    string Id,
    string Name,
    CriterionKind Kind = CriterionKind.Linguistic,
    Direction Direction = Direction.Benefit,
    string? Group = null,
    IReadOnlyDictionary<string, string>? Descriptors = null,
    string? Unit = null);

/// <summary>One of the things being chosen between (a bid, a supplier, a candidate, an application).</summary>
/// <param name="Id">Unique among alternatives.</param>
/// <param name="Name">Shown to people.</param>
/// <param name="Requested">The amount an application asks for (grant rounds with a funding line), or null.</param>
/// <param name="Topic">The field an application belongs to, matched against reviewers' topics when assigning, or null.</param>
public sealed record Alternative(string Id, string Name, double? Requested = null, string? Topic = null);

/// <summary>A panel member who rates.</summary>
/// <param name="Id">Unique; <c>panel</c> is reserved.</param>
/// <param name="Name">Shown to people.</param>
/// <param name="Weight">Relative weight of their judgement, fixed in the plan; positive; default 1.</param>
/// <param name="Criteria">
/// The criteria assigned to them; null means every linguistic criterion. They are expected to rate (or decline)
/// every alternative on each assigned criterion (or, under a <see cref="ReviewDesign"/>, every application assigned
/// to them).
/// </param>
/// <param name="Topics">Fields the reviewer knows, preferred when applications are assigned; null or empty for none.</param>
public sealed record Assessor(
    string Id, string Name, double Weight = 1, IReadOnlyList<string>? Criteria = null, IReadOnlyList<string>? Topics = null);

/// <summary>An assessor's importance term for a criterion or a group.</summary>
public sealed record ImportanceRating(string Assessor, string Node, string Term);

/// <summary>
/// An assessor's judgement of how much more important <paramref name="Row"/> is than <paramref name="Col"/>;
/// the reverse judgement is its reciprocal.
/// </summary>
/// <param name="Assessor">Who judged.</param>
/// <param name="Row">Criterion or group id.</param>
/// <param name="Col">Criterion or group id in the same matrix.</param>
/// <param name="Value">Positive TFN: row over column.</param>
/// <param name="Term">The pairwise-scale code the value came from, if any (kept for display).</param>
public sealed record PairwiseJudgement(string Assessor, string Row, string Col, Tfn Value, string? Term = null);

/// <summary>
/// An assessor's rating of one alternative on one linguistic criterion: a term with its rationale, or a
/// declined cell with the reason. Exactly one of <paramref name="Term"/> and <paramref name="Declined"/> is set.
/// </summary>
public sealed record Rating(
    string Assessor,
    string Alternative,
    string Criterion,
    string? Term,
    string? Rationale = null,
    string? Declined = null);

/// <summary>A measured value of a numeric criterion.</summary>
public sealed record NumericValue(string Alternative, string Criterion, double Value);

/// <summary>The outcome of a gate (pass/fail) criterion for one alternative.</summary>
public sealed record GateResult(string Alternative, string Criterion, bool Passed, string? Note = null);

/// <summary>
/// The panel's agreed value for one cell after moderation. The individual ratings stay as they were; the moderated
/// term replaces their aggregate in the decision matrix.
/// </summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criterion">Linguistic criterion id.</param>
/// <param name="Term">The agreed term of the rating scale.</param>
/// <param name="Reason">Why the panel agreed on it (the minute of the discussion).</param>
/// <param name="AgreedBy">Assessor ids who agreed, if recorded.</param>
public sealed record ModeratedRating(string Alternative, string Criterion, string Term, string Reason, IReadOnlyList<string>? AgreedBy = null);

/// <summary>Choices of method fixed in the plan.</summary>
/// <param name="Aggregation">How assessors' TFNs are combined.</param>
/// <param name="Ideal">Ideal points of fuzzy TOPSIS.</param>
/// <param name="DivergenceTolerance">
/// Largest spread of one cell's terms, in scale steps, that needs no discussion; cells above it are listed for
/// moderation. Default 2.
/// </param>
/// <param name="AcceptabilityWeights">
/// Where the weights of rank-acceptability draws come from: the panel's fuzzy weights (default) or, when the panel
/// chooses "no weight information", uniformly from all weight vectors.
/// </param>
public sealed record AnalysisOptions(
    AggregationRule Aggregation = AggregationRule.Mean,
    IdealPoints Ideal = IdealPoints.Unit,
    int DivergenceTolerance = 2,
    AcceptabilityWeights AcceptabilityWeights = AcceptabilityWeights.Fuzzy);

/// <summary>
/// A whole evaluation as the engine sees it: the plan (scales, criteria, panel, weighting) and the inputs
/// (judgements, ratings, values, gate results). The shape mirrors the portable evaluation file
/// (docs/evaluation-format.md), so error paths name places in that file.
/// </summary>
public sealed record Evaluation
{
    /// <summary>Title of the evaluation.</summary>
    public required string Title { get; init; }

    /// <summary>Scale assessors rate linguistic criteria on.</summary>
    public LinguisticScale RatingScale { get; init; } = BuiltInScales.ChenRating7;

    /// <summary>Scale importance ratings use.</summary>
    public LinguisticScale ImportanceScale { get; init; } = BuiltInScales.ChenImportance7;

    /// <summary>Scale pairwise judgements given by code use.</summary>
    public LinguisticScale PairwiseScale { get; init; } = BuiltInScales.Pairwise9;

    /// <summary>Criterion groups (may be empty).</summary>
    public IReadOnlyList<CriterionGroup> Groups { get; init; } = [];

    /// <summary>Criteria, in the order they are shown.</summary>
    public required IReadOnlyList<Criterion> Criteria { get; init; }

    /// <summary>Alternatives, in the order they are shown.</summary>
    public required IReadOnlyList<Alternative> Alternatives { get; init; }

    /// <summary>The panel.</summary>
    public required IReadOnlyList<Assessor> Assessors { get; init; }

    /// <summary>How criterion weights are derived.</summary>
    public WeightingMethod Weighting { get; init; } = WeightingMethod.Importance;

    /// <summary>The published points per group and criterion (used when <see cref="Weighting"/> is points).</summary>
    public PublishedWeights? Points { get; init; }

    /// <summary>The published award method (price formula, thresholds, tie-breaks, stages), or null for a ranking by closeness alone.</summary>
    public AwardMethod? Award { get; init; }

    /// <summary>The records of prices flagged as abnormally low: what was asked, the answer and the decision.</summary>
    public IReadOnlyList<LowPriceReview> LowPriceReviews { get; init; } = [];

    /// <summary>
    /// Who reviews which application in a round where each reviewer reads only some of them, or null when every
    /// assessor rates every alternative.
    /// </summary>
    public ReviewDesign? Reviews { get; init; }

    /// <summary>The budget and rule of a round's funding line, or null when there is none.</summary>
    public FundingPlan? Funding { get; init; }

    /// <summary>Importance ratings (used when <see cref="Weighting"/> is importance).</summary>
    public IReadOnlyList<ImportanceRating> Importance { get; init; } = [];

    /// <summary>Pairwise judgements (used when <see cref="Weighting"/> is pairwise).</summary>
    public IReadOnlyList<PairwiseJudgement> Pairwise { get; init; } = [];

    /// <summary>Ratings of linguistic criteria.</summary>
    public IReadOnlyList<Rating> Ratings { get; init; } = [];

    /// <summary>Values of numeric criteria.</summary>
    public IReadOnlyList<NumericValue> Values { get; init; } = [];

    /// <summary>Results of gate criteria.</summary>
    public IReadOnlyList<GateResult> Gates { get; init; } = [];

    /// <summary>Moderated values agreed by the panel (may be empty).</summary>
    public IReadOnlyList<ModeratedRating> Moderated { get; init; } = [];

    /// <summary>Method choices.</summary>
    public AnalysisOptions Options { get; init; } = new();

    /// <summary>The name of alternative <paramref name="id"/> as people read it (the id itself when it is unknown).</summary>
    public string AlternativeName(string id) => Alternatives.FirstOrDefault(a => a.Id == id)?.Name ?? id;
}
