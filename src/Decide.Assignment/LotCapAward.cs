using Google.OrTools.Graph;

namespace Decide.Assignment;

/// <summary>How lots are awarded when one bidder may win only so many.</summary>
public enum LotCapRule
{
    /// <summary>
    /// Lots in the published order (by value, say): each goes to its best-ranked bidder who has not yet reached the
    /// cap; a bidder at the cap is passed over for the next on that lot's ranking.
    /// </summary>
    InLotOrder,

    /// <summary>
    /// The combination of awards, at most the cap per bidder, that awards as many lots as possible and, among those,
    /// gives the largest sum of the winners' scores.
    /// </summary>
    BestTotal,
}

/// <summary>One lot's ranking as its own evaluation produced it.</summary>
/// <param name="Lot">The lot's id.</param>
/// <param name="Name">Shown in the explanation.</param>
/// <param name="Ranked">The bidders in the running, best first, with the score that ranked them (points or closeness, on one scale across lots).</param>
public sealed record LotStanding(string Lot, string Name, IReadOnlyList<(string Bidder, double Score)> Ranked);

/// <summary>The award of one lot under the cap.</summary>
/// <param name="Lot">The lot's id.</param>
/// <param name="Winner">The bidder it goes to, or null when every ranked bidder is at the cap.</param>
/// <param name="Place">The winner's place on the lot's own ranking (1 = first), 0 when unawarded.</param>
/// <param name="PassedOver">Bidders ranked above the winner who were passed over because of the cap.</param>
/// <param name="Explanation">The reason in one sentence.</param>
public sealed record LotAward(string Lot, string? Winner, int Place, IReadOnlyList<string> PassedOver, string Explanation);

/// <summary>The award across lots.</summary>
/// <param name="Cap">The most lots one bidder may win.</param>
/// <param name="Rule">The published rule.</param>
/// <param name="Lots">One per lot, in the order given.</param>
/// <param name="Total">The sum of the winners' scores.</param>
public sealed record LotCapResult(int Cap, LotCapRule Rule, IReadOnlyList<LotAward> Lots, double Total);

/// <summary>
/// Awards lots when the tender caps the lots one bidder may win (Directive 2014/24/EU Art 46(2): the cap and the
/// objective rule that applies it are stated in the tender). Each lot is evaluated on its own first; this only decides
/// which of its ranked bidders wins once the cap is applied. <see cref="LotCapRule.BestTotal"/> is an assignment
/// problem, solved exactly as a min-cost flow with Google OR-Tools (see ADR 24).
/// </summary>
public static class LotCapAward
{
    private const long Scale = 1_000_000;

    /// <summary>Applies the cap.</summary>
    /// <param name="lots">Each lot's ranking, in the published lot order.</param>
    /// <param name="cap">The most lots one bidder may win; 1 or more.</param>
    /// <param name="rule">The published rule.</param>
    public static LotCapResult Award(IReadOnlyList<LotStanding> lots, int cap, LotCapRule rule)
    {
        ArgumentNullException.ThrowIfNull(lots);
        ArgumentOutOfRangeException.ThrowIfLessThan(cap, 1);
        var winners = rule == LotCapRule.InLotOrder ? InOrder(lots, cap) : BestTotal(lots, cap);
        var won = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        for (var l = 0; l < lots.Count; l++)
        {
            if (winners[l] is { } w)
            {
                (won.TryGetValue(w, out var list) ? list : won[w] = []).Add(lots[l].Name);
            }
        }

        var awards = new List<LotAward>(lots.Count);
        double total = 0;
        for (var l = 0; l < lots.Count; l++)
        {
            var lot = lots[l];
            var winner = winners[l];
            var place = winner is null ? 0 : 1 + lot.Ranked.ToList().FindIndex(r => r.Bidder == winner);
            var passed = lot.Ranked.Take(Math.Max(place - 1, winner is null ? lot.Ranked.Count : 0)).Select(r => r.Bidder).ToArray();
            total += winner is null ? 0 : lot.Ranked[place - 1].Score;
            string explanation;
            if (winner is null)
            {
                explanation = lot.Ranked.Count == 0
                    ? $"{lot.Name} has no bidder in the running and is not awarded."
                    : $"{lot.Name} is not awarded: every bidder ranked on it has already won {cap} {(cap == 1 ? "lot" : "lots")}, the cap.";
            }
            else if (place == 1)
            {
                explanation = $"{lot.Name} goes to {winner}, ranked first on it.";
            }
            else
            {
                var who = string.Join(", ", passed.Select(b => $"{b} ({string.Join(", ", won.GetValueOrDefault(b) ?? [])})"));
                explanation = rule == LotCapRule.InLotOrder
                    ? $"{lot.Name} goes to {winner}, ranked {Ordinal(place)} on it: {who} ranked above but had reached the cap of {cap} {(cap == 1 ? "lot" : "lots")} on earlier lots."
                    : $"{lot.Name} goes to {winner}, ranked {Ordinal(place)} on it: giving it to {who} instead would lower the sum of the winners' scores across lots under the cap of {cap}.";
            }

            awards.Add(new LotAward(lot.Lot, winner, place, passed, explanation));
        }

        return new LotCapResult(cap, rule, awards, total);
    }

