using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Tests.Published;
using Decide.Core.Tests.Robustness;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Analysis;

[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class ExplanationTests
{
    [Theory]
    [InlineData("A2", "A1")]
    [InlineData("A2", "A3")]
    [InlineData("A1", "A3")]
    public void Advantages_add_up_to_the_difference_in_closeness(string a, string b)
    {
        var result = DecisionEngine.Analyse(Chen2000WorkedExample.Build());
        var first = result.Ranking.Single(r => r.Alternative == a);
        var second = result.Ranking.Single(r => r.Alternative == b);

        var terms = Explanation.WhyLeads(result, a, b);
        Assert.Equal(5, terms.Count);
        Assert.Equal(["C1", "C2", "C3", "C4", "C5"], terms.Select(t => t.Criterion).Order());
        Assert.Equal(first.Closeness - second.Closeness, terms.Sum(t => t.Advantage), 1e-12);
    }

    [Fact]
    public void A_small_case_computed_by_hand()
    {
        // Two bids, two criteria of weight (1, 1, 1), one assessor, Chen's rating scale, unit ideal points:
        // A1 = VG (9,10,10) and F (3,5,7); A2 = G (7,9,10) on both. Each column's largest upper value is 10, so the
        // weighted cells are the terms divided by 10. Vertex distances (Chen 2000, eq. 12) [derived]:
        //   A1·C1 (0.9,1,1):     d⁺ = √(0.01/3) = 0.0577350,  d⁻ = √(2.81/3) = 0.9678154
        //   A1·C2 (0.3,0.5,0.7): d⁺ = d⁻ = √(0.83/3) = 0.5259911
        //   A2 (0.7,0.9,1) twice: d⁺ = √(0.10/3) = 0.1825742, d⁻ = √(2.30/3) = 0.8755950
        // D⁺₁ = 0.5837262, D⁻₁ = 1.4938065, S₁ = 2.0775327, CC₁ = 0.7190291;
        // D⁺₂ = 0.3651484, D⁻₂ = 1.7511901, S₂ = 2.1163384, CC₂ = 0.8274622; CC₂ − CC₁ = 0.1084331.
        // Terms for A2 against A1, [Δ⁻ⱼ(D⁺₂ + D⁺₁) − Δ⁺ⱼ(D⁻₂ + D⁻₁)] / (2S₂S₁) with 2S₂S₁ = 8.7935246:
        //   C1: Δ⁻ = −0.0922204, Δ⁺ = 0.1248392 → (−0.0922204·0.9488745 − 0.1248392·3.2449966)/8.7935246 = −0.0560194
        //   C2: Δ⁻ = 0.3496039,  Δ⁺ = −0.3434169 → (0.3496039·0.9488745 + 0.3434169·3.2449966)/8.7935246 = 0.1644525
        var evaluation = RobustnessFixtures.Uniform([["VG", "F"], ["G", "G"]], ["10", "10"], assessors: 1,
            importanceScale: RobustnessFixtures.CrispImportance);
        var result = DecisionEngine.Analyse(evaluation);
        Assert.Equal(0.8274622 - 0.7190291, result.Ranking[0].Closeness - result.Ranking[1].Closeness, 6);

        var terms = Explanation.WhyLeads(result, "A2", "A1").ToDictionary(t => t.Criterion, t => t.Advantage);
        Assert.Equal(-0.0560194, terms["C1"], 6);
        Assert.Equal(0.1644525, terms["C2"], 6);
    }

    [Fact]
    public void Advantages_are_listed_largest_in_size_first()
    {
        var result = DecisionEngine.Analyse(Chen2000WorkedExample.Build());
        var forward = Explanation.WhyLeads(result, "A2", "A1");
        Assert.Equal(forward.OrderByDescending(t => Math.Abs(t.Advantage)).Select(t => t.Criterion), forward.Select(t => t.Criterion));

        // A2 is rated (VG, VG, VG) against A1's (G, MG, F) on C2 and (VG, MG, G) against (F, F, F) on C5.
        Assert.True(forward.Single(t => t.Criterion == "C2").Advantage > 0);
        Assert.True(forward.Single(t => t.Criterion == "C5").Advantage > 0);
    }

    [Property(MaxTest = 300)]
    public void On_any_panel_the_terms_add_up_to_the_closeness_difference_and_change_sign_when_swapped(GeneratedEvaluation generated)
    {
        var result = DecisionEngine.Analyse(generated.Evaluation);
        var m = result.Weights.Count;
        foreach (var a in result.Ranking)
        {
            foreach (var b in result.Ranking.Where(r => r.Alternative != a.Alternative))
            {
                var forward = Explanation.WhyLeads(result, a.Alternative, b.Alternative);
                Assert.Equal(m, forward.Count);
                Assert.Equal(a.Closeness - b.Closeness, forward.Sum(t => t.Advantage), 1e-12);

                var backward = Explanation.WhyLeads(result, b.Alternative, a.Alternative).ToDictionary(t => t.Criterion, t => t.Advantage);
                Assert.All(forward, t => Assert.Equal(-t.Advantage, backward[t.Criterion], 1e-15));
            }
        }
    }

    [Property(MaxTest = 300)]
    public void A_criterion_on_which_two_bids_are_rated_alike_by_everyone_contributes_nothing(GeneratedEvaluation generated, int pick)
    {
        // Copy the first bid's ratings (and numeric value) on one criterion to the second bid.
        var e = generated.Evaluation;
        var criterion = e.Criteria[(int)((uint)pick % (uint)e.Criteria.Count)].Id;
        string a = e.Alternatives[0].Id, b = e.Alternatives[1].Id;
        var alike = e with
        {
            Ratings = [.. e.Ratings.Where(r => !(r.Alternative == b && r.Criterion == criterion)),
                .. e.Ratings.Where(r => r.Alternative == a && r.Criterion == criterion).Select(r => r with { Alternative = b })],
            Values = [.. e.Values.Where(v => !(v.Alternative == b && v.Criterion == criterion)),
                .. e.Values.Where(v => v.Alternative == a && v.Criterion == criterion).Select(v => v with { Alternative = b })],
        };

        var result = DecisionEngine.Analyse(alike);
        var terms = Explanation.WhyLeads(result, a, b);
        Assert.Equal(0.0, terms.Single(t => t.Criterion == criterion).Advantage);
        Assert.Equal(0.0, Explanation.WhyLeads(result, b, a).Single(t => t.Criterion == criterion).Advantage);
    }

    [Fact]
    public void Identical_crisp_bids_under_extreme_ideal_points_have_nothing_to_explain()
    {
        // Every cell the same crisp value: the extreme ideal points coincide, d⁺ = d⁻ = 0, every closeness is 0.5.
        var evaluation = RobustnessFixtures.Uniform([["5", "5"], ["5", "5"]], ["6", "4"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance, ideal: IdealPoints.Extreme);
        var result = DecisionEngine.Analyse(evaluation);
        Assert.All(result.Ranking, r => Assert.Equal(0.5, r.Closeness));
        Assert.All(Explanation.WhyLeads(result, "A1", "A2"), t => Assert.Equal(0.0, t.Advantage));
    }

    [Fact]
    public void An_alternative_that_is_not_ranked_is_refused()
    {
        var result = DecisionEngine.Analyse(Chen2000WorkedExample.Build());
        Assert.Throws<ArgumentException>(() => Explanation.WhyLeads(result, "A9", "A1"));
        Assert.Throws<ArgumentException>(() => Explanation.WhyLeads(result, "A1", "A9"));
    }
}
