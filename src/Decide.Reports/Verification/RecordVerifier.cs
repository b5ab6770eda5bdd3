using Decide.Reports.Content;

namespace Decide.Reports.Verification;

/// <summary>
/// Checks a signed evaluation record, each question answered separately: is the signature valid, is the document
/// unchanged since signing, does the embedded evaluation file match the record's fingerprint, and (through a
/// delegate, because reading the file needs Decide.Interchange) does it re-analyse to the printed figures.
/// </summary>
/// <remarks>
/// The signer's identity is reported, not trusted: no certificate chain is built. A self-signed certificate proves the
/// file is unchanged, not who signed it.
/// </remarks>
public static class RecordVerifier
{
    /// <summary>Name of the check on the CMS signature itself.</summary>
    public const string SignatureCheck = "signature valid";

    /// <summary>Name of the check that the signed bytes are the whole file and unchanged.</summary>
    public const string UnchangedCheck = "document unchanged since signing";

    /// <summary>Name of the check that the embedded evaluation file is the one fingerprinted.</summary>
    public const string AttachmentCheck = "embedded evaluation matches the fingerprint";

    /// <summary>Name of the re-analysis check (run by the delegate).</summary>
    public const string ReanalysisCheck = "embedded evaluation re-analyses to the printed figures";

    /// <summary>Runs the checks on <paramref name="pdf"/>.</summary>
    /// <param name="pdf">The record's bytes.</param>
    /// <param name="reanalysis">
    /// Re-analyses the embedded file and compares with the printed figures; called only when the attachment could be
    /// read. Null leaves the check out of the report.
    /// </param>
    public static VerificationReport Verify(ReadOnlyMemory<byte> pdf, Func<EmbeddedRecord, VerificationCheck>? reanalysis = null)
    {
        var checks = new List<VerificationCheck>();
        var bytes = pdf.Span;
        var field = SignatureField.Find(bytes, out var fieldProblem);
        CmsSignature? cms = null;
        var cmsProblem = "";
        if (field is not null)
        {
            cms = CmsSignature.Decode(field.Signature, out cmsProblem);
        }

        checks.Add(Signature(field, fieldProblem, cms, cmsProblem));
        checks.Add(Unchanged(bytes, field, fieldProblem, cms));

        byte[]? snapshot = null;
        string? fingerprint = null;
        try
        {
            (snapshot, fingerprint) = RecordAttachment.Read(pdf);
            var actual = RecordFingerprint.Of(snapshot);
            checks.Add(fingerprint is null
                ? new VerificationCheck(AttachmentCheck, false, $"The {EvaluationRecordDocument.AttachmentName} attachment was found but the record states no fingerprint to compare it with.")
                : actual == fingerprint
                    ? new VerificationCheck(AttachmentCheck, true, $"The attached {EvaluationRecordDocument.AttachmentName} ({snapshot.Length:N0} bytes) has SHA-256 {actual}, the fingerprint the record states.")
                    : new VerificationCheck(AttachmentCheck, false, $"The attached {EvaluationRecordDocument.AttachmentName} has SHA-256 {actual}, but the record states {fingerprint}."));
        }
        catch (InvalidDataException ex)
        {
            checks.Add(new VerificationCheck(AttachmentCheck, false, ex.Message));
        }

        if (reanalysis is not null)
        {
            checks.Add(snapshot is null
                ? new VerificationCheck(ReanalysisCheck, false, "Not run: the embedded evaluation file could not be read.")
                : reanalysis(new EmbeddedRecord(pdf, snapshot, fingerprint)));
        }

        return new VerificationReport(checks);
    }

    private static VerificationCheck Signature(SignatureField? field, string fieldProblem, CmsSignature? cms, string cmsProblem)
    {
        if (field is null)
        {
            return new VerificationCheck(SignatureCheck, false, fieldProblem);
        }

        if (cms is null)
        {
            return new VerificationCheck(SignatureCheck, false, cmsProblem);
        }

        if (!cms.SignatureVerifies(out var problem))
        {
            return new VerificationCheck(SignatureCheck, false, problem);
        }

        var certificate = cms.Certificate!;
        var self = Signing.SelfSignedCertificate.IsSelfSigned(certificate) ? " The certificate is self-signed: this proves the file is unchanged since signing, not who signed it." : $" Issued by {certificate.Issuer}; the certificate chain is not checked here.";
        return new VerificationCheck(SignatureCheck, true, $"The CMS signature ({cms.Signer.DigestAlgorithm.FriendlyName ?? cms.Signer.DigestAlgorithm.Value}) verifies with the public key of {certificate.Subject}.{self}");
    }

    private static VerificationCheck Unchanged(ReadOnlySpan<byte> pdf, SignatureField? field, string fieldProblem, CmsSignature? cms)
    {
        if (field is null)
        {
            return new VerificationCheck(UnchangedCheck, false, $"Nothing to compare: {char.ToLowerInvariant(fieldProblem[0])}{fieldProblem[1..]}");
        }

        var r = field.Ranges;
        if (field.Count > 1)
        {
            return new VerificationCheck(UnchangedCheck, false, $"The file holds {field.Count} signatures; a record is signed once, so something was added after signing.");
        }

        if (r[0] != 0)
        {
            return new VerificationCheck(UnchangedCheck, false, $"The signed bytes start at offset {r[0]}, not at the start of the file: the first {r[0]} bytes are not covered.");
        }

        if (r[2] + r[3] != pdf.Length)
        {
            return new VerificationCheck(UnchangedCheck, false, r[2] + r[3] < pdf.Length
                ? $"The signature covers the file up to byte {r[2] + r[3]}, but the file is {pdf.Length} bytes long: {pdf.Length - (r[2] + r[3])} bytes were added after signing (for example an incremental update)."
                : $"The signature covers bytes up to {r[2] + r[3]}, but the file is only {pdf.Length} bytes long: it was cut or changed after signing.");
        }

        if (cms is null)
        {
            return new VerificationCheck(UnchangedCheck, false, "The signature cannot be read, so the signed digest cannot be compared.");
        }

        if (!cms.DigestMatches(field.SignedBytes(pdf), out var algorithm))
        {
            return new VerificationCheck(UnchangedCheck, false, $"The {algorithm} digest of the signed bytes differs from the digest in the signature: the file was changed after signing.");
        }

        return new VerificationCheck(UnchangedCheck, true, $"The signature covers the whole file ({pdf.Length:N0} bytes) except its own value, nothing follows it, and the {algorithm} digest of those bytes matches the signed digest.");
    }
}
