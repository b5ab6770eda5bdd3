using System.Globalization;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Web.Components.Shared;
using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Decide.Web.Features.Accounts;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// People using the screens in a real browser against the seeded demo: the facilitator reads the results with the
/// robustness checks, the observer finds the audit trail intact. Every screen is photographed, scanned for serious
/// accessibility problems, and watched for failed requests and console errors.
/// </summary>
public sealed class JourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "KVTA-2026-017";

    [Fact]
    public async Task The_facilitator_signs_in_opens_the_demo_and_reads_the_ranking_and_its_robustness()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        // A screen opened without signing in leads to the sign-in screen, which remembers where the person was going.
        await page.GotoAsync("/evaluations");
        var signIn = new SignInPage(page);
        await Assertions.Expect(signIn.Heading).ToBeVisibleAsync();
        Assert.Contains("/signin", page.Url, StringComparison.Ordinal);
        await Evidence.ScreenshotAsync(page, "01-sign-in");
        await Evidence.AssertAccessibleAsync(page, "the sign-in screen");
        await signIn.SignInAsync(DecideServer.Facilitator, DecideServer.Password);

        var list = new EvaluationsPage(page);
        await Assertions.Expect(list.Title).ToBeVisibleAsync();
        await Assertions.Expect(list.Caution).ToContainTextAsync(Caution.Text);
        await list.WaitUntilInteractiveAsync();
        await Evidence.ScreenshotAsync(page, "02-evaluations");
        await Evidence.AssertAccessibleAsync(page, "the list of evaluations");
        await list.OpenAsync(Reference);

        var overview = new OverviewPage(page);
        await Assertions.Expect(overview.Title).ToBeVisibleAsync();
        await Assertions.Expect(overview.ScalePlots.First).ToBeVisibleAsync();
        await overview.WaitUntilInteractiveAsync();
        await Evidence.ScreenshotAsync(page, "03-overview");
        await Evidence.AssertAccessibleAsync(page, "the evaluation's overview");
        await overview.OpenTabAsync("Results");

        var results = new ResultsPage(page);
        await Assertions.Expect(results.Title).ToBeVisibleAsync();
        await results.WaitForRobustnessAsync();

        // The engine, run here on the same demo file, says what the screen must show.
        var expected = ExpectedDemo();
        await Assertions.Expect(results.RankingRows).ToHaveCountAsync(expected.Analysis.Ranking.Count);
        for (var i = 0; i < expected.Analysis.Ranking.Count; i++)
        {
            var ranked = expected.Analysis.Ranking[i];
            var row = results.RankingRows.Nth(i);
            await Assertions.Expect(row).ToContainTextAsync(expected.Names[ranked.Alternative]);
            await Assertions.Expect(row).ToContainTextAsync(ranked.Closeness.ToString("F4", CultureInfo.InvariantCulture));
        }

        await Assertions.Expect(results.SummaryLines).ToHaveTextAsync(expected.Robustness.Summary.ToArray());
        await Assertions.Expect(results.Acceptability).ToBeVisibleAsync();
        await Assertions.Expect(results.Sweeps).ToHaveCountAsync(expected.Robustness.Sensitivity.Sweeps.Count);
        await Evidence.ScreenshotAsync(page, "04-results");
        await Evidence.AssertAccessibleAsync(page, "the results");

        // The same screen on a tablet held upright.
        await page.SetViewportSizeAsync(800, 1100);
        await Evidence.ScreenshotAsync(page, "05-results-tablet");
        watch.AssertClean();
    }

    [Fact]
    public async Task The_observer_opens_the_audit_trail_and_sees_it_intact()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        await page.GotoAsync("/signin");
        await new SignInPage(page).SignInAsync(DecideServer.Observer, DecideServer.Password);
        var list = new EvaluationsPage(page);
        await Assertions.Expect(list.Title).ToBeVisibleAsync();
        await list.OpenAsync(Reference);

        var overview = new OverviewPage(page);
        await Assertions.Expect(overview.Title).ToBeVisibleAsync();
        await overview.OpenTabAsync("Audit trail");

        var audit = new AuditTrailPage(page);
        await Assertions.Expect(audit.Title).ToBeVisibleAsync();
        await Assertions.Expect(audit.Verification).ToContainTextAsync("intact");
        await Assertions.Expect(audit.Entries.First).ToContainTextAsync("evaluation.seeded");
        await Assertions.Expect(audit.Caution).ToContainTextAsync(Caution.Text);
        await audit.WaitUntilInteractiveAsync();
        await Evidence.ScreenshotAsync(page, "06-audit-trail");
        await Evidence.AssertAccessibleAsync(page, "the audit trail");
        watch.AssertClean();
    }

    [Fact]
    public async Task A_wrong_password_keeps_the_person_on_the_sign_in_screen_with_a_clear_message()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        await page.GotoAsync("/signin");
        var signIn = new SignInPage(page);
        await signIn.SignInAsync(DecideServer.Observer, DecideServer.Password + "-wrong");
        await Assertions.Expect(signIn.Alert).ToContainTextAsync("The e-mail address or the password is wrong");
        await Assertions.Expect(signIn.Heading).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "07-sign-in-failed");
        watch.AssertClean();
    }

    [Fact]
    public async Task The_administrator_creates_an_account_and_an_evaluation_and_the_new_holder_is_told_who_creates_evaluations()
    {
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;

        await page.GotoAsync("/signin?returnUrl=%2Fadmin");
        await new SignInPage(page).SignInAsync(DecideServer.Administrator, DecideServer.Password);
        var admin = new AdministrationPage(page);
        await Assertions.Expect(admin.Title).ToBeVisibleAsync();
        await admin.WaitUntilInteractiveAsync();

        // A password below the rules is refused, and the reason stands by the password field.
        const string email = "tilbury@kestrel-vale.example";
        await admin.CreateAccountAsync(email, "Morwenna Tilbury (Fleet Engineer)", "short");
        await Assertions.Expect(page.GetByText("at least 12 characters").First).ToBeVisibleAsync();
        await Assertions.Expect(admin.Accounts).Not.ToContainTextAsync(email);

        const string password = "Tilbury-fleet-2026";
        await admin.Password.FillAsync(password);
        await admin.CreateAccount.ClickAsync();
        await Assertions.Expect(admin.Accounts).ToContainTextAsync(email);

        // An evaluation for a facilitator without an account is refused, naming the address; with the demo facilitator it is created.
        await admin.Reference.FillAsync("KVTA-2026-031");
        await admin.EvaluationTitle.FillAsync("Depot charging equipment");
        await admin.FacilitatorEmail.FillAsync("nobody@kestrel-vale.example");
        await admin.CreateEvaluation.ClickAsync();
        await Assertions.Expect(page.GetByText("no account has the e-mail address nobody@kestrel-vale.example")).ToBeVisibleAsync();
        await admin.FacilitatorEmail.FillAsync(DecideServer.Facilitator);
        await admin.CreateEvaluation.ClickAsync();
        await Assertions.Expect(page.GetByText("Evaluation KVTA-2026-031 created")).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "08-administration");
        await Evidence.AssertAccessibleAsync(page, "the administration screen");

        await admin.SignOut.ClickAsync();
        var signIn = new SignInPage(page);
        await Assertions.Expect(signIn.Heading).ToBeVisibleAsync();
        await signIn.SignInAsync(email, password);
        var list = new EvaluationsPage(page);
        await Assertions.Expect(list.Empty).ToContainTextAsync("An administrator creates evaluations");
        await Evidence.ScreenshotAsync(page, "09-no-evaluations-yet");
        watch.AssertClean();
    }

    private static (AnalysisResult Analysis, RobustnessResult Robustness, Dictionary<string, string> Names) ExpectedDemo()
    {
        var file = EvaluationFileReader.ReadFile(Path.Combine(AppContext.BaseDirectory, "samples", DemoSeeder.DemoFile));
        var prepared = DecisionEngine.Prepare(file.Evaluation);
        var analysis = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, analysis, new RobustnessOptions());
        return (analysis, robustness, file.Evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name));
    }
}
