using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Decide.Web.Features.Accounts;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// The third demo (samples/community-grants-round.json, seeded at moderation): the facilitator reads who read what —
/// six reviewers, six applications each, three per application, every application linked — and the results with
/// their bands and the funding line; a reviewer's own sheet holds their six applications and no other.
/// </summary>
public sealed class RoundJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "MCGF-2027-R1";
    private const string Facilitator = "grants@" + DemoSeeder.RoundDomain;
    private const string Reviewer = "lindgren@" + DemoSeeder.RoundDomain;

    [Fact]
    public async Task The_facilitator_sees_who_read_what_and_the_funding_line_and_a_reviewer_sees_only_their_applications()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;
        await OpenAsync(page, Facilitator, "Who reads what");

        await Assertions.Expect(page.GetByRole(AriaRole.Heading, new() { Name = "Who reads what", Level = 1 })).ToBeVisibleAsync();
        var figures = page.GetByTestId("assignment-figures");
        await Assertions.Expect(figures).ToContainTextAsync("6 each");
        await Assertions.Expect(figures).ToContainTextAsync("every application, so all scores can be compared");
        await Assertions.Expect(page.GetByTestId("propose")).ToHaveCountAsync(0); // frozen at scoring
        await Assertions.Expect(page.GetByTestId("reviewer-lindgren")).ToContainTextAsync("Leyfield Pond Rescue");
        await Evidence.ScreenshotAsync(page, "round-01-who-reads-what");
        await Evidence.AssertAccessibleAsync(page, "who reads what");

        await new OverviewPage(page).OpenTabAsync("Results");
        var results = new ResultsPage(page);
        await results.WaitForRobustnessAsync();
        var table = page.GetByTestId("round-table");
        await Assertions.Expect(table).ToBeVisibleAsync();
        await Assertions.Expect(page.GetByTestId("funding-summary")).ToContainTextAsync("Budget 60,000 GBP");
        await Assertions.Expect(table.Locator("tbody tr", new() { HasText = "Brookside Sensory Garden" })).ToContainTextAsync("funded");
        await Assertions.Expect(table.Locator("tbody tr", new() { HasText = "Harwick Street Compost Hub" })).ToContainTextAsync("not funded");
        await Assertions.Expect(page.GetByTestId("outside-w")).ToBeVisibleAsync();
        await Assertions.Expect(page.GetByTestId("alpha")).ToContainTextAsync("Krippendorff's alpha");
        await table.ScrollIntoViewIfNeededAsync();
        await Evidence.ScreenshotAsync(page, "round-02-bands-and-funding-line");
        await Evidence.AssertAccessibleAsync(page, "results of a round");
        watch.AssertClean();

        var (reviewerContext, reviewerPage, reviewerWatch) = await site.OpenAsync();
        await using var __ = reviewerContext;
        await OpenAsync(reviewerPage, Reviewer, "My ratings");
        var ratings = new RatingsPage(reviewerPage);
        await Assertions.Expect(ratings.Grid).ToBeVisibleAsync();
        await Assertions.Expect(ratings.Cells).ToHaveCountAsync(6 * 3); // six applications × three criteria, nothing else
        await Assertions.Expect(ratings.Grid).Not.ToContainTextAsync("Brookside Sensory Garden");
        await Evidence.ScreenshotAsync(reviewerPage, "round-03-reviewer-sheet");
        reviewerWatch.AssertClean();
    }

    private static async Task OpenAsync(IPage page, string email, string tab)
    {
        await page.GotoAsync("/evaluations");
        await new SignInPage(page).SignInAsync(email, DecideServer.Password);
        await new EvaluationsPage(page).OpenAsync(Reference);
        await new OverviewPage(page).OpenTabAsync(tab);
    }
}
