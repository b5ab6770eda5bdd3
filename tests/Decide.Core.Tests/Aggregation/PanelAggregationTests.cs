using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Aggregation;

/// <summary>Aggregation of the panel's ratings inside a whole analysis.</summary>
public sealed class PanelAggregationTests
{
    [Fact]
    public void A_declined_cell_is_the_weighted_mean_of_those_who_rated_it()
    {
        // D1 (weight 1) rates G, D2 (weight 2) declines, D3 (weight 3) rates F: shares ¼ and ¾ of those present.
        var evaluation = ThreeAssessors() with
        {
            Ratings = [.. ThreeAssessors().Ratings.Where(r => !(r.Assessor == "D2" && r.Alternative == "S1" && r.Criterion == "QUALITY")),
                new Rating("D2", "S1", "QUALITY", null, Declined: "recused: former employee of S1")],
        };
        var cell = DecisionEngine.Analyse(evaluation).Matrix.Single(c => c.Alternative == "S1" && c.Criterion == "QUALITY");

        var good = new Tfn(7, 9, 10);
        var fair = new Tfn(3, 5, 7);
        Assert.Equal((0.25 * good.Lower) + (0.75 * fair.Lower), cell.Aggregated.Lower, 1e-12);
        Assert.Equal((0.25 * good.Middle) + (0.75 * fair.Middle), cell.Aggregated.Middle, 1e-12);
        Assert.Equal((0.25 * good.Upper) + (0.75 * fair.Upper), cell.Aggregated.Upper, 1e-12);
        Assert.Equal(2, cell.Raters);
        Assert.Equal([new DeclinedCell("D2", "recused: former employee of S1")], cell.Declined);
    }

    [Fact]
    public void A_cell_all_rated_alike_keeps_that_term()
    {
        var cell = DecisionEngine.Analyse(ThreeAssessors()).Matrix.Single(c => c.Alternative == "S2" && c.Criterion == "STAFF");
        Assert.Equal(new Tfn(5, 7, 9), cell.Aggregated); // MG from all three
        Assert.Equal(3, cell.Raters);
    }

    [Fact]
    public void A_numeric_cell_is_its_crisp_value()
    {
        var cell = DecisionEngine.Analyse(ThreeAssessors()).Matrix.Single(c => c.Alternative == "S2" && c.Criterion == "PRICE");
        Assert.Equal(Tfn.Crisp(38_500), cell.Aggregated);
        Assert.Equal(0, cell.Raters);
    }

    private static Evaluation ThreeAssessors()
    {
        var baseline = SampleEvaluation.WithImportance();
        string[] criteria = ["QUALITY", "STAFF"];
        string[] alternatives = ["S1", "S2", "S3"];
        (string Id, double Weight, string[] Terms)[] panel =
        [
            ("D1", 1, ["G", "MG", "F", "VG", "MG", "P"]),
            ("D2", 2, ["VG", "MG", "G", "G", "MG", "MP"]),
            ("D3", 3, ["F", "MG", "MG", "F", "MG", "F"]),
        ];
        return baseline with
        {
            Assessors = panel.Select(p => new Assessor(p.Id, p.Id, p.Weight)).ToArray(),
            Importance = [.. from p in panel from c in new[] { "QUALITY", "STAFF", "PRICE" } select new ImportanceRating(p.Id, c, "H")],
            Ratings = [.. from p in panel
                from a in Enumerable.Range(0, 3)
                from c in Enumerable.Range(0, 2)
                select new Rating(p.Id, alternatives[a], criteria[c], p.Terms[(c * 3) + a])],
        };
    }
}
