namespace Decide.Assignment;

/// <summary>What a proposal must respect and what it should prefer.</summary>
/// <param name="Applications">The applications, in the order they are shown.</param>
/// <param name="Reviewers">The reviewers, in panel order.</param>
/// <param name="ReviewersPerApplication">k: reviewers each application gets.</param>
/// <param name="MaxLoad">The most applications one reviewer may be given.</param>
/// <param name="Conflicts">Declared conflicts (reviewer id, application id): never assigned.</param>
/// <param name="Seed">Seed of the tie-breaking and the local search: the same request always gives the same proposal.</param>
public sealed record AssignmentRequest(
    IReadOnlyList<Application> Applications,
    IReadOnlyList<Reviewer> Reviewers,
    int ReviewersPerApplication,
    int MaxLoad,
    IReadOnlySet<(string Reviewer, string Application)> Conflicts,
    ulong Seed = 1);

/// <summary>An application to be read.</summary>
/// <param name="Id">Alternative id.</param>
/// <param name="Name">Shown in messages.</param>
/// <param name="Topic">Its field, or null.</param>
public sealed record Application(string Id, string Name, string? Topic = null);

/// <summary>A reviewer who may be given applications.</summary>
/// <param name="Id">Assessor id.</param>
/// <param name="Name">Shown in messages.</param>
/// <param name="Topics">Fields they know; an application in one of them is preferred.</param>
public sealed record Reviewer(string Id, string Name, IReadOnlyList<string>? Topics = null);
