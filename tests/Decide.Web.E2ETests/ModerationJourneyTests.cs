using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// The facilitator's panel work on the seeded demo (stage Moderation, every sheet submitted): the scoring board,
/// the values and gates (read-only now), and moderation of a flagged cell that then stands in the record.
/// </summary>
public sealed class ModerationJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "KVTA-2026-017";

    [Fact]
    public async Task The_facilitator_reads_the_board_moderates_the_first_flagged_cell_and_finds_it_in_the_record()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        await page.GotoAsync("/signin");
        await new SignInPage(page).SignInAsync(DecideServer.Facilitator, DecideServer.Password);
        var list = new EvaluationsPage(page);
        await Assertions.Expect(list.Title).ToBeVisibleAsync();
        await list.OpenAsync(Reference);
        var overview = new OverviewPage(page);
        await Assertions.Expect(overview.Title).ToBeVisibleAsync();
        await overview.OpenTabAsync("Scoring board");

        // The board: every sheet is in (the demo is in moderation), so each line says submitted and can be reopened;
        // the demo weighs by importance, so no consistency ratio applies and none is flagged.
        var board = new BoardPage(page);
        await Assertions.Expect(board.Title).ToBeVisibleAsync();
        await board.WaitUntilInteractiveAsync();
        await Assertions.Expect(board.Rows).ToHaveCountAsync(5);
        var ravelle = await board.ReadRowAsync("ravelle");
        Assert.StartsWith("submitted", ravelle.Sheet);
        Assert.Equal("submitted", ravelle.Weights);
        Assert.False(ravelle.ConsistencyFlagged);
        Assert.Equal("—", ravelle.Consistency);
        Assert.True(ravelle.CanReopen);
        var ratings = ravelle.Ratings.Split(" of ");
        Assert.Equal(ratings[1], ratings[0]);
        await Assertions.Expect(board.StartModerationButton).ToHaveCountAsync(0);
        await Assertions.Expect(board.FlaggedSpreads.First).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "20-scoring-board");
        await Evidence.AssertAccessibleAsync(page, "the scoring board");

        // Values and gates are read-only in moderation, and the screen says why.
        await overview.OpenTabAsync("Values and gates");
        var values = new ValuesPage(page);
        await Assertions.Expect(values.Title).ToBeVisibleAsync();
        await Assertions.Expect(values.ValuesReadOnly).ToContainTextAsync("price evaluator");
        await Assertions.Expect(values.GatesReadOnly).ToContainTextAsync("stage Moderation");
        await Assertions.Expect(values.Gate("marrowgate", "ingress")).ToContainTextAsync("Fail");
        await Evidence.ScreenshotAsync(page, "21-values-and-gates");
        await Evidence.AssertAccessibleAsync(page, "values and gates");

        await overview.OpenTabAsync("Moderation");
        var moderation = new ModerationPage(page);
        await Assertions.Expect(moderation.Title).ToBeVisibleAsync();
        await Assertions.Expect(moderation.Cells.First).ToHaveAttributeAsync("data-flagged", "true");
        await Assertions.Expect(page.Locator("[data-testid=record-empty]")).ToBeVisibleAsync();

        var (cell, key) = await moderation.OpenFirstFlaggedCellAsync();
        var terms = await ModerationPage.TermsAsync(cell);
        Assert.True(terms.Count >= 2, $"The open cell {key} lists {terms.Count} assessor(s).");
        await Evidence.ScreenshotAsync(page, "22-moderation-cell-open");
        await Evidence.AssertAccessibleAsync(page, "moderation with a cell open");

        // A reason is required: the form refuses to send without one and says so beside the field.
        await cell.GetByRole(AriaRole.Button, new() { Name = "Record a moderated value" }).ClickAsync();
        await cell.Locator("input[type=radio][value='G']").CheckAsync();
        await cell.GetByRole(AriaRole.Button, new() { Name = "Record the moderated value" }).ClickAsync();
        await Assertions.Expect(cell.GetByText("Give the reason the panel agreed on this value")).ToBeVisibleAsync();
        await cell.GetByRole(AriaRole.Button, new() { Name = "Cancel" }).ClickAsync();

        const string reason = "The panel agreed that the display meets the brief but the audio button is optional in Q1.4, so Good rather than Very good.";
        await ModerationPage.RecordAsync(cell, "G", reason);
        await Assertions.Expect(moderation.Notice).ToContainTextAsync("Recorded G");
        var parts = key.Split('/');
        var entry = moderation.RecordRow(parts[0], parts[1]);
        await Assertions.Expect(entry).ToContainTextAsync("G");
        await Assertions.Expect(entry).ToContainTextAsync(reason);
        foreach (var (assessor, term) in terms.Where(t => t.Value != "not"))
        {
            await Assertions.Expect(entry).ToContainTextAsync($"{assessor} {term}");
        }

        await Assertions.Expect(cell.Locator("[data-testid=moderated-term]")).ToHaveTextAsync("G");
        await Evidence.ScreenshotAsync(page, "23-moderation-recorded");
        await Evidence.AssertAccessibleAsync(page, "moderation after recording a value");

        // The same screen on a tablet held upright, then the board with the cell now moderated.
        await page.SetViewportSizeAsync(800, 1100);
        await Evidence.ScreenshotAsync(page, "24-moderation-tablet");
        await overview.OpenTabAsync("Scoring board");
        await Assertions.Expect(board.SpreadGrid.Locator($"td[data-cell='{key}']")).ToContainTextAsync("moderated G");
        await Evidence.ScreenshotAsync(page, "25-scoring-board-tablet");
        await Evidence.AssertAccessibleAsync(page, "the scoring board on a tablet");
        watch.AssertClean();
    }

    [Fact]
    public async Task In_scoring_the_facilitator_records_a_failed_gate_with_its_note_and_starts_moderation_once_every_sheet_is_in()
    {
        var copies = new ScoringCopy(site.Server);
        var id = await copies.CreateAsync();
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        await page.GotoAsync($"/signin?returnUrl=%2Fevaluations%2F{id}%2Fvalues");
        await new SignInPage(page).SignInAsync(DecideServer.Facilitator, DecideServer.Password);

        // Gates are the facilitator's while scoring runs: a fail without a note is held back, with the reason beside it.
        var values = new ValuesPage(page);
        await Assertions.Expect(values.Title).ToBeVisibleAsync();
        await Assertions.Expect(values.GatesReadOnly).ToHaveCountAsync(0);
        await Assertions.Expect(values.ValuesReadOnly).ToContainTextAsync("price evaluator");
        await values.RecordGateAsync("vardelle", "ingress", passed: false, note: null);
        await Assertions.Expect(values.Gate("vardelle", "ingress")).ToContainTextAsync("A fail needs a note");
        await values.RecordGateAsync("vardelle", "ingress", passed: false, note: "The IK10 certificate covers a different enclosure from the one offered.");
        await Assertions.Expect(ValuesPage.State(values.Gate("vardelle", "ingress"))).ToHaveTextAsync("Saved");
        await Evidence.ScreenshotAsync(page, "26-gates-in-scoring");
        await Evidence.AssertAccessibleAsync(page, "values and gates in scoring");
        await values.RecordGateAsync("vardelle", "ingress", passed: true, note: null);
        await Assertions.Expect(ValuesPage.State(values.Gate("vardelle", "ingress"))).ToHaveTextAsync("Saved");

        // No sheet is submitted yet: the confirmation names them and will not start moderation.
        var overview = new OverviewPage(page);
        await overview.OpenTabAsync("Scoring board");
        var board = new BoardPage(page);
        await Assertions.Expect(board.Title).ToBeVisibleAsync();
        Assert.Equal("open", (await board.ReadRowAsync("ravelle")).Sheet);
        await board.OpenStartModerationAsync();
        await Assertions.Expect(board.Unsubmitted).ToContainTextAsync("ravelle");
        await Assertions.Expect(board.ConfirmStart).ToBeDisabledAsync();
        await Evidence.ScreenshotAsync(page, "27-start-moderation-held-back");
        await Evidence.AssertAccessibleAsync(page, "the scoring board in scoring");

        // Every assessor submits; the board read afresh lets moderation start, and the sheets can then be reopened.
        await copies.SubmitEverySheetAsync(id);
        await page.ReloadAsync();
        await Assertions.Expect(board.Title).ToBeVisibleAsync();
        await board.StartModerationAsync();
        await Assertions.Expect(board.Notice).ToContainTextAsync("Moderation has started");
        await Assertions.Expect(page.GetByRole(AriaRole.Navigation, new() { Name = "This evaluation" }).GetByRole(AriaRole.Link, new() { Name = "Moderation" }))
            .ToBeVisibleAsync();
        await Assertions.Expect(board.SpreadGrid).ToBeVisibleAsync();
        await board.ReopenSheetAsync("fenwright", "Fenwright asked to correct a rating entered against the wrong bid.");
        await Assertions.Expect(board.Notice).ToContainTextAsync("The sheet of fenwright is open again");
        Assert.Equal("open", (await board.ReadRowAsync("fenwright")).Sheet);
        await Evidence.ScreenshotAsync(page, "28-moderation-started-sheet-reopened");

        // Someone else records a value for the cell while the form is open: nothing is overwritten, their value shows,
        // and recording again replaces it knowingly.
        await new OverviewPage(page).OpenTabAsync("Moderation");
        var moderation = new ModerationPage(page);
        await Assertions.Expect(moderation.Title).ToBeVisibleAsync();
        var (cell, key) = await moderation.OpenFirstFlaggedCellAsync();
        var parts = key.Split('/');
        await cell.GetByRole(AriaRole.Button, new() { Name = "Record a moderated value" }).ClickAsync();
        await copies.ModerateAsync(id, parts[0], parts[1], "F", "Recorded from another session during the same meeting.", ["ravelle"]);
        const string reason = "The panel agreed Medium good after reading the bid's section on the feed together.";
        await cell.Locator("input[type=radio][value='MG']").CheckAsync();
        await cell.GetByLabel("Reason the panel agreed on it").FillAsync(reason);
        await cell.GetByRole(AriaRole.Button, new() { Name = "Record the moderated value" }).ClickAsync();
        await Assertions.Expect(cell.GetByRole(AriaRole.Alert)).ToContainTextAsync("Someone else recorded a moderated value for this cell");
        await Assertions.Expect(cell.Locator("[data-testid=moderated-term]")).ToHaveTextAsync("F");
        await Evidence.ScreenshotAsync(page, "29-moderation-conflict");
        await cell.GetByRole(AriaRole.Button, new() { Name = "Record the moderated value" }).ClickAsync();
        await Assertions.Expect(moderation.Notice).ToContainTextAsync("Recorded MG");
        await Assertions.Expect(moderation.RecordRow(parts[0], parts[1])).ToContainTextAsync("replaces 1 earlier");
        watch.AssertClean();
    }
}
