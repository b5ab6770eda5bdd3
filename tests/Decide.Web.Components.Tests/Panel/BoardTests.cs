using Decide.Core.Model;
using Decide.Data.Entities;
using Decide.Web.Components.Pages.Panel;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Moderation;

namespace Decide.Web.Components.Tests.Panel;

public sealed class BoardTests : MudComponentTest
{
    private static readonly DateTimeOffset Signed = new(2026, 11, 13, 9, 0, 0, TimeSpan.Zero);

    [Fact]
    public void Only_the_assessor_whose_consistency_ratio_is_above_its_limit_is_flagged()
    {
        var board = Board(EvaluationStage.Scoring,
            Assessor("ravelle", submitted: true, matrices: [new MatrixProgress(null, 6, 6, 0.071, 0.10, false)]),
            Assessor("fenwright", submitted: true, matrices: [new MatrixProgress(null, 6, 6, 0.142, 0.10, true)], inconsistent: true));

        var cut = Render<ScoringBoardTable>(p => p.Add(x => x.Board, board));

        Assert.Empty(cut.FindAll("tr[data-assessor=ravelle] [data-testid=cr-flag]"));
        Assert.Single(cut.FindAll("tr[data-assessor=fenwright] [data-testid=cr-flag]"));
        Assert.Contains("CR 0.142 (limit 0.10)", cut.Find("tr[data-assessor=fenwright] td[data-column=consistency]").TextContent);
        Assert.Contains("CR 0.071 (limit 0.10)", cut.Find("tr[data-assessor=ravelle] td[data-column=consistency]").TextContent);
    }

    [Fact]
    public void An_incomplete_matrix_says_how_many_pairs_are_left_and_importance_weighting_shows_no_ratio()
    {
        var pairwise = BoardRow.ConsistencyText([new MatrixProgress(null, 2, 3, null, null, false), new MatrixProgress("quality", 6, 6, 0.05, 0.09, false)]);
        Assert.Equal("CR 0.050 (limit 0.09) within quality; 1 of 9 pairs still to judge", pairwise);
        Assert.Equal("—", BoardRow.ConsistencyText(null));
    }

    [Fact]
    public void The_ratings_column_shows_done_of_total_and_only_submitted_sheets_can_be_reopened()
    {
        var board = Board(EvaluationStage.Scoring, Assessor("ravelle", submitted: true, done: 30, total: 30), Assessor("kilbane", submitted: false, done: 12, total: 30));
        string? asked = null;

        var cut = Render<ScoringBoardTable>(p => p.Add(x => x.Board, board).Add(x => x.CanReopen, true).Add(x => x.OnReopen, (string code) => asked = code));

        Assert.Equal("12 of 30", cut.Find("tr[data-assessor=kilbane] td[data-column=ratings] .decide-num").TextContent.Trim());
        Assert.Equal("open", cut.Find("tr[data-assessor=kilbane] [data-testid=sheet-state]").TextContent.Trim());
        Assert.Empty(cut.FindAll("tr[data-assessor=kilbane] button"));
        cut.Find("tr[data-assessor=ravelle] button").Click();
        Assert.Equal("ravelle", asked);
    }

    [Fact]
    public void A_submitted_sheet_cannot_be_reopened_once_signed_off_and_nobody_without_the_right_sees_the_buttons()
    {
        var signedOff = Render<ScoringBoardTable>(p => p.Add(x => x.Board, Board(EvaluationStage.SignedOff, Assessor("ravelle", submitted: true))).Add(x => x.CanReopen, true));
        Assert.Empty(signedOff.FindAll("tr[data-assessor=ravelle] button"));

        var observer = Render<ScoringBoardTable>(p => p.Add(x => x.Board, Board(EvaluationStage.Scoring, Assessor("ravelle", submitted: true))).Add(x => x.CanReopen, false));
        Assert.Empty(observer.FindAll("button"));
    }

