using System.Globalization;
using System.Text;

namespace Decide.Web.Features.Exchange;

/// <summary>
/// CSV (RFC 4180: comma-separated, CRLF line ends, inner quotes doubled) that is safe to open in a spreadsheet.
/// Rationales are typed by people; a bidder's name is chosen by a bidder. Following OWASP's "CSV Injection" page
/// (owasp.org/www-community/attacks/CSV_Injection; its advice [recalled]: prefix a cell that starts with =, +, -, @,
/// tab or carriage return with a single quote, and put every cell in double quotes) and OWASP ASVS 5.0 requirement
/// 1.2.10 (which adds the NUL character):
/// <list type="bullet">
/// <item>a text cell that starts with <c>=</c>, <c>+</c>, <c>-</c>, <c>@</c>, a tab, a carriage return or NUL gets a
/// single quote in front, so that a spreadsheet shows it as text instead of running it as a formula;</item>
/// <item>so does a text cell that already starts with a single quote, so that the escape can be undone exactly: a
/// reader takes off one leading quote when there is one, and every name comes back as it was;</item>
/// <item>every non-empty text cell is put in double quotes, so that a spreadsheet splitting lines at semicolons (as
/// in many European settings) cannot cut a name into a second cell that starts with <c>=</c>.</item>
/// </list>
/// Number cells are written plainly: they are made here, never typed by anyone.
/// </summary>
public sealed class SpreadsheetCsv
{
    private static readonly UTF8Encoding Utf8WithMark = new(encoderShouldEmitUTF8Identifier: true);
    private readonly StringBuilder _text = new();

    /// <summary>A text cell: neutralised (a leading quote added where a spreadsheet could read a formula) and quoted.</summary>
    public static string Text(string? value)
    {
        if (string.IsNullOrEmpty(value))
        {
            return "";
        }

        if (value[0] is '=' or '+' or '-' or '@' or '\t' or '\r' or '\0' or '\'')
        {
            value = "'" + value;
        }

        return "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";
    }

    /// <summary>A number cell in invariant notation (the shortest text that reads back to the same double).</summary>
    public static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>A whole-number cell.</summary>
    public static string Number(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>Adds a row of cells made by <see cref="Text"/> or <see cref="Number(double)"/>.</summary>
    public SpreadsheetCsv Row(params IEnumerable<string> cells)
    {
        _text.AppendJoin(',', cells).Append("\r\n");
        return this;
    }

    /// <summary>Adds a header row of plain names.</summary>
    public SpreadsheetCsv Header(params IEnumerable<string> names) => Row(names.Select(Text));

    /// <summary>The text so far.</summary>
    public override string ToString() => _text.ToString();

    /// <summary>UTF-8 with a byte-order mark, so that spreadsheets read non-ASCII names correctly.</summary>
    public byte[] ToUtf8() => [.. Utf8WithMark.GetPreamble(), .. Utf8WithMark.GetBytes(_text.ToString())];
}
