using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>What every interactive screen has: the layout's caution, the app bar, and a marker once it is live.</summary>
public abstract class Screen(IPage page)
{
    protected IPage Page { get; } = page;

    public ILocator Caution => Page.Locator("footer[data-testid=caution]");

    public ILocator SignOut => Page.GetByRole(AriaRole.Button, new() { Name = "Sign out" });

    /// <summary>Waits until the screen answers clicks (prerendered HTML shows first and loses them).</summary>
    public Task WaitUntilInteractiveAsync() =>
        Page.Locator("[data-testid=interactive]").WaitForAsync(new() { State = WaitForSelectorState.Attached });

    protected ILocator Heading(string name) => Page.GetByRole(AriaRole.Heading, new() { Name = name, Level = 1, Exact = true });
}
