namespace Decide.Interchange.Results;

/// <summary>One alternative's rank acceptability indices and holistic acceptability index (SMAA-2).</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Ranks">Share of draws giving it rank 1, rank 2, …, rank n (sums to 1; tied draws are shared equally).</param>
/// <param name="Intervals">[low, high]: the 95% Wilson score interval of each share, in the same order.</param>
/// <param name="Holistic">Σᵣ αʳ · ranks[r] with αʳ = (n − r)/(n − 1): 1 when always first, 0 when always last.</param>
public sealed record AcceptabilityEntry(string Alternative, IReadOnlyList<double> Ranks, IReadOnlyList<IReadOnlyList<double>> Intervals, double Holistic);
