namespace Decide.Interchange.Results;

/// <summary>A share of the swept criterion at which two alternatives swap order.</summary>
/// <param name="Weight">The share (to 1e-10).</param>
/// <param name="Pair">[the alternative ahead just below the share, the one ahead just above it].</param>
/// <param name="Confirmed">True when recomputing just either side shows the two in opposite orders.</param>
public sealed record SweepReversalEntry(double Weight, IReadOnlyList<string> Pair, bool Confirmed);
