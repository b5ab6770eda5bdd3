using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Properties;

/// <summary>
/// The order in which alternatives, criteria and assessors (and the inputs about them) are listed changes nothing
/// but the order of the results.
/// </summary>
[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class PermutationPropertyTests
{
    private const double Tolerance = 1e-12;

    [Property]
    public void Permuting_alternatives_permutes_the_results(GeneratedEvaluation generated)
    {
        var random = new Random(generated.Seed);
        var e = generated.Evaluation;
        AssertSameResults(e, e with { Alternatives = Shuffle(e.Alternatives, random), Ratings = Shuffle(e.Ratings, random) });
    }

    [Property]
    public void Permuting_criteria_permutes_the_results(GeneratedEvaluation generated)
    {
        var random = new Random(generated.Seed);
        var e = generated.Evaluation;
        AssertSameResults(e, e with { Criteria = Shuffle(e.Criteria, random), Importance = Shuffle(e.Importance, random), Values = Shuffle(e.Values, random) });
    }

    [Property]
    public void Permuting_assessors_permutes_the_results(GeneratedEvaluation generated)
    {
        var random = new Random(generated.Seed);
        var e = generated.Evaluation;
        AssertSameResults(e, e with { Assessors = Shuffle(e.Assessors, random), Ratings = Shuffle(e.Ratings, random) });
    }

    private static void AssertSameResults(Evaluation original, Evaluation permuted)
    {
        var a = DecisionEngine.Analyse(original);
        var b = DecisionEngine.Analyse(permuted);

        var ranked = b.Ranking.ToDictionary(r => r.Alternative);
        Assert.Equal(a.Ranking.Count, ranked.Count);
        foreach (var r in a.Ranking)
        {
            var s = ranked[r.Alternative];
            Assert.Equal(r.Closeness, s.Closeness, Tolerance);
            Assert.Equal(r.DPlus, s.DPlus, Tolerance);
            Assert.Equal(r.DMinus, s.DMinus, Tolerance);
            Assert.Equal(r.Rank, s.Rank);
            var contributions = s.Contributions.ToDictionary(c => c.Criterion);
            Assert.All(r.Contributions, c => Assert.Equal(c.DPlus, contributions[c.Criterion].DPlus, Tolerance));
        }

        var weights = b.Weights.ToDictionary(w => w.Criterion);
        foreach (var w in a.Weights)
        {
            Assert.Equal(w.Crisp, weights[w.Criterion].Crisp, Tolerance);
            Assert.Equal(w.Fuzzy.Middle, weights[w.Criterion].Fuzzy.Middle, Tolerance);
        }

        var cells = b.Matrix.ToDictionary(c => (c.Alternative, c.Criterion));
        foreach (var c in a.Matrix)
        {
            var d = cells[(c.Alternative, c.Criterion)];
            Assert.Equal(c.Aggregated.Lower, d.Aggregated.Lower, Tolerance * Math.Max(1, c.Aggregated.Upper));
            Assert.Equal(c.Aggregated.Upper, d.Aggregated.Upper, Tolerance * Math.Max(1, c.Aggregated.Upper));
            Assert.Equal(c.Weighted.Middle, d.Weighted.Middle, Tolerance);
            Assert.Equal(c.Raters, d.Raters);
        }
    }

    private static T[] Shuffle<T>(IReadOnlyList<T> items, Random random)
    {
        var copy = items.ToArray();
        random.Shuffle(copy);
        return copy;
    }
}
