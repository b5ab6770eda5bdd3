using Decide.Core.Model;

namespace Decide.Assignment;

/// <summary>A proposed assignment with the figures a facilitator checks before accepting it.</summary>
/// <param name="Design">The design to freeze with the plan (or edit first).</param>
/// <param name="LowestLoad">The fewest applications any reviewer is given.</param>
/// <param name="HighestLoad">The most applications any reviewer is given.</param>
/// <param name="TopicMatches">Reviews whose reviewer knows the application's field.</param>
/// <param name="TopicReviews">Reviews of applications that name a field (the most that could match).</param>
/// <param name="MostSharedByOnePair">The most applications any two reviewers read together.</param>
/// <param name="Parts">Parts of the design joined by shared reviewers; 1 means every application can be compared with every other.</param>
public sealed record AssignmentProposal(
    ReviewDesign Design,
    int LowestLoad,
    int HighestLoad,
    int TopicMatches,
    int TopicReviews,
    int MostSharedByOnePair,
    int Parts);

/// <summary>Why no assignment can meet the plan, in sentences that say what to change.</summary>
public sealed class AssignmentInfeasibleException(IReadOnlyList<string> reasons)
    : Exception(string.Join(" ", reasons))
{
    /// <summary>One sentence per reason.</summary>
    public IReadOnlyList<string> Reasons { get; } = reasons;
}
