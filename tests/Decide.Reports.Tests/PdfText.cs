using System.Text;
using UglyToad.PdfPig;

namespace Decide.Reports.Tests;

/// <summary>Text of a PDF as a reader extracts it (PdfPig), page by page.</summary>
internal sealed class PdfText
{
    private PdfText(IReadOnlyList<string> pages, IReadOnlyList<(double Width, double MaxRight, double MinLeft)> bounds)
    {
        Pages = pages;
        Bounds = bounds;
    }

    public IReadOnlyList<string> Pages { get; }

    /// <summary>Per page: its width, and the rightmost and leftmost edge of any letter on it.</summary>
    public IReadOnlyList<(double Width, double MaxRight, double MinLeft)> Bounds { get; }

    /// <summary>All pages' text with whitespace removed (cells and lines are drawn as separate strings).</summary>
    public string Squeezed => Squeeze(string.Concat(Pages));

    public static PdfText Of(byte[] pdf)
    {
        using var document = PdfDocument.Open(pdf);
        var pages = new List<string>();
        var bounds = new List<(double, double, double)>();
        foreach (var page in document.GetPages())
        {
            pages.Add(page.Text);
            var letters = page.Letters;
            bounds.Add((page.Width, letters.Count == 0 ? 0 : letters.Max(l => l.BoundingBox.Right), letters.Count == 0 ? 0 : letters.Min(l => l.BoundingBox.Left)));
        }

        return new PdfText(pages, bounds);
    }

    public static string Squeeze(string text)
    {
        var builder = new StringBuilder(text.Length);
        foreach (var c in text)
        {
            if (!char.IsWhiteSpace(c))
            {
                builder.Append(c);
            }
        }

        return builder.ToString();
    }
}
