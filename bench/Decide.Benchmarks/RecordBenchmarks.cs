using System.Security.Cryptography.X509Certificates;
using System.Text;
using BenchmarkDotNet.Attributes;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Reports;
using Decide.Reports.Content;
using Decide.Reports.Signing;
using Decide.Reports.Verification;

namespace Decide.Benchmarks;

/// <summary>
/// The signed evaluation record of the demo evaluation (samples/bus-stop-displays-importance.json: 6 bids, 9 criteria,
/// 5 assessors): laying out and signing the PDF from finished results, the whole of `decide report` in process
/// (read, analyse, robustness with 10,000 draws, render, sign), and verifying the signed file.
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class RecordBenchmarks
{
    private byte[] _json = null!;
    private RecordContent _content = null!;
    private X509Certificate2 _certificate = null!;
    private byte[] _signed = null!;

    [GlobalSetup]
    public void Setup()
    {
        _json = File.ReadAllBytes(SampleFile());
        _certificate = SelfSignedCertificate.Create("Benchmark signer", DateTimeOffset.UtcNow.AddDays(-1), TimeSpan.FromDays(30));
        _content = Content(_json, Environment.ProcessorCount);
        _signed = RecordSigner.Sign(_content, _certificate);
        Console.WriteLine($"// Signed record: {_signed.Length:N0} bytes");
    }

    [GlobalCleanup]
    public void Cleanup() => _certificate.Dispose();

    /// <summary>Layout and signature only (results already computed).</summary>
    [Benchmark(Baseline = true)]
    public byte[] RenderAndSign() => RecordSigner.Sign(_content, _certificate);

    /// <summary>What `decide report` does in process: read, analyse, robustness (10,000 draws), render, sign.</summary>
    [Benchmark]
    public byte[] EndToEnd() => RecordSigner.Sign(Content(_json, Environment.ProcessorCount), _certificate);

    /// <summary>Signature, byte range and attachment checks (the re-analysis check is the engine's own cost).</summary>
    [Benchmark]
    public VerificationReport Verify() => RecordVerifier.Verify(_signed);

    private static RecordContent Content(byte[] json, int threads)
    {
        var file = EvaluationFileReader.Read(json);
        var prepared = DecisionEngine.Prepare(file.Evaluation);
        var analysis = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, analysis, new RobustnessOptions(RobustnessOptions.DefaultDraws, RobustnessOptions.DefaultSeed, threads));
        return new RecordContent(
            file.Evaluation, analysis, robustness,
            new RecordIdentity(file.Evaluation.Title, file.Metadata.Reference ?? "", file.Metadata.Organisation ?? "", "Benchmark", []),
            [], AssessorConsistency.FromAnalysis(file.Evaluation, analysis), [], null, [], "bench",
            Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(file)), DateTimeOffset.UnixEpoch, SelfSignedCertificate.Note);
    }

    private static string SampleFile()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var path = Path.Combine(dir.FullName, "samples", "bus-stop-displays-importance.json");
            if (File.Exists(path))
            {
                return path;
            }
        }

        throw new FileNotFoundException("samples/bus-stop-displays-importance.json was not found above " + AppContext.BaseDirectory);
    }
}
