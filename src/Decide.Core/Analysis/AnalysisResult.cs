using Decide.Core.Consistency;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Weighting;

namespace Decide.Core.Analysis;

/// <summary>What the engine concludes from an evaluation.</summary>
/// <param name="Title">The evaluation's title.</param>
/// <param name="Weighting">How the weights were derived.</param>
/// <param name="Options">Aggregation rule and ideal points used.</param>
/// <param name="Ranking">Included alternatives, best first.</param>
/// <param name="Excluded">Alternatives that failed a gate, with the gates they failed.</param>
/// <param name="Weights">Every scored criterion's weight, fuzzy and as a crisp share.</param>
/// <param name="Consistency">Consistency of each pairwise matrix (pairwise weighting only), per assessor and for the panel.</param>
/// <param name="Matrix">The aggregated and weighted decision matrix, cell by cell, with who declined.</param>
public sealed record AnalysisResult(
    string Title,
    WeightingMethod Weighting,
    AnalysisOptions Options,
    IReadOnlyList<RankedAlternative> Ranking,
    IReadOnlyList<ExcludedAlternative> Excluded,
    IReadOnlyList<CriterionWeight> Weights,
    IReadOnlyList<MatrixConsistency> Consistency,
    IReadOnlyList<MatrixCell> Matrix);

/// <summary>An alternative's place in the ranking.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Rank">1 = best; exact ties share a rank.</param>
/// <param name="Closeness">Closeness coefficient CC = d⁻/(d⁺ + d⁻), in [0, 1].</param>
/// <param name="DPlus">Distance d⁺ from the positive ideal (smaller is better).</param>
/// <param name="DMinus">Distance d⁻ from the negative ideal (larger is better).</param>
/// <param name="Contributions">Each criterion's share of d⁺ and d⁻, in criterion order.</param>
public sealed record RankedAlternative(
    string Alternative,
    int Rank,
    double Closeness,
    double DPlus,
    double DMinus,
    IReadOnlyList<CriterionDistance> Contributions);

/// <summary>One criterion's terms of an alternative's distances.</summary>
public sealed record CriterionDistance(string Criterion, double DPlus, double DMinus);

/// <summary>
/// An alternative removed before normalisation: it failed one or more gates, or the published award excludes it (a
/// quality threshold it missed, a price rejected as abnormally low, a price over the budget) and so it leaves every
/// normalisation and price base.
/// </summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Gates">The gates it failed (may be empty when the award excludes it).</param>
/// <param name="Reason">Why the award excludes it, in words; null when only gates exclude it.</param>
public sealed record ExcludedAlternative(string Alternative, IReadOnlyList<string> Gates, string? Reason = null);

/// <summary>One cell of the decision matrix.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Aggregated">The panel's TFN (or the crisp value of a numeric criterion).</param>
/// <param name="Weighted">ṽ: normalised and weighted.</param>
/// <param name="Raters">How many assessors' ratings went into it (0 for a numeric criterion).</param>
/// <param name="Declined">Who declined it and why.</param>
/// <param name="Moderated">The moderated term that replaced the raters' aggregate, if the panel moderated this cell.</param>
public sealed record MatrixCell(
    string Alternative, string Criterion, Tfn Aggregated, Tfn Weighted, int Raters, IReadOnlyList<DeclinedCell> Declined,
    string? Moderated = null);

/// <summary>A cell an assessor declined, with their reason.</summary>
public sealed record DeclinedCell(string Assessor, string Reason);
