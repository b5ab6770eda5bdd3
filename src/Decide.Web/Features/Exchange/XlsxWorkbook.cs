using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;

namespace Decide.Web.Features.Exchange;

/// <summary>
/// A workbook of plain tables written with the Open XML SDK (ADR 25): a bold header row, then text and numbers.
/// Every text cell is an inline string, never a formula, so a name a bidder chose ("=HYPERLINK(…)") opens as the text
/// it is; numbers are written as numbers so a spreadsheet can sum them.
/// </summary>
public sealed class XlsxWorkbook
{
    private readonly List<(string Name, IReadOnlyList<string> Header, List<object?[]> Rows)> _sheets = [];

    /// <summary>Adds a sheet; its rows are added with <see cref="Row"/>.</summary>
    public XlsxWorkbook Sheet(string name, params string[] header)
    {
        // Sheet names: at most 31 characters, none of : \ / ? * [ ].
        var safe = new string(name.Select(c => c is ':' or '\\' or '/' or '?' or '*' or '[' or ']' ? ' ' : c).ToArray());
        _sheets.Add((safe.Length > 31 ? safe[..31] : safe, header, []));
        return this;
    }

    /// <summary>Adds a row to the last sheet: each cell a string, a number, or null for an empty cell.</summary>
    public XlsxWorkbook Row(params object?[] cells)
    {
        _sheets[^1].Rows.Add(cells);
        return this;
    }

    /// <summary>The workbook's bytes.</summary>
    public byte[] ToBytes()
    {
        using var stream = new MemoryStream();
        using (var document = SpreadsheetDocument.Create(stream, SpreadsheetDocumentType.Workbook))
        {
            var workbook = document.AddWorkbookPart();
            workbook.Workbook = new Workbook();
            var styles = workbook.AddNewPart<WorkbookStylesPart>();
            styles.Stylesheet = new Stylesheet(
                new Fonts(new Font(), new Font(new Bold())),
                new Fills(new Fill(new PatternFill { PatternType = PatternValues.None }), new Fill(new PatternFill { PatternType = PatternValues.Gray125 })),
                new Borders(new Border()),
                new CellFormats(new CellFormat(), new CellFormat { FontId = 1, ApplyFont = true }));
            var sheets = workbook.Workbook.AppendChild(new Sheets());
            uint id = 1;
            foreach (var (name, header, rows) in _sheets)
            {
                var part = workbook.AddNewPart<WorksheetPart>();
                var data = new SheetData();
                data.Append(Line(1, header.Cast<object?>().ToArray(), bold: true));
                for (var r = 0; r < rows.Count; r++)
                {
                    data.Append(Line((uint)(r + 2), rows[r], bold: false));
                }

                part.Worksheet = new Worksheet(new SheetViews(new SheetView { WorkbookViewId = 0, Pane = new Pane { VerticalSplit = 1, TopLeftCell = "A2", State = PaneStateValues.Frozen, ActivePane = PaneValues.BottomLeft } }), data);
                sheets.Append(new Sheet { Id = workbook.GetIdOfPart(part), SheetId = id++, Name = name });
            }
        }

        return stream.ToArray();
    }

    private static Row Line(uint index, object?[] cells, bool bold)
    {
        var row = new Row { RowIndex = index };
        for (var c = 0; c < cells.Length; c++)
        {
            var reference = Column(c) + index;
            Cell cell = cells[c] switch
            {
                null => new Cell { CellReference = reference },
                double d when double.IsFinite(d) => new Cell { CellReference = reference, DataType = CellValues.Number, CellValue = new CellValue(d) },
                int i => new Cell { CellReference = reference, DataType = CellValues.Number, CellValue = new CellValue(i) },
                var other => new Cell { CellReference = reference, DataType = CellValues.InlineString, InlineString = new InlineString(new Text(Clean(other.ToString() ?? "")) { Space = SpaceProcessingModeValues.Preserve }) },
            };
            if (bold)
            {
                cell.StyleIndex = 1;
            }

            row.Append(cell);
        }

        return row;
    }

    /// <summary>Characters XML cannot carry (control characters, a lone half of a surrogate pair) are dropped: a name may hold anything a bidder typed.</summary>
    private static string Clean(string text)
    {
        var clean = new System.Text.StringBuilder(text.Length);
        for (var i = 0; i < text.Length; i++)
        {
            var ch = text[i];
            if (char.IsHighSurrogate(ch) && i + 1 < text.Length && System.Xml.XmlConvert.IsXmlSurrogatePair(text[i + 1], ch))
            {
                clean.Append(ch).Append(text[++i]);
            }
            else if (System.Xml.XmlConvert.IsXmlChar(ch))
            {
                clean.Append(ch);
            }
        }

        return clean.ToString();
    }

    /// <summary>A zero-based column as a spreadsheet names it: 0 → A, 25 → Z, 26 → AA.</summary>
    internal static string Column(int index)
    {
        var letters = "";
        for (var c = index + 1; c > 0; c = (c - 1) / 26)
        {
            letters = (char)('A' + ((c - 1) % 26)) + letters;
        }

        return letters;
    }
}
