using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The published points award: the method, the table each bidder can recompute, the opening of prices and the reviews of low prices.</summary>
public sealed class AwardPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Award by the published points");

    public ILocator Sealed => Page.Locator("[data-testid=prices-sealed]");

    public ILocator Table => Page.Locator("[data-testid=award-table]");

    public ILocator Row(string bid) => Table.Locator($"tr[data-alternative='{bid}']");

    public ILocator Winner => Page.Locator("[data-testid=award-winner]");

    public ILocator RelativeWarning => Page.Locator("[data-testid=relative-warning]");

    public ILocator Excluded(string bid) => Page.Locator($"[data-testid=excluded-{bid}]");

    public ILocator Review(string bid) => Page.Locator($"[data-testid=review-{bid}]");

    /// <summary>Closes quality and opens the prices, through the confirmation.</summary>
    public async Task OpenPricesAsync()
    {
        await WaitUntilInteractiveAsync();
        await Page.Locator("[data-testid=open-prices]").ClickAsync();
        await Page.GetByRole(AriaRole.Button, new() { Name = "Close quality and open the prices", Exact = true }).ClickAsync();
    }

    /// <summary>Records the review of a flagged price.</summary>
    public async Task RecordReviewAsync(string bid, string asked, string answer, bool accepted, string reasons)
    {
        await WaitUntilInteractiveAsync();
        var card = Review(bid);
        await card.GetByLabel("The explanation asked of the bidder, as sent").FillAsync(asked);
        await card.GetByLabel("The bidder's answer (when received)").FillAsync(answer);
        await card.GetByLabel(accepted ? "Accepted: the bid stays in the award" : "Rejected: the bid is excluded").CheckAsync();
        await card.GetByLabel("Reasons, written so that the bidder can read them").FillAsync(reasons);
        await card.GetByRole(AriaRole.Button, new() { Name = "Record the review" }).ClickAsync();
        await Assertions.Expect(card.GetByRole(AriaRole.Status)).ToHaveTextAsync("Recorded.");
    }
}
