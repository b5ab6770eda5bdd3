using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// The end of the demo evaluation: the facilitator asks for sign-off through a confirmation that says what the last
/// approval locks; the approver approves with a statement and their password; the signed record is downloaded and
/// checked on the "Check a record" screen, once as issued and once with one byte changed.
/// </summary>
public sealed class SignOffJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const string Reference = "KVTA-2026-017";
    private const string Approver = "director@kestrel-vale.example";

    [Fact]
    public async Task The_facilitator_asks_the_approver_signs_off_and_the_record_checks_out_until_a_byte_changes()
    {
        var (facilitatorContext, facilitator, facilitatorWatch) = await site.OpenAsync();
        await using var _ = facilitatorContext;
        await facilitator.GotoAsync("/signin?returnUrl=%2Fevaluations");
        await new SignInPage(facilitator).SignInAsync(DecideServer.Facilitator, DecideServer.Password);
        await new EvaluationsPage(facilitator).OpenAsync(Reference);
        var overview = new OverviewPage(facilitator);
        await overview.OpenTabAsync("Sign-off");
        await Assertions.Expect(facilitator.GetByTestId("not-requested")).ToBeVisibleAsync();
        await overview.WaitUntilInteractiveAsync();
        await facilitator.GetByLabel("Note to the approvers").FillAsync("The panel recommends the top-ranked supplier; the moderation minutes are in the record.");
        await facilitator.GetByTestId("request").ClickAsync();
        await Assertions.Expect(facilitator.GetByTestId("confirm-request")).ToContainTextAsync("locked for good");
        await Evidence.ScreenshotAsync(facilitator, "signoff-01-request-confirmation");
        await Evidence.AssertAccessibleAsync(facilitator, "the sign-off request");
        await facilitator.GetByTestId("confirm-request-button").ClickAsync();
        await Assertions.Expect(facilitator.GetByTestId("request-note")).ToContainTextAsync("recommends the top-ranked supplier");

        var (approverContext, approver, approverWatch) = await site.OpenAsync();
        await using var __ = approverContext;
        await approver.GotoAsync("/signin?returnUrl=%2Fevaluations");
        await new SignInPage(approver).SignInAsync(Approver, DecideServer.Password);
        await new EvaluationsPage(approver).OpenAsync(Reference);
        var approverOverview = new OverviewPage(approver);
        await approverOverview.OpenTabAsync("Sign-off");
        await approverOverview.WaitUntilInteractiveAsync();
        await approver.GetByLabel("Your statement").FillAsync("I approve the award to the top-ranked supplier on the moderated scores.");
        await approver.GetByLabel("Your password, to confirm it is you").FillAsync(DecideServer.Password);
        await approver.GetByRole(AriaRole.Checkbox, new() { NameRegex = new("^I have read the results") }).CheckAsync();
        await Evidence.ScreenshotAsync(approver, "signoff-02-approval");
        await Evidence.AssertAccessibleAsync(approver, "the approval form");
        await approver.GetByTestId("approve").ClickAsync();
        await Assertions.Expect(approver.GetByTestId("signed-off")).ToBeVisibleAsync(new() { Timeout = 60_000 });
        await Assertions.Expect(approver.GetByTestId("archived-record")).ToBeVisibleAsync();
        await Assertions.Expect(approver.GetByTestId("self-signed")).ToContainTextAsync("not who signed it");
        await Evidence.ScreenshotAsync(approver, "signoff-03-signed-off");
        await Evidence.AssertAccessibleAsync(approver, "the signed-off evaluation");

        var download = await approver.RunAndWaitForDownloadAsync(() => approver.GetByTestId("download-record").ClickAsync());
        var path = Path.Combine(Path.GetTempPath(), $"decide-record-{Guid.NewGuid():N}.pdf");
        await download.SaveAsAsync(path);
        try
        {
            await approver.GetByRole(AriaRole.Link, new() { Name = "Check a record", Exact = true }).First.ClickAsync();
            await Assertions.Expect(approver.GetByRole(AriaRole.Heading, new() { Name = "Check a record", Level = 1 })).ToBeVisibleAsync();
            await approverOverview.WaitUntilInteractiveAsync();
            await approver.GetByTestId("record-file").SetInputFilesAsync(path);
            await Assertions.Expect(approver.GetByTestId("verdict")).ToContainTextAsync("passes every check", new() { Timeout = 60_000 });
            await Assertions.Expect(approver.Locator("[data-testid=checks] tbody tr")).ToHaveCountAsync(5);
            await Evidence.ScreenshotAsync(approver, "signoff-04-record-checked");
            await Evidence.AssertAccessibleAsync(approver, "the record check");

            var bytes = await File.ReadAllBytesAsync(path);
            bytes[bytes.Length / 2] ^= 0x01;
            var changed = Path.ChangeExtension(path, ".changed.pdf");
            await File.WriteAllBytesAsync(changed, bytes);
            await approver.GetByTestId("record-file").SetInputFilesAsync(changed);
            await Assertions.Expect(approver.GetByTestId("verdict")).ToContainTextAsync("fails", new() { Timeout = 60_000 });
            await Assertions.Expect(approver.Locator("tr[data-check='document unchanged since signing']")).ToContainTextAsync("no");
            await Evidence.ScreenshotAsync(approver, "signoff-05-changed-record");
            File.Delete(changed);
        }
        finally
        {
            File.Delete(path);
        }

        facilitatorWatch.AssertClean();
        approverWatch.AssertClean();
    }
}
