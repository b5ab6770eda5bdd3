using Decide.Core.Robustness;

namespace Decide.Core.Rounds;

/// <summary>The ranks an application takes in 95% of the rank-acceptability draws.</summary>
/// <param name="Alternative">Its id.</param>
/// <param name="Best">The best rank outside the best 2.5% of draws.</param>
/// <param name="Worst">The worst rank outside the worst 2.5% of draws.</param>
public sealed record RankInterval(string Alternative, int Best, int Worst);

/// <summary>Applications the uncertainty of the panel's ratings and weights cannot put in order.</summary>
/// <param name="Number">1 for the top band.</param>
/// <param name="Alternatives">Its members, in ranking order.</param>
/// <param name="Best">The best rank any member reaches in its interval.</param>
/// <param name="Worst">The worst rank any member reaches in its interval.</param>
public sealed record ScoreBand(int Number, IReadOnlyList<string> Alternatives, int Best, int Worst);

/// <summary>
/// Bands of a ranking: going down the ranking, an application joins the band of the one above it when its 95% rank
/// interval overlaps the interval of the band's first member, and starts a new band when it does not. Inside a band
/// the order is the panel's but the draws could not confirm it; between bands it is confirmed in 95% of draws.
/// </summary>
/// <remarks>
/// The intervals come from the rank-acceptability analysis (its shares bᵢʳ of draws at each rank); an interval is
/// read off the cumulative shares at 2.5% and 97.5%. Comparing with the band's first member, not the previous
/// application, keeps a long chain of small overlaps from making one band of the whole list. Common practice in
/// peer review is to fund clear bands and to decide within the band at the funding line by the panel's discussion.
/// </remarks>
public static class ScoreBands
{
    /// <summary>Each application's 95% rank interval, in the order of <paramref name="acceptability"/>.</summary>
    public static IReadOnlyList<RankInterval> Intervals(AcceptabilityResult acceptability)
    {
        ArgumentNullException.ThrowIfNull(acceptability);
        return acceptability.Alternatives.Select(a =>
        {
            double cumulative = 0;
            int best = 0, worst = a.Ranks.Count;
            for (var r = 0; r < a.Ranks.Count; r++)
            {
                cumulative += a.Ranks[r];
                if (best == 0 && cumulative > 0.025)
                {
                    best = r + 1;
                }

                if (cumulative >= 0.975 - 1e-12)
                {
                    worst = r + 1;
                    break;
                }
            }

            return new RankInterval(a.Alternative, Math.Max(best, 1), Math.Max(worst, Math.Max(best, 1)));
        }).ToArray();
    }

    /// <summary>The bands of <paramref name="order"/> (ids best first) from the intervals.</summary>
    public static IReadOnlyList<ScoreBand> Of(IReadOnlyList<string> order, IReadOnlyList<RankInterval> intervals)
    {
        ArgumentNullException.ThrowIfNull(order);
        ArgumentNullException.ThrowIfNull(intervals);
        var byId = intervals.ToDictionary(i => i.Alternative, StringComparer.Ordinal);
        var bands = new List<ScoreBand>();
        List<string>? members = null;
        RankInterval? leader = null;
        int best = 0, worst = 0;
        foreach (var id in order)
        {
            if (!byId.TryGetValue(id, out var interval))
            {
                continue;
            }

            if (leader is null || interval.Best > leader.Worst)
            {
                if (members is not null)
                {
                    bands.Add(new ScoreBand(bands.Count + 1, members, best, worst));
                }

                members = [];
                leader = interval;
                best = interval.Best;
                worst = interval.Worst;
            }

            members!.Add(id);
            best = Math.Min(best, interval.Best);
            worst = Math.Max(worst, interval.Worst);
        }

        if (members is not null)
        {
            bands.Add(new ScoreBand(bands.Count + 1, members, best, worst));
        }

        return bands;
    }
}
