using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The administrator's screen: new accounts, new evaluations, the list of accounts.</summary>
public sealed class AdministrationPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Administration");

    public ILocator Email => Page.GetByLabel("E-mail address", new() { Exact = true });

    public ILocator Name => Page.GetByLabel("Name as others see it");

    public ILocator Password => Page.GetByLabel("First password");

    public ILocator CreateAccount => Page.GetByRole(AriaRole.Button, new() { Name = "Create account" });

    public ILocator Reference => Page.GetByLabel("Buyer's reference");

    public ILocator EvaluationTitle => Page.GetByLabel("Title", new() { Exact = true });

    public ILocator FacilitatorEmail => Page.GetByLabel("Facilitator's e-mail address");

    public ILocator CreateEvaluation => Page.GetByRole(AriaRole.Button, new() { Name = "Create evaluation" });

    public ILocator Accounts => Page.GetByRole(AriaRole.Table, new() { Name = "Accounts" });

    public async Task CreateAccountAsync(string email, string name, string password)
    {
        await Email.FillAsync(email);
        await Name.FillAsync(name);
        await Password.FillAsync(password);
        await CreateAccount.ClickAsync();
    }
}
