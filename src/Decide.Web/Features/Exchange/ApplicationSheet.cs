using System.Globalization;
using System.Text;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Features.Exchange;

/// <summary>A problem with one cell (or row, or the whole file) of an uploaded sheet, by its place.</summary>
/// <param name="Place">Where, as a spreadsheet shows it: <c>Applications!D5</c>, <c>row 7</c>, or the file name.</param>
/// <param name="Reason">What is wrong, in words that name the sheet, row and column.</param>
public sealed record SheetError(string Place, string Reason);

/// <summary>What an uploaded list of applications (or bids) holds, or why it cannot be taken.</summary>
/// <param name="Rows">The applications read, in the order of the sheet.</param>
/// <param name="Errors">Every problem found; the list is taken only when there is none.</param>
public sealed record ApplicationSheetReading(IReadOnlyList<BidView> Rows, IReadOnlyList<SheetError> Errors);

/// <summary>
/// Reads a list of applications from a spreadsheet (.xlsx, read with the Open XML SDK, ADR 25) or a CSV file: a
/// header row naming the columns (code, name, and optionally field and requested amount, in any order), then one
/// application per row. Every problem is named by sheet, row and column, and nothing is taken unless the whole file
/// is sound. A formula is never evaluated: a formula cell's text is kept as typed (with its "="), so it is stored and
/// later exported as text.
/// </summary>
public static class ApplicationSheet
{
    /// <summary>The most applications one upload may hold.</summary>
    public const int MaxRows = 5_000;

    /// <summary>The largest upload taken, in bytes.</summary>
    public const int MaxBytes = 5 * 1024 * 1024;

    private static readonly string[] CodeHeaders = ["code", "id", "reference"];
    private static readonly string[] NameHeaders = ["name", "title", "applicant", "bidder"];
    private static readonly string[] FieldHeaders = ["field", "topic"];
    private static readonly string[] RequestedHeaders = ["requested", "amount", "amount requested"];

    /// <summary>Reads <paramref name="content"/>; <paramref name="fileName"/> decides between .xlsx and .csv.</summary>
    public static ApplicationSheetReading Read(string fileName, byte[] content)
    {
        ArgumentNullException.ThrowIfNull(content);
        var name = string.IsNullOrWhiteSpace(fileName) ? "the file" : Path.GetFileName(fileName.Trim());
        if (content.Length == 0)
        {
            return Refused(name, "the file is empty");
        }

        if (content.Length > MaxBytes)
        {
            return Refused(name, $"the file is larger than {MaxBytes / (1024 * 1024)} MB; split the list or remove pictures and other sheets");
        }

        if (name.EndsWith(".xlsx", StringComparison.OrdinalIgnoreCase))
        {
            return Table(ReadWorkbook(name, content));
        }

        if (name.EndsWith(".csv", StringComparison.OrdinalIgnoreCase) || name.EndsWith(".txt", StringComparison.OrdinalIgnoreCase))
        {
            return Table(ReadCsv(content));
        }

        return Refused(name, "give a spreadsheet (.xlsx) or a CSV file (.csv)");
    }

    private static ApplicationSheetReading Refused(string place, string reason) => new([], [new SheetError(place, reason)]);

    /// <summary>Cells as read: the sheet's name and, per row (its number in the sheet), its cells by column index.</summary>
    private sealed record RawTable(string Sheet, IReadOnlyList<(int Row, IReadOnlyDictionary<int, string> Cells)> Rows, SheetError? Problem);

    private static RawTable ReadWorkbook(string name, byte[] content)
    {
        try
        {
            using var stream = new MemoryStream(content, writable: false);
            using var document = SpreadsheetDocument.Open(stream, false, new OpenSettings { MaxCharactersInPart = 50_000_000 });
            var workbook = document.WorkbookPart;
            var sheet = workbook?.Workbook.Sheets?.Elements<Sheet>().FirstOrDefault();
            if (workbook is null || sheet?.Id?.Value is not { } relation)
            {
                return new RawTable(name, [], new SheetError(name, "the workbook has no sheet"));
            }

            var sheetName = sheet.Name?.Value ?? "Sheet1";
            var shared = workbook.SharedStringTablePart?.SharedStringTable.Elements<SharedStringItem>().Select(i => i.InnerText).ToArray() ?? [];
            var part = (WorksheetPart)workbook.GetPartById(relation);
            var rows = new List<(int, IReadOnlyDictionary<int, string>)>();
            foreach (var row in part.Worksheet.Descendants<Row>())
            {
                if (rows.Count > MaxRows + 1)
                {
                    return new RawTable(sheetName, [], new SheetError($"{sheetName}", $"sheet \"{sheetName}\" has more than {MaxRows} rows; split the list"));
                }

                var cells = new Dictionary<int, string>();
                var next = 0;
                foreach (var cell in row.Elements<Cell>())
                {
                    var column = cell.CellReference?.Value is { } reference ? Column(reference) : next;
                    next = column + 1;
                    if (column > 50)
                    {
                        continue;
                    }

                    cells[column] = Text(cell, shared);
                }

                rows.Add(((int)(row.RowIndex?.Value ?? (uint)(rows.Count + 1)), cells));
            }

            return new RawTable(sheetName, rows, null);
        }
        catch (Exception e) when (e is OpenXmlPackageException or InvalidDataException or IOException or FormatException or InvalidOperationException or ArgumentException or System.Xml.XmlException)
        {
            return new RawTable(name, [], new SheetError(name, "this is not a spreadsheet Decide can read (.xlsx, as saved by a spreadsheet program); save it again as .xlsx or as CSV"));
        }
    }

