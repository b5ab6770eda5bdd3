using System.Collections.Concurrent;
using PdfSharp.Fonts;

namespace Decide.Reports.Fonts;

/// <summary>
/// Resolves every family PDFsharp asks for to the embedded DejaVu Sans faces: bold requests get DejaVu Sans Bold,
/// everything else DejaVu Sans. Italic is simulated by PDFsharp (the faces are upright).
/// </summary>
public sealed class ReportFontResolver : IFontResolver
{
    private const string Regular = "DejaVuSans";
    private const string Bold = "DejaVuSans-Bold";

    private static readonly ConcurrentDictionary<string, byte[]> Faces = new(StringComparer.Ordinal);

    /// <inheritdoc />
    public FontResolverInfo ResolveTypeface(string familyName, bool bold, bool italic) =>
        new(bold ? Bold : Regular, mustSimulateBold: false, mustSimulateItalic: italic);

    /// <inheritdoc />
    public byte[] GetFont(string faceName) => Faces.GetOrAdd(faceName, Load);

    private static byte[] Load(string faceName)
    {
        var resource = $"Decide.Reports.Fonts.{faceName}.ttf";
        using var stream = typeof(ReportFontResolver).Assembly.GetManifestResourceStream(resource)
            ?? throw new InvalidOperationException($"The font resource {resource} is missing from {typeof(ReportFontResolver).Assembly.GetName().Name}.");
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        return buffer.ToArray();
    }
}
