namespace Decide.Core.Analysis;

/// <summary>How much one criterion contributes to the difference in closeness between two alternatives.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Advantage">
/// Criterion j's term of CCₐ − CCᵦ (Chen 2000, eq. 19): [Δ⁻ⱼ(D⁺ₐ + D⁺ᵦ) − Δ⁺ⱼ(D⁻ₐ + D⁻ᵦ)] / (2SₐSᵦ), with
/// Δ⁻ⱼ = d⁻ₐⱼ − d⁻ᵦⱼ, Δ⁺ⱼ = d⁺ₐⱼ − d⁺ᵦⱼ (each criterion's terms of the distances, eqs. 17–18), D⁺ₓ and D⁻ₓ the
/// alternatives' total distances and Sₓ = D⁺ₓ + D⁻ₓ. Positive when the criterion pulls alternative a
/// ahead of b, negative when it holds a back, 0 when the two have equal distances on it. The terms of all criteria
/// add up to CCₐ − CCᵦ (in [−1, 1]), the difference in closeness the ranking shows.
/// </param>
public sealed record CriterionAdvantage(string Criterion, double Advantage);

/// <summary>Explains, criterion by criterion, why one alternative's closeness differs from another's.</summary>
/// <remarks>
/// <para>
/// Derivation. CCₓ = D⁻ₓ/Sₓ (Chen 2000, eq. 19), so
/// CCₐ − CCᵦ = (D⁻ₐSᵦ − D⁻ᵦSₐ)/(SₐSᵦ) = (D⁻ₐD⁺ᵦ − D⁻ᵦD⁺ₐ)/(SₐSᵦ), because the D⁻ₐD⁻ᵦ terms cancel. With
/// Δ⁻ = D⁻ₐ − D⁻ᵦ and Δ⁺ = D⁺ₐ − D⁺ᵦ the numerator can be written two ways:
/// Δ⁻·D⁺ᵦ − Δ⁺·D⁻ᵦ = D⁻ₐD⁺ᵦ − D⁻ᵦD⁺ᵦ − D⁺ₐD⁻ᵦ + D⁺ᵦD⁻ᵦ = D⁻ₐD⁺ᵦ − D⁺ₐD⁻ᵦ, and likewise
/// Δ⁻·D⁺ₐ − Δ⁺·D⁻ₐ = D⁻ₐD⁺ₐ − D⁻ᵦD⁺ₐ − D⁺ₐD⁻ₐ + D⁺ᵦD⁻ₐ = D⁻ₐD⁺ᵦ − D⁺ₐD⁻ᵦ. Their mean,
/// [Δ⁻(D⁺ₐ + D⁺ᵦ) − Δ⁺(D⁻ₐ + D⁻ᵦ)] / (2SₐSᵦ), is therefore exactly CCₐ − CCᵦ. It is linear in Δ⁻ and Δ⁺, and
/// these are sums over criteria (eqs. 17–18), so criterion j's term is
/// [Δ⁻ⱼ(D⁺ₐ + D⁺ᵦ) − Δ⁺ⱼ(D⁻ₐ + D⁻ᵦ)] / (2SₐSᵦ). The terms add up to CCₐ − CCᵦ; a criterion on which the two have
/// equal distances gives 0; swapping a and b negates every term (the factors in the brackets and the denominator are
/// symmetric in a and b). Using one form alone would not be symmetric: it would give the same criterion a different
/// size depending on which alternative is named first.
/// </para>
/// <para>
/// Sₓ = 0 needs d⁺ = d⁻ = 0 on every criterion, so each criterion's ideal points coincide with x's crisp value,
/// which (extreme ideal points: the largest upper and smallest lower value) makes every alternative's cell that
/// same value: all S are 0, every closeness is 0.5 and every term is 0.
/// </para>
/// </remarks>
public static class Explanation
{
    /// <summary>
    /// Each criterion's term of CCₐ − CCᵦ for <paramref name="a"/> against <paramref name="b"/>, largest in size
    /// first. The terms add up to the difference in closeness of the two (to rounding).
    /// </summary>
    /// <exception cref="ArgumentException">An id is not in the ranking.</exception>
    public static IReadOnlyList<CriterionAdvantage> WhyLeads(AnalysisResult result, string a, string b)
    {
        var first = result.Ranking.FirstOrDefault(r => r.Alternative == a) ?? throw new ArgumentException($"\"{a}\" is not ranked.", nameof(a));
        var second = result.Ranking.FirstOrDefault(r => r.Alternative == b) ?? throw new ArgumentException($"\"{b}\" is not ranked.", nameof(b));
        double sumA = first.DPlus + first.DMinus, sumB = second.DPlus + second.DMinus;
        var denominator = 2 * sumA * sumB;
        double plus = first.DPlus + second.DPlus, minus = first.DMinus + second.DMinus;
        return first.Contributions.Zip(second.Contributions, (x, y) =>
                new CriterionAdvantage(x.Criterion, denominator > 0
                    ? (((x.DMinus - y.DMinus) * plus) - ((x.DPlus - y.DPlus) * minus)) / denominator
                    : 0))
            .OrderByDescending(c => Math.Abs(c.Advantage))
            .ToArray();
    }
}