    /// <summary>A cell's text as typed: a formula keeps its formula (never its computed value), a number its digits.</summary>
    private static string Text(Cell cell, string[] shared)
    {
        if (cell.CellFormula?.Text is { Length: > 0 } formula)
        {
            return "=" + formula;
        }

        var value = cell.CellValue?.Text ?? cell.InnerText;
        if (cell.DataType?.Value == CellValues.SharedString)
        {
            return int.TryParse(value, NumberStyles.None, CultureInfo.InvariantCulture, out var i) && i < shared.Length ? shared[i] : "";
        }

        if (cell.DataType?.Value == CellValues.InlineString)
        {
            return cell.InlineString?.InnerText ?? "";
        }

        if (cell.DataType?.Value == CellValues.Boolean)
        {
            return value == "1" ? "TRUE" : "FALSE";
        }

        return value;
    }

    /// <summary>The zero-based column of a reference such as "D5".</summary>
    private static int Column(string reference)
    {
        var column = 0;
        foreach (var c in reference)
        {
            if (c is >= 'A' and <= 'Z')
            {
                column = (column * 26) + (c - 'A' + 1);
            }
            else
            {
                break;
            }
        }

        return Math.Max(column - 1, 0);
    }

    private static RawTable ReadCsv(byte[] content)
    {
        string text;
        try
        {
            text = new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(content).TrimStart('\uFEFF');
        }
        catch (DecoderFallbackException)
        {
            return new RawTable("CSV", [], new SheetError("CSV", "the file is not UTF-8 text; save it as CSV UTF-8"));
        }

        var firstLine = text.Split('\n', 2)[0];
        var separator = firstLine.Count(c => c == ';') > firstLine.Count(c => c == ',') ? ';' : ',';
        var rows = new List<(int, IReadOnlyDictionary<int, string>)>();
        var cells = new Dictionary<int, string>();
        var cell = new StringBuilder();
        var quoted = false;
        var line = 1;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"')
                {
                    cell.Append('"');
                    i++;
                }
                else if (c == '"')
                {
                    quoted = false;
                }
                else
                {
                    cell.Append(c);
                }

                continue;
            }