    private static string?[] InOrder(IReadOnlyList<LotStanding> lots, int cap)
    {
        var count = new Dictionary<string, int>(StringComparer.Ordinal);
        var winners = new string?[lots.Count];
        for (var l = 0; l < lots.Count; l++)
        {
            foreach (var (bidder, _) in lots[l].Ranked)
            {
                if (count.GetValueOrDefault(bidder) < cap)
                {
                    winners[l] = bidder;
                    count[bidder] = count.GetValueOrDefault(bidder) + 1;
                    break;
                }
            }
        }

        return winners;
    }

    private static string?[] BestTotal(IReadOnlyList<LotStanding> lots, int cap)
    {
        var bidders = lots.SelectMany(l => l.Ranked.Select(r => r.Bidder)).Distinct(StringComparer.Ordinal).ToArray();
        var bidderNode = bidders.Select((b, i) => (b, i)).ToDictionary(x => x.b, x => 1 + x.i, StringComparer.Ordinal);
        int source = 0, firstLot = 1 + bidders.Length, sink = firstLot + lots.Count;
        var top = lots.SelectMany(l => l.Ranked).Select(r => r.Score).DefaultIfEmpty(0).Max();
        var bottom = lots.SelectMany(l => l.Ranked).Select(r => r.Score).DefaultIfEmpty(0).Min();

        // Costs are non-negative: (top − score) on an award, and on the by-pass that leaves a lot unawarded more than
        // any award could cost, so the flow awards as many lots as it can before it looks at scores.
        var unawarded = ((long)Math.Round((top - bottom) * Scale) + 1) * (lots.Count + 1);
        var flow = new MinCostFlow();
        foreach (var node in bidderNode.Values)
        {
            flow.AddArcWithCapacityAndUnitCost(source, node, cap, 0);
        }

        var arcs = new List<(int Arc, int Lot, string Bidder)>();
        for (var l = 0; l < lots.Count; l++)
        {
            foreach (var (bidder, score) in lots[l].Ranked)
            {
                var cost = (long)Math.Round((top - score) * Scale);
                arcs.Add((flow.AddArcWithCapacityAndUnitCost(bidderNode[bidder], firstLot + l, 1, cost), l, bidder));
            }

            flow.AddArcWithCapacityAndUnitCost(firstLot + l, sink, 1, 0);
            flow.AddArcWithCapacityAndUnitCost(source, firstLot + l, 1, unawarded);
        }

        flow.SetNodeSupply(source, lots.Count);
        flow.SetNodeSupply(sink, -lots.Count);
        var status = flow.Solve();
        if (status != MinCostFlowBase.Status.OPTIMAL)
        {
            throw new InvalidOperationException($"The lot award could not be solved ({status}).");
        }

        var winners = new string?[lots.Count];
        foreach (var (arc, l, bidder) in arcs)
        {
            if (flow.Flow(arc) > 0)
            {
                winners[l] = bidder;
            }
        }

        return winners;
    }

    private static string Ordinal(int n) => n switch
    {
        2 => "second",
        3 => "third",
        4 => "fourth",
        5 => "fifth",
        _ => $"{n}th",
    };
}
