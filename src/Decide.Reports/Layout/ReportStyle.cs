using Decide.Reports.Fonts;
using PdfSharp.Drawing;

namespace Decide.Reports.Layout;

/// <summary>Fonts, colours and sizes shared by every page.</summary>
internal sealed class ReportStyle
{
    public XFont Title { get; } = new(ReportFonts.Family, 22, XFontStyleEx.Bold);
    public XFont Heading1 { get; } = new(ReportFonts.Family, 15, XFontStyleEx.Bold);
    public XFont Heading2 { get; } = new(ReportFonts.Family, 11, XFontStyleEx.Bold);
    public XFont Body { get; } = new(ReportFonts.Family, 9.5);
    public XFont BodyBold { get; } = new(ReportFonts.Family, 9.5, XFontStyleEx.Bold);
    public XFont Cell { get; } = new(ReportFonts.Family, 8);
    public XFont CellBold { get; } = new(ReportFonts.Family, 8, XFontStyleEx.Bold);
    public XFont Small { get; } = new(ReportFonts.Family, 7);

    public static readonly XColor Ink = XColor.FromArgb(20, 20, 20);
    public static readonly XColor Muted = XColor.FromArgb(90, 90, 90);
    public static readonly XColor Rule = XColor.FromArgb(170, 170, 170);
    public static readonly XColor HeaderFill = XColor.FromArgb(226, 230, 236);
    public static readonly XColor Zebra = XColor.FromArgb(246, 247, 249);
    public static readonly XColor Accent = XColor.FromArgb(31, 78, 121);
    public static readonly XColor CautionFill = XColor.FromArgb(253, 246, 227);
    public static readonly XColor CautionRule = XColor.FromArgb(196, 150, 40);

    /// <summary>Series colours for charts, chosen to stay apart in grey print too (dark to light alternating).</summary>
    public static readonly XColor[] Series =
    [
        XColor.FromArgb(31, 78, 121), XColor.FromArgb(214, 96, 77), XColor.FromArgb(47, 133, 90), XColor.FromArgb(146, 92, 180),
        XColor.FromArgb(196, 150, 40), XColor.FromArgb(90, 90, 90), XColor.FromArgb(57, 160, 200), XColor.FromArgb(170, 60, 120),
    ];

    public XBrush InkBrush { get; } = new XSolidBrush(Ink);
    public XBrush MutedBrush { get; } = new XSolidBrush(Muted);
    public XBrush AccentBrush { get; } = new XSolidBrush(Accent);
}
