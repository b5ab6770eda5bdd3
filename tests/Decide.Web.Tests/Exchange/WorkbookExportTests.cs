using System.Net;
using System.Net.Http.Json;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Exchange;

/// <summary>
/// The .xlsx extracts, opened again with the Open XML SDK: the grant demo's assignment and its results with the bands
/// and the funding line, the demo tender's ratings; every text is an inline string (never a formula) and every
/// figure a number.
/// </summary>
public sealed class WorkbookExportTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    private const string GrantsFacilitator = "grants@" + DemoSeeder.RoundDomain;

    private sealed record Summary(Guid Id, string Reference);

    private static Dictionary<string, List<List<string>>> Sheets(byte[] content)
    {
        using var document = SpreadsheetDocument.Open(new MemoryStream(content), false);
        var workbook = document.WorkbookPart!;
        var result = new Dictionary<string, List<List<string>>>();
        foreach (var sheet in workbook.Workbook.Sheets!.Elements<Sheet>())
        {
            var part = (WorksheetPart)workbook.GetPartById(sheet.Id!);
            Assert.Empty(part.Worksheet.Descendants<CellFormula>());
            result[sheet.Name!] = part.Worksheet.Descendants<Row>().Select(r => r.Elements<Cell>().Select(c =>
                c.DataType?.Value == CellValues.InlineString ? c.InlineString!.InnerText : c.CellValue?.Text ?? "").ToList()).ToList();
        }

        return result;
    }

    private async Task<(HttpClient Client, Guid Id)> GrantRoundAsync()
    {
        var client = await factory.SignInAsync(GrantsFacilitator);
        var list = await client.GetFromJsonAsync<List<Summary>>("/api/evaluations");
        return (client, list!.Single(e => e.Reference == "MCGF-2027-R1").Id);
    }

    [Fact]
    public async Task The_assignment_lists_each_reviewers_applications_and_each_applications_readers()
    {
        var (client, id) = await GrantRoundAsync();
        using var _ = client;
        var response = await client.GetAsync($"/api/evaluations/{id}/export/assignment.xlsx");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var sheets = Sheets(await response.Content.ReadAsByteArrayAsync());
        var reviewers = sheets["Reviewers"];
        Assert.Equal(["Code", "Reviewer", "Fields", "Reads", "Applications"], reviewers[0]);
        var lindgren = reviewers.Single(r => r[0] == "lindgren");
        Assert.Equal("6", lindgren[3]);
        Assert.Contains("Leyfield Pond Rescue", lindgren[4]);
        Assert.Equal(13, sheets["Applications"].Count); // the header and twelve applications
    }

    [Fact]
    public async Task The_results_carry_the_ranking_and_the_funding_line()
    {
        var (client, id) = await GrantRoundAsync();
        using var _ = client;
        var sheets = Sheets(await client.GetByteArrayAsync($"/api/evaluations/{id}/export/results.xlsx"));
        Assert.Equal(13, sheets["Ranking"].Count);
        var funding = sheets["Bands and funding"];
        Assert.Equal(["Place", "Code", "Application", "Band", "Best likely place", "Worst likely place", "Requested", "Funded"], funding[0]);
        Assert.Equal(6, funding.Count(r => r[^1] == "funded")); // 57,000 of 60,000, worked by hand in samples/README.md
        Assert.Equal("15000", funding[1][6]);
    }

    [Fact]
    public async Task The_ratings_of_the_demo_tender_come_with_their_rationales_and_a_tender_has_no_assignment()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var sheets = Sheets(await client.GetByteArrayAsync($"/api/evaluations/{id}/export/ratings.xlsx"));
        var ratings = sheets["Ratings"];
        Assert.Equal("Rationale", ratings[0][4]);
        Assert.True(ratings.Count > 10);
        Assert.All(ratings.Skip(1).Where(r => r.Count > 3 && r[3].Length > 0), r => Assert.True(r[4].Length > 0));
        await ApiAssert.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/export/assignment.xlsx"), HttpStatusCode.Conflict, "is not a round");
    }
}
