using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Tests.Published;

namespace Decide.Core.Tests.Robustness;

public sealed class BidSetAndPanelTests
{
    [Fact]
    public void Removing_each_alternative_ranks_the_rest_and_reports_no_reversal_when_none_happens()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.Uniform(
            [["VG", "VG"], ["G", "G"], ["F", "F"], ["P", "P"]], ["H", "H"]));
        var results = WithoutAlternative.Run(prepared);
        Assert.Equal(4, results.Count);
        Assert.All(results, r => Assert.Empty(r.Reversals));
        Assert.Equal(["A1", "A3", "A4"], results[1].Ranking);
    }

    [Fact]
    public void Removing_the_cheapest_bid_can_reverse_two_others_through_price_normalisation()
    {
        // Price is a cost criterion normalised by the lowest bid: removing the very cheap A3 changes the scale
        // against which A1 and A2 are compared, and A2 overtakes A1 [derived: hand-checked with Chen's formulas].
        var evaluation = new Evaluation
        {
            Title = "rank reversal",
            Criteria = [new Criterion("Q", "Quality"), new Criterion("P", "Price", CriterionKind.Numeric, Direction.Cost)],
            Alternatives = [new Alternative("A1", "One"), new Alternative("A2", "Two"), new Alternative("A3", "Three")],
            Assessors = [new Assessor("E1", "Assessor")],
            Importance = [new ImportanceRating("E1", "Q", "VH"), new ImportanceRating("E1", "P", "VH")],
            Ratings = [new Rating("E1", "A1", "Q", "VG"), new Rating("E1", "A2", "Q", "MG"), new Rating("E1", "A3", "Q", "VP")],
            Values = [new NumericValue("A1", "P", 200), new NumericValue("A2", "P", 130), new NumericValue("A3", "P", 10)],
        };
        var prepared = DecisionEngine.Prepare(evaluation);
        var full = prepared.Analyse().Ranking.Select(r => r.Alternative).ToArray();
        var withoutA3 = WithoutAlternative.Run(prepared).Single(r => r.Alternative == "A3");
        var before = Array.IndexOf(full, "A1") < Array.IndexOf(full, "A2");
        var after = withoutA3.Ranking.ToList().IndexOf("A1") < withoutA3.Ranking.ToList().IndexOf("A2");
        Assert.NotEqual(before, after);
        Assert.Single(withoutA3.Reversals);
    }

    [Fact]
    public void Leaving_out_an_assessor_re_derives_weights_and_flags_a_changed_winner()
    {
        // E1 prefers A2, E2 strongly prefers A1, E3 is indifferent: the panel picks A1, but without E2 it picks A2.
        var evaluation = new Evaluation
        {
            Title = "leave one out",
            Criteria = [new Criterion("C1", "One"), new Criterion("C2", "Two")],
            Alternatives = [new Alternative("A1", "One"), new Alternative("A2", "Two")],
            Assessors = [new Assessor("E1", "E1"), new Assessor("E2", "E2"), new Assessor("E3", "E3")],
            Importance = [.. from e in new[] { "E1", "E2", "E3" } from c in new[] { "C1", "C2" } select new ImportanceRating(e, c, "H")],
            Ratings =
            [
                new Rating("E1", "A1", "C1", "F"), new Rating("E1", "A1", "C2", "F"),
                new Rating("E1", "A2", "C1", "VG"), new Rating("E1", "A2", "C2", "VG"),
                new Rating("E2", "A1", "C1", "VG"), new Rating("E2", "A1", "C2", "VG"),
                new Rating("E2", "A2", "C1", "P"), new Rating("E2", "A2", "C2", "P"),
                new Rating("E3", "A1", "C1", "G"), new Rating("E3", "A1", "C2", "G"),
                new Rating("E3", "A2", "C1", "G"), new Rating("E3", "A2", "C2", "G"),
            ],
        };
        var prepared = DecisionEngine.Prepare(evaluation);
        var baseResult = prepared.Analyse();
        Assert.Equal("A1", baseResult.Ranking[0].Alternative);
        var loo = LeaveOneOut.Run(prepared, baseResult);
        Assert.Equal(["E1", "E2", "E3"], loo.Select(l => l.Assessor));
        Assert.False(loo[0].WinnerChanged);
        Assert.True(loo[1].WinnerChanged);
        Assert.Equal("A2", loo[1].Winner);
    }

    [Fact]
    public void Leaving_out_the_only_rater_of_a_cell_says_why_no_ranking_exists()
    {
        var evaluation = new Evaluation
        {
            Title = "sole rater",
            Criteria = [new Criterion("C1", "One")],
            Alternatives = [new Alternative("A1", "One"), new Alternative("A2", "Two")],
            Assessors = [new Assessor("E1", "E1"), new Assessor("E2", "E2")],
            Importance = [new ImportanceRating("E1", "C1", "H"), new ImportanceRating("E2", "C1", "H")],
            Ratings =
            [
                new Rating("E1", "A1", "C1", "G"), new Rating("E1", "A2", "C1", "F"),
                new Rating("E2", "A1", "C1", null, Declined: "recused"), new Rating("E2", "A2", "C1", "F"),
            ],
        };
        var prepared = DecisionEngine.Prepare(evaluation);
        var loo = LeaveOneOut.Run(prepared, prepared.Analyse());
        Assert.Null(loo[0].Winner);
        Assert.Contains("nobody rated", loo[0].Problem);
    }

    [Fact]
    public void Leaving_out_an_assessor_who_agreed_a_moderated_value_keeps_the_panels_value_and_ranks()
    {
        var evaluation = Chen2000WorkedExample.Build() with
        {
            Moderated = [new ModeratedRating("A1", "C5", "G", "the panel agreed the references show steady self-confidence", ["D1", "D2"])],
        };
        var prepared = DecisionEngine.Prepare(evaluation);

        var loo = LeaveOneOut.Run(prepared, prepared.Analyse());

        Assert.All(loo, l => Assert.Null(l.Problem));
        Assert.All(loo, l => Assert.Equal(3, l.Ranking.Count));
        var kept = Assert.Single(LeaveOneOut.Without(evaluation, "D1").Moderated);
        Assert.Equal("G", kept.Term);
        Assert.Equal(["D2"], kept.AgreedBy!);
    }
}
