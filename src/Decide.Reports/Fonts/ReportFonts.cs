using PdfSharp.Fonts;

namespace Decide.Reports.Fonts;

/// <summary>
/// The one typeface every Decide PDF uses: DejaVu Sans (regular and bold), shipped inside this assembly so a report
/// looks the same on every machine and never depends on what fonts a server has installed.
/// </summary>
public static class ReportFonts
{
    /// <summary>The family name reports ask for.</summary>
    public const string Family = "Decide Sans";

    private static readonly Lock Gate = new();

    /// <summary>
    /// Installs <see cref="ReportFontResolver"/> as PDFsharp's font resolver, once per process. PDFsharp's resolver is
    /// global; if another resolver is already installed, reports fall back to it and this call leaves it alone.
    /// </summary>
    public static void EnsureRegistered()
    {
        lock (Gate)
        {
            if (GlobalFontSettings.FontResolver is null)
            {
                GlobalFontSettings.FontResolver = new ReportFontResolver();
            }
        }
    }
}
