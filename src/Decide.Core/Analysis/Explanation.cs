namespace Decide.Core.Analysis;

/// <summary>How much one criterion favours the leader of a pair.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Advantage">
/// (d⁻ₐ − d⁻ᵦ) + (d⁺ᵦ − d⁺ₐ) for this criterion: positive when it pulls alternative a ahead of b, negative when it
/// holds a back.
/// </param>
public sealed record CriterionAdvantage(string Criterion, double Advantage);

/// <summary>Explains, criterion by criterion, why one alternative's closeness differs from another's.</summary>
public static class Explanation
{
    /// <summary>
    /// Each criterion's advantage for <paramref name="a"/> over <paramref name="b"/>, largest in size first. d⁺ and
    /// d⁻ are sums over criteria, so these terms add up to (d⁻ₐ − d⁻ᵦ) + (d⁺ᵦ − d⁺ₐ).
    /// </summary>
    /// <exception cref="ArgumentException">An id is not in the ranking.</exception>
    public static IReadOnlyList<CriterionAdvantage> WhyLeads(AnalysisResult result, string a, string b)
    {
        var first = result.Ranking.FirstOrDefault(r => r.Alternative == a) ?? throw new ArgumentException($"\"{a}\" is not ranked.", nameof(a));
        var second = result.Ranking.FirstOrDefault(r => r.Alternative == b) ?? throw new ArgumentException($"\"{b}\" is not ranked.", nameof(b));
        return first.Contributions.Zip(second.Contributions, (x, y) =>
                new CriterionAdvantage(x.Criterion, (x.DMinus - y.DMinus) + (y.DPlus - x.DPlus)))
            .OrderByDescending(c => Math.Abs(c.Advantage))
            .ToArray();
    }
}
