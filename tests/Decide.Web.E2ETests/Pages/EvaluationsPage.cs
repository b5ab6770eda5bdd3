using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The list of the person's evaluations.</summary>
public sealed class EvaluationsPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Evaluations");

    /// <summary>What the list says when the person takes part in no evaluation.</summary>
    public ILocator Empty => Page.Locator(".decide-empty");

    public ILocator Evaluation(string reference) => Page.GetByRole(AriaRole.Link, new() { Name = reference, Exact = true });

    public async Task OpenAsync(string reference)
    {
        await WaitUntilInteractiveAsync();
        await Evaluation(reference).ClickAsync();
    }
}
