using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Decide.Web.Features.Accounts;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// The second demo (samples/park-grounds-points.json, seeded with its prices sealed) run to its award in the screens:
/// the facilitator finds the quality stage, closes quality and opens the prices, the price evaluator enters them,
/// the facilitator records the review of the flagged price, asks for sign-off, and the approver's signed record is
/// read back with pdftotext. The figures are those of samples/README.md, worked with a calculator from the sample's
/// ratings.
/// </summary>
public sealed class AwardJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "HDC-PK-2026-44";
    private const string Facilitator = "procurement@" + DemoSeeder.PointsDomain;
    private const string Commercial = "commercial@" + DemoSeeder.PointsDomain;
    private const string Approver = "head.parks@" + DemoSeeder.PointsDomain;

    [Fact]
    public async Task Prices_are_opened_after_quality_entered_and_a_flagged_price_reviewed_until_the_award_is_named()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;
        await OpenAsync(page, Facilitator, "Award");

        var award = new AwardPage(page);
        await Assertions.Expect(award.Title).ToBeVisibleAsync();
        await Assertions.Expect(award.Sealed).ToBeVisibleAsync();
        await Assertions.Expect(award.RelativeWarning).ToBeVisibleAsync();
        await Assertions.Expect(award.Row("cobblehill")).ToContainTextAsync("49.50");
        await Assertions.Expect(award.Excluded("fernbrook")).ToContainTextAsync("below the minimum of 4");
        await Evidence.ScreenshotAsync(page, "award-01-quality-stage");
        await Evidence.AssertAccessibleAsync(page, "the award while prices are sealed");

        await award.OpenPricesAsync();
        await Assertions.Expect(award.Sealed).ToHaveCountAsync(0);
        await Assertions.Expect(page.GetByText("Fernbrook Landscapes takes no part in price")).ToBeVisibleAsync();
        watch.AssertClean();

        // The price evaluator, in a browser of their own, enters the four prices that were opened.
        var (priceContext, pricePage, priceWatch) = await site.OpenAsync();
        await using var __ = priceContext;
        await OpenAsync(pricePage, Commercial, "Values and gates");
        var values = new ValuesPage(pricePage);
        foreach (var (bid, price) in new[] { ("aldergate", "412000"), ("brackenridge", "389500"), ("cobblehill", "436200"), ("quickcut", "298000") })
        {
            await values.EnterValueAsync(bid, "price", price);
            await Assertions.Expect(ValuesPage.State(values.Value(bid, "price"))).ToContainTextAsync("Saved");
        }

        await Evidence.ScreenshotAsync(pricePage, "award-02-prices-entered");
        priceWatch.AssertClean();

        // Quickcut is flagged (27.8 % below the mean of the others); no award is named until its review is recorded.
        await page.ReloadAsync();
        await Assertions.Expect(award.Review("quickcut")).ToContainTextAsync("27.8 %");
        await Assertions.Expect(award.Winner).ToHaveCountAsync(0);
        await award.RecordReviewAsync("quickcut",
            "Your price is 27.8 % below the mean of the other admissible prices; please explain how it covers the specified frequencies.",
            "We share a depot with the neighbouring district's contract and own our mowers.",
            accepted: true,
            "The shared depot and owned equipment account for the difference; the price is sustainable.");

        // Cobble Hill: quality 49.50, price points 40 × 298,000 / 436,200 = 27.33, total 76.83, first.
        await Assertions.Expect(award.Winner).ToContainTextAsync("Cobble Hill Horticulture");
        await Assertions.Expect(award.Row("cobblehill")).ToContainTextAsync("76.83");
        await Assertions.Expect(award.Row("quickcut")).ToContainTextAsync("73.33");
        await Evidence.ScreenshotAsync(page, "award-03-award");
        await Evidence.AssertAccessibleAsync(page, "the award with prices open");

        // Sign-off: the facilitator asks, the approver approves, and the signed record read back with pdftotext
        // carries the published method and the table.
        await new OverviewPage(page).OpenTabAsync("Sign-off");
        await page.GetByLabel("Note to the approvers").FillAsync("The panel recommends the award by points to Cobble Hill Horticulture.");
        await page.GetByTestId("request").ClickAsync();
        await page.GetByTestId("confirm-request-button").ClickAsync();
        await Assertions.Expect(page.GetByTestId("request-note")).ToContainTextAsync("award by points");
        watch.AssertClean();

        var (approverContext, approver, approverWatch) = await site.OpenAsync();
        await using var ___ = approverContext;
        await OpenAsync(approver, Approver, "Sign-off");
        await new OverviewPage(approver).WaitUntilInteractiveAsync();
        await approver.GetByLabel("Your statement").FillAsync("I approve the award by the published points to Cobble Hill Horticulture.");
        await approver.GetByLabel("Your password, to confirm it is you").FillAsync(DecideServer.Password);
        await approver.GetByRole(AriaRole.Checkbox, new() { NameRegex = new("^I have read the results") }).CheckAsync();
        await approver.GetByTestId("approve").ClickAsync();
        await Assertions.Expect(approver.GetByTestId("signed-off")).ToBeVisibleAsync(new() { Timeout = 60_000 });
        var download = await approver.RunAndWaitForDownloadAsync(() => approver.GetByTestId("download-record").ClickAsync());
        var path = Path.Combine(Path.GetTempPath(), $"decide-award-record-{Guid.NewGuid():N}.pdf");
        await download.SaveAsAsync(path);
        try
        {
            var text = PdfToText(path);
            Assert.Contains("The award by the published points (binding)", text, StringComparison.Ordinal);
            Assert.Contains("The award by points goes to Cobble Hill Horticulture.", text, StringComparison.Ordinal);
            Assert.Contains("the same: the method published with the tender is the one applied", text, StringComparison.Ordinal);
            Assert.Matches(@"Cobble Hill Horticulture\s+49\.50\s+436,200\s+27\.33\s+76\.83\s+1", text);
        }
        finally
        {
            File.Delete(path);
        }

        approverWatch.AssertClean();
    }

    /// <summary>The record's text as poppler's pdftotext reads it, keeping the layout of table rows.</summary>
    private static string PdfToText(string path)
    {
        using var process = System.Diagnostics.Process.Start(new System.Diagnostics.ProcessStartInfo("pdftotext", ["-layout", path, "-"])
        {
            RedirectStandardOutput = true,
            UseShellExecute = false,
        })!;
        var text = process.StandardOutput.ReadToEnd();
        process.WaitForExit();
        Assert.Equal(0, process.ExitCode);
        return text;
    }

    private static async Task OpenAsync(IPage page, string email, string tab)
    {
        await page.GotoAsync("/evaluations");
        await new SignInPage(page).SignInAsync(email, DecideServer.Password);
        await new EvaluationsPage(page).OpenAsync(Reference);
        await new OverviewPage(page).OpenTabAsync(tab);
    }
}
