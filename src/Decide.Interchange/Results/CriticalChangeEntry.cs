namespace Decide.Interchange.Results;

/// <summary>The smallest change of one criterion's share that reverses one pair of alternatives.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Pair">[leader, challenger]: the alternative ahead in the base ranking, then the one behind it.</param>
/// <param name="Current">The criterion's current share.</param>
/// <param name="Weight">The share at which the pair reverses; left out when none does.</param>
/// <param name="Absolute">|weight − current|; left out when no share reverses the pair.</param>
/// <param name="Relative">The same change in percent of the current share; left out when no share reverses the pair.</param>
/// <param name="Reverses">True when some share in [0, 1] reverses the pair.</param>
/// <param name="Note">"no change in [0,1] reverses this pair" when none does; else left out.</param>
public sealed record CriticalChangeEntry(
    string Criterion,
    IReadOnlyList<string> Pair,
    double Current,
    double? Weight,
    double? Absolute,
    double? Relative,
    bool Reverses,
    string? Note);
