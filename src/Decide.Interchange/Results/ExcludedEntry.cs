namespace Decide.Interchange.Results;

/// <summary>An alternative removed because it failed one or more gates.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Name">Alternative name.</param>
/// <param name="Gates">Ids of the gates it failed, in criterion order.</param>
public sealed record ExcludedEntry(string Alternative, string Name, IReadOnlyList<string> Gates);
