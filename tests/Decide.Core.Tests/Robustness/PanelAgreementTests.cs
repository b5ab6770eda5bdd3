using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;
using Decide.Core.Robustness;
using Decide.Core.Scales;
using Decide.Core.Tests.Published;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// Panel agreement on small evaluations built from Chen's (2000) worked example (three decision makers, three
/// candidates, five criteria, the seven-term rating scale VP, P, MP, F, MG, G, VG = steps 0 … 6).
/// </summary>
public sealed class PanelAgreementTests
{
    private static readonly string[] Dms = ["D1", "D2", "D3"];

    [Fact]
    public void A_panel_that_rates_identically_has_W_1_no_spread_and_no_distance()
    {
        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(IdenticalPanel()));

        Assert.Equal(Dms, agreement.Assessors.Select(a => a.Assessor));
        Assert.NotNull(agreement.Concordance);
        Assert.Equal(1, agreement.Concordance.W, 1e-12);
        Assert.Equal(3 * 2, agreement.Concordance.ChiSquare, 1e-9); // χ² = m(n − 1)
        Assert.Equal(2, agreement.Concordance.DegreesOfFreedom);
        Assert.Equal(15, agreement.Cells.Count);
        Assert.All(agreement.Cells, c => Assert.Equal(0, c.Spread));
        Assert.Empty(agreement.ForDiscussion);
        Assert.All(agreement.Assessors, a =>
        {
            Assert.Equal(15, a.CellsRated);
            Assert.Equal(0, a.MeanDistance, 1e-12);
            Assert.Equal(1, a.TauWithPanel!.Value, 1e-12);
        });
    }

    [Fact]
    public void In_an_identical_panel_every_assessor_ranks_as_the_panel_does()
    {
        var evaluation = IdenticalPanel();
        var panel = DecisionEngine.Analyse(evaluation);

        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(evaluation));

        foreach (var assessor in agreement.Assessors)
        {
            Assert.Equal(panel.Ranking.Select(r => r.Alternative), assessor.Ranking);
            foreach (var c in assessor.Closeness)
            {
                var published = panel.Ranking.Single(r => r.Alternative == c.Alternative);
                Assert.Equal(published.Closeness, c.Closeness, 1e-12);
                Assert.Equal(published.Rank, c.Rank);
            }
        }
    }

    [Fact]
    public void One_assessor_three_steps_away_on_one_cell_lists_exactly_that_cell()
    {
        // Everyone rates A1 on C2 "G" (step 5) except D3, who rates it "MP" (step 2): a spread of 3 > 2.
        var evaluation = IdenticalPanel(r => r is { Assessor: "D3", Alternative: "A1", Criterion: "C2" } ? "MP" : null);

        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(evaluation));

        var listed = Assert.Single(agreement.ForDiscussion);
        Assert.Equal(("A1", "C2", 3), (listed.Alternative, listed.Criterion, listed.Spread));
        Assert.Equal([new AssessorTerm("D1", "G"), new AssessorTerm("D2", "G"), new AssessorTerm("D3", "MP")], listed.Terms);
        Assert.Equal(3, agreement.Cells.Single(c => c is { Alternative: "A1", Criterion: "C2" }).Spread);
        Assert.All(agreement.Cells.Where(c => c != listed), c => Assert.Equal(0, c.Spread));
    }

    [Fact]
    public void Mean_distance_is_each_assessors_vertex_distance_from_the_aggregate_over_the_cells_they_rated()
    {
        var evaluation = IdenticalPanel(r => r is { Assessor: "D3", Alternative: "A1", Criterion: "C2" } ? "MP" : null);

        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(evaluation));

        // By hand: the aggregate of G (7, 9, 10), G and MP (1, 3, 5) is (5, 7, 25/3). D3's MP lies
        // √((16 + 16 + 100/9)/3) from it, D1's and D2's G √((4 + 4 + 25/9)/3); every other cell is 0; 15 cells each.
        var mp = Math.Sqrt((16 + 16 + (100.0 / 9)) / 3) / 15;
        var g = Math.Sqrt((4 + 4 + (25.0 / 9)) / 3) / 15;
        var distance = agreement.Assessors.ToDictionary(a => a.Assessor, a => a.MeanDistance);
        Assert.Equal(g, distance["D1"], 1e-12);
        Assert.Equal(g, distance["D2"], 1e-12);
        Assert.Equal(mp, distance["D3"], 1e-12);
    }

    [Fact]
    public void A_spread_of_exactly_the_tolerance_is_not_listed()
    {
        // D3 rates A3 on C1 "MG" (step 4) where the others say "VG" (step 6): a spread of 2, not above 2.
        var evaluation = IdenticalPanel(r => r is { Assessor: "D3", Alternative: "A3", Criterion: "C1" } ? "MG" : null);

        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(evaluation));

        Assert.Equal(2, agreement.Cells.Single(c => c is { Alternative: "A3", Criterion: "C1" }).Spread);
        Assert.Empty(agreement.ForDiscussion);
        Assert.Single(PanelAgreement.Measure(DecisionEngine.Prepare(evaluation), tolerance: 1).ForDiscussion);
    }

    [Fact]
    public void Cells_for_discussion_come_largest_spread_first_then_in_alternative_and_criterion_order()
    {
        var changes = new Dictionary<(string, string, string), string>
        {
            [("D2", "A3", "C1")] = "MG", // VG → MG: 2
            [("D1", "A2", "C5")] = "MG", // VG → MG: 2
            [("D3", "A2", "C3")] = "MG", // VG → MG: 2
            [("D2", "A1", "C2")] = "MP", // G → MP: 3
        };
        var evaluation = IdenticalPanel(r => changes.GetValueOrDefault((r.Assessor, r.Alternative, r.Criterion)));

        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(evaluation), tolerance: 1);

        Assert.Equal(
            [("A1", "C2", 3), ("A2", "C3", 2), ("A2", "C5", 2), ("A3", "C1", 2)],
            agreement.ForDiscussion.Select(c => (c.Alternative, c.Criterion, c.Spread)));
        Assert.Equal(1, agreement.Tolerance);
    }

    [Fact]
    public void A_declined_cell_takes_the_other_assessors_aggregate_in_that_assessors_ranking()
    {
        // D2 declines A2 on C3; D1 rated it VG (9, 10, 10) and D3 G (7, 9, 10), so the aggregate there is (8, 9.5, 10).
        var source = Chen2000WorkedExample.Build();
        var evaluation = source with
        {
            Ratings = source.Ratings.Select(r => r is { Assessor: "D2", Alternative: "A2", Criterion: "C3" }
                ? r with { Term = null, Declined = "recused: former employer" }
                : r).ToArray(),
        };
        var prepared = DecisionEngine.Prepare(evaluation);

        var agreement = PanelAgreement.Measure(prepared);

        // D2's own matrix, built here from the ratings: their TFN everywhere but the declined cell.
        var scale = BuiltInScales.ChenRating7;
        var matrix = new Tfn[3 * 5];
        foreach (var r in evaluation.Ratings.Where(r => r.Assessor == "D2" && r.Term is not null))
        {
            scale.TryFind(r.Term!, out var step);
            matrix[(Index(r.Alternative) * 5) + Index(r.Criterion)] = scale[step].Value;
        }

        matrix[(1 * 5) + 2] = new Tfn(8, 9.5, 10);
        var expected = Closeness(matrix, prepared);

        var d2 = agreement.Assessors.Single(a => a.Assessor == "D2");
        Assert.Equal(14, d2.CellsRated);
        for (var i = 0; i < 3; i++)
        {
            Assert.Equal(expected[i], d2.Closeness[i].Closeness, 1e-12);
        }

        var cell = agreement.Cells.Single(c => c is { Alternative: "A2", Criterion: "C3" });
        Assert.Equal(["D1", "D3"], cell.Terms.Select(t => t.Assessor));
        Assert.Equal(1, cell.Spread);
    }

    [Fact]
    public void An_assessor_assigned_one_criterion_is_ranked_on_the_aggregate_elsewhere_and_one_who_rated_nothing_is_left_out()
    {
        var source = Chen2000WorkedExample.Build();
        var evaluation = source with
        {
            Criteria = [.. source.Criteria, new Criterion("price", "Price", CriterionKind.Numeric, Direction.Cost)],
            Assessors = [.. source.Assessors, new Assessor("D4", "D4", Criteria: ["C1"]), new Assessor("D5", "D5", Criteria: [])],
            Importance = [.. source.Importance, .. Dms.Select(d => new ImportanceRating(d, "price", "H"))],
            Values = [new NumericValue("A1", "price", 90), new NumericValue("A2", "price", 120), new NumericValue("A3", "price", 100)],
            Ratings = [.. source.Ratings, new Rating("D4", "A1", "C1", "VG"), new Rating("D4", "A2", "C1", "VP"), new Rating("D4", "A3", "C1", "F")],
        };
        var prepared = DecisionEngine.Prepare(evaluation);

        var agreement = PanelAgreement.Measure(prepared);

        Assert.Equal(["D1", "D2", "D3", "D4"], agreement.Assessors.Select(a => a.Assessor));
        Assert.Equal(4, agreement.Concordance!.Rankings);
        var d4 = agreement.Assessors.Single(a => a.Assessor == "D4");
        Assert.Equal(3, d4.CellsRated);

        // D4's matrix: the panel's everywhere (the price column stays the measured prices) but their own C1 terms.
        var matrix = prepared.Matrix.ToArray();
        matrix[(0 * 6) + 0] = BuiltInScales.ChenRating7[6].Value; // VG
        matrix[(1 * 6) + 0] = BuiltInScales.ChenRating7[0].Value; // VP
        matrix[(2 * 6) + 0] = BuiltInScales.ChenRating7[3].Value; // F
        Assert.Equal(Tfn.Crisp(120), matrix[(1 * 6) + 5]);
        var expected = Closeness(matrix, prepared);
        for (var i = 0; i < 3; i++)
        {
            Assert.Equal(expected[i], d4.Closeness[i].Closeness, 1e-12);
        }

        // The price column has no assessors' terms, so it has no cells to spread.
        Assert.DoesNotContain(agreement.Cells, c => c.Criterion == "price");
    }

    [Fact]
    public void Concordance_is_left_out_with_a_single_assessor()
    {
        var source = Chen2000WorkedExample.Build();
        var evaluation = source with
        {
            Assessors = source.Assessors.Where(a => a.Id == "D1").ToArray(),
            Importance = source.Importance.Where(r => r.Assessor == "D1").ToArray(),
            Ratings = source.Ratings.Where(r => r.Assessor == "D1").ToArray(),
        };

        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(evaluation));

        Assert.Null(agreement.Concordance);
        Assert.Single(agreement.Assessors);
        Assert.Empty(agreement.Cells); // no cell has two raters
    }

    [Fact]
    public void A_negative_tolerance_is_refused() =>
        Assert.Throws<ArgumentOutOfRangeException>(() =>
            PanelAgreement.Measure(DecisionEngine.Prepare(Chen2000WorkedExample.Build()), tolerance: -1));

    /// <summary>Chen's example with every decision maker giving D1's terms, except where <paramref name="change"/> says otherwise.</summary>
    private static Evaluation IdenticalPanel(Func<Rating, string?>? change = null)
    {
        var source = Chen2000WorkedExample.Build();
        var d1 = source.Ratings.Where(r => r.Assessor == "D1").ToDictionary(r => (r.Alternative, r.Criterion), r => r.Term);
        return source with
        {
            Ratings = source.Ratings
                .Select(r => r with { Term = change?.Invoke(r) ?? d1[(r.Alternative, r.Criterion)] })
                .ToArray(),
        };
    }

    private static int Index(string id) => id[1] - '1'; // A1 → 0, C3 → 2

    private static double[] Closeness(Tfn[] matrix, PreparedEvaluation prepared)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        var closeness = new double[n];
        FuzzyTopsis.Evaluate(matrix, m, prepared.IsCost, prepared.FuzzyWeights, prepared.Source.Options.Ideal,
            new Tfn[n * m], new double[n], new double[n], closeness);
        return closeness;
    }
}
