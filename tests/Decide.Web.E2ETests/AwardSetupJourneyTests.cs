using System.Security.Cryptography;
using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Decide.Web.Features.Accounts;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// A points award set up entirely in the screens (no file import): the facilitator chooses the 0–10 points scale,
/// publishes the points, a relative price formula, a threshold and two stages, locks the plan without anyone weighing,
/// and downloads the methodology whose fingerprint was stored at the lock.
/// </summary>
public sealed class AwardSetupJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "HDC-PK-2026-51";
    private const string Facilitator = "procurement@" + DemoSeeder.PointsDomain;

    [Fact]
    public async Task The_facilitator_publishes_points_a_price_formula_and_two_stages_in_the_screens_and_the_methodology_is_fixed_at_lock()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;
        await page.GotoAsync("/signin?returnUrl=%2Fevaluations");
        await new SignInPage(page).SignInAsync(DecideServer.Administrator, DecideServer.Password);
        var list = new EvaluationsPage(page);
        await SetupPage.CreateEvaluationAsAdminAsync(page, Reference, "Tree surgery framework 2027–2030", "Harrowmere District Council", Facilitator);
        await Assertions.Expect(list.Evaluation(Reference)).ToBeVisibleAsync();
        await list.SignOut.ClickAsync();

        await new SignInPage(page).SignInAsync(Facilitator, DecideServer.Password);
        await list.OpenAsync(Reference);
        await new OverviewPage(page).OpenTabAsync("Setup");
        var setup = new SetupPage(page);
        await setup.WaitUntilInteractiveAsync();
        await setup.FillPurposeAsync("Tree surgery across the district's parks and highways, awarded by published points.", "bids");
        await setup.SaveAndContinueAsync("saved together with the first criterion");
        await setup.AddCriterionAsync(0, "Method statement");
        await setup.AddCriterionAsync(1, "Arboricultural qualifications");
        await setup.AddCriterionAsync(2, "Framework price", kind: "number", cost: true, unit: "GBP");
        await setup.SaveAndContinueAsync("Plan saved");
        await setup.ChooseRatingScaleAsync("points-0-10");
        await setup.SaveAndContinueAsync("Plan saved");
        await setup.AddBidAsync(0, "oakline", "Oakline Tree Care");
        await setup.AddBidAsync(1, "birchwood", "Birchwood Arborists");
        await setup.SaveAndContinueAsync("saved");
        await setup.AddAssessorAsync(0, "ashcroft@" + DemoSeeder.PointsDomain, "ashcroft");
        await setup.AddAssessorAsync(1, "wren@" + DemoSeeder.PointsDomain, "wren");
        await setup.SaveAndContinueAsync("Panel saved");

        // The method: published points with a points award.
        await page.GetByText("Points published in the tender, with a points award", new() { Exact = false }).ClickAsync();
        var award = page.GetByTestId("award-settings");
        await award.GetByLabel("Method statement", new() { Exact = true }).FillAsync("40");
        await award.GetByLabel("Arboricultural qualifications", new() { Exact = true }).FillAsync("20");
        await award.GetByLabel("Framework price", new() { Exact = true }).FillAsync("40");
        await award.GetByLabel("Least share of all quality points (%), empty for none").FillAsync("50");
        await award.GetByText("Two stages: keep prices sealed").ClickAsync();
        await Assertions.Expect(award.GetByTestId("points-sum")).ToContainTextAsync("add up to 100 of 100");
        await Assertions.Expect(award.GetByTestId("relative-warning")).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "award-setup-01-method");
        await Evidence.AssertAccessibleAsync(page, "setup: a points award");
        await setup.SaveAndContinueAsync("Plan saved");

        // Nobody weighs under published points: the plan locks once the panel has signed nothing more than it must.
        await setup.AskToLockAsync();
        await Assertions.Expect(setup.Locks.Filter(new() { HasText = "The published points" })).ToContainTextAsync("in two stages");
        await Assertions.Expect(setup.LockBlocking).ToHaveCountAsync(0);
        await setup.ConfirmLockAsync();
        await Assertions.Expect(setup.PlanHash).ToHaveTextAsync(new System.Text.RegularExpressions.Regex("^[0-9a-f]{64}$"));

        // The methodology published with the tender: its text hashes to the fingerprint shown on the overview.
        await new OverviewPage(page).OpenTabAsync("Overview");
        var methodology = page.GetByTestId("methodology");
        await Assertions.Expect(methodology).ToContainTextAsync("published at lock");
        var href = await methodology.GetByRole(AriaRole.Link, new() { Name = "plain text" }).GetAttributeAsync("href");
        var response = await page.APIRequest.GetAsync(href!);
        var text = await response.BodyAsync();
        var fingerprint = Convert.ToHexStringLower(SHA256.HashData(text));
        await Assertions.Expect(methodology.Locator("code")).ToHaveTextAsync(fingerprint[..12] + "…");
        var words = System.Text.Encoding.UTF8.GetString(text);
        Assert.Contains("Method statement |  |  | 40 | 40 %", words, StringComparison.Ordinal);
        Assert.Contains("at least 50 % of all quality points", words, StringComparison.Ordinal);
        Assert.Contains("Two stages: prices stay sealed", words, StringComparison.Ordinal);
        await Evidence.ScreenshotAsync(page, "award-setup-02-overview");
        watch.AssertClean();
    }
}
