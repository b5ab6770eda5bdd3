using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using Decide.Web.E2ETests.Pages;
using Decide.Web.E2ETests.Support;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests;

/// <summary>
/// A grant round of 120 invented applications and 24 reviewers, three reviewers per application, run in the screens
/// where the issue asks for them: the facilitator takes the applications from a spreadsheet, asks Decide for who reads
/// what, two reviewers score their sheets by keyboard, the facilitator follows the board and reads the results with
/// their bands and funding line. The other twenty-two reviewers, the weights and the stage moves go through the API,
/// as a script would, to keep the journey to what is being checked.
/// </summary>
public sealed class GrantRoundJourneyTests(BrowserSite site) : IClassFixture<BrowserSite>
{
    private const int Applications = 120;
    private const int Reviewers = 24;
    private static readonly string[] Fields = ["soil", "water", "heritage", "youth"];

    [Fact]
    public async Task A_round_of_120_applications_is_imported_assigned_scored_and_ranked_with_its_funding_line()
    {
        var tag = Guid.NewGuid().ToString("N")[..6];
        using var admin = await SignInAsync(DecideServer.Administrator);
        var emails = Enumerable.Range(1, Reviewers).Select(i => $"rev{i:00}.{tag}@vale-fund.example").ToArray();
        for (var i = 0; i < Reviewers; i++)
        {
            await Ok(await admin.PostAsJsonAsync("/api/accounts", new { email = emails[i], displayName = $"Reviewer {i + 1:00} (Vale Fund, invented)", password = DecideServer.Password }));
        }

        var reference = $"VF-{tag}";
        var created = await Ok(await admin.PostAsJsonAsync("/api/evaluations",
            new { reference, title = "Vale Community Fund 2027", organisation = "Vale Community Fund (fictitious)", facilitatorEmail = DecideServer.Facilitator }));
        var id = created.GetProperty("id").GetGuid();
        string Url(string path = "") => $"/api/evaluations/{id}{path}";
        using var f = await SignInAsync(DecideServer.Facilitator);
        async Task<long> Version() => (await Ok(await f.GetAsync(Url()))).GetProperty("summary").GetProperty("version").GetInt64();
        await Ok(await f.PutAsJsonAsync(Url("/plan"), new
        {
            plan = new Dictionary<string, object?>
            {
                ["format"] = "decide-evaluation/1", ["title"] = "Vale Community Fund 2027", ["reference"] = reference, ["noun"] = "applications",
                ["criteria"] = new object[] { new { id = "merit", name = "Need and merit" }, new { id = "plan", name = "Plan and budget" } },
                ["weighting"] = "importance",
                ["reviews"] = new { reviewersPerApplication = 3, maxLoad = 20, assigned = new { } },
                ["funding"] = new { budget = 400_000, rule = "stop-at-first-unaffordable", currency = "EUR" },
            },
            settings = new { minRationaleLength = 10, pricesVisibleToAssessors = false, requiredApprovals = 1 },
            version = await Version(),
        }));
        await Ok(await f.PutAsJsonAsync(Url("/panel"), new
        {
            seats = emails.Select((e, i) => new { email = e, role = "assessor", assessorCode = $"rev{i + 1:00}", topics = new[] { Fields[i % 4], Fields[(i + 1) % 4] } }).ToArray(),
            version = await Version(),
        }));

        // The facilitator takes the 120 applications from a spreadsheet on the setup screen: preview, then store.
        var (context, page, watch) = await site.OpenAsync();
        await using var _ = context;
        await page.GotoAsync("/evaluations");
        await new SignInPage(page).SignInAsync(DecideServer.Facilitator, DecideServer.Password);
        await page.GotoAsync($"/evaluations/{id}/setup");
        var setup = new SetupPage(page);
        await setup.OpenStepAsync("Bids");
        var upload = page.GetByTestId("bids-upload");
        await upload.Locator("summary").ClickAsync();
        var file = Path.Combine(Path.GetTempPath(), $"vale-fund-{tag}.xlsx");
        await File.WriteAllBytesAsync(file, Workbook());
        await upload.Locator("input[type=file]").SetInputFilesAsync(file);
        await Assertions.Expect(page.GetByTestId("upload-preview")).ToContainTextAsync("holds 120 applications");
        await Evidence.ScreenshotAsync(page, "grant-01-import-preview");
        await page.GetByTestId("upload-store").ClickAsync();
        await Assertions.Expect(setup.Status).ToContainTextAsync("taken from the file and saved");
        Assert.Equal(Applications, (await Ok(await f.GetAsync(Url()))).GetProperty("bids").GetArrayLength());

        // The reviewers weigh the two criteria and confirm their declaration against the names (API).
        foreach (var email in emails)
        {
            await AssessorApi.SubmitImportanceAsync(site.Server.BaseUrl, email, id, "H");
        }

        await Ok(await f.PostAsJsonAsync(Url("/lock-plan"), new { version = await Version() }));
        foreach (var email in emails)
        {
            using var r = await SignInAsync(email);
            await Ok(await r.PostAsJsonAsync(Url("/declaration/names"), new { conflicts = Array.Empty<object>() }));
        }

        // Who reads what: Decide's proposal, 15 each, every application linked.
        await page.GotoAsync($"/evaluations/{id}/assignment");
        await new OverviewPage(page).WaitUntilInteractiveAsync();
        await page.GetByTestId("propose").ClickAsync();
        await Assertions.Expect(page.GetByTestId("assignment-figures")).ToContainTextAsync("15 each");
        await Assertions.Expect(page.GetByTestId("assignment-ready")).ToBeVisibleAsync();
        await Evidence.ScreenshotAsync(page, "grant-02-proposed-assignment");
        await Ok(await f.PostAsJsonAsync(Url("/open-scoring"), new { version = await Version() }));

        // Two reviewers score their fifteen applications by keyboard; the others through the API.
        for (var i = 0; i < 2; i++)
        {
            var (reviewerContext, reviewerPage, reviewerWatch) = await site.OpenAsync();
            await using var __ = reviewerContext;
            await reviewerPage.GotoAsync("/evaluations");
            await new SignInPage(reviewerPage).SignInAsync(emails[i], DecideServer.Password);
            var ratings = new RatingsPage(reviewerPage);
            await ratings.GotoAsync(id);
            await Assertions.Expect(ratings.Cells).ToHaveCountAsync(15 * 2);
            await ratings.RateEveryCellAsync(i == 0 ? "G" : "MG", cell => $"Section 2 of {cell.Split('/')[0]} sets out the steps.");
            await ratings.SubmitAsync();
            reviewerWatch.AssertClean();
        }

        var random = new Random(2027);
        string[] terms = ["F", "MG", "G", "VG"];
        foreach (var email in emails.Skip(2))
        {
            using var r = await SignInAsync(email);
            var sheet = await Ok(await r.GetAsync(Url("/my/sheet")));
            foreach (var cell in sheet.GetProperty("cells").EnumerateArray())
            {
                await Ok(await r.PutAsJsonAsync(Url($"/my/ratings/{cell.GetProperty("alternative").GetString()}/{cell.GetProperty("criterion").GetString()}"),
                    new { term = terms[random.Next(terms.Length)], rationale = "The application's section 2 shows this." }));
            }

            await Ok(await r.PostAsJsonAsync(Url("/my/submit"), new { }));
        }

        // The board shows every sheet in; moderation starts; the results carry the bands and the funding line.
        await page.GotoAsync($"/evaluations/{id}/board");
        var board = new BoardPage(page);
        await board.WaitUntilInteractiveAsync();
        await Assertions.Expect(board.Rows).ToHaveCountAsync(Reviewers);
        await Evidence.ScreenshotAsync(page, "grant-03-board");
        await Ok(await f.PostAsJsonAsync(Url("/start-moderation"), new { version = await Version() }));
        await page.GotoAsync($"/evaluations/{id}/results");
        var results = new ResultsPage(page);
        await results.WaitForRobustnessAsync();
        await Assertions.Expect(page.GetByTestId("round-table")).ToBeVisibleAsync();
        await Assertions.Expect(page.GetByTestId("funding-summary")).ToContainTextAsync("Budget 400,000 EUR");
        await Evidence.ScreenshotAsync(page, "grant-04-results");
        watch.AssertClean();
        File.Delete(file);
    }

