using System.Globalization;
using System.Text;

namespace Decide.Web.Features.Exchange;

/// <summary>
/// CSV (RFC 4180: comma-separated, CRLF line ends, fields with a comma, quote or line break in double quotes and
/// inner quotes doubled) that is safe to open in a spreadsheet: a text cell that starts with <c>=</c>, <c>+</c>,
/// <c>-</c>, <c>@</c>, a tab or a carriage return is prefixed with a single quote, so that a spreadsheet shows it as
/// text instead of running it as a formula. Rationales are typed by people; a bidder's name is chosen by a bidder.
/// </summary>
public sealed class SpreadsheetCsv
{
    private static readonly UTF8Encoding Utf8WithMark = new(encoderShouldEmitUTF8Identifier: true);
    private readonly StringBuilder _text = new();

    /// <summary>A text cell, neutralised and quoted as needed.</summary>
    public static string Text(string? value)
    {
        if (string.IsNullOrEmpty(value))
        {
            return "";
        }

        if (value[0] is '=' or '+' or '-' or '@' or '\t' or '\r')
        {
            value = "'" + value;
        }

        return value.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : value;
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
