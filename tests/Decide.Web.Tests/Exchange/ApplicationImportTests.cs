using System.Net;
using System.Text;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using Decide.Web.Tests.Support;
using FsCheck;
using FsCheck.Fluent;

namespace Decide.Web.Tests.Exchange;

/// <summary>
/// A list of applications uploaded as a spreadsheet or CSV: read with every problem by sheet, row and column, nothing
/// stored unless the whole file is sound, a formula kept as text, and hostile files refused with a reason, never a 5xx.
/// </summary>
public sealed class ApplicationImportTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    /// <summary>An .xlsx of one sheet "Applications" made with the Open XML SDK; a cell starting with "=" becomes a formula cell.</summary>
    internal static byte[] Workbook(params string[][] rows)
    {
        using var stream = new MemoryStream();
        using (var document = SpreadsheetDocument.Create(stream, SpreadsheetDocumentType.Workbook))
        {
            var workbook = document.AddWorkbookPart();
            workbook.Workbook = new Workbook();
            var sheetPart = workbook.AddNewPart<WorksheetPart>();
            var data = new SheetData();
            for (var r = 0; r < rows.Length; r++)
            {
                var row = new Row { RowIndex = (uint)(r + 1) };
                for (var c = 0; c < rows[r].Length; c++)
                {
                    var reference = $"{(char)('A' + c)}{r + 1}";
                    var text = rows[r][c];
                    row.Append(text.StartsWith('=')
                        ? new Cell { CellReference = reference, CellFormula = new CellFormula(text[1..]), CellValue = new CellValue("0") }
                        : double.TryParse(text, System.Globalization.CultureInfo.InvariantCulture, out _)
                            ? new Cell { CellReference = reference, CellValue = new CellValue(text), DataType = CellValues.Number }
                            : new Cell { CellReference = reference, InlineString = new InlineString(new Text(text)), DataType = CellValues.InlineString });
                }

                data.Append(row);
            }

            sheetPart.Worksheet = new Worksheet(data);
            workbook.Workbook.AppendChild(new Sheets(new Sheet { Id = workbook.GetIdOfPart(sheetPart), SheetId = 1, Name = "Applications" }));
        }

        return stream.ToArray();
    }

    private static object Upload(string name, byte[] content, bool preview, long version) =>
        new { fileName = name, content = Convert.ToBase64String(content), preview, version };

    [Fact]
    public async Task A_sound_workbook_is_previewed_then_stored_and_a_formula_in_a_name_stays_text()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var file = Workbook(
            ["Code", "Name", "Field", "Requested"],
            ["G1", "Orchard for Tollgate", "food", "8000"],
            ["G2", "=HYPERLINK(\"http://x.invalid\",\"Pond\")", "nature", "12500.5"],
            ["G3", "Seed library", "", ""]);
        var preview = await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/bids/import"), Upload("round.xlsx", file, true, await s.VersionAsync())));
        Assert.False(preview.GetProperty("stored").GetBoolean());
        Assert.Equal(3, (await s.DetailAsync()).GetProperty("bids").GetArrayLength()); // the scenario's three bids, unchanged

        var stored = await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/bids/import"), Upload("round.xlsx", file, false, await s.VersionAsync())));
        Assert.True(stored.GetProperty("stored").GetBoolean());
        var bids = (await s.DetailAsync()).GetProperty("bids").EnumerateArray().ToArray();
        Assert.Equal(["G1", "G2", "G3"], bids.Select(b => b.GetProperty("code").GetString()));
        Assert.Equal("=HYPERLINK(\"http://x.invalid\",\"Pond\")", bids[1].GetProperty("name").GetString());
        Assert.Equal(12500.5, bids[1].GetProperty("requested").GetDouble());
        Assert.Equal("food", bids[0].GetProperty("topic").GetString());
    }

    [Fact]
    public async Task Every_problem_is_named_by_sheet_row_and_column_and_nothing_is_stored()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var file = Workbook(
            ["Name", "Code", "Requested"],
            ["Orchard", "G1", "lots"],
            ["", "G1", "12,500"],
            ["Pond", "G3", "-5"]);
        var problem = await ApiAssert.ProblemAsync(await s.Facilitator.PostJsonAsync(s.Url("/bids/import"), Upload("round.xlsx", file, false, await s.VersionAsync())), HttpStatusCode.BadRequest);
        ApiAssert.HasError(problem, "Applications!C2", "sheet \"Applications\", row 2, column C (requested): \"lots\" is not an amount");
        ApiAssert.HasError(problem, "Applications!B3", "row 3, column B (code): \"G1\" is already the code of row 2");
        ApiAssert.HasError(problem, "Applications!A3", "row 3, column A (name)");
        ApiAssert.HasError(problem, "Applications!C3", "\"12,500\" is not an amount");
        ApiAssert.HasError(problem, "Applications!C4", "\"-5\" is not an amount");
        Assert.Equal(3, (await s.DetailAsync()).GetProperty("bids").GetArrayLength());
    }

    [Fact]
    public async Task A_csv_with_semicolons_and_decimal_commas_is_read()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var csv = Encoding.UTF8.GetBytes("code;name;requested\r\nG1;\"Obstgarten; Nord\";12 500,50\r\nG2;'=Teich;1.250,00\r\n");
        var preview = await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/bids/import"), Upload("runde.csv", csv, true, await s.VersionAsync())));
        var rows = preview.GetProperty("bids").EnumerateArray().ToArray();
        Assert.Equal("Obstgarten; Nord", rows[0].GetProperty("name").GetString());
        Assert.Equal(12500.5, rows[0].GetProperty("requested").GetDouble());
        Assert.Equal("=Teich", rows[1].GetProperty("name").GetString()); // Decide's own export escape taken off, kept as text
        Assert.Equal(1250, rows[1].GetProperty("requested").GetDouble());
    }

    [Fact]
    public async Task Hostile_uploads_get_a_400_with_a_reason_and_never_a_5xx()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var version = await s.VersionAsync();
        var cases = new List<(string Name, byte[] Content)>
        {
            ("empty.xlsx", []),
            ("zip.xlsx", [0x50, 0x4B, 0x03, 0x04, 1, 2, 3]),
            ("notes.pdf", Encoding.UTF8.GetBytes("%PDF-1.7")),
            ("latin1.csv", [0x63, 0x6F, 0x64, 0x65, 0xE9, 0xFF]),
            ("header.csv", Encoding.UTF8.GetBytes("only;header\r\n")),
            ("wide.xlsx", Workbook([.. Enumerable.Range(0, 60).Select(i => $"c{i}")], ["x"])),
        };
        var generator = Gen.ArrayOf(Gen.Elements("G1", "G2", "=1+1", "@SUM(A1)", "\"", ";", ",", "\r\n", "12,5", "1.000,0", "\u0000", "é", "名", " ", "-", "+3"))
            .Select(parts => Encoding.UTF8.GetBytes("code,name,requested\r\n" + string.Concat(parts)));
        cases.AddRange(generator.Sample(30, 25).Select((bytes, i) => ($"fuzz{i}.csv", bytes)));
        foreach (var (name, content) in cases)
        {
            var response = await s.Facilitator.PostJsonAsync(s.Url("/bids/import"), Upload(name, content, true, version));
            Assert.True((int)response.StatusCode is 200 or 400, $"{name}: {(int)response.StatusCode} {await response.Content.ReadAsStringAsync()}");
        }

        Assert.Equal(3, (await s.DetailAsync()).GetProperty("bids").GetArrayLength());
    }
}
