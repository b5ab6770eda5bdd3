using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Rounds;

/// <summary>
/// An invented grant round of four applications and three reviewers, two reviewers per application:
/// R1 reads A1 A2 A3, R2 reads A2 A3 A4, R3 reads A1 A4. Nobody rates, declines or is imputed anything else.
/// </summary>
public sealed class IncompleteDesignTests
{
    private static readonly string[][] Reads = [["A1", "A2", "A3"], ["A2", "A3", "A4"], ["A1", "A4"]];

    private static Evaluation Round()
    {
        var terms = new Dictionary<(string, string), string>
        {
            [("R1", "A1")] = "G", [("R3", "A1")] = "VG",
            [("R1", "A2")] = "F", [("R2", "A2")] = "MG",
            [("R1", "A3")] = "MP", [("R2", "A3")] = "F",
            [("R2", "A4")] = "G", [("R3", "A4")] = "G",
        };
        return new Evaluation
        {
            Title = "Community gardens fund 2027",
            Criteria = [new Criterion("MERIT", "Merit"), new Criterion("REACH", "Reach")],
            Alternatives = Enumerable.Range(1, 4).Select(i => new Alternative($"A{i}", $"Application {i}", Requested: 10_000 * i)).ToArray(),
            Assessors = [new Assessor("R1", "Reviewer one"), new Assessor("R2", "Reviewer two"), new Assessor("R3", "Reviewer three")],
            Importance = new[] { "R1", "R2", "R3" }.SelectMany(r => new[] { new ImportanceRating(r, "MERIT", "H"), new ImportanceRating(r, "REACH", "M") }).ToArray(),
            Ratings = terms.SelectMany(t => new[]
            {
                new Rating(t.Key.Item1, t.Key.Item2, "MERIT", t.Value),
                new Rating(t.Key.Item1, t.Key.Item2, "REACH", "F"),
            }).ToArray(),
            Reviews = new ReviewDesign(2, 3, Reads.Select((apps, i) => new ReviewAssignment($"R{i + 1}", apps)).ToArray()),
        };
    }

    [Fact]
    public void Only_the_assigned_reviewers_are_aggregated_and_nothing_is_declined_or_imputed()
    {
        var result = DecisionEngine.Analyse(Round());
        Assert.All(result.Matrix, cell =>
        {
            Assert.Equal(2, cell.Raters);
            Assert.Empty(cell.Declined);
        });

        // A1 on merit: the mean of R1's G (7, 9, 10) and R3's VG (9, 10, 10) on Chen's 0–10 scale, worked by hand.
        var a1 = result.Matrix.Single(c => c.Alternative == "A1" && c.Criterion == "MERIT").Aggregated;
        Assert.Equal(new Tfn(8, 9.5, 10), a1);
    }

    [Fact]
    public void A_rating_of_an_application_not_assigned_is_refused_by_its_place()
    {
        var e = Round();
        var errors = ErrorAssert.Refused(e with { Ratings = [.. e.Ratings, new Rating("R3", "A2", "MERIT", "G")] });
        ErrorAssert.HasError(errors, "$.ratings.R3.A2.MERIT", "application \"A2\" is not assigned to reviewer \"R3\"");
    }

    [Fact]
    public void A_missing_assigned_cell_is_named()
    {
        var e = Round();
        var errors = ErrorAssert.Refused(e with { Ratings = e.Ratings.Where(r => !(r.Assessor == "R2" && r.Alternative == "A4" && r.Criterion == "REACH")).ToArray() });
        ErrorAssert.HasError(errors, "$.ratings.R2.A4.REACH", "has neither rated alternative \"A4\" on criterion \"REACH\"");
    }

    [Fact]
    public void A_disconnected_design_is_refused_naming_its_parts()
    {
        // R1 and R2 both read A1 A2; R3 and a new R4 both read A3 A4: two parts, nobody reads across.
        var e = Round();
        var design = new ReviewDesign(2, 3, [new("R1", ["A1", "A2"]), new("R2", ["A1", "A2"]), new("R3", ["A3", "A4"]), new("R4", ["A3", "A4"])]);
        var errors = EvaluationValidator.Validate(e with { Assessors = [.. e.Assessors, new Assessor("R4", "Reviewer four")], Reviews = design, Ratings = [] });
        ErrorAssert.HasError(errors, "$.reviews.assigned", "falls into 2 parts that share no reviewer", "{Application 1, Application 2} and {Application 3, Application 4}");
    }

    [Fact]
    public void Too_few_reviewers_on_an_application_and_too_many_applications_on_a_reviewer_are_refused()
    {
        var e = Round();
        var design = new ReviewDesign(2, 2, [new("R1", ["A1", "A2", "A3"]), new("R2", ["A2", "A3", "A4"]), new("R3", ["A4"])]);
        var errors = EvaluationValidator.Validate(e with { Reviews = design, Ratings = [] });
        Assert.Contains(errors, x => x.Path == "$.reviews.assigned.R1" && x.Reason.Contains("is given 3 applications, more than the most one reviewer may read (2)"));
        Assert.Contains(errors, x => x.Path == "$.reviews.assigned" && x.Reason.Contains("1 application has fewer than the 2 reviewers the plan asks for (Application 1 1); 1 more review is needed"));
    }

    [Fact]
    public void Kendalls_W_is_left_out_when_nobody_ranks_every_application_but_alpha_is_measured()
    {
        var run = DecisionRun.Of(Round(), new RobustnessOptions { Draws = 200 });
        var agreement = run.Robustness!.Agreement;
        Assert.Null(agreement.Concordance);
        Assert.Equal(["R1", "R2", "R3"], agreement.OutsideConcordance);
        Assert.NotNull(agreement.Reliability?.Ordinal);
        Assert.Equal(8, agreement.Reliability!.Ordinal!.Units); // four applications × two criteria, each read twice
    }

    [Fact]
    public void Leaving_a_reviewer_out_keeps_the_others_assignments_and_ranks_on_what_remains()
    {
        var run = DecisionRun.Of(Round(), new RobustnessOptions { Draws = 200 });
        var without = run.Robustness!.Sensitivity.LeaveOneOut;
        Assert.All(without, w => Assert.Null(w.Problem));
        Assert.All(without, w => Assert.Equal(4, w.Ranking.Count));
        var effects = run.Round!.Reviewers;
        Assert.Equal([3, 3, 2], effects.Select(x => x.Read));
    }

    [Fact]
    public void Ratings_in_a_complete_design_with_one_bid_recused_leave_that_assessor_out_of_W()
    {
        var e = SampleEvaluation.WithImportance();
        e = e with
        {
            Assessors = [.. e.Assessors, new Assessor("D3", "Third assessor")],
            Ratings =
            [
                .. e.Ratings,
                new Rating("D3", "S1", "QUALITY", "G"), new Rating("D3", "S1", "STAFF", "G"),
                new Rating("D3", "S2", "QUALITY", null, Declined: "recused"), new Rating("D3", "S2", "STAFF", null, Declined: "recused"),
                new Rating("D3", "S3", "QUALITY", "F"), new Rating("D3", "S3", "STAFF", "F"),
            ],
        };
        var agreement = PanelAgreement.Measure(DecisionEngine.Prepare(e));
        Assert.Equal(["D3"], agreement.OutsideConcordance);
        Assert.Equal(2, agreement.Concordance!.Rankings);
    }
}