    /// <summary>120 invented applications: code, name, field and amount requested.</summary>
    private static byte[] Workbook()
    {
        var rows = new List<string[]> { new[] { "Code", "Name", "Field", "Requested" } };
        rows.AddRange(Enumerable.Range(1, Applications).Select(i => new[] { $"VF{i:000}", $"Project {i:000} of the Vale", Fields[i % 4], $"{5000 + (i * 37 % 20) * 1000}" }));
        using var stream = new MemoryStream();
        using (var document = SpreadsheetDocument.Create(stream, SpreadsheetDocumentType.Workbook))
        {
            var workbook = document.AddWorkbookPart();
            workbook.Workbook = new Workbook();
            var part = workbook.AddNewPart<WorksheetPart>();
            var data = new SheetData();
            for (var r = 0; r < rows.Count; r++)
            {
                var row = new Row { RowIndex = (uint)(r + 1) };
                for (var c = 0; c < rows[r].Length; c++)
                {
                    row.Append(new Cell { CellReference = $"{(char)('A' + c)}{r + 1}", DataType = CellValues.InlineString, InlineString = new InlineString(new Text(rows[r][c])) });
                }

                data.Append(row);
            }

            part.Worksheet = new Worksheet(data);
            workbook.Workbook.AppendChild(new Sheets(new Sheet { Id = workbook.GetIdOfPart(part), SheetId = 1, Name = "Applications" }));
        }

        return stream.ToArray();
    }

    private async Task<HttpClient> SignInAsync(string email)
    {
        var client = new HttpClient { BaseAddress = new Uri(site.Server.BaseUrl) };
        var token = await Ok(await client.PostAsJsonAsync("/api/auth/login", new { email, password = DecideServer.Password }));
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token.GetProperty("accessToken").GetString());
        return client;
    }

    private static async Task<JsonElement> Ok(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, $"{response.RequestMessage?.Method} {response.RequestMessage?.RequestUri} answered {(int)response.StatusCode}: {body}");
        return body.Length == 0 ? default : JsonDocument.Parse(body).RootElement.Clone();
    }
}
