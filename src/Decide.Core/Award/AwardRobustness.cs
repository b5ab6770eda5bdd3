using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Core.Award;

/// <summary>Two bids whose order changed: <paramref name="Above"/> was above <paramref name="Below"/> and no longer is.</summary>
public sealed record AwardReversal(string Above, string Below);

/// <summary>The award recomputed without one bid or one assessor.</summary>
/// <param name="Without">The bid or assessor left out.</param>
/// <param name="Winner">The first place then, or null when none (a tie, or no bid left).</param>
/// <param name="WinnerChanged">True when the first place differs from the award's.</param>
/// <param name="Reversed">The pairs of the other bids whose order changed.</param>
public sealed record AwardWithout(string Without, string? Winner, bool WinnerChanged, IReadOnlyList<AwardReversal> Reversed);

/// <summary>
/// One criterion's weight swept over its whole range with the others scaled in proportion (the total kept): the
/// nearest shares below and above the published one at which the first place changes.
/// </summary>
/// <param name="Criterion">The criterion (a quality criterion or the price).</param>
/// <param name="Published">Its published share of all points.</param>
/// <param name="Lower">The largest share below the published one at which another bid comes first, or null when none does down to 0.</param>
/// <param name="LowerWinner">That bid.</param>
/// <param name="Upper">The smallest share above the published one at which another bid comes first, or null when none does up to 1.</param>
/// <param name="UpperWinner">That bid.</param>
public sealed record AwardSweep(string Criterion, double Published, double? Lower, string? LowerWinner, double? Upper, string? UpperWinner);

/// <summary>How often a bid took each place when the panel's scores were drawn again from the assessors' own terms.</summary>
/// <param name="Bid">The bid.</param>
/// <param name="Ranks">The share of draws at rank 1, 2, …; a draw in which the bid was excluded counts in none.</param>
/// <param name="Excluded">The share of draws in which the bid was excluded (a threshold it missed in that draw).</param>
public sealed record AwardAcceptability(string Bid, IReadOnlyList<double> Ranks, double Excluded)
{
    /// <summary>The share of draws the bid came first.</summary>
    public double First => Ranks.Count > 0 ? Ranks[0] : 0;
}

/// <summary>The robustness of the points award, the binding rule the tender published.</summary>
/// <param name="WithoutBid">The award without each bid that reached price (relative formulas can reorder the others).</param>
/// <param name="WithoutAssessor">The award without each assessor (moderated values stay as the panel agreed them).</param>
/// <param name="Sweeps">Each criterion's weight swept (steps of 0.01).</param>
/// <param name="Acceptability">Rank shares over the draws, per bid in the order given.</param>
/// <param name="Draws">How many draws.</param>
/// <param name="Seed">Their seed.</param>
public sealed record AwardRobustnessResult(
    IReadOnlyList<AwardWithout> WithoutBid,
    IReadOnlyList<AwardWithout> WithoutAssessor,
    IReadOnlyList<AwardSweep> Sweeps,
    IReadOnlyList<AwardAcceptability> Acceptability,
    int Draws,
    ulong Seed);

/// <summary>
/// Robustness of the points award: the same questions the closeness ranking answers (without each bid, without each
/// assessor, weight sweeps, rank acceptability from the spread of the panel's terms), asked of the award the tender
/// published. See docs/methods.md §10.
/// </summary>
/// <remarks>
/// Rank acceptability resamples the panel: in every draw each cell not moderated takes the weighted mean of as many
/// of its assessors' points as it has raters, drawn with replacement (a bootstrap over the panel); moderated cells
/// keep the agreed term. The draws are seeded, so the shares repeat exactly.
/// </remarks>
public static class AwardRobustness
{
    private const double Step = 0.01;

    /// <summary>Runs every check on the award of <paramref name="evaluation"/>.</summary>
    public static AwardRobustnessResult Run(Evaluation evaluation, AwardReport award, RobustnessOptions options)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        ArgumentNullException.ThrowIfNull(award);
        ArgumentNullException.ThrowIfNull(options);
        if (award.Result.PricesSealed)
        {
            return new AwardRobustnessResult([], [], [], [], 0, options.Seed);
        }

