using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>Moderation: cells with every assessor's rating side by side, flagged first; the form for a moderated value; the record.</summary>
public sealed class ModerationPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Moderation");

    /// <summary>The cells shown, in screen order (flagged first).</summary>
    public ILocator Cells => Page.Locator("article[data-cell]");

    public ILocator FlaggedCells => Page.Locator("article[data-cell][data-flagged=true]");

    /// <summary>One cell by its bid code and criterion id.</summary>
    public ILocator Cell(string alternative, string criterion) => Page.Locator($"article[data-cell='{alternative}/{criterion}']");

    public ILocator FlaggedOnly => Page.GetByLabel("Flagged cells only");

    public ILocator CriterionFilter => Page.GetByLabel("Criterion", new() { Exact = true });

    public ILocator BidFilter => Page.GetByLabel("Bid", new() { Exact = true });

    public ILocator Notice => Page.Locator("[data-testid=notice]");

    public ILocator ReadOnly => Page.Locator("[data-testid=read-only]");

    /// <summary>The moderation record: one row per moderated value in force.</summary>
    public ILocator Record => Page.Locator("[data-testid=moderation-record]");

    public ILocator RecordRow(string alternative, string criterion) => Record.Locator($"tr[data-cell='{alternative}/{criterion}']");

    /// <summary>Opens the first flagged cell; returns it and its key ("bid/criterion").</summary>
    public async Task<(ILocator Cell, string Key)> OpenFirstFlaggedCellAsync()
    {
        await WaitUntilInteractiveAsync();
        var cell = FlaggedCells.First;
        var key = await cell.GetAttributeAsync("data-cell") ?? throw new InvalidOperationException("The flagged cell has no key.");
        await OpenAsync(cell);
        return (Page.Locator($"article[data-cell='{key}']"), key);
    }

    /// <summary>Opens a cell (shows the ratings side by side) unless it is open.</summary>
    public static async Task OpenAsync(ILocator cell)
    {
        var toggle = cell.Locator("button[aria-expanded]");
        if (await toggle.GetAttributeAsync("aria-expanded") != "true")
        {
            await toggle.ClickAsync();
        }

        await Assertions.Expect(toggle).ToHaveAttributeAsync("aria-expanded", "true");
    }

    /// <summary>The assessors' terms in an open cell, by assessor code ("declined" or "not rated" where no term).</summary>
    public static async Task<IReadOnlyDictionary<string, string>> TermsAsync(ILocator cell)
    {
        var terms = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var row in await cell.Locator("table tbody tr").AllAsync())
        {
            var code = await row.GetAttributeAsync("data-assessor") ?? "";
            terms[code] = (await row.Locator("td").First.InnerTextAsync()).Split(' ')[0];
        }

        return terms;
    }

    /// <summary>Records a moderated term with its reason in an open cell (agreed by those ticked at the start: the assessors who rated).</summary>
    public static async Task RecordAsync(ILocator cell, string term, string reason)
    {
        var open = cell.GetByRole(AriaRole.Button, new() { Name = "Record a moderated value" })
            .Or(cell.GetByRole(AriaRole.Button, new() { Name = "Replace the moderated value" }));
        await open.ClickAsync();
        var form = cell.Locator("[data-testid=moderation-form]");
        await form.Locator($"input[type=radio][value='{term}']").CheckAsync();
        await form.GetByLabel("Reason the panel agreed on it").FillAsync(reason);
        await form.GetByRole(AriaRole.Button, new() { Name = "Record the moderated value" }).ClickAsync();
    }

    public async Task ShowFlaggedOnlyAsync(bool on)
    {
        await WaitUntilInteractiveAsync();
        await FlaggedOnly.SetCheckedAsync(on);
    }

    public async Task FilterByCriterionAsync(string? criterionName) =>
        await CriterionFilter.SelectOptionAsync(new SelectOptionValue { Label = criterionName ?? "All criteria" });

    public async Task FilterByBidAsync(string? bidName) =>
        await BidFilter.SelectOptionAsync(new SelectOptionValue { Label = bidName ?? "All bids" });
}
