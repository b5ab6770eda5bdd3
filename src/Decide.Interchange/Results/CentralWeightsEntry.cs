namespace Decide.Interchange.Results;

/// <summary>The central weight vector of an alternative: the mean crisp shares of the draws in which it ranks first.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Weights">Share per scored criterion id, in criterion order (sums to 1).</param>
public sealed record CentralWeightsEntry(string Alternative, IReadOnlyDictionary<string, double> Weights);
