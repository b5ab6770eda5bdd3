using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Tests.Support;
using Decide.Core.Weighting;

namespace Decide.Core.Tests.Weighting;

/// <summary>A grouped criterion's weight is its group's weight ⊗ its local weight.</summary>
public sealed class GroupWeightsTests
{
    [Fact]
    public void Importance_weighting_divides_a_group_among_its_criteria()
    {
        var evaluation = SampleEvaluation.WithGroupedPairwise() with
        {
            Weighting = WeightingMethod.Importance,
            Pairwise = [],
            Assessors = [new Assessor("D1", "First assessor")],
            Ratings = SampleEvaluation.WithImportance().Ratings.Where(r => r.Assessor == "D1").ToArray(),
            Importance =
            [
                new ImportanceRating("D1", "TECH", "H"), new ImportanceRating("D1", "PRICE", "MH"),
                new ImportanceRating("D1", "QUALITY", "VH"), new ImportanceRating("D1", "STAFF", "M"),
            ],
        };
        var weights = DecisionEngine.Analyse(evaluation).Weights.ToDictionary(w => w.Criterion);

        // Local weights: each member's importance over the sum of the members' centroids, VH and M on Chen's scale.
        Tfn high = new(0.7, 0.9, 1.0), veryHigh = new(0.9, 1.0, 1.0), medium = new(0.3, 0.5, 0.7);
        var total = veryHigh.Centroid + medium.Centroid;
        AssertTfn((1 / total) * veryHigh, weights["QUALITY"].Local!.Value);
        AssertTfn((1 / total) * medium, weights["STAFF"].Local!.Value);
        AssertTfn(high, weights["QUALITY"].GroupWeight!.Value);

        foreach (var id in new[] { "QUALITY", "STAFF" })
        {
            var w = weights[id];
            Assert.Equal("TECH", w.Group);
            AssertTfn(w.GroupWeight!.Value * w.Local!.Value, w.Fuzzy);
        }

        AssertTfn(new Tfn(0.5, 0.7, 0.9), weights["PRICE"].Fuzzy); // top level keeps its importance (MH)
        Assert.Null(weights["PRICE"].Group);
        Assert.Null(weights["PRICE"].Local);
        Assert.Equal(1, weights.Values.Sum(w => w.Crisp), 1e-12);
    }

    [Fact]
    public void Pairwise_weighting_multiplies_the_top_and_group_matrices()
    {
        // TECH over PRICE 3̃ = (2, 3, 4) at the top level, QUALITY over STAFF 2̃ = (1, 2, 3) within TECH.
        var result = DecisionEngine.Analyse(SampleEvaluation.WithGroupedPairwise());
        var weights = result.Weights.ToDictionary(w => w.Criterion);

        var top = new FuzzyPairwiseMatrix(["TECH", "PRICE"]);
        top.Set(0, 1, new Tfn(2, 3, 4));
        var inner = new FuzzyPairwiseMatrix(["QUALITY", "STAFF"]);
        inner.Set(0, 1, new Tfn(1, 2, 3));
        var topWeights = BuckleyWeights.Compute(top);
        var innerWeights = BuckleyWeights.Compute(inner);

        // Buckley's upper weights exceed 1 here (TECH's is 2/(√2 + ½) ≈ 1.045, QUALITY's local one √3/(1 + 1/√3) ≈ 1.098),
        // so every global weight is divided by the largest upper value, β = QUALITY's, as fuzzy TOPSIS's unit ideal
        // points need (Chen 2000, §3 after eq. 16); the crisp shares are those of the undivided weights.
        Tfn quality = topWeights[0] * innerWeights[0], staff = topWeights[0] * innerWeights[1], price = topWeights[1];
        var beta = quality.Upper;
        Assert.True(beta > 1.1, $"β = {beta}");
        AssertTfn((1 / beta) * quality, weights["QUALITY"].Fuzzy);
        AssertTfn((1 / beta) * staff, weights["STAFF"].Fuzzy);
        AssertTfn((1 / beta) * price, weights["PRICE"].Fuzzy);
        Assert.Equal(1, weights.Values.Max(w => w.Fuzzy.Upper), 1e-12);
        AssertTfn(topWeights[0], weights["STAFF"].GroupWeight!.Value);
        AssertTfn(innerWeights[1], weights["STAFF"].Local!.Value);

        // Middles before the division: TECH ¾ · (QUALITY ⅔, STAFF ⅓), PRICE ¼.
        Assert.Equal(0.5 / beta, weights["QUALITY"].Fuzzy.Middle, 1e-12);
        Assert.Equal(0.25 / beta, weights["STAFF"].Fuzzy.Middle, 1e-12);
        Assert.Equal(0.25 / beta, weights["PRICE"].Fuzzy.Middle, 1e-12);
        var centroids = quality.Centroid + staff.Centroid + price.Centroid;
        Assert.Equal(quality.Centroid / centroids, weights["QUALITY"].Crisp, 1e-12);
        Assert.Equal(price.Centroid / centroids, weights["PRICE"].Crisp, 1e-12);
        Assert.Equal(1, weights.Values.Sum(w => w.Crisp), 1e-12);

        // One report per matrix for D1 and one for the panel, the group's matrix named by its group.
        Assert.Equal(4, result.Consistency.Count);
        Assert.Contains(result.Consistency, c => c.Assessor == WeightStructure.PanelId && c.Group == "TECH");
        Assert.Contains(result.Consistency, c => c.Assessor == "D1" && c.Group is null && c.Items.SequenceEqual(["TECH", "PRICE"]));
    }

    [Fact]
    public void A_group_of_one_criterion_passes_the_group_weight_on_whole()
    {
        var evaluation = SampleEvaluation.WithGroupedPairwise() with
        {
            Criteria =
            [
                new Criterion("QUALITY", "Quality plan", Group: "TECH"),
                new Criterion("STAFF", "Staff experience"),
                new Criterion("PRICE", "Annual price", CriterionKind.Numeric, Direction.Cost),
                new Criterion("INSURED", "Liability insurance", CriterionKind.Gate),
            ],
            Pairwise =
            [
                SampleEvaluation.Judgement("D1", "TECH", "PRICE", "3"), SampleEvaluation.Judgement("D1", "TECH", "STAFF", "2"),
                SampleEvaluation.Judgement("D1", "STAFF", "PRICE", "2"),
            ],
        };
        var weights = DecisionEngine.Analyse(evaluation).Weights.ToDictionary(w => w.Criterion);
        Assert.Equal(Tfn.One, weights["QUALITY"].Local);
        Assert.Equal(weights["QUALITY"].GroupWeight, weights["QUALITY"].Fuzzy);
    }

    private static void AssertTfn(Tfn expected, Tfn actual)
    {
        Assert.Equal(expected.Lower, actual.Lower, 1e-12);
        Assert.Equal(expected.Middle, actual.Middle, 1e-12);
        Assert.Equal(expected.Upper, actual.Upper, 1e-12);
    }
}
