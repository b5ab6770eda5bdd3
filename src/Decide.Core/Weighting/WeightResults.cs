using Decide.Core.Consistency;
using Decide.Core.Fuzzy;

namespace Decide.Core.Weighting;

/// <summary>A criterion's weight.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Fuzzy">The fuzzy weight used in the analysis.</param>
/// <param name="Crisp">The centroid share, normalised so that all crisp weights sum to 1.</param>
/// <param name="Group">The criterion's group, if any.</param>
/// <param name="GroupWeight">The group's fuzzy weight, if grouped.</param>
/// <param name="Local">The criterion's fuzzy weight within its group, if grouped.</param>
public sealed record CriterionWeight(
    string Criterion, Tfn Fuzzy, double Crisp, string? Group = null, Tfn? GroupWeight = null, Tfn? Local = null);

/// <summary>The consistency of one pairwise matrix.</summary>
/// <param name="Assessor">Assessor id, or <c>panel</c> for the aggregated matrix.</param>
/// <param name="Group">Null for the top-level matrix (groups and top-level criteria); otherwise the group compared within.</param>
/// <param name="Items">Items compared, in matrix order.</param>
/// <param name="Report">CR, GCI and diagnostics.</param>
/// <param name="Weights">The Buckley fuzzy weights this matrix gives its items, in item order.</param>
public sealed record MatrixConsistency(
    string Assessor, string? Group, IReadOnlyList<string> Items, ConsistencyReport Report, IReadOnlyList<Tfn> Weights);
