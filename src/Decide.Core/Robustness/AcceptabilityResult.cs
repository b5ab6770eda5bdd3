using Decide.Core.Model;

namespace Decide.Core.Robustness;

/// <summary>Rank acceptability of every alternative (SMAA-2 rank acceptability indices).</summary>
/// <param name="Draws">Number of Monte Carlo draws.</param>
/// <param name="Seed">Seed of the run; the same seed gives the same numbers on any number of threads.</param>
/// <param name="Weights">Where draw weights came from.</param>
/// <param name="Alternatives">Per alternative, in input order.</param>
/// <param name="CentralWeights">The mean weight vector (crisp shares) of the draws in which each alternative ranks first, for every alternative that ever does.</param>
public sealed record AcceptabilityResult(
    int Draws,
    ulong Seed,
    AcceptabilityWeights Weights,
    IReadOnlyList<RankAcceptability> Alternatives,
    IReadOnlyList<CentralWeightVector> CentralWeights);

/// <summary>One alternative's rank acceptability indices bᵢʳ.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Ranks">Share of draws giving it rank 1, 2, …, n (sums to 1).</param>
/// <param name="Intervals">95% Wilson score interval for each share.</param>
public sealed record RankAcceptability(string Alternative, IReadOnlyList<double> Ranks, IReadOnlyList<ShareInterval> Intervals);

/// <summary>A confidence interval for a share.</summary>
public sealed record ShareInterval(double Low, double High);

/// <summary>The central weight vector of an alternative: the mean crisp shares of the draws in which it ranks first.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Weights">Crisp share per scored criterion, in criterion order (sums to 1).</param>
/// <param name="Criteria">Criterion ids matching <paramref name="Weights"/>.</param>
public sealed record CentralWeightVector(string Alternative, IReadOnlyList<string> Criteria, IReadOnlyList<double> Weights);
