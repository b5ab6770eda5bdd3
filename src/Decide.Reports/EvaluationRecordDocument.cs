using Decide.Reports.Content;
using Decide.Reports.Fonts;
using Decide.Reports.Layout;
using PdfSharp.Pdf;

namespace Decide.Reports;

/// <summary>
/// The evaluation record as a PDF: cover, summary, method, locked plan, panel, consistency, decision matrix, ranking,
/// robustness, moderation, audit trail, sign-off and every assessor's ratings, with the evaluation file embedded as
/// <see cref="AttachmentName"/> and its fingerprint in every footer. Sign it with <see cref="Signing.RecordSigner"/>.
/// </summary>
public static class EvaluationRecordDocument
{
    /// <summary>The name of the embedded evaluation file.</summary>
    public const string AttachmentName = "evaluation.json";

    /// <summary>The prefix of the fingerprint in the PDF's keywords (<c>sha256:</c> followed by 64 hex digits).</summary>
    public const string FingerprintKeyword = "sha256:";

    /// <summary>Lays out the record as an unsaved PDF document (save it, or sign it with <see cref="Signing.RecordSigner"/>).</summary>
    public static PdfDocument Create(RecordContent content)
    {
        ArgumentNullException.ThrowIfNull(content);
        ReportFonts.EnsureRegistered();
        var document = new PdfDocument();
        document.Info.Title = $"Evaluation record: {content.Identity.Title}";
        document.Info.Subject = $"Evaluation record {content.Identity.Reference}";
        document.Info.Author = content.Identity.Organisation;
        document.Info.Creator = $"Decide {content.SoftwareVersion}";
        document.Info.Keywords = $"decide-evaluation-record {FingerprintKeyword}{content.Fingerprint}";
        document.Info.CreationDate = content.GeneratedAt.UtcDateTime;
        document.Options.CompressContentStreams = true;
        new RecordWriter(document, content).Write();
        using (var snapshot = new MemoryStream(content.Snapshot.ToArray(), writable: false))
        {
            document.AddEmbeddedFile(AttachmentName, snapshot);
        }

        return document;
    }

    /// <summary>Renders the record as an unsigned PDF.</summary>
    public static byte[] Render(RecordContent content)
    {
        using var document = Create(content);
        using var output = new MemoryStream();
        document.Save(output, closeStream: false);
        return output.ToArray();
    }
}
