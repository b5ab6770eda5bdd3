using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>Measured values and gate results, bid by bid, saved cell by cell.</summary>
public sealed class ValuesPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Values and gates");

    public ILocator ValuesTable => Page.Locator("[data-testid=values-table]");

    public ILocator GatesTable => Page.Locator("[data-testid=gates-table]");

    /// <summary>Why the values cannot be changed now (absent when they can).</summary>
    public ILocator ValuesReadOnly => Page.Locator("[data-testid=values-read-only]");

    /// <summary>Why the gate results cannot be changed now (absent when they can).</summary>
    public ILocator GatesReadOnly => Page.Locator("[data-testid=gates-read-only]");

    /// <summary>A value cell by bid code and criterion id.</summary>
    public ILocator Value(string alternative, string criterion) => ValuesTable.Locator($"[data-cell='{alternative}/{criterion}']");

    /// <summary>A gate cell by bid code and gate id.</summary>
    public ILocator Gate(string alternative, string gate) => GatesTable.Locator($"[data-cell='{alternative}/{gate}']");

    /// <summary>The saved state said beside a cell ("Saved", "Not saved: …", or who entered it and when).</summary>
    public static ILocator State(ILocator cell) => cell.Locator("[role=status]");

    /// <summary>Types a value and leaves the field, which saves it.</summary>
    public async Task EnterValueAsync(string alternative, string criterion, string value)
    {
        await WaitUntilInteractiveAsync();
        var input = Value(alternative, criterion).Locator("input");
        await input.FillAsync(value);
        await input.PressAsync("Tab");
    }

    /// <summary>Records a gate result; a fail needs a note.</summary>
    public async Task RecordGateAsync(string alternative, string gate, bool passed, string? note)
    {
        await WaitUntilInteractiveAsync();
        var cell = Gate(alternative, gate);
        await cell.GetByLabel(passed ? "Pass" : "Fail", new() { Exact = true }).CheckAsync();
        await cell.Locator("textarea").FillAsync(note ?? "");
        await cell.GetByRole(AriaRole.Button).ClickAsync();
    }
}
