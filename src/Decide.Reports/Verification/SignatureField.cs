using System.Globalization;
using System.Text;

namespace Decide.Reports.Verification;

/// <summary>
/// The /ByteRange and /Contents of a PDF's signature dictionary, read from the raw bytes (not through a PDF parser, so
/// that what is checked is exactly what was signed).
/// </summary>
/// <param name="Ranges">The four numbers of /ByteRange: start and length of the part before the signature, and of the part after.</param>
/// <param name="Signature">The bytes of the /Contents hex string (the CMS signature, possibly zero-padded).</param>
/// <param name="Count">How many signature byte ranges the file holds.</param>
internal sealed record SignatureField(long[] Ranges, byte[] Signature, int Count)
{
    private const string Marker = "/ByteRange";

    /// <summary>Finds the last signature in <paramref name="pdf"/>; null with a reason when there is none or it is malformed.</summary>
    public static SignatureField? Find(ReadOnlySpan<byte> pdf, out string problem)
    {
        problem = "";
        var text = Encoding.Latin1.GetString(pdf);
        var positions = new List<int>();
        for (var at = text.IndexOf(Marker, StringComparison.Ordinal); at >= 0; at = text.IndexOf(Marker, at + Marker.Length, StringComparison.Ordinal))
        {
            positions.Add(at);
        }

        if (positions.Count == 0)
        {
            problem = "The file holds no signature (no /ByteRange entry).";
            return null;
        }

        var start = text.IndexOf('[', positions[^1]);
        var end = start < 0 ? -1 : text.IndexOf(']', start);
        if (start < 0 || end < 0 || end - start > 200)
        {
            problem = "The signature's /ByteRange is not a readable array.";
            return null;
        }

        var parts = text[(start + 1)..end].Split((char[])[' ', '\r', '\n', '\t'], StringSplitOptions.RemoveEmptyEntries);
        var ranges = new long[4];
        if (parts.Length != 4 || !parts.Select((p, i) => long.TryParse(p, NumberStyles.None, CultureInfo.InvariantCulture, out ranges[i])).All(ok => ok))
        {
            problem = $"The signature's /ByteRange should hold four whole numbers; it holds [{text[(start + 1)..end].Trim()}].";
            return null;
        }

        var gapStart = ranges[0] + ranges[1];
        var gapEnd = ranges[2];
        if (ranges[0] < 0 || ranges[1] <= 0 || gapEnd <= gapStart || gapEnd > pdf.Length || gapEnd - gapStart < 2
            || pdf[(int)gapStart] != (byte)'<' || pdf[(int)gapEnd - 1] != (byte)'>')
        {
            problem = $"The /ByteRange [{string.Join(' ', ranges)}] does not leave exactly the signature's hex string out of the signed bytes.";
            return null;
        }

        var hex = text[((int)gapStart + 1)..((int)gapEnd - 1)];
        if (hex.Length % 2 != 0 || !hex.All(char.IsAsciiHexDigit))
        {
            problem = "The signature's /Contents is not a hex string.";
            return null;
        }

        return new SignatureField(ranges, Convert.FromHexString(hex), positions.Count);
    }

    /// <summary>The signed bytes: the two ranges joined.</summary>
    public byte[] SignedBytes(ReadOnlySpan<byte> pdf)
    {
        var first = pdf.Slice((int)Ranges[0], (int)Ranges[1]);
        var secondLength = (int)Math.Max(0, Math.Min(Ranges[3], pdf.Length - Ranges[2]));
        var second = pdf.Slice((int)Ranges[2], secondLength);
        var bytes = new byte[first.Length + second.Length];
        first.CopyTo(bytes);
        second.CopyTo(bytes.AsSpan(first.Length));
        return bytes;
    }
}
