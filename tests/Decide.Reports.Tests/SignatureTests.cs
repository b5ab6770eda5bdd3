using System.Diagnostics;
using Decide.Reports.Verification;

namespace Decide.Reports.Tests;

public sealed class SignatureTests
{
    private static byte[] Signed => SampleRecords.SignedBusStop;

    [Fact]
    public void Every_check_passes_on_the_record_as_signed()
    {
        var report = RecordVerifier.Verify(Signed);

        Assert.True(report.AllPassed, string.Join("\n", report.Failed.Select(c => $"{c.Name}: {c.Detail}")));
        Assert.Equal([RecordVerifier.SignatureCheck, RecordVerifier.UnchangedCheck, RecordVerifier.AttachmentCheck], report.Checks.Select(c => c.Name));
        Assert.Contains("self-signed", report.Checks[0].Detail);
    }

    [Fact]
    public void Popplers_pdfsig_an_external_verifier_reports_the_signature_valid()
    {
        // External verifier: Debian's pdfsig (poppler-utils), installed by scripts/prerequisites.sh.
        var path = Path.Combine(Path.GetTempPath(), $"decide-record-{Guid.NewGuid():N}.pdf");
        File.WriteAllBytes(path, Signed);
        try
        {
            var start = new ProcessStartInfo("pdfsig", [path]) { RedirectStandardOutput = true, RedirectStandardError = true };
            Process process;
            try
            {
                process = Process.Start(start)!;
            }
            catch (System.ComponentModel.Win32Exception ex)
            {
                Assert.Fail($"pdfsig could not be started ({ex.Message}); install poppler-utils (scripts/prerequisites.sh does).");
                return;
            }

            using (process)
            {
                var output = process.StandardOutput.ReadToEnd() + process.StandardError.ReadToEnd();
                process.WaitForExit();
                Assert.Contains("Signature Validation: Signature is Valid.", output);
                Assert.Contains("Total document signed", output);
                Assert.Contains("SHA-256", output);
            }
        }
        finally
        {
            File.Delete(path);
        }
    }

    public static TheoryData<long> PositionsInsideTheSignedRange()
    {
        var field = SignatureField.Find(Signed, out var problem) ?? throw new InvalidOperationException(problem);
        var r = field.Ranges;
        var positions = new SortedSet<long> { r[0], r[1] - 1, r[2], r[2] + r[3] - 1 };
        // Both ends of each range, the /ByteRange entry itself, and a spread through the whole file.
        var marker = System.Text.Encoding.Latin1.GetString(Signed).LastIndexOf("/ByteRange", StringComparison.Ordinal);
        for (var i = 0; i < 30; i++)
        {
            positions.Add(marker + i);
        }

        for (long p = 7; p < Signed.Length; p += Signed.Length / 97)
        {
            if (p < r[1] || p >= r[2])
            {
                positions.Add(p);
            }
        }

        var data = new TheoryData<long>();
        foreach (var p in positions)
        {
            data.Add(p);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(PositionsInsideTheSignedRange))]
    public void Flipping_any_byte_inside_the_signed_range_fails_the_unchanged_check(long position)
    {
        var tampered = (byte[])Signed.Clone();
        tampered[position] ^= 0x5A;

        var report = RecordVerifier.Verify(tampered);

        Assert.False(report.AllPassed);
        Assert.Contains(report.Failed, c => c.Name == RecordVerifier.UnchangedCheck);
    }

    [Fact]
    public void A_changed_byte_in_the_content_leaves_the_signature_itself_valid_and_names_only_the_unchanged_check()
    {
        var field = SignatureField.Find(Signed, out _)!;
        var tampered = (byte[])Signed.Clone();
        var position = (int)(field.Ranges[1] / 2);
        tampered[position] ^= 0x01;

        var report = RecordVerifier.Verify(tampered);

        Assert.True(report.Checks.Single(c => c.Name == RecordVerifier.SignatureCheck).Passed);
        var failed = report.Checks.Single(c => c.Name == RecordVerifier.UnchangedCheck);
        Assert.False(failed.Passed);
        Assert.Contains("changed after signing", failed.Detail);
    }

    [Fact]
    public void Bytes_appended_after_signing_such_as_an_incremental_update_fail_the_unchanged_check()
    {
        var update = System.Text.Encoding.ASCII.GetBytes("\n1 0 obj\n<< /Title (changed) >>\nendobj\n%%EOF\n");
        var tampered = Signed.Concat(update).ToArray();

        var report = RecordVerifier.Verify(tampered);

        var failed = Assert.Single(report.Failed);
        Assert.Equal(RecordVerifier.UnchangedCheck, failed.Name);
        Assert.Contains($"{update.Length} bytes were added after signing", failed.Detail);
    }

    [Fact]
    public void A_damaged_signature_value_fails_the_signature_check()
    {
        var field = SignatureField.Find(Signed, out _)!;
        System.Formats.Asn1.AsnDecoder.ReadEncodedValue(field.Signature, System.Formats.Asn1.AsnEncodingRules.BER, out _, out _, out var length);
        var cms = new System.Security.Cryptography.Pkcs.SignedCms();
        cms.Decode(field.Signature.AsSpan(0, length));
        // The RSA signature value itself, found as hex inside /Contents; one hex digit in its middle is changed.
        var value = Convert.ToHexString(cms.SignerInfos[0].GetSignature());
        var text = System.Text.Encoding.Latin1.GetString(Signed);
        var at = text.IndexOf(value, StringComparison.OrdinalIgnoreCase) + (value.Length / 2);
        Assert.True(at > value.Length / 2);
        var tampered = (byte[])Signed.Clone();
        tampered[at] = tampered[at] == (byte)'0' ? (byte)'1' : (byte)'0';

        var report = RecordVerifier.Verify(tampered);

        Assert.Contains(report.Failed, c => c.Name == RecordVerifier.SignatureCheck);
    }

    [Fact]
    public void An_unsigned_record_fails_the_signature_checks_and_says_there_is_no_signature()
    {
        var unsigned = EvaluationRecordDocument.Render(SampleRecords.BusStop);

        var report = RecordVerifier.Verify(unsigned);

        Assert.Contains("no signature", report.Checks.Single(c => c.Name == RecordVerifier.SignatureCheck).Detail);
        Assert.False(report.Checks.Single(c => c.Name == RecordVerifier.UnchangedCheck).Passed);
        Assert.True(report.Checks.Single(c => c.Name == RecordVerifier.AttachmentCheck).Passed);
    }

    [Fact]
    public void A_certificate_without_a_private_key_is_refused_with_a_reason()
    {
        using var publicOnly = System.Security.Cryptography.X509Certificates.X509CertificateLoader.LoadCertificate(SampleRecords.Certificate.RawData);

        var ex = Assert.Throws<ArgumentException>(() => Signing.RecordSigner.Sign(SampleRecords.BusStop, publicOnly));

        Assert.Contains("no private key", ex.Message);
    }
}
