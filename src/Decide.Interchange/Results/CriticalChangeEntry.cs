namespace Decide.Interchange.Results;

/// <summary>
/// The smallest change of one criterion's weight that reverses one pair of alternatives: as the share it must reach,
/// and as the change of its weight alone (Triantaphyllou &amp; Sánchez 1997).
/// </summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Pair">[leader, challenger]: the alternative ahead in the base ranking, then the one behind it.</param>
/// <param name="Current">The criterion's current share.</param>
/// <param name="Weight">The share nearest to current at which the pair reverses (the others keep their proportions); left out when none does.</param>
/// <param name="Absolute">|weight − current|; left out when no share reverses the pair.</param>
/// <param name="Relative">The same change in percent of the current share; left out when no share reverses the pair.</param>
/// <param name="Delta">
/// Triantaphyllou &amp; Sánchez's critical change δ (signed, positive lowers the weight): the criterion's weight alone
/// becomes current − δ, then all weights are renormalised; the one smallest in size with current − δ in [0, 1]. Left
/// out when no such change reverses the pair.
/// </param>
/// <param name="DeltaRelative">δ in percent of the current weight (signed); left out with <paramref name="Delta"/>.</param>
/// <param name="DeltaShare">The share after renormalising at which that reversal happens; left out with <paramref name="Delta"/>.</param>
/// <param name="Reverses">True when some share in [0, 1] reverses the pair.</param>
/// <param name="Note">
/// "no change in [0,1] reverses this pair" when none does; "reverses only if this criterion's weight alone rose above
/// 1 before renormalising" when a share reverses it but no feasible δ does; else left out.
/// </param>
public sealed record CriticalChangeEntry(
    string Criterion,
    IReadOnlyList<string> Pair,
    double Current,
    double? Weight,
    double? Absolute,
    double? Relative,
    double? Delta,
    double? DeltaRelative,
    double? DeltaShare,
    bool Reverses,
    string? Note);
