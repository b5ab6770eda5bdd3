using PdfSharp;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace Decide.Reports.Layout;

/// <summary>
/// The layout helper: pours headings, wrapped paragraphs, tables and fixed-height blocks (charts) down A4 pages,
/// starting a new page when the next piece does not fit. Tables break between rows (a row taller than a page breaks
/// between its lines) and repeat their header on every page. Footers are drawn afterwards by <see cref="FinishPages"/>,
/// once the page count is known.
/// </summary>
internal sealed class PageFlow : IDisposable
{
    public const double Margin = 50;
    public const double TopMargin = 50;
    public const double BottomMargin = 62;
    private const double CellPadding = 3;

    private XGraphics? _gfx;

    public PageFlow(PdfDocument document, ReportStyle style)
    {
        Document = document;
        Style = style;
    }

    public PdfDocument Document { get; }

    public ReportStyle Style { get; }

    public XGraphics Gfx => _gfx ?? throw new InvalidOperationException("No page yet: call NewPage first.");

    public PdfPage Page => Document.Pages[^1];

    public double Y { get; set; }

    public double PageWidth { get; private set; }

    public double PageHeight { get; private set; }

    public double Left => Margin;

    public double Right => PageWidth - Margin;

    public double Width => Right - Left;

    public double Bottom => PageHeight - BottomMargin;

    public double Remaining => Bottom - Y;

    public void NewPage()
    {
        _gfx?.Dispose();
        var page = Document.AddPage();
        page.Size = PageSize.A4;
        PageWidth = page.Width.Point;
        PageHeight = page.Height.Point;
        _gfx = XGraphics.FromPdfPage(page);
        Y = TopMargin;
    }

    public void EnsureSpace(double height)
    {
        if (_gfx is null || Y + height > Bottom)
        {
            NewPage();
        }
    }

    public void Space(double points) => Y = Math.Min(Y + points, Bottom);

    /// <summary>A section title: starts a new page unless <paramref name="newPage"/> is false.</summary>
    public void Section(string title, bool newPage = true)
    {
        if (newPage || _gfx is null)
        {
            NewPage();
        }
        else
        {
            EnsureSpace(100);
            Y += 14;
        }

        var font = Style.Heading1;
        foreach (var line in TextPainter.Wrap(Gfx, title, font, Width))
        {
            TextPainter.Draw(Gfx, line, font, Style.AccentBrush, Left, Y);
            Y += font.GetHeight();
        }

        Y += 2;
        Gfx.DrawLine(new XPen(ReportStyle.Accent, 1), Left, Y, Right, Y);
        Y += 8;
    }

    /// <summary>A sub-heading, kept on one page with at least <paramref name="keepWith"/> points of what follows.</summary>
    public void Heading(string text, double keepWith = 60)
    {
        var font = Style.Heading2;
        var lines = TextPainter.Wrap(Gfx, text, font, Width);
        EnsureSpace((lines.Count * font.GetHeight()) + 6 + keepWith);
        Y += 4;
        foreach (var line in lines)
        {
            TextPainter.Draw(Gfx, line, font, Style.InkBrush, Left, Y);
            Y += font.GetHeight();
        }

        Y += 3;
    }

    public void Paragraph(string text, XFont? font = null, XBrush? brush = null, double indent = 0, double after = 5, double keepWith = 0)
    {
        font ??= Style.Body;
        var height = font.GetHeight() * 1.12;
        if (keepWith > 0)
        {
            EnsureSpace((TextPainter.Wrap(Gfx, text, font, Width - indent).Count * height) + keepWith);
        }
        foreach (var line in TextPainter.Wrap(Gfx, text, font, Width - indent))
        {
            EnsureSpace(height);
            TextPainter.Draw(Gfx, line, font, brush ?? Style.InkBrush, Left + indent, Y);
            Y += height;
        }

        Y += after;
    }

