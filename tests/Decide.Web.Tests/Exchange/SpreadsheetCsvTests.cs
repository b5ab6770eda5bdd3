using Decide.Web.Features.Exchange;
using FsCheck;
using FsCheck.Xunit;

namespace Decide.Web.Tests.Exchange;

/// <summary>
/// The spreadsheet-safe CSV cell: no cell a spreadsheet could run (OWASP "CSV Injection"; OWASP ASVS 5.0, 1.2.10),
/// and the escape undone exactly by taking off one leading single quote, so names are never corrupted.
/// </summary>
public sealed class SpreadsheetCsvTests
{
    /// <summary>Names starting with each character OWASP lists (=, +, -, @, tab, carriage return) and ASVS adds (NUL).</summary>
    public static TheoryData<string> FormulaNames() =>
    [
        "=HYPERLINK(\"http://example.invalid\",\"Click\")", "+cmd|' /C calc'!A0", "-2+3", "@SUM(1+1)", "\t=1+1", "\r=1+1", "\0=1+1",
    ];

    [Theory]
    [MemberData(nameof(FormulaNames))]
    public void A_name_a_spreadsheet_would_run_gets_a_single_quote_in_front_inside_double_quotes(string name)
    {
        var cell = Read(SpreadsheetCsv.Text(name));

        Assert.Equal("'" + name, cell);
        Assert.Equal(name, CsvText.Unescape(cell));
    }

    [Fact]
    public void A_name_that_starts_with_a_single_quote_keeps_it_after_the_escape_is_undone()
    {
        const string name = "'Ohana Signs Ltd";

        var cell = Read(SpreadsheetCsv.Text(name));

        Assert.Equal("''Ohana Signs Ltd", cell);
        Assert.Equal(name, CsvText.Unescape(cell));
    }

    [Fact]
    public void A_name_with_a_semicolon_before_a_formula_stays_one_quoted_cell()
    {
        // A spreadsheet that splits at semicolons would otherwise make a second cell "=1+1".
        Assert.Equal("\"Acme;=1+1\"", SpreadsheetCsv.Text("Acme;=1+1"));
    }

    [Property(MaxTest = 500)]
    public bool Any_text_comes_back_unchanged_and_no_cell_starts_like_a_formula(NonNull<string> generated)
    {
        var name = generated.Get;
        var csv = new SpreadsheetCsv().Row(SpreadsheetCsv.Text(name), SpreadsheetCsv.Text("x" + name)).ToString();

        var row = Assert.Single(CsvText.Parse(csv));

        return row.All(cell => cell.Length == 0 || cell[0] is not ('=' or '+' or '-' or '@' or '\t' or '\r' or '\0'))
            && CsvText.Unescape(row[0]) == name && CsvText.Unescape(row[1]) == "x" + name;
    }

    private static string Read(string cell) => Assert.Single(Assert.Single(CsvText.Parse(cell + "\r\n")));
}
