using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Decide.Web.Features.Accounts;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// The administrator creates an evaluation from the list; its facilitator prepares it on the setup screen step by
/// step, seats two assessors, is told what stops the lock until they have submitted their weights, locks the plan
/// and opens scoring. Every step is photographed and scanned for serious accessibility problems.
/// </summary>
public sealed class SetupJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "KVTA-2026-040";
    private const string Ravelle = "ravelle@" + DemoSeeder.Domain;
    private const string Fenwright = "fenwright@" + DemoSeeder.Domain;

    [Fact]
    public async Task The_facilitator_prepares_a_new_evaluation_in_steps_locks_the_plan_and_opens_scoring()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        // The administrator creates the evaluation from the list; a missing title is refused by name.
        await page.GotoAsync("/signin?returnUrl=%2Fevaluations");
        await new SignInPage(page).SignInAsync(DecideServer.Administrator, DecideServer.Password);
        var list = new EvaluationsPage(page);
        await Assertions.Expect(list.Title).ToBeVisibleAsync();
        await SetupPage.CreateEvaluationAsAdminAsync(page, Reference, "", null, DecideServer.Facilitator);
        await Assertions.Expect(page.GetByRole(AriaRole.Dialog).GetByText("give a title")).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "setup-01-new-evaluation-refused");
        await Evidence.AssertAccessibleAsync(page, "the new-evaluation dialog");
        await page.GetByRole(AriaRole.Dialog).GetByLabel("Title", new() { Exact = true }).FillAsync("Shelter lighting maintenance");
        await page.GetByRole(AriaRole.Dialog).GetByRole(AriaRole.Button, new() { Name = "Create evaluation" }).ClickAsync();
        await Assertions.Expect(list.Evaluation(Reference)).ToBeVisibleAsync();
        await list.SignOut.ClickAsync();

        // The facilitator opens it; setup starts with the purpose.
        await new SignInPage(page).SignInAsync(DecideServer.Facilitator, DecideServer.Password);
        await list.OpenAsync(Reference);
        await new OverviewPage(page).OpenTabAsync("Setup");
        var setup = new SetupPage(page);
        await Assertions.Expect(setup.Title).ToBeVisibleAsync();
        await setup.WaitUntilInteractiveAsync();
        await setup.FillPurposeAsync("Five years' maintenance of lighting in 180 bus shelters, scored on the published descriptors.", "suppliers");
        await Evidence.ScreenshotAsync(page, "setup-02-purpose");
        await Evidence.AssertAccessibleAsync(page, "setup: purpose");
        await setup.SaveAndContinueAsync("saved together with the first criterion");

        // Criteria: one rated in words with descriptors, a price, a gate.
        await Assertions.Expect(page.GetByTestId("no-criteria")).ToContainTextAsync("Add the first criterion");
        await setup.AddCriterionAsync(0, "Maintenance plan", description: "How faults are found and fixed across the shelters.",
            descriptors: new Dictionary<string, string> { ["Good"] = "Named crews, monthly inspections and a four-hour fix for dark shelters.", ["Fair"] = "Inspections planned; response times vague." });
        await setup.AddCriterionAsync(1, "Five-year price", kind: "number", cost: true, unit: "EUR");
        await setup.AddCriterionAsync(2, "Electrical safety certificate", kind: "gate");
        await setup.SaveAndContinueAsync("Plan saved");
        await setup.OpenStepAsync("Criteria");
        await Assertions.Expect(setup.Criterion(0)).ToContainTextAsync("maintenance_plan");
        await Evidence.ScreenshotAsync(page, "setup-03-criteria");
        await Evidence.AssertAccessibleAsync(page, "setup: criteria");

        await setup.OpenStepAsync("Scales");
        await setup.ChooseRatingScaleAsync("rating-5");
        // Every built-in rating scale (Chen's, the five-term one and the two points scales) and both importance scales.
        await Assertions.Expect(page.Locator("svg[aria-label^='Triangles of the scale']")).ToHaveCountAsync(
            Decide.Web.Components.Pages.Setup.PlanDraft.RatingScales.Count + Decide.Web.Components.Pages.Setup.PlanDraft.ImportanceScales.Count);
        await Evidence.ScreenshotAsync(page, "setup-04-scales");
        await Evidence.AssertAccessibleAsync(page, "setup: scales");
        await setup.SaveAndContinueAsync("Plan saved");

        await setup.AddBidAsync(0, "B1", "Lumenwick Street Services");
        await setup.AddBidAsync(1, "B2", "Harrowfield Electrical");
        await Evidence.ScreenshotAsync(page, "setup-05-bids");
        await Evidence.AssertAccessibleAsync(page, "setup: bids");
        await setup.SaveAndContinueAsync("saved");

        await setup.AddAssessorAsync(0, Ravelle, "ravelle");
        await setup.AddAssessorAsync(1, Fenwright, "fenwright");
        await Evidence.ScreenshotAsync(page, "setup-06-panel");
        await Evidence.AssertAccessibleAsync(page, "setup: panel");
        await setup.SaveAndContinueAsync("Panel saved");

        await setup.SetToleranceAsync(1);
        await Evidence.ScreenshotAsync(page, "setup-07-method");
        await Evidence.AssertAccessibleAsync(page, "setup: method");
        await setup.SaveAndContinueAsync("Plan saved");

        // Nobody has weighed yet: the confirmation lists what locks and says what stops the lock.
        await setup.AskToLockAsync();
        await Assertions.Expect(setup.Locks).ToHaveCountAsync(6);
        await Assertions.Expect(setup.Locks.Filter(new() { HasText = "tolerance for disagreement" })).ToContainTextAsync("1 scale steps");
        await Assertions.Expect(setup.Locks.Filter(new() { HasText = "The panel" })).ToContainTextAsync(Fenwright);
        await Assertions.Expect(setup.LockBlocking).ToContainTextAsync("nobody has rated the criteria's importance");
        await Assertions.Expect(setup.LockWarnings).ToContainTextAsync("Assessor ravelle has not signed the declaration");
        await Evidence.ScreenshotAsync(page, "setup-08-lock-blocked");
        await Evidence.AssertAccessibleAsync(page, "setup: lock confirmation");
        await setup.CancelLockAsync();

        // The two assessors sign and submit their weights (their own screens are not part of this journey).
        await AssessorApi.SubmitImportanceAsync(site.Server.BaseUrl, Ravelle, setup.EvaluationId, "VH");
        await AssessorApi.SubmitImportanceAsync(site.Server.BaseUrl, Fenwright, setup.EvaluationId, "H");
        await setup.AskToLockAsync();
        await Assertions.Expect(setup.LockBlocking).ToHaveCountAsync(0);
        await setup.ConfirmLockAsync();
        await Assertions.Expect(setup.PlanHash).ToHaveTextAsync(new System.Text.RegularExpressions.Regex("^[0-9a-f]{64}$"));
        await Evidence.ScreenshotAsync(page, "setup-09-locked");
        await Evidence.AssertAccessibleAsync(page, "setup: plan locked");

        await setup.AskToOpenScoringAsync();
        await Assertions.Expect(setup.OpenConfirmation).ToContainTextAsync("see the bidders' names");
        await Evidence.ScreenshotAsync(page, "setup-10-open-scoring");
        await setup.ConfirmOpenScoringAsync();
        await Evidence.ScreenshotAsync(page, "setup-11-scoring-open");
        watch.AssertClean();
    }
}
