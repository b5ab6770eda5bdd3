using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The facilitator's scoring board: assessors' progress, reopening a sheet, starting moderation, spread by cell.</summary>
public sealed class BoardPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Scoring board");

    public ILocator Rows => Page.Locator("[data-testid=board] tbody tr");

    public ILocator Row(string assessor) => Page.Locator($"[data-testid=board] tbody tr[data-assessor='{assessor}']");

    public ILocator ConsistencyFlag(string assessor) => Row(assessor).Locator("[data-testid=cr-flag]");

    /// <summary>The success message after reopening a sheet or starting moderation.</summary>
    public ILocator Notice => Page.Locator("[data-testid=notice]");

    public ILocator Problem => Page.Locator(".decide-problem");

    public ILocator StartModerationButton => Page.GetByRole(AriaRole.Button, new() { Name = "Start moderation…" });

    public ILocator StartModerationPanel => Page.Locator("[data-testid=start-moderation-panel]");

    /// <summary>In the confirmation: the sheets still open (moderation cannot start).</summary>
    public ILocator Unsubmitted => StartModerationPanel.Locator("[data-testid=unsubmitted]");

    /// <summary>In the confirmation: what the facilitator should know before starting.</summary>
    public ILocator Warnings => StartModerationPanel.Locator("[data-testid=warnings] li");

    public ILocator ConfirmStart => Page.GetByRole(AriaRole.Button, new() { Name = "Lock the sheets and start moderation" });

    public ILocator SpreadGrid => Page.Locator("[data-testid=spread-grid]");

    public ILocator FlaggedSpreads => SpreadGrid.Locator("td.decide-spread-flagged");

    /// <summary>Reads one assessor's line: every column as shown, the consistency flag, and whether the sheet can be reopened.</summary>
    public async Task<AssessorRow> ReadRowAsync(string assessor)
    {
        var row = Row(assessor);
        await row.WaitForAsync();
        var flagged = await ConsistencyFlag(assessor).CountAsync() > 0;
        var consistency = await Column(row, "consistency");
        if (flagged)
        {
            consistency = consistency.Replace(await ConsistencyFlag(assessor).InnerTextAsync(), "", StringComparison.Ordinal).Trim();
        }

        return new AssessorRow(
            assessor,
            await Column(row, "declaration"),
            await Column(row, "weights"),
            consistency,
            flagged,
            (await row.Locator("td[data-column=ratings] .decide-num").InnerTextAsync()).Trim(),
            (await row.Locator("td[data-column=sheet] [data-testid=sheet-state]").InnerTextAsync()).Trim(),
            await row.GetByRole(AriaRole.Button, new() { Name = $"Reopen sheet of {assessor}" }).CountAsync() > 0);
    }

    /// <summary>Opens the confirmation of starting moderation (the caller reads it or confirms it).</summary>
    public async Task OpenStartModerationAsync()
    {
        await WaitUntilInteractiveAsync();
        await StartModerationButton.ClickAsync();
        await StartModerationPanel.WaitForAsync();
    }

    /// <summary>Starts moderation: opens the confirmation and confirms it.</summary>
    public async Task StartModerationAsync()
    {
        await OpenStartModerationAsync();
        await ConfirmStart.ClickAsync();
    }

    /// <summary>Reopens an assessor's submitted sheet with the reason.</summary>
    public async Task ReopenSheetAsync(string assessor, string reason)
    {
        await WaitUntilInteractiveAsync();
        await Row(assessor).GetByRole(AriaRole.Button, new() { Name = $"Reopen sheet of {assessor}" }).ClickAsync();
        var panel = Page.Locator("[data-testid=reopen-panel]");
        await panel.GetByLabel("Reason for reopening").FillAsync(reason);
        await panel.GetByRole(AriaRole.Button, new() { Name = "Reopen the sheet" }).ClickAsync();
    }

    private static async Task<string> Column(ILocator row, string column) =>
        (await row.Locator($"td[data-column={column}]").InnerTextAsync()).Trim();
}
