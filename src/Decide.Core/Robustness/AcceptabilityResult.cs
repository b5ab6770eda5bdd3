using Decide.Core.Model;

namespace Decide.Core.Robustness;

/// <summary>
/// Rank acceptability of every alternative, with the SMAA-2 holistic acceptability index, central weight vectors
/// and confidence factors (Lahdelma &amp; Salminen 2001, Operations Research 49(3):444–454).
/// </summary>
/// <param name="Draws">Number of Monte Carlo draws (of weights and ratings; each confidence factor uses as many draws of the ratings).</param>
/// <param name="Seed">Seed of the run; the same seed gives the same numbers on any number of threads.</param>
/// <param name="Weights">Where draw weights came from.</param>
/// <param name="Alternatives">Per alternative, in input order.</param>
/// <param name="CentralWeights">The mean weight vector (crisp shares) of the draws in which each alternative ranks first, with its confidence factor, for every alternative that ever does.</param>
public sealed record AcceptabilityResult(
    int Draws,
    ulong Seed,
    AcceptabilityWeights Weights,
    IReadOnlyList<RankAcceptability> Alternatives,
    IReadOnlyList<CentralWeightVector> CentralWeights)
{
    /// <summary>
    /// The meta-weights α¹ … αⁿ behind <see cref="RankAcceptability.Holistic"/>: αʳ = (n − r)/(n − 1), from 1 for
    /// first place down to 0 for last (see <see cref="RankAcceptabilityAnalysis.MetaWeights"/>).
    /// </summary>
    public IReadOnlyList<double> MetaWeights => RankAcceptabilityAnalysis.MetaWeights(Alternatives.Count);
}

/// <summary>One alternative's rank acceptability indices bᵢʳ and holistic acceptability index aᵢʰ (SMAA-2).</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Ranks">
/// bᵢʳ: share of draws giving it rank 1, 2, …, n, in [0, 1] (sums to 1; a draw in which k alternatives tie at
/// positions p … p + k − 1 gives each of them 1/k at each of those positions).
/// </param>
/// <param name="Intervals">95% Wilson score interval for each share.</param>
/// <param name="Holistic">
/// aᵢʰ = Σᵣ αʳ bᵢʳ with the linear meta-weights αʳ = (n − r)/(n − 1) (<see cref="AcceptabilityResult.MetaWeights"/>),
/// in [0, 1]: 1 when it is always first, 0 when always last; Lahdelma &amp; Salminen (2001).
/// </param>
public sealed record RankAcceptability(string Alternative, IReadOnlyList<double> Ranks, IReadOnlyList<ShareInterval> Intervals, double Holistic);

/// <summary>A confidence interval for a share.</summary>
public sealed record ShareInterval(double Low, double High);

/// <summary>
/// The central weight vector wᵢᶜ of an alternative (the mean crisp shares of the draws in which it ranks first; a
/// draw with k tied for first counts 1/k) and its confidence factor pᵢᶜ (SMAA-2, Lahdelma &amp; Salminen 2001).
/// </summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criteria">Criterion ids matching <paramref name="Weights"/>.</param>
/// <param name="Weights">Crisp share per scored criterion, in criterion order (sums to 1).</param>
/// <param name="Confidence">
/// pᵢᶜ in [0, 1]: the share of draws of the ratings alone (as many as the run's draws, with the weights fixed at
/// <paramref name="Weights"/>) in which the alternative ranks first, tied firsts counting 1/k. 1 when the ratings'
/// uncertainty cannot cost it first place at these weights.
/// </param>
public sealed record CentralWeightVector(string Alternative, IReadOnlyList<string> Criteria, IReadOnlyList<double> Weights, double Confidence);