    [Fact]
    public void Starting_moderation_is_held_back_while_a_sheet_is_open_and_the_open_sheets_are_named()
    {
        var board = Board(EvaluationStage.Scoring, Assessor("ravelle", submitted: true), Assessor("kilbane", submitted: false, done: 29, total: 30));
        var confirmed = false;

        var cut = Render<StartModerationPanel>(p => p.Add(x => x.Board, board).Add(x => x.OnConfirm, () => confirmed = true));

        Assert.Contains("kilbane", cut.Find("[data-testid=unsubmitted]").TextContent);
        Assert.DoesNotContain("ravelle", cut.Find("[data-testid=unsubmitted]").TextContent);
        var confirm = cut.FindAll("button").Single(b => b.TextContent.Contains("start moderation", StringComparison.Ordinal));
        Assert.True(confirm.HasAttribute("disabled"));
        confirm.Click();
        Assert.False(confirmed);
    }

    [Fact]
    public void With_every_sheet_in_the_confirmation_says_what_it_locks_lists_warnings_and_starts_on_confirm()
    {
        var board = Board(EvaluationStage.Scoring,
            Assessor("ravelle", submitted: true, matrices: [new MatrixProgress(null, 6, 6, 0.16, 0.10, true)], inconsistent: true),
            Assessor("fenwright", submitted: true)) with
        {
            PriceEvaluators = [new PriceEvaluatorProgress("kilbane", "K", 8, 10)],
        };
        var confirmed = false;

        var cut = Render<StartModerationPanel>(p => p.Add(x => x.Board, board).Add(x => x.OnConfirm, () => confirmed = true));

        Assert.Contains("sheet locks", cut.Markup, StringComparison.Ordinal);
        Assert.Contains("results become visible to the panel", cut.Markup, StringComparison.Ordinal);
        Assert.Empty(cut.FindAll("[data-testid=unsubmitted]"));
        var warnings = cut.FindAll("[data-testid=warnings] li").Select(li => li.TextContent).ToArray();
        Assert.Equal(2, warnings.Length);
        Assert.Contains(warnings, w => w.StartsWith("ravelle's pairwise comparisons", StringComparison.Ordinal));
        Assert.Contains(warnings, w => w.StartsWith("2 of 10 numeric values", StringComparison.Ordinal));
        cut.FindAll("button").Single(b => b.TextContent.Contains("start moderation", StringComparison.Ordinal)).Click();
        Assert.True(confirmed);
    }

    [Fact]
    public void Reopening_a_sheet_needs_a_reason_of_the_minimum_length_before_it_is_asked_for()
    {
        string? reason = null;
        var cut = Render<ReopenSheetPanel>(p => p.Add(x => x.AssessorCode, "ravelle").Add(x => x.OnConfirm, (string r) => reason = r));

        cut.Find("textarea").Input("too short");
        cut.FindAll("button").Single(b => b.TextContent.Contains("Reopen the sheet", StringComparison.Ordinal)).Click();
        Assert.Null(reason);
        Assert.Contains($"at least {ModerationService.MinReasonLength} characters", cut.Markup, StringComparison.Ordinal);

        cut.Find("textarea").Input("  Rated the wrong bid on integration.  ");
        cut.FindAll("button").Single(b => b.TextContent.Contains("Reopen the sheet", StringComparison.Ordinal)).Click();
        Assert.Equal("Rated the wrong bid on integration.", reason);
    }

    private static ScoringBoard Board(EvaluationStage stage, params AssessorProgress[] assessors) =>
        new(Guid.NewGuid(), stage, WeightingMethod.Pairwise, 5, assessors, []);

    private static AssessorProgress Assessor(
        string code, bool submitted, int done = 30, int total = 30, IReadOnlyList<MatrixProgress>? matrices = null, bool inconsistent = false) =>
        new(code, $"Name of {code}", Signed, "2026-1", Signed.AddDays(7), Signed, matrices, inconsistent, done, total, submitted ? Signed.AddDays(14) : null);
}
