using System.Text.RegularExpressions;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>
/// The facilitator's setup screen (seven steps: purpose, criteria, scales, bids, panel, method, review and lock), and
/// the administrator's "New evaluation" dialog on the list that comes before it.
/// </summary>
public sealed partial class SetupPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("Setup");

    public ILocator Steps => Page.GetByRole(AriaRole.Navigation, new() { Name = "Setup steps" });

    public ILocator StepTitle => Page.Locator("#step-title");

    /// <summary>The polite live region that says what was saved (or why not).</summary>
    public ILocator Status => Page.GetByTestId("save-status");

    public ILocator Problem => Page.Locator(".decide-problem");

    public ILocator ChangedElsewhere => Page.GetByTestId("changed-elsewhere");

    public ILocator Criterion(int index) => Page.GetByTestId($"criterion-{index}");

    public ILocator Seat(int index) => Page.GetByTestId($"seat-{index}");

    public ILocator Bid(int index) => Page.GetByTestId($"bid-{index}");

    public ILocator LockConfirmation => Page.GetByTestId("lock-confirmation");

    public ILocator LockBlocking => Page.GetByTestId("lock-blocking");

    public ILocator LockWarnings => Page.GetByTestId("lock-warnings");

    /// <summary>What the confirmation says becomes unchangeable, one item per part (data-lock = criteria, descriptors, scales, weights, tolerance, panel).</summary>
    public ILocator Locks => LockConfirmation.Locator("[data-lock]");

    public ILocator PlanHash => Page.GetByTestId("plan-hash");

    public ILocator OpenConfirmation => Page.GetByTestId("open-confirmation");

    /// <summary>A save goes through the service and the audit chain: on a busy machine it may take longer than Playwright's 5 s default.</summary>
    private static readonly LocatorAssertionsToContainTextOptions Saving = new() { Timeout = 30_000 };

    private static readonly LocatorAssertionsToBeVisibleOptions Shown = new() { Timeout = 30_000 };

    private ILocator Button(string name) => Page.GetByRole(AriaRole.Button, new() { Name = name, Exact = true });

    /// <summary>As an administrator on the evaluations list: opens "New evaluation", fills the dialog and creates it.</summary>
    public static async Task CreateEvaluationAsAdminAsync(IPage page, string reference, string title, string? organisation, string facilitatorEmail)
    {
        await new EvaluationsPage(page).WaitUntilInteractiveAsync();
        await page.GetByRole(AriaRole.Button, new() { Name = "New evaluation" }).ClickAsync();
        var dialog = page.GetByRole(AriaRole.Dialog);
        await dialog.GetByLabel("Buyer's reference").FillAsync(reference);
        await dialog.GetByLabel("Title", new() { Exact = true }).FillAsync(title);
        if (organisation is not null)
        {
            await dialog.GetByLabel("Buying organisation (optional)").FillAsync(organisation);
        }

        await dialog.GetByLabel("Facilitator's e-mail address").FillAsync(facilitatorEmail);
        await dialog.GetByRole(AriaRole.Button, new() { Name = "Create evaluation" }).ClickAsync();
    }

    /// <summary>The evaluation's id, read from the address of this screen.</summary>
    public Guid EvaluationId => Guid.Parse(IdInUrl().Match(Page.Url).Groups[1].Value);

    public async Task OpenStepAsync(string name)
    {
        await WaitUntilInteractiveAsync();
        await Steps.GetByRole(AriaRole.Button).Filter(new() { HasText = name }).ClickAsync();
        await Assertions.Expect(StepTitle).ToContainTextAsync(name);
    }

    /// <summary>Clicks "Save and continue" and waits until the status says <paramref name="saved"/>.</summary>
    public async Task SaveAndContinueAsync(string saved = "saved")
    {
        await Button("Save and continue").ClickAsync();
        await Assertions.Expect(Status).ToContainTextAsync(saved, Saving);
    }

    public async Task FillPurposeAsync(string purpose, string noun)
    {
        await Page.GetByLabel("Purpose of the evaluation").FillAsync(purpose);
        await Page.GetByLabel("What is chosen (plural)").FillAsync(noun);
        await Page.GetByLabel("What is chosen (plural)").PressAsync("Tab");
    }

    /// <summary>Adds a criterion. <paramref name="kind"/>: "words", "number" or "gate"; descriptors by term label ("Good").</summary>
    public async Task AddCriterionAsync(int index, string name, string kind = "words", bool cost = false, string? unit = null,
        string? description = null, IReadOnlyDictionary<string, string>? descriptors = null)
    {
        await Button("Add criterion").ClickAsync();
        var card = Criterion(index);
        await card.GetByLabel("Criterion name").FillAsync(name);
        if (kind != "words")
        {
            await card.GetByText(kind == "number" ? "A measured number (price, days)" : "Pass or fail (a gate)").ClickAsync();
        }

        if (cost)
        {
            await card.GetByText("Cost: less is better").ClickAsync();
        }

        if (unit is not null)
        {
            await card.GetByLabel("Unit (EUR, days)").FillAsync(unit);
        }

        if (description is not null)
        {
            await card.GetByLabel("What this criterion judges (shown to assessors)").FillAsync(description);
        }

        foreach (var (term, text) in descriptors ?? new Dictionary<string, string>())
        {
            await card.GetByLabel(new Regex($"^{Regex.Escape(term)} \\(")).FillAsync(text);
        }
    }

    public async Task ChooseRatingScaleAsync(string name) =>
        await Page.GetByTestId("rating-scale").GetByText(name, new() { Exact = true }).ClickAsync();

    public async Task AddBidAsync(int index, string code, string name)
    {
        await Button("Add bid").ClickAsync();
        await Page.GetByLabel($"Code of bid {index + 1}").FillAsync(code);
        await Page.GetByLabel($"Bidder's name of bid {index + 1}").FillAsync(name);
    }

    /// <summary>Adds an assessor seat (the default role) by account e-mail with an assessor code and weight.</summary>
    public async Task AddAssessorAsync(int index, string email, string code, double weight = 1)
    {
        await Button("Add seat").ClickAsync();
        var seat = Seat(index);
        await seat.GetByLabel($"E-mail address of seat {index + 1}").FillAsync(email);
        await seat.GetByLabel($"Assessor code of seat {index + 1}").FillAsync(code);
        if (weight != 1)
        {
            await seat.GetByLabel($"Weight of seat {index + 1}").FillAsync(weight.ToString(System.Globalization.CultureInfo.InvariantCulture));
        }
    }

    public async Task SetToleranceAsync(int steps) =>
        await Page.GetByLabel("Tolerance for disagreement (scale steps)").FillAsync(steps.ToString(System.Globalization.CultureInfo.InvariantCulture));

    /// <summary>On the last step: opens the lock confirmation (read it through <see cref="Locks"/>, <see cref="LockBlocking"/>, <see cref="LockWarnings"/>).</summary>
    public async Task AskToLockAsync()
    {
        await Button("Review and lock the plan…").ClickAsync();
        await Assertions.Expect(LockConfirmation).ToBeVisibleAsync(Shown);
    }

    /// <summary>Confirms the lock and waits for the plan's fingerprint.</summary>
    public async Task ConfirmLockAsync()
    {
        await LockConfirmation.GetByRole(AriaRole.Button, new() { Name = "Lock the plan" }).ClickAsync();
        await Assertions.Expect(PlanHash).ToBeVisibleAsync(Shown);
    }

    public async Task CancelLockAsync() => await LockConfirmation.GetByRole(AriaRole.Button, new() { Name = "Not yet" }).ClickAsync();

    public async Task AskToOpenScoringAsync()
    {
        await Button("Open scoring…").ClickAsync();
        await Assertions.Expect(OpenConfirmation).ToBeVisibleAsync();
    }

    public async Task ConfirmOpenScoringAsync()
    {
        await OpenConfirmation.GetByRole(AriaRole.Button, new() { Name = "Open scoring" }).ClickAsync();
        await Assertions.Expect(Status).ToContainTextAsync("Scoring is open", Saving);
    }

    [GeneratedRegex("/evaluations/([0-9a-f-]{36})")]
    private static partial Regex IdInUrl();
}
