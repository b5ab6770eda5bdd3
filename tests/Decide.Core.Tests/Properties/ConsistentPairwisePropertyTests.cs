using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Properties;

[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class ConsistentPairwisePropertyTests
{
    [Property]
    public void A_consistent_pairwise_matrix_returns_its_weights_with_ratio_zero(PositiveWeights weights)
    {
        var n = weights.Values.Length;
        var criteria = Enumerable.Range(1, n).Select(j => new Criterion($"C{j}", $"Criterion {j}")).ToArray();
        var judgements = new List<PairwiseJudgement>();
        foreach (var assessor in new[] { "D1", "D2" })
        {
            for (var i = 0; i < n; i++)
            {
                for (var j = i + 1; j < n; j++)
                {
                    judgements.Add(new PairwiseJudgement(assessor, criteria[i].Id, criteria[j].Id, Tfn.Crisp(weights.Values[i] / weights.Values[j])));
                }
            }
        }

        var evaluation = new Evaluation
        {
            Title = "Consistent judgements",
            Criteria = criteria,
            Alternatives = [new Alternative("S1", "S1"), new Alternative("S2", "S2")],
            Assessors = [new Assessor("D1", "D1"), new Assessor("D2", "D2", 2)],
            Weighting = WeightingMethod.Pairwise,
            Pairwise = judgements,
            Ratings = [.. from a in new[] { "D1", "D2" } from s in new[] { "S1", "S2" } from c in criteria select new Rating(a, s, c.Id, "G")],
        };

        var result = DecisionEngine.Analyse(evaluation);
        var expected = weights.Normalised;
        for (var j = 0; j < n; j++)
        {
            Assert.Equal(expected[j], result.Weights[j].Crisp, 1e-12);
            Assert.Equal(expected[j], result.Weights[j].Fuzzy.Middle, 1e-12);
        }

        Assert.Equal(3, result.Consistency.Count); // D1, D2 and the panel
        Assert.All(result.Consistency, c =>
        {
            Assert.InRange(c.Report.Ratio, 0, 1e-12);
            Assert.True(c.Report.Acceptable);
        });
    }
}
