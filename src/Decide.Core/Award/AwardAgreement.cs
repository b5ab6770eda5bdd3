using Decide.Core.Analysis;
using Decide.Core.Robustness;

namespace Decide.Core.Award;

/// <summary>
/// How the binding result and the supporting one agree: the points award's first place beside the closeness
/// ranking's, and Kendall's τ-b between the two orders over the bids both rank.
/// </summary>
/// <param name="Binding">Which result binds.</param>
/// <param name="PointsWinner">The points award's first place, or null when it has none yet.</param>
/// <param name="ClosenessWinner">The closeness ranking's first place, or null when it has none.</param>
/// <param name="KendallTau">τ-b between the two orders (1 = the same order), or null with fewer than two bids ranked by both.</param>
/// <param name="Compared">How many bids both results rank.</param>
public sealed record AwardAgreement(BindingResult Binding, string? PointsWinner, string? ClosenessWinner, double? KendallTau, int Compared)
{
    /// <summary>True when both results put the same bid first.</summary>
    public bool SameWinner => PointsWinner is not null && PointsWinner == ClosenessWinner;

    /// <summary>The winner under the binding result.</summary>
    public string? Winner => Binding == BindingResult.Points ? PointsWinner : ClosenessWinner;

    /// <summary>Compares the award with the closeness ranking of the same evaluation.</summary>
    public static AwardAgreement Of(AwardReport award, AnalysisResult analysis)
    {
        ArgumentNullException.ThrowIfNull(award);
        ArgumentNullException.ThrowIfNull(analysis);
        var closeness = analysis.Ranking.ToDictionary(r => r.Alternative, r => r.Rank, StringComparer.Ordinal);
        var both = award.Result.Bids.Where(b => b.Rank is not null && closeness.ContainsKey(b.Id)).ToArray();
        var x = both.Select(b => (double)b.Rank!.Value).ToArray();
        var y = both.Select(b => (double)closeness[b.Id]).ToArray();
        var closenessWinner = analysis.Ranking.Count(r => r.Rank == 1) == 1 ? analysis.Ranking.First(r => r.Rank == 1).Alternative : null;
        return new AwardAgreement(award.Method.Binding, award.Winner, closenessWinner, both.Length >= 2 ? RankStatistics.KendallTauB(x, y) : null, both.Length);
    }
}
