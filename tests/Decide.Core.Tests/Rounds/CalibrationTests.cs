using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Rounds;

namespace Decide.Core.Tests.Rounds;

/// <summary>Reviewer calibration: shown beside the raw ranking, computed as docs/methods.md §11 states.</summary>
public sealed class CalibrationTests
{
    private static Evaluation Round(params (string Reviewer, string Application, string Term)[] ratings)
    {
        var apps = ratings.Select(r => r.Application).Distinct().Order(StringComparer.Ordinal).ToArray();
        var reviewers = ratings.Select(r => r.Reviewer).Distinct().Order(StringComparer.Ordinal).ToArray();
        return new Evaluation
        {
            Title = "Calibration",
            Criteria = [new Criterion("Q", "Quality"), new Criterion("R", "Reach")],
            Alternatives = apps.Select(a => new Alternative(a, a)).ToArray(),
            Assessors = reviewers.Select(r => new Assessor(r, r)).ToArray(),
            Importance = reviewers.SelectMany(r => new[] { new ImportanceRating(r, "Q", "H"), new ImportanceRating(r, "R", "H") }).ToArray(),
            Ratings = ratings.SelectMany(r => new[] { new Rating(r.Reviewer, r.Application, "Q", r.Term), new Rating(r.Reviewer, r.Application, "R", r.Term) }).ToArray(),
            Reviews = new ReviewDesign(1, 5, reviewers.Select(x => new ReviewAssignment(x, ratings.Where(r => r.Reviewer == x).Select(r => r.Application).ToArray())).ToArray(),
                ReviewerCalibration.Standardise),
        };
    }

    [Fact]
    public void Each_reviewers_mean_and_spread_and_the_panels_are_worked_by_hand()
    {
        // R1 (lenient) gives A1 VG (position 6) and A2 G (5): mean 5.5, spread 0.5. R2 (strict) gives A2 F (3) and
        // A3 MP (2): mean 2.5, spread 0.5. Panel, over the eight cells: mean 4, spread √2.5.
        var e = Round(("R1", "A1", "VG"), ("R1", "A2", "G"), ("R2", "A2", "F"), ("R2", "A3", "MP"));
        var run = DecisionRun.Of(e);
        var calibrated = run.Round!.Calibrated!;
        Assert.Equal(new ReviewerHabit("R1", 4, 5.5, 0.5), calibrated.Reviewers[0]);
        Assert.Equal(new ReviewerHabit("R2", 4, 2.5, 0.5), calibrated.Reviewers[1]);
        Assert.Equal(4, calibrated.PanelMean, 12);
        Assert.Equal(Math.Sqrt(2.5), calibrated.PanelSpread, 12);
        Assert.Equal(["A1", "A2", "A3"], calibrated.Order);
        Assert.Equal(["A1", "A2", "A3"], run.Analysis.Ranking.Select(r => r.Alternative));
    }

    [Fact]
    public void When_every_reviewer_marks_like_the_panel_calibration_changes_nothing()
    {
        // Both reviewers use F and G once each on every criterion: the same mean and spread as the panel.
        var e = Round(("R1", "A1", "G"), ("R1", "A2", "F"), ("R2", "A2", "G"), ("R2", "A3", "F"));
        var run = DecisionRun.Of(e);
        var calibrated = run.Round!.Calibrated!;
        foreach (var (id, i) in calibrated.Order.Select((id, i) => (id, i)))
        {
            Assert.Equal(run.Analysis.Ranking.Single(r => r.Alternative == id).Closeness, calibrated.Closeness[i], 9);
        }

        Assert.Equal(1.0, calibrated.KendallTau!.Value, 12);
    }

    [Fact]
    public void A_strict_markers_application_is_lifted_and_the_raw_ranking_stays_the_result()
    {
        // R1 marks strictly (P, MP) and R2 leniently (G, VG); each application is read by one of them except A2.
        // Raw: A4 (R2's VG) leads and A1 (R1's P) is last. A1 and A4 are each their reader's best, A3 and A2 the
        // reader's worst: calibration puts each reviewer's best level with the other's best.
        var e = Round(("R1", "A1", "MP"), ("R1", "A2", "P"), ("R2", "A2", "G"), ("R2", "A4", "VG"));
        var run = DecisionRun.Of(e);
        var calibrated = run.Round!.Calibrated!;
        Assert.Equal("A4", run.Analysis.Ranking[0].Alternative);
        var raw = run.Analysis.Ranking.Select(r => r.Alternative).ToList();
        Assert.True(calibrated.Order.ToList().IndexOf("A1") < raw.IndexOf("A1"), $"raw {string.Join(",", raw)}, calibrated {string.Join(",", calibrated.Order)}");
        Assert.Equal(run.Analysis.Ranking.Select(r => r.Alternative), run.Round.Order); // the round follows the raw ranking
    }

    [Fact]
    public void Off_by_default()
    {
        var e = Round(("R1", "A1", "G"), ("R1", "A2", "F"), ("R2", "A2", "G"), ("R2", "A3", "F"));
        var plain = e with { Reviews = e.Reviews! with { Calibration = ReviewerCalibration.None } };
        Assert.Null(DecisionRun.Of(plain).Round!.Calibrated);
    }
}