    public void Bullets(IEnumerable<string> items, XFont? font = null)
    {
        font ??= Style.Body;
        var height = font.GetHeight() * 1.12;
        foreach (var item in items)
        {
            var lines = TextPainter.Wrap(Gfx, item, font, Width - 12);
            for (var i = 0; i < lines.Count; i++)
            {
                EnsureSpace(height);
                if (i == 0)
                {
                    Gfx.DrawString("•", font, Style.InkBrush, Left + 2, Y, XStringFormats.TopLeft);
                }

                TextPainter.Draw(Gfx, lines[i], font, Style.InkBrush, Left + 12, Y);
                Y += height;
            }

            Y += 2;
        }

        Y += 3;
    }

    /// <summary>A label/value list ("Reference: KVTA-2026-017"), the labels in bold in a column of their own.</summary>
    public void Facts(IEnumerable<(string Label, string Value)> facts, double labelWidth = 130)
    {
        var font = Style.Body;
        var height = font.GetHeight() * 1.12;
        foreach (var (label, value) in facts)
        {
            var lines = TextPainter.Wrap(Gfx, value, font, Width - labelWidth);
            EnsureSpace(height * Math.Min(lines.Count, 3));
            TextPainter.Draw(Gfx, label, Style.BodyBold, Style.InkBrush, Left, Y);
            foreach (var line in lines)
            {
                EnsureSpace(height);
                TextPainter.Draw(Gfx, line, font, Style.InkBrush, Left + labelWidth, Y);
                Y += height;
            }

            Y += 2;
        }

        Y += 3;
    }

    /// <summary>A boxed caution: a tinted panel with a rule on its left.</summary>
    public void Caution(string title, IReadOnlyList<string> sentences)
    {
        var font = Style.Body;
        var height = font.GetHeight() * 1.12;
        var lines = new List<(string Text, XFont Font)> { (title, Style.BodyBold) };
        foreach (var s in sentences)
        {
            lines.AddRange(TextPainter.Wrap(Gfx, s, font, Width - 20).Select(l => (l, font)));
        }

        var boxHeight = (lines.Count * height) + 12;
        EnsureSpace(boxHeight);
        Gfx.DrawRectangle(new XSolidBrush(ReportStyle.CautionFill), Left, Y, Width, boxHeight);
        Gfx.DrawRectangle(new XSolidBrush(ReportStyle.CautionRule), Left, Y, 3, boxHeight);
        var y = Y + 6;
        foreach (var (text, f) in lines)
        {
            TextPainter.Draw(Gfx, text, f, Style.InkBrush, Left + 12, y);
            y += height;
        }

        Y += boxHeight + 8;
    }

    /// <summary>Reserves a block of fixed height (a chart) and returns where to draw it.</summary>
    public XRect Reserve(double height)
    {
        EnsureSpace(height);
        var rect = new XRect(Left, Y, Width, height);
        Y += height;
        return rect;
    }

