namespace Decide.Interchange.Results;

/// <summary>
/// The central weight vector of an alternative (the mean crisp shares of the draws in which it ranks first) and its
/// confidence factor (SMAA-2).
/// </summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Weights">Share per scored criterion id, in criterion order (sums to 1).</param>
/// <param name="Confidence">Share of draws of the ratings alone, with the weights fixed at <paramref name="Weights"/>, in which it ranks first.</param>
public sealed record CentralWeightsEntry(string Alternative, IReadOnlyDictionary<string, double> Weights, double Confidence);
