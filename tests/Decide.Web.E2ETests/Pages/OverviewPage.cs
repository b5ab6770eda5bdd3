using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>One evaluation's overview, with the tabs to its other screens.</summary>
public sealed class OverviewPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Overview");

    public ILocator Stages => Page.GetByRole(AriaRole.Heading, new() { Name = "Stages" });

    public ILocator ScalePlots => Page.Locator("svg[aria-label^='Triangles of the scale']");

    private ILocator Tabs => Page.GetByRole(AriaRole.Navigation, new() { Name = "This evaluation" });

    public async Task OpenTabAsync(string name)
    {
        await WaitUntilInteractiveAsync();
        await Tabs.GetByRole(AriaRole.Link, new() { Name = name, Exact = true }).ClickAsync();
    }
}