    /// <summary>
    /// Draws a table. Cells wrap within their column; the header repeats on every page the table spans; a row breaks
    /// across pages only when it is taller than the space a fresh page offers.
    /// </summary>
    public void Table(IReadOnlyList<TableColumn> columns, IEnumerable<IReadOnlyList<string>> rows, bool zebra = true, int boldColumns = 0, double keepWithBefore = 0)
    {
        var totalShare = columns.Sum(c => c.Share);
        var widths = columns.Select(c => Width * c.Share / totalShare).ToArray();
        var font = Style.Cell;
        var lineHeight = font.GetHeight() * 1.1;
        var headerLines = columns.Select((c, i) => TextPainter.Wrap(Gfx, c.Header, Style.CellBold, widths[i] - (2 * CellPadding))).ToArray();
        var headerHeight = (headerLines.Max(l => l.Count) * lineHeight) + (2 * CellPadding);

        void Header()
        {
            Gfx.DrawRectangle(new XSolidBrush(ReportStyle.HeaderFill), Left, Y, Width, headerHeight);
            var x = Left;
            for (var c = 0; c < columns.Count; c++)
            {
                var y = Y + CellPadding;
                foreach (var line in headerLines[c])
                {
                    TextPainter.Draw(Gfx, line, Style.CellBold, Style.InkBrush, x + CellPadding, y, widths[c] - (2 * CellPadding), columns[c].Align);
                    y += lineHeight;
                }

                x += widths[c];
            }

            Y += headerHeight;
        }

        var materialised = rows.ToArray();
        var firstRowLines = materialised.Length == 0 ? 1 : columns.Select((c, i) =>
            TextPainter.Wrap(Gfx, i < materialised[0].Count ? materialised[0][i] : "", i < boldColumns ? Style.CellBold : font, widths[i] - (2 * CellPadding)).Count).Max();
        EnsureSpace(headerHeight + (Math.Min(firstRowLines, 6) * lineHeight) + (2 * CellPadding) + keepWithBefore);
        Y += keepWithBefore;
        Header();
        var index = 0;
        var rule = new XPen(ReportStyle.Rule, 0.4);
        foreach (var row in materialised)
        {
            var cellLines = new IReadOnlyList<string>[columns.Count];
            for (var c = 0; c < columns.Count; c++)
            {
                var cellFont = c < boldColumns ? Style.CellBold : font;
                cellLines[c] = TextPainter.Wrap(Gfx, c < row.Count ? row[c] : "", cellFont, widths[c] - (2 * CellPadding));
            }

            var total = cellLines.Max(l => l.Count);
            var start = 0;
            while (start < total)
            {
                var fit = (int)Math.Floor((Remaining - (2 * CellPadding)) / lineHeight);
                if (fit < 1 || (start == 0 && fit < total && total * lineHeight < Bottom - TopMargin - headerHeight - (2 * CellPadding)))
                {
                    NewPage();
                    Header();
                    continue;
                }

                var take = Math.Min(fit, total - start);
                var height = (take * lineHeight) + (2 * CellPadding);
                if (zebra && index % 2 == 1)
                {
                    Gfx.DrawRectangle(new XSolidBrush(ReportStyle.Zebra), Left, Y, Width, height);
                }

                var x = Left;
                for (var c = 0; c < columns.Count; c++)
                {
                    var cellFont = c < boldColumns ? Style.CellBold : font;
                    var y = Y + CellPadding;
                    for (var l = start; l < Math.Min(start + take, cellLines[c].Count); l++)
                    {
                        TextPainter.Draw(Gfx, cellLines[c][l], cellFont, Style.InkBrush, x + CellPadding, y, widths[c] - (2 * CellPadding), columns[c].Align);
                        y += lineHeight;
                    }

                    x += widths[c];
                }

                Y += height;
                Gfx.DrawLine(rule, Left, Y, Right, Y);
                start += take;
            }

            index++;
        }

        Y += 8;
    }

    /// <summary>Draws "Page n of N" and the footer text on every page; call once, after the last page is complete.</summary>
    public void FinishPages(string footerLeft, string footerSecond)
    {
        _gfx?.Dispose();
        _gfx = null;
        var count = Document.PageCount;
        for (var i = 0; i < count; i++)
        {
            var page = Document.Pages[i];
            using var gfx = XGraphics.FromPdfPage(page, XGraphicsPdfPageOptions.Append);
            var height = page.Height.Point;
            var width = page.Width.Point;
            var y = height - BottomMargin + 18;
            gfx.DrawLine(new XPen(ReportStyle.Rule, 0.5), Margin, y - 4, width - Margin, y - 4);
            TextPainter.Draw(gfx, footerLeft, Style.Small, Style.MutedBrush, Margin, y);
            var number = $"Page {i + 1} of {count}";
            gfx.DrawString(number, Style.Small, Style.MutedBrush, width - Margin - TextPainter.Width(gfx, number, Style.Small), y, XStringFormats.TopLeft);
            TextPainter.Draw(gfx, footerSecond, Style.Small, Style.MutedBrush, Margin, y + Style.Small.GetHeight() + 1);
        }
    }

    public void Dispose()
    {
        _gfx?.Dispose();
        _gfx = null;
    }
}
