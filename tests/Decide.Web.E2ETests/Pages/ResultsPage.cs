using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The results screen: summary, ranking, weights, explanations and the robustness checks.</summary>
public sealed class ResultsPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Results");

    public ILocator RankingRows => Page.GetByRole(AriaRole.Table, new() { Name = "Ranking" }).Locator("tbody tr");

    public ILocator SummaryLines => Page.Locator(".decide-summary li");

    public ILocator Acceptability => Page.GetByRole(AriaRole.Table, new() { Name = "Rank acceptability" });

    public ILocator Sweeps => Page.Locator("[data-sweep]");

    /// <summary>Waits until the robustness checks have been shown (their progress bar is gone).</summary>
    public async Task WaitForRobustnessAsync()
    {
        await Page.GetByRole(AriaRole.Heading, new() { Name = "Rank acceptability" }).WaitForAsync(new() { Timeout = 90_000 });
    }
}
