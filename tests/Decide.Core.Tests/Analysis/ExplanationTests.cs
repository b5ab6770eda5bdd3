using Decide.Core.Analysis;
using Decide.Core.Tests.Published;

namespace Decide.Core.Tests.Analysis;

public sealed class ExplanationTests
{
    [Theory]
    [InlineData("A2", "A1")]
    [InlineData("A2", "A3")]
    [InlineData("A1", "A3")]
    public void Advantages_add_up_to_the_difference_in_distances(string a, string b)
    {
        var result = DecisionEngine.Analyze(Chen2000WorkedExample.Build());
        var first = result.Ranking.Single(r => r.Alternative == a);
        var second = result.Ranking.Single(r => r.Alternative == b);

        var terms = Explanation.WhyLeads(result, a, b);
        Assert.Equal(5, terms.Count);
        Assert.Equal(["C1", "C2", "C3", "C4", "C5"], terms.Select(t => t.Criterion).Order());
        Assert.Equal((first.DMinus - second.DMinus) + (second.DPlus - first.DPlus), terms.Sum(t => t.Advantage), 1e-12);
    }

    [Fact]
    public void Advantages_are_listed_largest_in_size_first_and_change_sign_when_swapped()
    {
        var result = DecisionEngine.Analyze(Chen2000WorkedExample.Build());
        var forward = Explanation.WhyLeads(result, "A2", "A1");
        Assert.Equal(forward.OrderByDescending(t => Math.Abs(t.Advantage)).Select(t => t.Criterion), forward.Select(t => t.Criterion));

        var backward = Explanation.WhyLeads(result, "A1", "A2").ToDictionary(t => t.Criterion, t => t.Advantage);
        Assert.All(forward, t => Assert.Equal(-t.Advantage, backward[t.Criterion], 1e-12));

        // A2 is rated (VG, VG, VG) against A1's (G, MG, F) on C2 and (VG, MG, G) against (F, F, F) on C5.
        Assert.True(forward.Single(t => t.Criterion == "C2").Advantage > 0);
        Assert.True(forward.Single(t => t.Criterion == "C5").Advantage > 0);
    }

    [Fact]
    public void An_alternative_that_is_not_ranked_is_refused()
    {
        var result = DecisionEngine.Analyze(Chen2000WorkedExample.Build());
        Assert.Throws<ArgumentException>(() => Explanation.WhyLeads(result, "A9", "A1"));
        Assert.Throws<ArgumentException>(() => Explanation.WhyLeads(result, "A1", "A9"));
    }
}
