namespace Decide.Interchange.Results;

/// <summary>One criterion's term of an alternative's distances.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="DPlus">Its term of the distance from the positive ideal.</param>
/// <param name="DMinus">Its term of the distance from the negative ideal.</param>
public sealed record ContributionEntry(string Criterion, double DPlus, double DMinus);
