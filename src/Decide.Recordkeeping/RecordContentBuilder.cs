using System.Text;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Reports.Content;

namespace Decide.Recordkeeping;

/// <summary>
/// Builds the record's content from an evaluation file alone: what a file cannot hold (declarations, an audit trail,
/// sign-offs) is stated as not recorded rather than invented.
/// </summary>
public static class RecordContentBuilder
{
    /// <summary>The version printed as the software that computed the figures.</summary>
    public static string SoftwareVersion { get; } = typeof(DecisionEngine).Assembly.GetName().Version?.ToString(3) ?? "unknown";

    /// <summary>Analyses <paramref name="file"/> and assembles everything the record prints.</summary>
    public static RecordContent Build(EvaluationFile file, RobustnessOptions robustness, DateTimeOffset generatedAt, string? certificateNote)
    {
        ArgumentNullException.ThrowIfNull(file);
        var evaluation = file.Evaluation;
        var run = DecisionRun.Of(evaluation, robustness);
        var (analysis, checks) = (run.Analysis, run.Robustness!);
        var snapshot = Encoding.UTF8.GetBytes(EvaluationFileWriter.ToJson(file));
        var names = evaluation.Assessors.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);

        var panel = evaluation.Assessors.Select(a =>
        {
            var declined = evaluation.Ratings.Where(r => r.Assessor == a.Id && r.Declined is not null).Select(r => r.Declined!).Distinct().ToArray();
            return new MemberOnRecord(a.Name, "Assessor", a.Id, a.Weight, null,
                declined.Length == 0 ? null : "Declined cells: " + string.Join("; ", declined));
        }).ToArray();

        var moderation = evaluation.Moderated.Select(m => new ModerationOnRecord(
            m.Alternative,
            m.Criterion,
            evaluation.Ratings.Where(r => r.Alternative == m.Alternative && r.Criterion == m.Criterion && r.Term is not null)
                .Select(r => $"{names.GetValueOrDefault(r.Assessor, r.Assessor)} {r.Term}").ToArray(),
            m.Term,
            m.Reason,
            m.AgreedBy is { Count: > 0 } agreed ? "Agreed by " + string.Join(", ", agreed.Select(a => names.GetValueOrDefault(a, a))) : "The panel",
            null)).ToArray();

        var meta = file.Metadata;
        var identity = new RecordIdentity(
            evaluation.Title,
            string.IsNullOrWhiteSpace(meta.Reference) ? "(no reference given)" : meta.Reference,
            string.IsNullOrWhiteSpace(meta.Organisation) ? "(organisation not given)" : meta.Organisation,
            "Produced from an evaluation file with the command line; not approved in the service",
            []);

        return new RecordContent(
            evaluation, analysis, checks, identity, panel, AssessorConsistency.FromAnalysis(evaluation, analysis), moderation,
            Audit: null, Approvals: [], SoftwareVersion, snapshot, generatedAt, certificateNote,
            run.Award, run.AwardAgreement, run.AwardRobustness,
            Reports.Methodology.MethodologyDocument.Fingerprint(MethodologyInputs.From(file)),
            Round: run.Round);
    }
}
