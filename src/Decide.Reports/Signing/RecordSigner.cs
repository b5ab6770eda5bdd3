using System.Security.Cryptography.X509Certificates;
using Decide.Reports.Content;
using PdfSharp.Pdf;
using PdfSharp.Pdf.Signatures;

namespace Decide.Reports.Signing;

/// <summary>
/// Signs an evaluation record: a CMS (PKCS#7) signature with SHA-256 over every byte of the PDF except the signature
/// itself, made with PDFsharp's default signer.
/// </summary>
public static class RecordSigner
{
    /// <summary>Lays out <paramref name="content"/> and returns the signed PDF.</summary>
    /// <param name="content">What the record prints.</param>
    /// <param name="certificate">A certificate with its private key.</param>
    /// <param name="reason">The signature's stated reason.</param>
    public static byte[] Sign(RecordContent content, X509Certificate2 certificate, string reason = "Evaluation record issued")
    {
        ArgumentNullException.ThrowIfNull(content);
        using var document = EvaluationRecordDocument.Create(content);
        return Sign(document, certificate, reason, content.SoftwareVersion);
    }

    /// <summary>Saves an unsaved document with a signature and returns the bytes.</summary>
    /// <exception cref="ArgumentException">The certificate has no private key.</exception>
    public static byte[] Sign(PdfDocument document, X509Certificate2 certificate, string reason, string softwareVersion)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(certificate);
        if (!certificate.HasPrivateKey)
        {
            throw new ArgumentException($"The certificate {certificate.Subject} has no private key, so it cannot sign.", nameof(certificate));
        }

        var options = new DigitalSignatureOptions
        {
            Reason = reason,
            ContactInfo = certificate.GetNameInfo(X509NameType.SimpleName, forIssuer: false),
            AppName = $"Decide {softwareVersion}",
            PageIndex = 0,
        };
        DigitalSignatureHandler.ForDocument(document, new PdfSharpDefaultSigner(certificate, PdfMessageDigestType.SHA256, null), options);
        using var output = new MemoryStream();
        document.Save(output, closeStream: false);
        return output.ToArray();
    }
}
