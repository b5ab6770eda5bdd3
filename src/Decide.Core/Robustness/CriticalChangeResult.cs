namespace Decide.Core.Robustness;

/// <summary>
/// The smallest change of one criterion's share that reverses one pair of alternatives (after Triantaphyllou &amp;
/// Sánchez 1997).
/// </summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Leader">The alternative ahead in the base ranking.</param>
/// <param name="Challenger">The alternative behind it.</param>
/// <param name="Current">The criterion's current share ŵₖ.</param>
/// <param name="Weight">The share t* at which the pair reverses; null when no share in [0, 1] reverses it.</param>
/// <param name="Absolute">δ = |t* − ŵₖ|; null when no share in [0, 1] reverses the pair.</param>
/// <param name="Relative">δ / ŵₖ × 100 (percent of the current share); null when no share reverses the pair.</param>
public sealed record CriticalChange(
    string Criterion, string Leader, string Challenger, double Current, double? Weight, double? Absolute, double? Relative)
{
    /// <summary>The words used when no change reverses the pair.</summary>
    public const string NoReversal = "no change in [0,1] reverses this pair";

    /// <summary>True when some share in [0, 1] reverses the pair.</summary>
    public bool Reverses => Absolute is not null;
}

/// <summary>The most critical criterion under one definition.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Leader">The alternative ahead in the base ranking.</param>
/// <param name="Challenger">The alternative that overtakes it.</param>
/// <param name="Current">The criterion's current share.</param>
/// <param name="Absolute">Smallest absolute change of share.</param>
/// <param name="Relative">The same change as a percentage of the criterion's current share.</param>
/// <param name="Weight">The share at which the reversal happens.</param>
public sealed record MostCriticalCriterion(
    string Criterion, string Leader, string Challenger, double Current, double Absolute, double Relative, double Weight);

/// <summary>Critical changes for every criterion and pair, and the most critical criteria.</summary>
/// <param name="Changes">Per criterion and ordered pair of the base ranking.</param>
/// <param name="TopAbsolute">Most critical criterion for the top rank, by absolute change (null when nothing reverses it).</param>
/// <param name="TopRelative">Most critical criterion for the top rank, by relative change.</param>
/// <param name="AnyAbsolute">Most critical criterion for any rank, by absolute change.</param>
/// <param name="AnyRelative">Most critical criterion for any rank, by relative change.</param>
public sealed record CriticalChangesResult(
    IReadOnlyList<CriticalChange> Changes,
    MostCriticalCriterion? TopAbsolute,
    MostCriticalCriterion? TopRelative,
    MostCriticalCriterion? AnyAbsolute,
    MostCriticalCriterion? AnyRelative);
