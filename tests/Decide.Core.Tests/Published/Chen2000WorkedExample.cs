using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Core.Tests.Published;

/// <summary>
/// The worked example of Chen, C.-T. (2000), "Extensions of the TOPSIS for group decision-making under fuzzy
/// environment", Fuzzy Sets and Systems 114:1–9, §4: a company hiring a system analysis engineer; three decision
/// makers D1–D3 rate three candidates A1–A3 on five benefit criteria with the paper's seven-term scales.
/// Inputs and the published closeness coefficients as recalled in shared METHODS §3 (recalled, not re-read; the
/// paper prints two decimals and rounds intermediate values, hence the ±0.01 tolerance).
/// </summary>
public sealed class Chen2000WorkedExample
{
    public static Evaluation Build(IdealPoints ideal = IdealPoints.Unit)
    {
        string[] dms = ["D1", "D2", "D3"];
        string[] criteria = ["C1", "C2", "C3", "C4", "C5"];
        string[] alternatives = ["A1", "A2", "A3"];
        string[][] importance =
        [
            ["H", "VH", "MH"], ["VH", "VH", "VH"], ["VH", "H", "H"], ["VH", "VH", "VH"], ["M", "MH", "MH"],
        ];

        // ratings[criterion][alternative][decision maker]
        string[][][] ratings =
        [
            [["MG", "G", "MG"], ["G", "G", "MG"], ["VG", "G", "F"]],
            [["G", "MG", "F"], ["VG", "VG", "VG"], ["MG", "G", "VG"]],
            [["F", "G", "G"], ["VG", "VG", "G"], ["G", "MG", "VG"]],
            [["VG", "G", "VG"], ["VG", "VG", "VG"], ["G", "VG", "MG"]],
            [["F", "F", "F"], ["VG", "MG", "G"], ["G", "G", "MG"]],
        ];

        return new Evaluation
        {
            Title = "Chen (2000) system analysis engineer",
            Criteria = criteria.Select(c => new Criterion(c, c)).ToArray(),
            Alternatives = alternatives.Select(a => new Alternative(a, a)).ToArray(),
            Assessors = dms.Select(d => new Assessor(d, d)).ToArray(),
            Importance = [.. from c in Enumerable.Range(0, 5) from d in Enumerable.Range(0, 3)
                select new ImportanceRating(dms[d], criteria[c], importance[c][d])],
            Ratings = [.. from c in Enumerable.Range(0, 5) from a in Enumerable.Range(0, 3) from d in Enumerable.Range(0, 3)
                select new Rating(dms[d], alternatives[a], criteria[c], ratings[c][a][d])],
            Options = new AnalysisOptions(AggregationRule.Mean, ideal),
        };
    }

    [Theory]
    [InlineData("A1", 0.64)] // Chen (2000) Table 7 [recalled]
    [InlineData("A2", 0.77)]
    [InlineData("A3", 0.70)]
    public void Closeness_matches_the_published_values_to_two_decimals(string alternative, double published)
    {
        var result = DecisionEngine.Analyze(Build());
        var cc = result.Ranking.Single(r => r.Alternative == alternative).Closeness;
        Assert.InRange(cc, published - 0.01, published + 0.01);
    }

    [Fact]
    public void Ranking_is_A2_A3_A1_as_published()
    {
        var result = DecisionEngine.Analyze(Build());
        Assert.Equal(["A2", "A3", "A1"], result.Ranking.Select(r => r.Alternative));
        Assert.Equal([1, 2, 3], result.Ranking.Select(r => r.Rank));
    }

    [Theory]
    [InlineData("A1", 0.638)] // unrounded computation of the same inputs [derived, shared METHODS §3]
    [InlineData("A2", 0.765)]
    [InlineData("A3", 0.702)]
    public void Closeness_matches_the_unrounded_computation(string alternative, double expected)
    {
        var result = DecisionEngine.Analyze(Build());
        Assert.Equal(expected, result.Ranking.Single(r => r.Alternative == alternative).Closeness, 3);
    }

    [Fact]
    public void Closeness_is_d_minus_over_the_sum_of_distances()
    {
        foreach (var r in DecisionEngine.Analyze(Build()).Ranking)
        {
            Assert.Equal(r.DMinus / (r.DPlus + r.DMinus), r.Closeness, 1e-12);
            Assert.Equal(r.DPlus, r.Contributions.Sum(c => c.DPlus), 1e-12);
            Assert.Equal(r.DMinus, r.Contributions.Sum(c => c.DMinus), 1e-12);
        }
    }
}