            if (c == '"' && cell.Length == 0)
            {
                quoted = true;
            }
            else if (c == separator)
            {
                cells[cells.Count] = cell.ToString();
                cell.Clear();
            }
            else if (c is '\n' or '\r')
            {
                if (c == '\r' && i + 1 < text.Length && text[i + 1] == '\n')
                {
                    i++;
                }

                cells[cells.Count] = cell.ToString();
                cell.Clear();
                rows.Add((line++, cells));
                cells = [];
                if (rows.Count > MaxRows + 1)
                {
                    return new RawTable("CSV", [], new SheetError("CSV", $"the file has more than {MaxRows} rows; split the list"));
                }
            }
            else
            {
                cell.Append(c);
            }
        }

        if (cell.Length > 0 || cells.Count > 0)
        {
            cells[cells.Count] = cell.ToString();
            rows.Add((line, cells));
        }

        // A cell written by Decide's own CSV export carries a leading quote against formula injection: take it off.
        var unescaped = rows.Select(r => (r.Item1, (IReadOnlyDictionary<int, string>)r.Item2.ToDictionary(x => x.Key, x => x.Value.StartsWith('\'') ? x.Value[1..] : x.Value))).ToList();
        return new RawTable("CSV", unescaped, null);
    }

    private static ApplicationSheetReading Table(RawTable raw)
    {
        if (raw.Problem is { } problem)
        {
            return new([], [problem]);
        }

        var nonEmpty = raw.Rows.Where(r => r.Cells.Values.Any(v => !string.IsNullOrWhiteSpace(v))).ToList();
        if (nonEmpty.Count == 0)
        {
            return Refused(raw.Sheet, $"sheet \"{raw.Sheet}\" is empty: give a header row (code, name, field, requested) and one row per application");
        }

        var header = nonEmpty[0];
        int? Find(string[] names) => header.Cells.Where(x => names.Contains(x.Value.Trim().ToLowerInvariant())).Select(x => (int?)x.Key).FirstOrDefault();
        int? code = Find(CodeHeaders), name = Find(NameHeaders), field = Find(FieldHeaders), requested = Find(RequestedHeaders);
        var errors = new List<SheetError>();
        if (code is null || name is null)
        {
            errors.Add(new SheetError($"{raw.Sheet}!{header.Row}", $"sheet \"{raw.Sheet}\", row {header.Row}: the header row must name a \"code\" and a \"name\" column (and may add \"field\" and \"requested\"); found {string.Join(", ", header.Cells.Values.Where(v => v.Length > 0).Select(v => $"\"{v}\"").DefaultIfEmpty("nothing"))}"));
            return new([], errors);
        }

        var rows = new List<BidView>();
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var (row, cells) in nonEmpty.Skip(1))
        {
            string Cell(int? column) => column is { } c && cells.TryGetValue(c, out var v) ? v.Trim() : "";
            string At(int? column) => $"{raw.Sheet}!{XlsxWorkbook.Column(column ?? 0)}{row}";
            string Where(int? column, string what) => $"sheet \"{raw.Sheet}\", row {row}, column {XlsxWorkbook.Column(column ?? 0)} ({what})";
            var c = Cell(code);
            var n = Cell(name);
            if (c.Length is 0 or > 100)
            {
                errors.Add(new SheetError(At(code), $"{Where(code, "code")}: give each application a code of 1 to 100 characters"));
            }
            else if (seen.TryGetValue(c, out var first))
            {
                errors.Add(new SheetError(At(code), $"{Where(code, "code")}: \"{c}\" is already the code of row {first}"));
            }
            else
            {
                seen[c] = row;
            }

            if (n.Length is 0 or > 300)
            {
                errors.Add(new SheetError(At(name), $"{Where(name, "name")}: give the applicant's name or the title, 1 to 300 characters"));
            }

            var f = Cell(field);
            if (f.Length > 200)
            {
                errors.Add(new SheetError(At(field), $"{Where(field, "field")}: keep the field within 200 characters"));
            }

            double? amount = null;
            var given = Cell(requested);
            if (given.Length > 0)
            {
                if (Amount(given) is { } parsed && parsed > 0)
                {
                    amount = parsed;
                }
                else
                {
                    errors.Add(new SheetError(At(requested), $"{Where(requested, "requested")}: \"{Shorten(given)}\" is not an amount; write it with digits, for example 12500 or 12500.50"));
                }
            }

            rows.Add(new BidView(c, n, amount, f.Length == 0 ? null : f));
        }

        if (rows.Count == 0 && errors.Count == 0)
        {
            errors.Add(new SheetError(raw.Sheet, $"sheet \"{raw.Sheet}\" has a header row but no application under it"));
        }

        return new(errors.Count == 0 ? rows : [], errors);
    }

    /// <summary>
    /// An amount as people type it: digits with an optional decimal part after a point or a comma, thousands
    /// separated by spaces or by the other mark ("12 500,50", "12,500.50", "1.250,00"). "12,500" alone is read as
    /// twelve thousand five hundred only when a point could not be the decimal mark either; a single mark followed by
    /// exactly three digits is refused as ambiguous.
    /// </summary>
    internal static double? Amount(string text)
    {
        var t = text.Replace(" ", "", StringComparison.Ordinal).Replace("\u00A0", "", StringComparison.Ordinal).Replace("\u202F", "", StringComparison.Ordinal);
        if (t.Length == 0 || t.Length > 30 || t.Any(ch => !(char.IsAsciiDigit(ch) || ch is '.' or ',')))
        {
            return null;
        }

        int dots = t.Count(ch => ch == '.'), commas = t.Count(ch => ch == ',');
        char? decimalMark = (dots, commas) switch
        {
            (0, 0) => null,
            ( > 0, > 0) => t.LastIndexOf('.') > t.LastIndexOf(',') ? '.' : ',',
            (1, 0) => '.',
            (0, 1) => ',',
            _ => null, // several of one mark: thousands
        };
        if (decimalMark is { } mark && (dots + commas == 1) && t.Length - t.IndexOf(mark) - 1 == 3)
        {
            return null; // "12,500" or "12.500": thousands or decimals? Refused rather than guessed.
        }

        var thousands = decimalMark == '.' ? ',' : decimalMark == ',' ? '.' : (dots > 1 ? '.' : ',');
        var normal = t.Replace(thousands.ToString(), "", StringComparison.Ordinal);
        if (decimalMark == ',')
        {
            normal = normal.Replace(',', '.');
        }

        return double.TryParse(normal, NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value) ? value : null;
    }

    private static string Shorten(string text) => text.Length <= 40 ? text : text[..40] + "…";
}
