using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>The declaration an assessor or price evaluator signs first, and confirms against the bidders' names once scoring opens.</summary>
public sealed class DeclarationPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Declaration");

    public ILocator Accept => Page.GetByLabel("I have read this declaration and I accept it.");

    public ILocator Sign => Page.GetByRole(AriaRole.Button, new() { Name = "Sign the declaration" });

    /// <summary>Says which version was signed and when.</summary>
    public ILocator Signed => Page.Locator("[data-testid=declaration-signed]");

    /// <summary>Says when the declaration was confirmed against the bidders' names.</summary>
    public ILocator NamesConfirmed => Page.Locator("[data-testid=names-confirmed]");

    /// <summary>The bidders to confirm against, one item each (<c>data-bid</c> holds the code).</summary>
    public ILocator Bidders => Page.GetByRole(AriaRole.List, new() { Name = "Bidders" }).Locator("li");

    public ILocator Problem => Page.Locator(".decide-problem");

    public async Task GotoAsync(Guid evaluation)
    {
        await Page.GotoAsync($"/evaluations/{evaluation}/declaration");
        await WaitUntilInteractiveAsync();
    }

    /// <summary>Accepts the declaration and waits until it is recorded.</summary>
    public async Task SignAsync()
    {
        await WaitUntilInteractiveAsync();
        await Accept.CheckAsync();
        await Sign.ClickAsync();
        await Signed.WaitForAsync();
    }

    /// <summary>Ticks the conflict box for one bidder and says what the interest is (confirm with <see cref="ConfirmNamesAsync"/>).</summary>
    public async Task DeclareConflictAsync(string bidderCode, string statement)
    {
        var item = Page.Locator($"li[data-bid='{bidderCode}']");
        await item.GetByLabel("I have a conflict of interest with this bidder").CheckAsync();
        await item.GetByLabel("What the interest is").FillAsync(statement);
    }

    /// <summary>Confirms the declaration against the names with whatever conflicts are ticked (none: "no conflict").</summary>
    public async Task ConfirmNamesAsync()
    {
        await WaitUntilInteractiveAsync();
        await Page.GetByRole(AriaRole.Button, new() { NameRegex = new("^Confirm(:| and declare)") }).ClickAsync();
        await Page.Locator("[data-testid=names-confirmation]").GetByRole(AriaRole.Button, new() { Name = "Confirm", Exact = true }).ClickAsync();
        await NamesConfirmed.WaitForAsync();
    }

    /// <summary>Confirms the names declaring no conflict of interest with any bidder.</summary>
    public Task ConfirmNoConflictAsync() => ConfirmNamesAsync();
}
