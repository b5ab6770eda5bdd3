using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// An assessor's own screens in a real browser: in the demo (at moderation) the declaration, weights and sheet are
/// read-only; in a new evaluation the assessor signs the declaration, compares the criteria pair by pair (fixing the
/// judgement the others disagree with), submits, confirms the bidders' names, rates every cell from the keyboard and
/// submits the sheet. Each screen is photographed at 1280×800 and 800 px wide and scanned for accessibility.
/// </summary>
public sealed class AssessorWorkspaceTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Ravelle = "ravelle@kestrel-vale.example";

    [Fact]
    public async Task Ravelle_finds_her_sheet_read_only_in_the_demo_at_moderation()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;
        await page.GotoAsync("/signin");
        await new SignInPage(page).SignInAsync(Ravelle, DecideServer.Password);
        var list = new EvaluationsPage(page);
        await Assertions.Expect(list.Title).ToBeVisibleAsync();
        await list.OpenAsync("KVTA-2026-017");
        var overview = new OverviewPage(page);
        await overview.OpenTabAsync("My ratings");

        var ratings = new RatingsPage(page);
        await Assertions.Expect(ratings.Title).ToBeVisibleAsync();
        await Assertions.Expect(ratings.Locked).ToContainTextAsync("read-only");
        Assert.True(await ratings.Cells.CountAsync() > 0);
        Assert.Equal(0, await page.Locator("main textarea, main td[tabindex]").CountAsync());
        await Evidence.ScreenshotAsync(page, "assessor-01-demo-sheet");
        await Evidence.AssertAccessibleAsync(page, "the read-only rating sheet");
        await page.SetViewportSizeAsync(800, 1100);
        await Evidence.ScreenshotAsync(page, "assessor-02-demo-sheet-tablet");
        await Evidence.AssertAccessibleAsync(page, "the read-only rating sheet on a tablet");

        await overview.OpenTabAsync("My weights");
        var weights = new WeightsPage(page);
        await Assertions.Expect(weights.Title).ToBeVisibleAsync();
        await Assertions.Expect(weights.Locked).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "assessor-03-demo-weights-tablet");
        await Evidence.AssertAccessibleAsync(page, "the read-only importance weights");

        await overview.OpenTabAsync("Declaration");
        var declaration = new DeclarationPage(page);
        await Assertions.Expect(declaration.NamesConfirmed).ToBeVisibleAsync();
        await Evidence.AssertAccessibleAsync(page, "the signed declaration");
        watch.AssertClean();
    }

    [Fact]
    public async Task A_new_assessor_signs_compares_pair_by_pair_submits_then_rates_every_cell_by_keyboard()
    {
        var evaluation = await FreshEvaluation.CreateAsync(site.Server.BaseUrl);
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;
        await page.GotoAsync("/signin");
        await new SignInPage(page).SignInAsync(evaluation.AssessorEmail, FreshEvaluation.AssessorPassword);
        await Assertions.Expect(new EvaluationsPage(page).Title).ToBeVisibleAsync();

        // Nothing but the declaration until it is signed.
        var weights = new WeightsPage(page);
        await weights.GotoAsync(evaluation.Id);
        await Assertions.Expect(page.GetByRole(AriaRole.Link, new() { Name = "Go to the declaration" })).ToBeVisibleAsync();
        var declaration = new DeclarationPage(page);
        await declaration.GotoAsync(evaluation.Id);
        await Evidence.ScreenshotAsync(page, "assessor-04-declaration");
        await Evidence.AssertAccessibleAsync(page, "the declaration before signing");
        await declaration.SignAsync();

        // Pairwise: design strongly over durability, durability over service, but service over design — a circle.
        await weights.GotoAsync(evaluation.Id);
        await weights.EnterAllAsync(new Dictionary<(string, string), string>
        {
            [("Design and accessibility", "Durability of materials")] = "5",
            [("Durability of materials", "Service and upkeep")] = "3",
            [("Service and upkeep", "Design and accessibility")] = "3",
            [("Maintenance regime", "Repair response")] = "1",
        });
        await Assertions.Expect(page.Locator(".decide-matrix-list li").First).ToContainTextAsync("above");
        await weights.Previous.ClickAsync();
        await weights.Previous.ClickAsync();
        await Assertions.Expect(weights.ConsistencyRatio).ToContainTextAsync("too inconsistent");
        await Assertions.Expect(weights.Triads.First).ToContainTextAsync("round in a circle");
        await Assertions.Expect(weights.Matrix.Locator("td.decide-worst")).ToHaveCountAsync(1);
        await Evidence.ScreenshotAsync(page, "assessor-05-pairwise-inconsistent");
        await Evidence.AssertAccessibleAsync(page, "pairwise weighting");
        await page.SetViewportSizeAsync(800, 1100);
        await Evidence.ScreenshotAsync(page, "assessor-06-pairwise-tablet");
        await page.SetViewportSizeAsync(1280, 800);

        // The suggested judgement repairs the matrix.
        await weights.UseSuggested.ClickAsync();
        await Assertions.Expect(weights.SaveState).ToHaveTextAsync("All changes saved.");
        await Assertions.Expect(weights.Triads).ToHaveCountAsync(0);
        await weights.SubmitAsync();
        await Evidence.ScreenshotAsync(page, "assessor-07-weights-submitted");

        await evaluation.OpenScoringAsync();
        await declaration.GotoAsync(evaluation.Id);
        await Assertions.Expect(declaration.Bidders).ToHaveCountAsync(FreshEvaluation.Bidders.Length);
        await Evidence.ScreenshotAsync(page, "assessor-08-names");
        await Evidence.AssertAccessibleAsync(page, "the confirmation against the names");
        await declaration.ConfirmNoConflictAsync();

        var ratings = new RatingsPage(page);
        await ratings.GotoAsync(evaluation.Id);
        await Assertions.Expect(ratings.Progress).ToContainTextAsync("0 of 12");

        // The check lists every cell still open before anything is submitted.
        await ratings.CheckAsync();
        await Assertions.Expect(ratings.Issues).ToHaveCountAsync(12);
        await ratings.RateEveryCellAsync("MG", cell => $"Section 4 of the {cell.Split('/')[0]} bid describes {cell.Split('/')[1]} in detail.");
        await Assertions.Expect(ratings.Progress).ToContainTextAsync("12 of 12");
        await Assertions.Expect(ratings.SaveState).ToHaveTextAsync("All changes saved.");
        await ratings.Cell("oakridge", "design").FocusAsync();
        await page.Keyboard.PressAsync("Enter");
        await Assertions.Expect(ratings.Rationale).ToBeFocusedAsync();
        await Evidence.ScreenshotAsync(page, "assessor-09-sheet-editing");
        await Evidence.AssertAccessibleAsync(page, "the rating grid with its rationale open");
        await page.SetViewportSizeAsync(800, 1100);
        await Evidence.ScreenshotAsync(page, "assessor-10-sheet-tablet");
        await Evidence.AssertAccessibleAsync(page, "the rating grid on a tablet");
        await page.Keyboard.PressAsync("Escape");

        await ratings.SubmitAsync();
        await Assertions.Expect(page.Locator("main textarea")).ToHaveCountAsync(0);
        await Evidence.ScreenshotAsync(page, "assessor-11-sheet-submitted");
        watch.AssertClean();
    }
}
