using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Ranking;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Ranking;

public sealed class RankTests
{
    [Fact]
    public void Ties_share_a_rank_and_the_next_rank_is_skipped()
    {
        int[] ranks = new int[4], order = new int[4];
        FuzzyTopsis.Rank([0.3, 0.6, 0.9, 0.6], ranks, order);
        Assert.Equal([4, 2, 1, 2], ranks);
        Assert.Equal([2, 1, 3, 0], order); // ties keep input order
    }

    [Fact]
    public void Closeness_within_the_tie_tolerance_is_a_tie_and_beyond_it_is_not()
    {
        int[] ranks = new int[3], order = new int[3];
        FuzzyTopsis.Rank([0.5, 0.5 + 1e-14, 0.5 - 1e-9], ranks, order);
        Assert.Equal([1, 1, 3], ranks);
    }

    [Fact]
    public void Alternatives_rated_identically_share_a_rank_in_a_whole_analysis()
    {
        var evaluation = SampleEvaluation.WithImportance() with
        {
            Criteria = [new Criterion("QUALITY", "Quality plan")],
            Alternatives = new[] { "S1", "S2", "S3", "S4" }.Select(id => new Alternative(id, id)).ToArray(),
            Assessors = [new Assessor("D1", "D1")],
            Importance = [new ImportanceRating("D1", "QUALITY", "H")],
            Ratings =
            [
                new Rating("D1", "S1", "QUALITY", "VG"), new Rating("D1", "S2", "QUALITY", "G"),
                new Rating("D1", "S3", "QUALITY", "G"), new Rating("D1", "S4", "QUALITY", "P"),
            ],
            Values = [],
            Gates = [],
        };
        var ranking = DecisionEngine.Analyse(evaluation).Ranking;
        Assert.Equal(["S1", "S2", "S3", "S4"], ranking.Select(r => r.Alternative));
        Assert.Equal([1, 2, 2, 4], ranking.Select(r => r.Rank));
        Assert.Equal(ranking[1].Closeness, ranking[2].Closeness);
    }

    [Fact]
    public void An_alternative_that_fails_a_gate_is_excluded_before_normalisation()
    {
        var evaluation = SampleEvaluation.WithImportance() with
        {
            Gates = [new GateResult("S1", "INSURED", true), new GateResult("S2", "INSURED", false), new GateResult("S3", "INSURED", true)],
        };
        var result = DecisionEngine.Analyse(evaluation);
        Assert.Equal(["S1", "S3"], result.Ranking.Select(r => r.Alternative).Order());
        var excluded = Assert.Single(result.Excluded);
        Assert.Equal("S2", excluded.Alternative);
        Assert.Equal(["INSURED"], excluded.Gates);

        // S2 was the cheapest; without it S1 is the cheapest left and its price normalises to 1.
        var price = result.Matrix.Single(c => c.Alternative == "S1" && c.Criterion == "PRICE");
        var weight = result.Weights.Single(w => w.Criterion == "PRICE").Fuzzy;
        Assert.Equal(weight.Middle, price.Weighted.Middle, 1e-12);
    }
}
