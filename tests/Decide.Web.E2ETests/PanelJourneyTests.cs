using System.Text.RegularExpressions;
using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Decide.Web.Features.Accounts;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// The whole panel, each person in a browser of their own: the facilitator sets up a pairwise-weighted evaluation
/// and locks it; two assessors sign the declaration, compare the criteria pair by pair (one of them inconsistently,
/// and submits anyway) and rate every cell by keyboard, disagreeing; the facilitator sees the consistency flag on
/// the scoring board, starts moderation, moderates a flagged cell and reads the results with their robustness.
/// Every screen is photographed and scanned; no request may fail and no console error may appear.
/// </summary>
public sealed class PanelJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "KVTA-2026-051";
    private const string Ravelle = "ravelle@" + DemoSeeder.Domain;
    private const string Fenwright = "fenwright@" + DemoSeeder.Domain;
    private const string Design = "Design and accessibility";
    private const string Durability = "Durability of materials";
    private const string Upkeep = "Service and upkeep";

    [Fact]
    public async Task Facilitator_and_two_assessors_take_an_evaluation_from_setup_to_moderated_results()
    {
        // The administrator creates the evaluation and names its facilitator.
        var (adminContext, admin, adminWatch) = await site.OpenAsync();
        await using (adminContext)
        {
            await admin.GotoAsync("/signin?returnUrl=%2Fevaluations");
            await new SignInPage(admin).SignInAsync(DecideServer.Administrator, DecideServer.Password);
            await Assertions.Expect(new EvaluationsPage(admin).Title).ToBeVisibleAsync();
            await SetupPage.CreateEvaluationAsAdminAsync(admin, Reference, "Bus shelter refurbishment", "Kestrel Vale Transit Authority", DecideServer.Facilitator);
            await Assertions.Expect(new EvaluationsPage(admin).Evaluation(Reference)).ToBeVisibleAsync();
            adminWatch.AssertClean();
        }

        // The facilitator: purpose, three criteria weighed pair by pair, two bids, two assessors, tolerance 1.
        var (facilitatorContext, facilitator, facilitatorWatch) = await site.OpenAsync();
        await using var _ = facilitatorContext;
        await facilitator.GotoAsync("/signin?returnUrl=%2Fevaluations");
        await new SignInPage(facilitator).SignInAsync(DecideServer.Facilitator, DecideServer.Password);
        await new EvaluationsPage(facilitator).OpenAsync(Reference);
        await new OverviewPage(facilitator).OpenTabAsync("Setup");
        var setup = new SetupPage(facilitator);
        await setup.WaitUntilInteractiveAsync();
        await setup.FillPurposeAsync("Refurbish 60 bus shelters to the published design guide within one year.", "suppliers");
        await setup.SaveAndContinueAsync("saved together with the first criterion");
        await setup.AddCriterionAsync(0, Design, description: "Step-free access, seating and legible timetables.");
        await setup.AddCriterionAsync(1, Durability, description: "Materials and finishes that last the contract's ten years.");
        await setup.AddCriterionAsync(2, Upkeep, description: "How the supplier keeps the shelters clean and repaired.");
        await setup.SaveAndContinueAsync("Plan saved");
        await setup.SaveAndContinueAsync("Plan saved");
        await setup.AddBidAsync(0, "B1", "Ashgrove Street Furniture");
        await setup.AddBidAsync(1, "B2", "Pellmarsh Civic Works");
        await setup.SaveAndContinueAsync("saved");
        await setup.AddAssessorAsync(0, Ravelle, "ravelle");
        await setup.AddAssessorAsync(1, Fenwright, "fenwright");
        await setup.SaveAndContinueAsync("Panel saved");
        await facilitator.GetByText("Each assessor compares the criteria in pairs").ClickAsync();
        await setup.SetToleranceAsync(1);
        await setup.SaveAndContinueAsync("Plan saved");
        await Evidence.ScreenshotAsync(facilitator, "panel-01-setup-review");
        await Evidence.AssertAccessibleAsync(facilitator, "setup review");
        var evaluationId = setup.EvaluationId;

        // Each assessor signs and weighs in their own browser; fenwright's judgements go round in a circle.
        var (ravelleContext, ravelle, ravelleWatch) = await site.OpenAsync();
        await using var __ = ravelleContext;
        var (fenwrightContext, fenwright, fenwrightWatch) = await site.OpenAsync();
        await using var ___ = fenwrightContext;
        var ravelleWeights = await WeighAsync(ravelle, Ravelle, evaluationId, new()
        {
            [(Design, Durability)] = "3", [(Durability, Upkeep)] = "3", [(Design, Upkeep)] = "5",
        });
        await Assertions.Expect(ravelleWeights.Triads).ToHaveCountAsync(0);
        await ravelleWeights.SubmitAsync();
        var fenwrightWeights = await WeighAsync(fenwright, Fenwright, evaluationId, new()
        {
            [(Design, Durability)] = "5", [(Durability, Upkeep)] = "3", [(Upkeep, Design)] = "3",
        });
        await Assertions.Expect(fenwrightWeights.ConsistencyRatio).ToContainTextAsync("too inconsistent");
        await Assertions.Expect(fenwrightWeights.Triads.First).ToContainTextAsync("round in a circle");
        await Evidence.ScreenshotAsync(fenwright, "panel-02-fenwright-inconsistent");
        await Evidence.AssertAccessibleAsync(fenwright, "pairwise weights, inconsistent");
        await fenwrightWeights.SubmitAsync();

        // The facilitator locks the plan and opens scoring.
        await facilitator.ReloadAsync();
        await setup.WaitUntilInteractiveAsync();
        await setup.OpenStepAsync("Review and lock");
        await setup.AskToLockAsync();
        await Assertions.Expect(setup.LockBlocking).ToHaveCountAsync(0);
        await Evidence.ScreenshotAsync(facilitator, "panel-03-lock-confirmation");
        await setup.ConfirmLockAsync();
        await setup.AskToOpenScoringAsync();
        await setup.ConfirmOpenScoringAsync();

        // Both confirm no conflict and rate every cell by keyboard; they disagree by three scale steps everywhere.
        await RateAsync(ravelle, evaluationId, "VG");
        await RateAsync(fenwright, evaluationId, "MP");
        await Evidence.ScreenshotAsync(fenwright, "panel-04-fenwright-sheet-submitted");

        // The board flags fenwright's consistency; moderation starts; the first flagged cell is moderated.
        await facilitator.GotoAsync($"/evaluations/{evaluationId}/board");
        var board = new BoardPage(facilitator);
        await Assertions.Expect(board.Title).ToBeVisibleAsync();
        await board.WaitUntilInteractiveAsync();
        Assert.True((await board.ReadRowAsync("fenwright")).ConsistencyFlagged, "fenwright's consistency ratio is above the limit");
        Assert.False((await board.ReadRowAsync("ravelle")).ConsistencyFlagged, "ravelle's judgements are consistent");
        await Evidence.ScreenshotAsync(facilitator, "panel-05-board");
        await Evidence.AssertAccessibleAsync(facilitator, "the scoring board");
        await board.StartModerationAsync();

        await new OverviewPage(facilitator).OpenTabAsync("Moderation");
        var moderation = new ModerationPage(facilitator);
        await Assertions.Expect(moderation.Title).ToBeVisibleAsync();
        await Assertions.Expect(moderation.FlaggedCells).ToHaveCountAsync(6);
        var (cell, key) = await moderation.OpenFirstFlaggedCellAsync();
        var terms = await ModerationPage.TermsAsync(cell);
        Assert.Equal("VG", terms["ravelle"]);
        Assert.Equal("MP", terms["fenwright"]);
        await ModerationPage.RecordAsync(cell, "G", "The panel agreed the shelter drawings meet the guide apart from the timetable case.");
        var parts = key.Split('/');
        await Assertions.Expect(moderation.RecordRow(parts[0], parts[1])).ToContainTextAsync("The panel agreed");
        await Evidence.ScreenshotAsync(facilitator, "panel-06-moderated");
        await Evidence.AssertAccessibleAsync(facilitator, "moderation");

        // Results with robustness, ranked on the moderated values.
        await new OverviewPage(facilitator).OpenTabAsync("Results");
        var results = new ResultsPage(facilitator);
        await Assertions.Expect(results.Title).ToBeVisibleAsync();
        await results.WaitForRobustnessAsync();
        await Assertions.Expect(results.RankingRows).ToHaveCountAsync(2);
        await Assertions.Expect(results.RankingRows.First).ToContainTextAsync(new Regex("Ashgrove Street Furniture|Pellmarsh Civic Works"));
        await Assertions.Expect(results.Acceptability).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(facilitator, "panel-07-results");
        await Evidence.AssertAccessibleAsync(facilitator, "the results of the new evaluation");

        facilitatorWatch.AssertClean();
        ravelleWatch.AssertClean();
        fenwrightWatch.AssertClean();
    }

    private static async Task<WeightsPage> WeighAsync(IPage page, string email, Guid evaluation, Dictionary<(string, string), string> judgements)
    {
        await page.GotoAsync("/signin?returnUrl=%2Fevaluations");
        await new SignInPage(page).SignInAsync(email, DecideServer.Password);
        await Assertions.Expect(new EvaluationsPage(page).Title).ToBeVisibleAsync();
        var declaration = new DeclarationPage(page);
        await declaration.GotoAsync(evaluation);
        await declaration.SignAsync();
        var weights = new WeightsPage(page);
        await weights.GotoAsync(evaluation);
        await weights.EnterAllAsync(judgements);
        await Assertions.Expect(weights.SaveState).ToHaveTextAsync("All changes saved.");
        return weights;
    }

    private static async Task RateAsync(IPage page, Guid evaluation, string term)
    {
        var declaration = new DeclarationPage(page);
        await declaration.GotoAsync(evaluation);
        await declaration.ConfirmNoConflictAsync();
        var ratings = new RatingsPage(page);
        await ratings.GotoAsync(evaluation);
        await ratings.RateEveryCellAsync(term, cell => $"Drawings and method statement of {cell.Split('/')[0]} support this for {cell.Split('/')[1]}.");
        await Assertions.Expect(ratings.Progress).ToContainTextAsync("6 of 6");
        await Assertions.Expect(ratings.SaveState).ToHaveTextAsync("All changes saved.");
        await ratings.SubmitAsync();
    }
}
