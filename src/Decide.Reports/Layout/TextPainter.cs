using PdfSharp.Drawing;

namespace Decide.Reports.Layout;

/// <summary>
/// Draws one line of text as text (never interpreted as markup). Right-to-left runs are drawn glyph by glyph from the
/// right, in logical order, so they read correctly on the page and a text extractor still finds them in reading order.
/// </summary>
internal static class TextPainter
{
    public static double Width(XGraphics gfx, string text, XFont font) =>
        text.Length == 0 ? 0 : gfx.MeasureString(text, font).Width;

    public static void Draw(XGraphics gfx, string text, XFont font, XBrush brush, double x, double y)
    {
        if (text.Length == 0)
        {
            return;
        }

        if (!BidiText.HasRightToLeft(text))
        {
            gfx.DrawString(text, font, brush, x, y, XStringFormats.TopLeft);
            return;
        }

        var cursor = x;
        foreach (var run in BidiText.VisualRuns(text))
        {
            var width = Width(gfx, run.Text, font);
            if (!run.RightToLeft)
            {
                gfx.DrawString(run.Text, font, brush, cursor, y, XStringFormats.TopLeft);
            }
            else
            {
                var right = cursor + width;
                foreach (var element in run.Elements)
                {
                    right -= Width(gfx, element, font);
                    gfx.DrawString(element, font, brush, right, y, XStringFormats.TopLeft);
                }
            }

            cursor += width;
        }
    }

    public static void Draw(XGraphics gfx, string text, XFont font, XBrush brush, double x, double y, double width, CellAlign align)
    {
        var offset = align switch
        {
            CellAlign.Right => width - Width(gfx, text, font),
            CellAlign.Center => (width - Width(gfx, text, font)) / 2,
            _ => 0,
        };
        Draw(gfx, text, font, brush, x + Math.Max(0, offset), y);
    }

    /// <summary>Breaks <paramref name="text"/> into lines no wider than <paramref name="width"/>; explicit line breaks are kept.</summary>
    public static IReadOnlyList<string> Wrap(XGraphics gfx, string text, XFont font, double width)
    {
        var lines = new List<string>();
        foreach (var paragraph in text.ReplaceLineEndings("\n").Split('\n'))
        {
            var words = paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (words.Length == 0)
            {
                lines.Add("");
                continue;
            }

            var space = Width(gfx, " ", font);
            var line = new System.Text.StringBuilder();
            double lineWidth = 0;
            foreach (var original in words)
            {
                foreach (var word in BreakLongWord(gfx, original, font, width))
                {
                    var w = Width(gfx, word, font);
                    if (line.Length > 0 && lineWidth + space + w > width)
                    {
                        lines.Add(line.ToString());
                        line.Clear();
                        lineWidth = 0;
                    }

                    if (line.Length > 0)
                    {
                        line.Append(' ');
                        lineWidth += space;
                    }

                    line.Append(word);
                    lineWidth += w;
                }
            }

            lines.Add(line.ToString());
        }

        return lines;
    }

    private static IEnumerable<string> BreakLongWord(XGraphics gfx, string word, XFont font, double width)
    {
        if (Width(gfx, word, font) <= width)
        {
            yield return word;
            yield break;
        }

        var start = 0;
        for (var end = 1; end <= word.Length; end++)
        {
            if (end - start > 1 && Width(gfx, word[start..end], font) > width)
            {
                yield return word[start..(end - 1)];
                start = end - 1;
            }
        }

        if (start < word.Length)
        {
            yield return word[start..];
        }
    }
}
