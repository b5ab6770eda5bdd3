using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The sign-in screen (plain HTML, no interactivity to wait for).</summary>
public sealed class SignInPage(IPage page)
{
    public ILocator Heading => page.GetByRole(AriaRole.Heading, new() { Name = "Sign in", Level = 1 });

    public ILocator Email => page.GetByLabel("E-mail address");

    public ILocator Password => page.GetByLabel("Password");

    public ILocator Submit => page.GetByRole(AriaRole.Button, new() { Name = "Sign in" });

    public ILocator Alert => page.GetByRole(AriaRole.Alert);

    /// <summary>Fills in the form and sends it; the browser then follows the redirect.</summary>
    public async Task SignInAsync(string email, string password)
    {
        await Email.FillAsync(email);
        await Password.FillAsync(password);
        await Submit.ClickAsync();
    }
}
