using Decide.Web.Features.Evaluations;

namespace Decide.Web.Features.Rounds;

/// <summary>Who reads which application in a round, with the figures a facilitator checks before scoring opens.</summary>
/// <param name="Evaluation">The evaluation.</param>
/// <param name="ReviewersPerApplication">k, from the plan.</param>
/// <param name="MaxLoad">The most one reviewer may read, from the plan.</param>
/// <param name="Frozen">True once scoring has opened: the assignment can no longer change.</param>
/// <param name="Reviewers">Per reviewer in panel order (an assessor sees only their own).</param>
/// <param name="Applications">Per application in bid order with who reads it (empty for an assessor).</param>
/// <param name="Problems">What stops the assignment from being frozen, in sentences (empty when none).</param>
/// <param name="Figures">The proposal's figures, or null when nothing is assigned yet.</param>
public sealed record AssignmentView(
    EvaluationSummary Evaluation,
    int ReviewersPerApplication,
    int MaxLoad,
    bool Frozen,
    IReadOnlyList<ReviewerLoadView> Reviewers,
    IReadOnlyList<ApplicationReadersView> Applications,
    IReadOnlyList<string> Problems,
    AssignmentFiguresView? Figures);

/// <summary>One reviewer's share.</summary>
public sealed record ReviewerLoadView(string Code, string Name, IReadOnlyList<string> Topics, IReadOnlyList<string> Applications, IReadOnlyList<string> Conflicts);

/// <summary>One application and its readers.</summary>
public sealed record ApplicationReadersView(string Code, string Name, string? Topic, double? Requested, IReadOnlyList<string> Reviewers);

/// <summary>The figures of the assignment as it stands.</summary>
public sealed record AssignmentFiguresView(int LowestLoad, int HighestLoad, int TopicMatches, int TopicReviews, int MostSharedByOnePair, int Parts);

/// <summary>A proposal request: the seed of the tie-breaks (default 1), so that another proposal can be asked for.</summary>
public sealed record ProposeAssignmentRequest(ulong? Seed);

/// <summary>One reviewer's applications, as the facilitator edits them.</summary>
public sealed record ReviewerApplicationsRequest(IReadOnlyList<string>? Applications);
