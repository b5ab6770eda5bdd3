using PdfSharp.Pdf;
using PdfSharp.Pdf.IO;

namespace Decide.Reports.Verification;

/// <summary>Reads the embedded evaluation file and the stated fingerprint out of a record.</summary>
public static class RecordAttachment
{
    /// <summary>
    /// The bytes of the embedded file named <paramref name="name"/> and the fingerprint in the document's keywords.
    /// </summary>
    /// <exception cref="InvalidDataException">The PDF cannot be read or holds no such attachment.</exception>
    public static (byte[] Snapshot, string? Fingerprint) Read(ReadOnlyMemory<byte> pdf, string name = EvaluationRecordDocument.AttachmentName)
    {
        PdfDocument document;
        try
        {
            document = PdfReader.Open(new MemoryStream(pdf.ToArray(), writable: false), PdfDocumentOpenMode.Import);
        }
        catch (Exception ex) when (ex is not OutOfMemoryException)
        {
            throw new InvalidDataException($"The PDF cannot be read ({ex.Message.TrimEnd('.')}).", ex);
        }

        using (document)
        {
            var names = document.Internals.Catalog.Elements.GetDictionary("/Names")?.Elements.GetDictionary("/EmbeddedFiles")?.Elements.GetArray("/Names")
                ?? throw new InvalidDataException("The PDF has no embedded files.");
            for (var i = 0; i + 1 < names.Elements.Count; i += 2)
            {
                var key = names.Elements[i] is PdfString s ? s.Value : null;
                if (key != name)
                {
                    continue;
                }

                var spec = names.Elements.GetDictionary(i + 1);
                var file = spec?.Elements.GetDictionary("/EF")?.Elements.GetDictionary("/F");
                if (file?.Stream is null)
                {
                    throw new InvalidDataException($"The attachment {name} has no content.");
                }

                var keywords = document.Info.Keywords ?? "";
                var at = keywords.IndexOf(EvaluationRecordDocument.FingerprintKeyword, StringComparison.Ordinal);
                var fingerprint = at < 0 ? null : new string(keywords[(at + EvaluationRecordDocument.FingerprintKeyword.Length)..].TakeWhile(char.IsAsciiHexDigit).ToArray());
                return (file.Stream.UnfilteredValue, fingerprint);
            }

            throw new InvalidDataException($"The PDF has no attachment named {name}.");
        }
    }
}