        var baseOrder = Order(award.Result);
        var winner = award.Result.Ranking.Count(b => b.Rank == 1) == 1 ? award.Result.Ranking.First().Id : null;
        return new AwardRobustnessResult(
            WithoutBid(award, baseOrder, winner),
            WithoutAssessor(evaluation, baseOrder, winner),
            Sweeps(award, winner),
            Acceptability(evaluation, award, options),
            options.Draws,
            options.Seed);
    }

    private static List<AwardWithout> WithoutBid(AwardReport award, IReadOnlyList<string> baseOrder, string? winner)
    {
        var result = new List<AwardWithout>();
        foreach (var removed in award.Result.Ranking.Select(b => b.Id).ToArray())
        {
            var again = PointsAward.Compute(award.Plan, award.Inputs.Where(b => b.Id != removed).ToArray());
            result.Add(Compare(removed, baseOrder.Where(id => id != removed).ToArray(), again, winner == removed ? null : winner));
        }

        return result;
    }

    private static List<AwardWithout> WithoutAssessor(Evaluation evaluation, IReadOnlyList<string> baseOrder, string? winner)
    {
        var result = new List<AwardWithout>();
        if (evaluation.Assessors.Count < 2)
        {
            return result;
        }

        foreach (var left in evaluation.Assessors)
        {
            var panel = evaluation.Assessors.Where(a => a.Id != left.Id).ToArray();
            var again = AwardAnalysis.Compute(evaluation, panel).Result;
            result.Add(Compare(left.Id, baseOrder, again, winner));
        }

        return result;
    }

    private static List<AwardSweep> Sweeps(AwardReport award, string? winner)
    {
        var plan = award.Plan;
        var points = plan.CriterionPoints.Append(plan.Price.MaxPoints).ToArray();
        var names = award.QualityCriteria.Append(award.Method.PriceCriterion).ToArray();
        var total = points.Sum();
        var sweeps = new List<AwardSweep>();
        if (winner is null || total <= 0)
        {
            return sweeps;
        }

        var steps = (int)Math.Round(1 / Step);
        var scaled = new double[points.Length];
        for (var j = 0; j < points.Length; j++)
        {
            var published = points[j] / total;
            string? WinnerAt(double share)
            {
                var rest = total - points[j];
                for (var k = 0; k < points.Length; k++)
                {
                    scaled[k] = k == j ? share * total : rest > 0 ? points[k] * (1 - share) * total / rest : 0;
                }

                var swept = plan with { CriterionPoints = scaled[..^1], Price = plan.Price with { MaxPoints = scaled[^1] } };
                var r = PointsAward.Compute(swept, award.Inputs);
                var first = r.Ranking.Where(b => b.Rank == 1).ToArray();
                return first.Length == 1 ? first[0].Id : null;
            }

            double? lower = null, upper = null;
            string? lowerWinner = null, upperWinner = null;
            for (var i = (int)Math.Floor(published * steps); i >= 0; i--)
            {
                var share = i * Step;
                if (share >= published - 1e-12)
                {
                    continue;
                }

                if (WinnerAt(share) is var w && w != winner)
                {
                    (lower, lowerWinner) = (share, w);
                    break;
                }
            }

            for (var i = (int)Math.Ceiling(published * steps); i <= steps; i++)
            {
                var share = i * Step;
                if (share <= published + 1e-12)
                {
                    continue;
                }

                if (WinnerAt(share) is var w && w != winner)
                {
                    (upper, upperWinner) = (share, w);
                    break;
                }
            }

            sweeps.Add(new AwardSweep(names[j], published, lower, lowerWinner, upper, upperWinner));
        }

        return sweeps;
    }

    private static List<AwardAcceptability> Acceptability(Evaluation evaluation, AwardReport award, RobustnessOptions options)
    {
        var bids = award.Inputs;
        var n = bids.Count;
        var m = award.QualityCriteria.Count;
        if (options.Draws <= 0 || n == 0)
        {
            return [];
        }

        // Per cell: the raters' points and weights, or nothing when the score is fixed (moderated, or nobody rated).
        var scale = evaluation.RatingScale;
        var weightOf = evaluation.Assessors.ToDictionary(a => a.Id, a => a.Weight, StringComparer.Ordinal);
        var byCell = evaluation.Ratings.Where(r => r.Term is not null && weightOf.ContainsKey(r.Assessor))
            .GroupBy(r => (r.Alternative, r.Criterion))
            .ToDictionary(g => g.Key, g => g.ToArray());
        var cellPoints = new double[n * m][];
        var cellWeights = new double[n * m][];
        for (var b = 0; b < n; b++)
        {
            for (var j = 0; j < m; j++)
            {
                var line = award.Lines[b].Cells[j];
                var raters = line.Source == PanelScoreSource.Moderated ? [] : byCell.GetValueOrDefault((bids[b].Id, award.QualityCriteria[j]), []);
                cellPoints[(b * m) + j] = raters.Select(r => scale.TryFind(r.Term!, out var s) ? scale[s].Points ?? 0 : 0).ToArray();
                cellWeights[(b * m) + j] = raters.Select(r => weightOf[r.Assessor]).ToArray();
            }
        }

        var counts = new int[n * n];
        var excluded = new int[n];
        var random = new SeededRandom(options.Seed, stream: 0xA3A2D);
        var scores = new double[n][];
        for (var b = 0; b < n; b++)
        {
            scores[b] = [.. bids[b].Scores];
        }

        var drawn = new AwardBid[n];
        for (var draw = 0; draw < options.Draws; draw++)
        {
            for (var b = 0; b < n; b++)
            {
                var row = scores[b];
                for (var j = 0; j < m; j++)
                {
                    var points = cellPoints[(b * m) + j];
                    if (points.Length == 0)
                    {
                        continue;
                    }

                    var weights = cellWeights[(b * m) + j];
                    double sum = 0, total = 0;
                    for (var k = 0; k < points.Length; k++)
                    {
                        var pick = (int)(random.NextDouble() * points.Length);
                        sum += weights[pick] * points[pick];
                        total += weights[pick];
                    }

                    row[j] = sum / total;
                }

                drawn[b] = bids[b] with { Scores = row };
            }

            var result = PointsAward.Compute(award.Plan, drawn);
            for (var b = 0; b < n; b++)
            {
                if (result.Bids[b].Rank is { } rank)
                {
                    counts[(b * n) + rank - 1]++;
                }
                else if (result.Bids[b].Excluded is not null)
                {
                    excluded[b]++;
                }
            }
        }

        return bids.Select((bid, b) => new AwardAcceptability(bid.Id,
            Enumerable.Range(0, n).Select(r => (double)counts[(b * n) + r] / options.Draws).ToArray(),
            (double)excluded[b] / options.Draws)).ToList();
    }

    private static AwardWithout Compare(string without, IReadOnlyList<string> before, AwardResult after, string? winner)
    {
        var rank = after.Bids.Where(b => b.Rank is not null).ToDictionary(b => b.Id, b => b.Rank!.Value, StringComparer.Ordinal);
        var reversed = new List<AwardReversal>();
        for (var i = 0; i < before.Count; i++)
        {
            for (var k = i + 1; k < before.Count; k++)
            {
                if (rank.TryGetValue(before[i], out var ri) && rank.TryGetValue(before[k], out var rk) && ri > rk)
                {
                    reversed.Add(new AwardReversal(before[i], before[k]));
                }
            }
        }

        var first = after.Ranking.Where(b => b.Rank == 1).ToArray();
        var now = first.Length == 1 ? first[0].Id : null;
        return new AwardWithout(without, now, now != winner, reversed);
    }

    private static IReadOnlyList<string> Order(AwardResult result) => result.Ranking.Select(b => b.Id).ToArray();
}
