using Decide.Recordkeeping;
using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using System.Text;
using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Reports.Signing;
using Decide.Reports.Verification;

namespace Decide.Cli.Tests;

public sealed class ReportAndVerifyCommandTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("decide-report-tests-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string PathOf(string name) => Path.Combine(_folder, name);

    [Fact]
    public void Report_without_a_certificate_self_signs_says_so_and_verifies()
    {
        var pdf = PathOf("record.pdf");

        var report = CliRun.Of("report", RepositoryFiles.BusStopSample, "-o", pdf, "--draws", "300", "--seed", "5");

        Assert.Equal(0, report.ExitCode);
        Assert.Equal("", report.Stderr);
        Assert.Contains("self-signed", report.Stdout);
        Assert.StartsWith("%PDF-", Encoding.ASCII.GetString(File.ReadAllBytes(pdf), 0, 5));

        var verify = CliRun.Of("verify", pdf);

        Assert.Equal(0, verify.ExitCode);
        var lines = verify.Stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(4, lines.Length);
        Assert.All(lines, l => Assert.StartsWith("PASS", l));
        Assert.Contains(lines, l => l.Contains(RecordVerifier.ReanalysisCheck, StringComparison.Ordinal));
        Assert.Contains("not who signed it", verify.Stdout);
    }

    [Fact]
    public void Report_signs_with_a_given_certificate_whose_password_comes_from_the_environment()
    {
        var (pfx, variable) = IssuedCertificate("s3cret-" + Guid.NewGuid().ToString("N")[..6]);
        var pdf = PathOf("signed.pdf");

        var report = CliRun.Of("report", RepositoryFiles.MinimalExample, "-o", pdf, "--sign", pfx, "--password-env", variable, "--draws", "0");

        Assert.Equal(0, report.ExitCode);
        Assert.Contains("CN=Procurement Office Signer", report.Stdout);
        Assert.DoesNotContain("self-signed", report.Stdout);
        var verify = CliRun.Of("verify", pdf);
        Assert.Equal(0, verify.ExitCode);
        Assert.Contains("CN=Procurement Office Signer", verify.Stdout);
        Assert.Contains("Issued by CN=Test Procurement CA", verify.Stdout);
    }

    [Fact]
    public void A_wrong_password_is_an_input_error_naming_the_certificate_file()
    {
        var (pfx, _) = IssuedCertificate("right");
        var variable = "DECIDE_TEST_WRONG_" + Guid.NewGuid().ToString("N")[..8];
        Environment.SetEnvironmentVariable(variable, "wrong");

        var run = CliRun.Of("report", RepositoryFiles.MinimalExample, "-o", PathOf("x.pdf"), "--sign", pfx, "--password-env", variable);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.StartsWith($"{pfx}: cannot be read as a PKCS#12 certificate", run.Stderr);
        Assert.False(File.Exists(PathOf("x.pdf")));
    }

    [Fact]
    public void An_unset_password_variable_is_named()
    {
        var (pfx, _) = IssuedCertificate("pw");
        var run = CliRun.Of("report", RepositoryFiles.MinimalExample, "-o", PathOf("x.pdf"), "--sign", pfx, "--password-env", "DECIDE_TEST_NOT_SET_ANYWHERE");

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("DECIDE_TEST_NOT_SET_ANYWHERE", run.Stderr);
    }

    [Fact]
    public void Report_of_an_invalid_evaluation_lists_its_problems_and_writes_nothing()
    {
        var input = PathOf("bad.json");
        File.WriteAllText(input, "{\"format\": \"decide-evaluation/1\"}");

        var run = CliRun.Of("report", input, "-o", PathOf("bad.pdf"));

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.StartsWith("$.", run.StderrLines[0]);
        Assert.False(File.Exists(PathOf("bad.pdf")));
    }

    [Fact]
    public void Report_needs_an_output_file()
    {
        var run = CliRun.Of("report", RepositoryFiles.MinimalExample);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("--output", run.Stderr);
    }

    [Fact]
    public void Verify_of_a_changed_file_fails_and_names_the_check()
    {
        var pdf = PathOf("record.pdf");
        Assert.Equal(0, CliRun.Of("report", RepositoryFiles.MinimalExample, "-o", pdf, "--draws", "0").ExitCode);
        var bytes = File.ReadAllBytes(pdf);
        bytes[bytes.Length / 3] ^= 0x20;
        File.WriteAllBytes(pdf, bytes);

        var run = CliRun.Of("verify", pdf);

        Assert.Equal(ExitCodes.VerificationFailed, run.ExitCode);
        Assert.Contains($"FAIL  {RecordVerifier.UnchangedCheck}", run.Stdout);
        Assert.Contains($"verification failed: {RecordVerifier.UnchangedCheck}", run.Stderr);
    }

    [Fact]
    public void Verify_fails_the_reanalysis_check_when_the_printed_figures_are_not_those_of_the_embedded_file()
    {
        // A record whose pages show the demo evaluation but whose attachment is another evaluation: signature,
        // byte range and fingerprint are all consistent, only the figures disagree.
        var demo = EvaluationFileReader.ReadFile(RepositoryFiles.BusStopSample);
        var content = RecordContentBuilder.Build(demo, new RobustnessOptions(0), DateTimeOffset.UnixEpoch, null)
            with { Snapshot = File.ReadAllBytes(RepositoryFiles.MinimalExample) };
        using var certificate = SelfSignedCertificate.Create("test", DateTimeOffset.UtcNow.AddDays(-1), TimeSpan.FromDays(2));
        var pdf = PathOf("mismatch.pdf");
        File.WriteAllBytes(pdf, RecordSigner.Sign(content, certificate));

        var run = CliRun.Of("verify", pdf);

        Assert.Equal(ExitCodes.VerificationFailed, run.ExitCode);
        Assert.Contains($"verification failed: {RecordVerifier.ReanalysisCheck}", run.Stderr);
        Assert.Contains($"PASS  {RecordVerifier.UnchangedCheck}", run.Stdout);
    }

    [Fact]
    public void Verify_of_a_missing_file_is_an_input_error()
    {
        var run = CliRun.Of("verify", PathOf("absent.pdf"));

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Equal($"{PathOf("absent.pdf")}: no such file", run.Stderr.Trim());
    }

    [Fact]
    public void Verify_of_a_file_that_is_not_a_signed_record_fails_every_check_without_a_stack_trace()
    {
        var path = PathOf("notes.pdf");
        File.WriteAllText(path, "just some text");

        var run = CliRun.Of("verify", path);

        Assert.Equal(ExitCodes.VerificationFailed, run.ExitCode);
        Assert.DoesNotContain("   at ", run.Stdout + run.Stderr);
        Assert.Contains("no signature", run.Stdout);
    }

    /// <summary>A signing certificate issued by a throw-away CA, saved as a password-protected .pfx.</summary>
    private (string Path, string Variable) IssuedCertificate(string password)
    {
        var now = DateTimeOffset.UtcNow;
        using var caKey = RSA.Create(2048);
        var caRequest = new CertificateRequest("CN=Test Procurement CA", caKey, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        caRequest.CertificateExtensions.Add(new X509BasicConstraintsExtension(true, false, 0, true));
        using var ca = caRequest.CreateSelfSigned(now.AddDays(-1), now.AddDays(30));
        using var key = RSA.Create(2048);
        var request = new CertificateRequest("CN=Procurement Office Signer", key, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        using var issued = request.Create(ca, now.AddDays(-1), now.AddDays(10), [1, 2, 3, 4]);
        using var withKey = issued.CopyWithPrivateKey(key);
        var path = PathOf($"signer-{Guid.NewGuid():N}.pfx");
        File.WriteAllBytes(path, withKey.Export(X509ContentType.Pkcs12, password));
        var variable = "DECIDE_TEST_PFX_" + Guid.NewGuid().ToString("N")[..8].ToUpperInvariant();
        Environment.SetEnvironmentVariable(variable, password);
        return (path, variable);
    }
}
