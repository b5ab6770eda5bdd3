namespace Decide.Interchange.Results;

/// <summary>An alternative removed because it failed one or more gates or because the published award excludes it.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Name">Alternative name.</param>
/// <param name="Gates">Ids of the gates it failed, in criterion order.</param>
/// <param name="Reason">Why the award excludes it; left out when only gates do.</param>
public sealed record ExcludedEntry(string Alternative, string Name, IReadOnlyList<string> Gates, string? Reason = null);
