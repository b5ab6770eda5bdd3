using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Reports.Content;

/// <summary>The consistency of one assessor's pairwise judgements on one matrix (or of the panel's aggregate).</summary>
/// <param name="Assessor">Assessor id, or <c>panel</c>.</param>
/// <param name="Matrix">Which matrix ("Top level", or the group's name).</param>
/// <param name="Size">Order n of the matrix.</param>
/// <param name="Ratio">Consistency ratio CR = CI / RI(n).</param>
/// <param name="Threshold">The CR threshold applied for this n.</param>
/// <param name="Gci">Geometric consistency index.</param>
/// <param name="GciThreshold">The GCI threshold applied for this n.</param>
/// <param name="Acceptable">Whether CR is within its threshold.</param>
/// <param name="RandomIndexTable">Which random-index table gave RI(n).</param>
public sealed record AssessorConsistency(
    string Assessor, string Matrix, int Size, double Ratio, double Threshold, double Gci, double GciThreshold, bool Acceptable, string RandomIndexTable)
{
    /// <summary>
    /// The rows for every pairwise matrix in <paramref name="analysis"/> (empty when the weights come from importance
    /// ratings, where there is no pairwise consistency to report).
    /// </summary>
    public static IReadOnlyList<AssessorConsistency> FromAnalysis(Evaluation evaluation, AnalysisResult analysis)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        ArgumentNullException.ThrowIfNull(analysis);
        var groups = evaluation.Groups.ToDictionary(g => g.Id, g => g.Name, StringComparer.Ordinal);
        return analysis.Consistency.Select(c => new AssessorConsistency(
            c.Assessor,
            c.Group is null ? "Top level" : groups.GetValueOrDefault(c.Group, c.Group),
            c.Report.Size,
            c.Report.Ratio,
            c.Report.Threshold,
            c.Report.Gci,
            c.Report.GciThreshold,
            c.Report.Acceptable,
            c.Report.RandomIndexTable)).ToArray();
    }
}
