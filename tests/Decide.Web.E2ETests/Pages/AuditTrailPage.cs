using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The audit trail with its verification.</summary>
public sealed class AuditTrailPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Audit trail");

    public ILocator Verification => Page.Locator("[data-testid=verification]");

    public ILocator Entries => Page.GetByRole(AriaRole.Table, new() { Name = "Audit entries" }).Locator("tbody tr");
}
