using System.Security.Cryptography.X509Certificates;
using System.Text;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Reports.Content;
using Decide.Reports.Signing;

namespace Decide.Reports.Tests;

/// <summary>Records built from the repository's demo evaluation, with every optional section filled in.</summary>
internal static class SampleRecords
{
    public static readonly DateTimeOffset At = new(2026, 3, 30, 9, 0, 0, TimeSpan.Zero);

    private static readonly Lazy<X509Certificate2> LazyCertificate = new(() =>
        SelfSignedCertificate.Create("Decide test signer", At.AddDays(-1), TimeSpan.FromDays(30)));

    private static readonly Lazy<RecordContent> LazyBusStop = new(() => Build(BusStopFile()));

    private static readonly Lazy<byte[]> LazySigned = new(() => RecordSigner.Sign(LazyBusStop.Value, LazyCertificate.Value));

    public static X509Certificate2 Certificate => LazyCertificate.Value;

    /// <summary>The demo evaluation's record (rank acceptability with 2,000 draws, seed 7).</summary>
    public static RecordContent BusStop => LazyBusStop.Value;

    /// <summary>The demo evaluation's record, signed.</summary>
    public static byte[] SignedBusStop => LazySigned.Value;

    public static string Root { get; } = FindRoot();

    public static EvaluationFile BusStopFile() =>
        EvaluationFileReader.ReadFile(Path.Combine(Root, "samples", "bus-stop-displays-importance.json"));

    public static RecordContent Build(EvaluationFile file, int draws = 2000)
    {
        var evaluation = file.Evaluation;
        var run = Decide.Core.DecisionRun.Of(evaluation, new RobustnessOptions(draws, 7, 2));
        var (analysis, robustness) = (run.Analysis, run.Robustness!);
        var snapshot = Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(file));
        var first = evaluation.Assessors[0];
        return new RecordContent(
            evaluation,
            analysis,
            robustness,
            new RecordIdentity(evaluation.Title, file.Metadata.Reference ?? "REF-1", file.Metadata.Organisation ?? "Test body", "Awaiting approval",
                [new RecordDate("Plan locked", At.AddDays(-40)), new RecordDate("Bids opened", At.AddDays(-20))]),
            evaluation.Assessors.Select(a => new MemberOnRecord(a.Name, a == first ? "Chair and assessor" : "Assessor", a.Id, a.Weight, At.AddDays(-21), "none declared")).ToArray(),
            AssessorConsistency.FromAnalysis(evaluation, analysis),
            [new ModerationOnRecord(evaluation.Alternatives[0].Id, evaluation.Criteria[0].Id, ["A: G", "B: MP"], "MG", "Agreed after reading the trial photos again.", first.Name, At.AddDays(-5))],
            new AuditSummary(412, "9f2c0000000000000000000000000000000000000000000000000000000000aa", true, "All 412 entries verify.", At.AddDays(-45), At.AddDays(-1)),
            [new ApprovalOnRecord(first.Name, "Panel chair", At.AddDays(-1), "I confirm the panel evaluated every bid against the published criteria only.")],
            "0.1.0-test",
            snapshot,
            At,
            SelfSignedCertificate.Note,
            run.Award,
            run.AwardAgreement,
            run.AwardRobustness,
            Round: run.Round);
    }

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "Decide.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException($"No folder above {AppContext.BaseDirectory} holds Decide.sln.");
    }

    /// <summary>A copy of an evaluation with alternatives renamed (ids unchanged).</summary>
    public static EvaluationFile Renamed(EvaluationFile file, IReadOnlyDictionary<string, string> names) =>
        file with
        {
            Evaluation = file.Evaluation with
            {
                Alternatives = file.Evaluation.Alternatives.Select(a => names.TryGetValue(a.Id, out var n) ? a with { Name = n } : a).ToArray(),
            },
        };

    public static Evaluation WithRationale(Evaluation evaluation, string assessor, string alternative, string criterion, string rationale) =>
        evaluation with
        {
            Ratings = evaluation.Ratings.Select(r => r.Assessor == assessor && r.Alternative == alternative && r.Criterion == criterion ? r with { Rationale = rationale } : r).ToArray(),
        };
}
