using Decide.Core.Award;
using Decide.Core.Model;

namespace Decide.Interchange;

/// <summary>
/// The one table of the words the portable file uses for the engine's choices (<c>"numeric"</c>, <c>"cost"</c>,
/// <c>"pairwise"</c>, <c>"geometric"</c>, …). The strict reader, the lenient plan reader and both writers take their
/// words from here; docs/evaluation-format.md lists the same words.
/// </summary>
public static class FormatWords
{
    /// <summary>Criterion kinds: <c>linguistic</c>, <c>numeric</c>, <c>gate</c>.</summary>
    public static IReadOnlyList<(string Name, CriterionKind Value)> Kinds { get; } =
        [("linguistic", CriterionKind.Linguistic), ("numeric", CriterionKind.Numeric), ("gate", CriterionKind.Gate)];

    /// <summary>Directions: <c>benefit</c>, <c>cost</c>.</summary>
    public static IReadOnlyList<(string Name, Direction Value)> Directions { get; } =
        [("benefit", Direction.Benefit), ("cost", Direction.Cost)];

    /// <summary>Weighting methods: <c>importance</c>, <c>pairwise</c>, <c>points</c>.</summary>
    public static IReadOnlyList<(string Name, WeightingMethod Value)> Weightings { get; } =
        [("importance", WeightingMethod.Importance), ("pairwise", WeightingMethod.Pairwise), ("points", WeightingMethod.Points)];

    /// <summary>Reviewer calibration of a round.</summary>
    public static IReadOnlyList<(string Name, Decide.Core.Model.ReviewerCalibration Value)> Calibrations { get; } =
        [("none", Decide.Core.Model.ReviewerCalibration.None), ("standardise", Decide.Core.Model.ReviewerCalibration.Standardise)];

    /// <summary>The file's word for a reviewer calibration.</summary>
    public static string Of(Decide.Core.Model.ReviewerCalibration value) => Word(Calibrations, value);

    /// <summary>Rules of a round's funding line.</summary>
    public static IReadOnlyList<(string Name, Decide.Core.Model.FundingRule Value)> FundingRules { get; } =
        [("stop-at-first-unaffordable", Decide.Core.Model.FundingRule.StopAtFirstUnaffordable), ("skip-unaffordable", Decide.Core.Model.FundingRule.SkipUnaffordable)];

    /// <summary>Price formulas of the award.</summary>
    public static IReadOnlyList<(string Name, PriceFormula Value)> PriceFormulas { get; } =
    [
        ("lowest-price-ratio", PriceFormula.LowestPriceRatio), ("linear-from-lowest", PriceFormula.LinearFromLowest),
        ("lowest-highest", PriceFormula.LowestHighestInterpolation), ("budget", PriceFormula.BudgetBased),
        ("value-for-money", PriceFormula.ValueForMoney), ("quality-adjusted-price", PriceFormula.QualityAdjustedPrice),
        ("lowest-price-acceptable", PriceFormula.LowestPriceAcceptable),
    ];

    /// <summary>Which result binds: <c>points</c>, <c>closeness</c>.</summary>
    public static IReadOnlyList<(string Name, BindingResult Value)> Bindings { get; } =
        [("points", BindingResult.Points), ("closeness", BindingResult.Closeness)];

    /// <summary>How the panel's terms become one score: <c>mean</c>, <c>moderated</c>.</summary>
    public static IReadOnlyList<(string Name, PanelScoreRule Value)> PanelScores { get; } =
        [("mean", PanelScoreRule.Mean), ("moderated", PanelScoreRule.Moderated)];

    /// <summary>Tie-break rules: <c>higher-quality</c>, <c>lower-price</c>, <c>earlier-submission</c>.</summary>
    public static IReadOnlyList<(string Name, TieBreak Value)> TieBreaks { get; } =
        [("higher-quality", TieBreak.HigherQuality), ("lower-price", TieBreak.LowerPrice), ("earlier-submission", TieBreak.EarlierSubmission)];

    /// <summary>Decisions about an abnormally low price: <c>accepted</c>, <c>rejected</c>.</summary>
    public static IReadOnlyList<(string Name, LowPriceDecision Value)> LowPriceDecisions { get; } =
        [("accepted", LowPriceDecision.Accepted), ("rejected", LowPriceDecision.Rejected)];

    /// <summary>Aggregation rules: <c>mean</c>, <c>geometric</c>.</summary>
    public static IReadOnlyList<(string Name, AggregationRule Value)> Aggregations { get; } =
        [("mean", AggregationRule.Mean), ("geometric", AggregationRule.Geometric)];

    /// <summary>Ideal points: <c>unit</c>, <c>extreme</c>.</summary>
    public static IReadOnlyList<(string Name, IdealPoints Value)> Ideals { get; } =
        [("unit", IdealPoints.Unit), ("extreme", IdealPoints.Extreme)];

    /// <summary>Where acceptability draws take their weights: <c>fuzzy</c>, <c>uniform</c>.</summary>
    public static IReadOnlyList<(string Name, AcceptabilityWeights Value)> AcceptabilityWeightings { get; } =
        [("fuzzy", AcceptabilityWeights.Fuzzy), ("uniform", AcceptabilityWeights.Uniform)];

    /// <summary>The file's word for a criterion kind.</summary>
    public static string Of(CriterionKind value) => Word(Kinds, value);

    /// <summary>The file's word for a direction.</summary>
    public static string Of(Direction value) => Word(Directions, value);

    /// <summary>The file's word for a weighting method.</summary>
    public static string Of(WeightingMethod value) => Word(Weightings, value);

    /// <summary>The file's word for a funding rule.</summary>
    public static string Of(Decide.Core.Model.FundingRule value) => Word(FundingRules, value);

    /// <summary>The file's word for an aggregation rule.</summary>
    public static string Of(AggregationRule value) => Word(Aggregations, value);

    /// <summary>The file's word for a choice of ideal points.</summary>
    public static string Of(IdealPoints value) => Word(Ideals, value);

    /// <summary>The file's word for the acceptability weights.</summary>
    public static string Of(AcceptabilityWeights value) => Word(AcceptabilityWeightings, value);

    /// <summary>The file's word for a price formula.</summary>
    public static string Of(PriceFormula value) => Word(PriceFormulas, value);

    /// <summary>The file's word for the binding result.</summary>
    public static string Of(BindingResult value) => Word(Bindings, value);

    /// <summary>The file's word for the panel score rule.</summary>
    public static string Of(PanelScoreRule value) => Word(PanelScores, value);

    /// <summary>The file's word for a tie-break rule.</summary>
    public static string Of(TieBreak value) => Word(TieBreaks, value);

    /// <summary>The file's word for a decision about an abnormally low price.</summary>
    public static string Of(LowPriceDecision value) => Word(LowPriceDecisions, value);

    /// <summary>The value a word stands for in <paramref name="table"/>, or <paramref name="fallback"/> when it is not one of them.</summary>
    public static T Parse<T>(IReadOnlyList<(string Name, T Value)> table, string? word, T fallback)
    {
        foreach (var (name, value) in table)
        {
            if (name == word)
            {
                return value;
            }
        }

        return fallback;
    }

    private static string Word<T>(IReadOnlyList<(string Name, T Value)> table, T value)
    {
        foreach (var (name, v) in table)
        {
            if (EqualityComparer<T>.Default.Equals(v, value))
            {
                return name;
            }
        }

        throw new ArgumentOutOfRangeException(nameof(value), value, "no word of the file format stands for this value");
    }
}
