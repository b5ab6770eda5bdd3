namespace Decide.Core.Robustness;

/// <summary>
/// Kendall's coefficient of concordance W for m rankings of the same n objects, with its chi-square test.
/// </summary>
/// <param name="W">
/// W in [0, 1]: 1 when every ranking is the same, 0 when the rank sums are all equal (no common preference).
/// Corrected for ties.
/// </param>
/// <param name="ChiSquare">χ² = m(n − 1)W, approximately chi-square distributed with n − 1 degrees of freedom when
/// the rankings are independent. With few objects the approximation is rough (common practice uses it from about
/// seven objects and exact tables below that), so with a handful of bids read the p-value as a guide.</param>
/// <param name="DegreesOfFreedom">n − 1.</param>
/// <param name="PValue">P(χ²ₙ₋₁ ≥ <paramref name="ChiSquare"/>): the chance of agreement at least this strong among
/// rankings made independently at random. Small means the agreement is not chance.</param>
/// <param name="Rankings">m, the number of rankings (assessors).</param>
/// <param name="Objects">n, the number of objects ranked (alternatives).</param>
public sealed record Concordance(double W, double ChiSquare, int DegreesOfFreedom, double PValue, int Rankings, int Objects);
