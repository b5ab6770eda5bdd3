namespace Decide.Interchange.Results;

/// <summary>A cell an assessor declined.</summary>
/// <param name="Assessor">Assessor id.</param>
/// <param name="Reason">The reason they gave.</param>
public sealed record DeclinedEntry(string Assessor, string Reason);
