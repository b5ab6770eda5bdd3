using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Scales;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Properties;

/// <summary>
/// With crisp terms (l = m = u) for ratings and importance, fuzzy TOPSIS (Chen 2000) is crisp TOPSIS with linear
/// normalisation and the distance |x − y|, because the vertex distance of crisp numbers is |x − y|.
/// </summary>
[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class CrispReductionPropertyTests
{
    private static readonly LinguisticScale CrispRating = LinguisticScale.Create("crisp-rating-9", 0, 10,
        Enumerable.Range(1, 9).Select(k => new LinguisticTerm($"R{k}", $"Level {k}", Tfn.Crisp(k))).ToArray());

    private static readonly LinguisticScale CrispImportance = LinguisticScale.Create("crisp-importance-5", 0, 1,
        new[] { 0.1, 0.3, 0.5, 0.7, 0.9 }.Select((w, k) => new LinguisticTerm($"I{k + 1}", $"Importance {k + 1}", Tfn.Crisp(w))).ToArray());

    [Property]
    public void Crisp_terms_reduce_fuzzy_topsis_to_crisp_topsis(Seed seed)
    {
        var evaluation = EvaluationGenerator.Generate(seed.Value, CrispRating, CrispImportance);
        var result = DecisionEngine.Analyse(evaluation);
        var expected = CrispTopsisReference.Closeness(evaluation);

        for (var i = 0; i < evaluation.Alternatives.Count; i++)
        {
            var actual = result.Ranking.Single(r => r.Alternative == evaluation.Alternatives[i].Id).Closeness;
            Assert.Equal(expected[i], actual, 1e-12);
        }

        Assert.All(result.Matrix, c => Assert.True(c.Weighted.IsCrisp, $"{c.Alternative}/{c.Criterion} {c.Weighted} is not crisp"));
    }
}
