namespace Decide.Core.Model;

/// <summary>
/// The design of a round in which each reviewer reads only some of the applications (an incomplete design, as in
/// grant rounds): how many reviewers each application gets, the most any reviewer may read, and who reads what.
/// Fixed with the plan; an evaluation without one is a complete design, in which every assessor rates every bid.
/// </summary>
/// <param name="ReviewersPerApplication">k: how many reviewers read each application; 1 or more.</param>
/// <param name="MaxLoad">The most applications one reviewer may be given; 1 or more.</param>
/// <param name="Assigned">Per reviewer, the applications they read (the proposal the facilitator accepted or edited).</param>
/// <param name="Calibration">
/// Whether a ranking with each reviewer's terms standardised is shown beside the raw one (never in its place); off
/// by default.
/// </param>
public sealed record ReviewDesign(
    int ReviewersPerApplication, int MaxLoad, IReadOnlyList<ReviewAssignment> Assigned, ReviewerCalibration Calibration = ReviewerCalibration.None)
{
    /// <summary>The applications assigned to <paramref name="assessor"/>, in the order given (empty when none).</summary>
    public IReadOnlyList<string> ApplicationsOf(string assessor) =>
        Assigned.FirstOrDefault(a => a.Assessor == assessor)?.Alternatives ?? [];

    /// <summary>The reviewers assigned to <paramref name="alternative"/>, in the order of <see cref="Assigned"/>.</summary>
    public IReadOnlyList<string> ReviewersOf(string alternative) =>
        Assigned.Where(a => a.Alternatives.Contains(alternative)).Select(a => a.Assessor).ToArray();
}

/// <summary>One reviewer's share of a round.</summary>
/// <param name="Assessor">Assessor id.</param>
/// <param name="Alternatives">The applications (alternative ids) they read.</param>
public sealed record ReviewAssignment(string Assessor, IReadOnlyList<string> Alternatives);

/// <summary>Whether reviewers' habits (a hard or a lenient marker) are corrected in a second ranking shown beside the raw one.</summary>
public enum ReviewerCalibration
{
    /// <summary>No second ranking (the default).</summary>
    None,

    /// <summary>
    /// Each reviewer's terms are standardised: a term's position on the scale is moved so that the reviewer's mean
    /// and spread of positions become the whole panel's, and the ranking of the moved terms is shown beside the raw
    /// one.
    /// </summary>
    Standardise,
}

/// <summary>How a round's budget is spent down the ranking.</summary>
public enum FundingRule
{
    /// <summary>Fund in rank order and stop at the first application the remaining budget cannot pay for in full.</summary>
    StopAtFirstUnaffordable,

    /// <summary>Fund in rank order; pass over an application the remaining budget cannot pay for and go on down the list.</summary>
    SkipUnaffordable,
}

/// <summary>The funding line of a round: the budget and the rule that spends it down the ranking.</summary>
/// <param name="Budget">The amount available; positive.</param>
/// <param name="Rule">How an application the remaining budget cannot pay for is treated.</param>
/// <param name="Currency">The unit of the budget and of the requested amounts, for display ("EUR").</param>
public sealed record FundingPlan(double Budget, FundingRule Rule = FundingRule.StopAtFirstUnaffordable, string? Currency = null);
