namespace Decide.Interchange.Results;

/// <summary>Critical changes of criterion shares (after Triantaphyllou &amp; Sánchez 1997).</summary>
/// <param name="Changes">Per criterion and per pair of the base ranking (leader ahead of challenger).</param>
/// <param name="MostCritical">The most critical criteria for the top rank and for any rank.</param>
public sealed record CriticalChangesEntry(IReadOnlyList<CriticalChangeEntry> Changes, MostCriticalEntry MostCritical);
