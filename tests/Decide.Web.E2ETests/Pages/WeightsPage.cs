using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Pages;

/// <summary>
/// The assessor's weights: importance terms per criterion and group, or pairwise comparisons one pair at a time
/// with the matrix and its consistency beside them. Every choice saves itself; <see cref="SaveState"/> says so.
/// </summary>
public sealed class WeightsPage(IPage page) : Screen(page)
{
    public ILocator Title => Heading("My weights");

    /// <summary>"Saving…", "All changes saved." or "Not saved: …" (a live region).</summary>
    public ILocator SaveState => Page.Locator("[data-testid=save-state]");

    /// <summary>"How much more important is A than B?"</summary>
    public ILocator Question => Page.Locator("[data-testid=pair-question]");

    public ILocator PairMeaning => Page.Locator("[data-testid=pair-meaning]");

    public ILocator Matrix => Page.Locator("[data-testid=matrix]");

    public ILocator ConsistencyRatio => Page.Locator("[data-testid=consistency-ratio]");

    public ILocator WorstJudgement => Page.Locator("[data-testid=worst-judgement]");

    public ILocator UseSuggested => Page.GetByRole(AriaRole.Button, new() { NameRegex = new("^Use suggested") });

    public ILocator Triads => Page.Locator("[data-testid=triad]");

    public ILocator Next => Page.GetByRole(AriaRole.Button, new() { Name = "Next pair" });

    public ILocator Previous => Page.GetByRole(AriaRole.Button, new() { Name = "Previous pair" });

    /// <summary>Says the weights were submitted (or the plan locked) and are read-only.</summary>
    public ILocator Locked => Page.Locator("[data-testid=weights-locked]");

    public ILocator Missing => Page.Locator("[data-testid=weights-missing]");

    public async Task GotoAsync(Guid evaluation)
    {
        await Page.GotoAsync($"/evaluations/{evaluation}/weights");
        await WaitUntilInteractiveAsync();
    }

    /// <summary>Chooses an importance term (by its label) for a criterion or group (by its id) and waits until it is saved.</summary>
    public async Task ChooseImportanceAsync(string node, string termLabel)
    {
        await Page.Locator($"fieldset[data-node='{node}']").GetByText(termLabel, new() { Exact = true }).ClickAsync();
        await Assertions.Expect(SaveState).ToHaveTextAsync("All changes saved.");
    }

    /// <summary>Chooses a pairwise-scale term (its code, "5" or "1/5") for the pair shown, and waits until it is saved.</summary>
    public async Task ChooseAsync(string code)
    {
        await Page.Locator($".decide-pair-option:has(input[value='{code}']) label").ClickAsync();
        await Assertions.Expect(PairMeaning).ToContainTextAsync(code.StartsWith("1/", StringComparison.Ordinal) ? $"({code[2..]})" : $"({code})");
        await Assertions.Expect(SaveState).ToHaveTextAsync("All changes saved.");
    }

    /// <summary>The two names in the question shown.</summary>
    public async Task<(string First, string Second)> PairAsync()
    {
        var text = await Question.InnerTextAsync();
        const string lead = "How much more important is ";
        var body = text.Trim()[lead.Length..].TrimEnd('?');
        var at = body.IndexOf(" than ", StringComparison.Ordinal);
        return (body[..at], body[(at + " than ".Length)..]);
    }

    /// <summary>
    /// Enters every pair from a table of (more important, less important or equal) names → code of how many times
    /// as important the first is; a pair shown the other way round gets the reciprocal. Goes pair by pair with Next.
    /// </summary>
    public async Task EnterAllAsync(IReadOnlyDictionary<(string Row, string Col), string> judgements)
    {
        await WaitUntilInteractiveAsync();
        var count = judgements.Count;
        while (await Previous.IsEnabledAsync())
        {
            await Previous.ClickAsync();
        }

        for (var i = 0; i < count; i++)
        {
            var (first, second) = await PairAsync();
            var code = judgements.TryGetValue((first, second), out var given) ? given
                : judgements.TryGetValue((second, first), out var other) ? Reciprocal(other)
                : throw new InvalidOperationException($"The table has no judgement for {first} and {second}.");
            await ChooseAsync(code);
            if (i < count - 1)
            {
                await Next.ClickAsync();
                await Assertions.Expect(Question).Not.ToHaveTextAsync($"How much more important is {first} than {second}?");
            }
        }
    }

    /// <summary>Submits the weights through the confirmation and waits until they are read-only.</summary>
    public async Task SubmitAsync()
    {
        await Page.GetByRole(AriaRole.Button, new() { Name = "Submit my weights…" }).ClickAsync();
        await Page.GetByRole(AriaRole.Button, new() { Name = "Submit and lock my weights" }).ClickAsync();
        await Locked.WaitForAsync();
    }

    private static string Reciprocal(string code) =>
        code == "1" ? "1" : code.StartsWith("1/", StringComparison.Ordinal) ? code[2..] : "1/" + code;
}
