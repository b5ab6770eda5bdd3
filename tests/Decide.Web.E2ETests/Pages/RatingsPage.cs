using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>
/// The assessor's rating sheet: a grid of bids × criteria worked from the keyboard (arrow keys, a term's code,
/// Enter for the rationale, Escape back), each cell saving itself, then the check and the submission.
/// </summary>
public sealed class RatingsPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("My ratings");

    public ILocator Grid => Page.GetByRole(AriaRole.Grid, new() { Name = "Your ratings" });

    /// <summary>Every rateable cell, in reading order (<c>data-cell</c> = "bid/criterion", <c>data-state</c> = saved, saving, draft, error, stale).</summary>
    public ILocator Cells => Grid.Locator("td[data-cell]");

    public ILocator Cell(string bid, string criterion) => Grid.Locator($"td[data-cell='{bid}/{criterion}']");

    /// <summary>Bids that cannot be rated, with the reason.</summary>
    public ILocator NotRateable => Grid.Locator("[data-testid=not-rateable]");

    /// <summary>"n of m cells done".</summary>
    public ILocator Progress => Page.Locator("[data-testid=progress]");

    /// <summary>The sheet's saved state (a live region).</summary>
    public ILocator SaveState => Page.Locator("[data-testid=sheet-save-state]");

    public ILocator Editor => Page.Locator("[data-testid=cell-editor]");

    public ILocator Rationale => Editor.GetByLabel("Rationale: what in the bid supports this rating");

    /// <summary>The cells the submission check lists, each a link to the cell.</summary>
    public ILocator Issues => Page.Locator("[data-testid=sheet-issues] li");

    /// <summary>Says the sheet was submitted (or the stage moved on) and is read-only.</summary>
    public ILocator Locked => Page.Locator("[data-testid=sheet-locked]");

    public async Task GotoAsync(Guid evaluation)
    {
        await Page.GotoAsync($"/evaluations/{evaluation}/ratings");
        await WaitUntilInteractiveAsync();
    }

    /// <summary>Rates the focused cell from the keyboard: the term's code, Enter, the rationale, Escape; waits until saved.</summary>
    public async Task RateFocusedAsync(string code, string rationale)
    {
        var cell = Grid.Locator("td[role=gridcell][tabindex='0']");
        var at = await cell.GetAttributeAsync("data-cell");
        await Page.Keyboard.TypeAsync(code);
        await Page.Keyboard.PressAsync("Enter");
        await Assertions.Expect(Rationale).ToBeFocusedAsync();
        await Page.Keyboard.InsertTextAsync(rationale);
        await Page.Keyboard.PressAsync("Escape");
        var rated = Grid.Locator($"td[data-cell='{at}']");
        await Assertions.Expect(rated).ToBeFocusedAsync();
        await Assertions.Expect(rated).ToHaveAttributeAsync("data-state", "saved");
    }

    /// <summary>
    /// Rates every rateable cell with <paramref name="code"/> and a rationale from <paramref name="rationale"/>
    /// (given "bid/criterion"), moving with the arrow keys only: right along a row, then Home and down.
    /// </summary>
    public async Task RateEveryCellAsync(string code, Func<string, string> rationale)
    {
        await WaitUntilInteractiveAsync();
        var cells = await Cells.EvaluateAllAsync<string[]>("cells => cells.map(c => c.dataset.cell)");
        var columns = await Grid.Locator("thead th[scope=col]").CountAsync() - 1;
        await Cell(cells[0].Split('/')[0], cells[0].Split('/')[1]).FocusAsync();
        for (var i = 0; i < cells.Length; i++)
        {
            await Assertions.Expect(Grid.Locator($"td[data-cell='{cells[i]}']")).ToBeFocusedAsync();
            await RateFocusedAsync(code, rationale(cells[i]));
            if (i == cells.Length - 1)
            {
                break;
            }

            if ((i + 1) % columns == 0)
            {
                await Page.Keyboard.PressAsync("Home");
                await Assertions.Expect(Grid.Locator($"td[data-cell='{cells[i + 1 - columns]}']")).ToBeFocusedAsync();
                await Page.Keyboard.PressAsync("ArrowDown");
            }
            else
            {
                await Page.Keyboard.PressAsync("ArrowRight");
            }
        }
    }

    /// <summary>Runs the check; when nothing is missing, confirms and waits until the sheet is read-only.</summary>
    public async Task SubmitAsync()
    {
        await Page.GetByRole(AriaRole.Button, new() { Name = "Check and submit…" }).ClickAsync();
        await Page.GetByRole(AriaRole.Button, new() { Name = "Submit and lock my sheet" }).ClickAsync();
        await Locked.WaitForAsync();
    }

    /// <summary>Runs the check only (the listed cells show in <see cref="Issues"/>).</summary>
    public Task CheckAsync() => Page.GetByRole(AriaRole.Button, new() { Name = "Check and submit…" }).ClickAsync();
}
