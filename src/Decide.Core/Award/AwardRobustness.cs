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
/// <param name="CriticalChanges">For each pair of neighbours in the award's order, the criterion whose smallest change of share reverses them.</param>
public sealed record AwardRobustnessResult(
    IReadOnlyList<AwardWithout> WithoutBid,
    IReadOnlyList<AwardWithout> WithoutAssessor,
    IReadOnlyList<AwardSweep> Sweeps,
    IReadOnlyList<AwardAcceptability> Acceptability,
    int Draws,
    ulong Seed,
    IReadOnlyList<AwardCriticalChange> CriticalChanges);

/// <summary>
/// The smallest change of one criterion's share of all points (on the 0.01 grid, the others in proportion) that puts
/// <paramref name="Below"/> above <paramref name="Above"/>, its neighbour in the award's order.
/// </summary>
/// <param name="Above">The bid ranked just above.</param>
/// <param name="Below">The bid ranked just below.</param>
/// <param name="Criterion">The criterion whose change reverses them soonest.</param>
/// <param name="Published">That criterion's published share.</param>
/// <param name="Share">The share at which the two are reversed.</param>
public sealed record AwardCriticalChange(string Above, string Below, string Criterion, double Published, double Share);

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
            return new AwardRobustnessResult([], [], [], [], 0, options.Seed, []);
        }

        var baseOrder = Order(award.Result);
        var winner = award.Result.Ranking.Count(b => b.Rank == 1) == 1 ? award.Result.Ranking.First().Id : null;
        var (sweeps, critical) = Sweeps(award, baseOrder, winner);
        return new AwardRobustnessResult(
            WithoutBid(award, baseOrder, winner),
            WithoutAssessor(evaluation, baseOrder, winner),
            sweeps,
            Acceptability(evaluation, award, options),
            options.Draws,
            options.Seed,
            critical);
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

    /// <summary>
    /// Each criterion's share swept over the grid 0, 0.01, …, 1 (the others in proportion, the total kept), the award
    /// recomputed at every point: the nearest shares either side of the published one with another first place, and,
    /// for each pair of neighbours in the award's order, the criterion whose nearest share reverses them is closest.
    /// </summary>
    private static (List<AwardSweep> Sweeps, List<AwardCriticalChange> Critical) Sweeps(AwardReport award, IReadOnlyList<string> order, string? winner)
    {
        var plan = award.Plan;
        var points = plan.CriterionPoints.Append(plan.Price.MaxPoints).ToArray();
        var names = award.QualityCriteria.Append(award.Method.PriceCriterion).ToArray();
        var total = points.Sum();
        var sweeps = new List<AwardSweep>();
        var pairs = order.Zip(order.Skip(1)).ToArray();
        var best = new AwardCriticalChange?[pairs.Length];
        if (winner is null || total <= 0)
        {
            return (sweeps, []);
        }

        var steps = (int)Math.Round(1 / Step);
        var scaled = new double[points.Length];
        for (var j = 0; j < points.Length; j++)
        {
            var published = points[j] / total;
            var rest = total - points[j];
            var ranks = new Dictionary<string, int>[steps + 1];
            for (var i = 0; i <= steps; i++)
            {
                var share = i * Step;
                for (var k = 0; k < points.Length; k++)
                {
                    scaled[k] = k == j ? share * total : rest > 0 ? points[k] * (1 - share) * total / rest : 0;
                }

                var swept = plan with { CriterionPoints = scaled[..^1], Price = plan.Price with { MaxPoints = scaled[^1] } };
                ranks[i] = PointsAward.Compute(swept, award.Inputs).Bids.Where(b => b.Rank is not null).ToDictionary(b => b.Id, b => b.Rank!.Value, StringComparer.Ordinal);
            }

            string? First(int i)
            {
                var first = ranks[i].Where(r => r.Value == 1).Select(r => r.Key).ToArray();
                return first.Length == 1 ? first[0] : null;
            }

            var (lower, lowerWinner) = Nearest(published, steps, -1, i => First(i) is var w && w != winner, First);
            var (upper, upperWinner) = Nearest(published, steps, +1, i => First(i) is var w && w != winner, First);
            sweeps.Add(new AwardSweep(names[j], published, lower, lowerWinner, upper, upperWinner));

            for (var p = 0; p < pairs.Length; p++)
            {
                var (above, below) = pairs[p];
                bool Reversed(int i) => ranks[i].TryGetValue(above, out var ra) && ranks[i].TryGetValue(below, out var rb) && ra > rb;
                foreach (var direction in new[] { -1, +1 })
                {
                    if (Nearest(published, steps, direction, Reversed, _ => null).Share is { } share
                        && (best[p] is not { } current || Math.Abs(share - published) < Math.Abs(current.Share - current.Published) - 1e-12))
                    {
                        best[p] = new AwardCriticalChange(above, below, names[j], published, share);
                    }
                }
            }
        }

        return (sweeps, best.Where(b => b is not null).Select(b => b!).ToList());
    }

    /// <summary>The grid share nearest <paramref name="published"/> in <paramref name="direction"/> at which <paramref name="hit"/> holds.</summary>
    private static (double? Share, string? Winner) Nearest(double published, int steps, int direction, Func<int, bool> hit, Func<int, string?> winner)
    {
        var from = direction < 0 ? (int)Math.Floor(published * steps) : (int)Math.Ceiling(published * steps);
        for (var i = from; i >= 0 && i <= steps; i += direction)
        {
            var share = i * Step;
            if (direction < 0 ? share >= published - 1e-12 : share <= published + 1e-12)
            {
                continue;
            }

            if (hit(i))
            {
                return (share, winner(i));
            }
        }

        return (null, null);
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
