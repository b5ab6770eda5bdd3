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

/// <summary>The figures of an assignment as it stands, the same whether Decide proposed it or the facilitator edited it.</summary>
public static class AssignmentFigures
{
    /// <summary>A proposal of <paramref name="design"/> with its loads, field matches, the most one pair shares and its parts.</summary>
    public static AssignmentProposal Of(ReviewDesign design, IReadOnlyList<Application> applications, IReadOnlyList<Reviewer> reviewers)
    {
        ArgumentNullException.ThrowIfNull(design);
        var loads = reviewers.Select(r => design.ApplicationsOf(r.Id).Count).DefaultIfEmpty(0).ToArray();
        var topics = reviewers.ToDictionary(r => r.Id, r => r.Topics ?? [], StringComparer.Ordinal);
        var readers = applications.ToDictionary(a => a.Id, a => design.ReviewersOf(a.Id), StringComparer.Ordinal);
        int matches = 0, topical = 0;
        foreach (var a in applications.Where(a => !string.IsNullOrWhiteSpace(a.Topic)))
        {
            foreach (var r in readers[a.Id])
            {
                topical++;
                matches += topics.GetValueOrDefault(r)?.Contains(a.Topic!, StringComparer.OrdinalIgnoreCase) == true ? 1 : 0;
            }
        }

        var together = new Dictionary<(string, string), int>();
        foreach (var list in readers.Values)
        {
            for (var i = 0; i < list.Count; i++)
            {
                for (var j = i + 1; j < list.Count; j++)
                {
                    var key = string.CompareOrdinal(list[i], list[j]) < 0 ? (list[i], list[j]) : (list[j], list[i]);
                    together[key] = together.GetValueOrDefault(key) + 1;
                }
            }
        }

        var parts = Core.Rounds.DesignConnectivity.Parts(applications.Select(a => a.Id).ToArray(), design.Assigned).Count;
        return new AssignmentProposal(design, loads.Min(), loads.Max(), matches, topical, together.Values.DefaultIfEmpty(0).Max(), parts);
    }
}
