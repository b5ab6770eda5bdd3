using Decide.Core.Model;

namespace Decide.Core.Rounds;

/// <summary>One application's place against the funding line.</summary>
/// <param name="Alternative">Its id.</param>
/// <param name="Position">Its place in the ranking, 1 = best.</param>
/// <param name="Requested">What it asks for.</param>
/// <param name="Funded">True when the budget pays for it under the plan's rule.</param>
/// <param name="RemainingAfter">The budget left once this application's turn has passed.</param>
/// <param name="PassedOver">True when it was not funded although an application below it was (the rule skips what the remaining budget cannot pay for).</param>
public sealed record FundingDecision(string Alternative, int Position, double Requested, bool Funded, double RemainingAfter, bool PassedOver);

/// <summary>The funding line drawn down a ranking.</summary>
/// <param name="Plan">The budget and rule.</param>
/// <param name="Decisions">One per ranked application, best first.</param>
/// <param name="Spent">What the funded applications request in all.</param>
/// <param name="Line">The position of the last funded application in an unbroken run from the top (0 when none is).</param>
/// <param name="TiedAcrossTheLine">Applications whose closeness equals that of an application on the other side of the line: the line falls inside a tie, which the panel must break.</param>
public sealed record FundingResult(FundingPlan Plan, IReadOnlyList<FundingDecision> Decisions, double Spent, int Line, IReadOnlyList<string> TiedAcrossTheLine)
{
    /// <summary>The ids of the funded applications, best first.</summary>
    public IEnumerable<string> Funded => Decisions.Where(d => d.Funded).Select(d => d.Alternative);
}

/// <summary>
/// Spends a round's budget down the ranking: each application in turn is funded in full if the remaining budget can
/// pay for it; the first that cannot either ends the funding (<see cref="FundingRule.StopAtFirstUnaffordable"/>)
/// or is passed over for the next that fits (<see cref="FundingRule.SkipUnaffordable"/>). No application is funded in
/// part. The rule is the plan's; which one a funder may use is set by its own rules.
/// </summary>
public static class FundingLine
{
    /// <summary>Draws the line down <paramref name="order"/>.</summary>
    /// <param name="order">Ranked application ids, best first, with the score that ranked them (for ties at the line).</param>
    /// <param name="requested">The amount each application asks for.</param>
    /// <param name="plan">The budget and rule.</param>
    public static FundingResult Draw(IReadOnlyList<(string Id, double Score)> order, Func<string, double> requested, FundingPlan plan)
    {
        ArgumentNullException.ThrowIfNull(order);
        ArgumentNullException.ThrowIfNull(requested);
        ArgumentNullException.ThrowIfNull(plan);
        var remaining = plan.Budget;
        var stopped = false;
        var decisions = new List<FundingDecision>(order.Count);
        var line = 0;
        var unbroken = true;
        for (var i = 0; i < order.Count; i++)
        {
            var amount = requested(order[i].Id);
            var funded = !stopped && amount <= remaining + Slack(plan.Budget);
            if (funded)
            {
                remaining = Math.Max(0, remaining - amount);
                if (unbroken)
                {
                    line = i + 1;
                }
            }
            else
            {
                unbroken = false;
                stopped = plan.Rule == FundingRule.StopAtFirstUnaffordable;
            }

            decisions.Add(new FundingDecision(order[i].Id, i + 1, amount, funded, remaining, false));
        }

        // Passed over: unfunded with a funded application further down.
        var lastFunded = decisions.FindLastIndex(d => d.Funded);
        for (var i = 0; i < lastFunded; i++)
        {
            if (!decisions[i].Funded)
            {
                decisions[i] = decisions[i] with { PassedOver = true };
            }
        }

        var tied = new List<string>();
        for (var i = 0; i < order.Count; i++)
        {
            for (var j = 0; j < order.Count; j++)
            {
                if (decisions[i].Funded && !decisions[j].Funded && Math.Abs(order[i].Score - order[j].Score) <= Ranking.FuzzyTopsis.TieTolerance)
                {
                    if (!tied.Contains(order[i].Id))
                    {
                        tied.Add(order[i].Id);
                    }

                    if (!tied.Contains(order[j].Id))
                    {
                        tied.Add(order[j].Id);
                    }
                }
            }
        }

        return new FundingResult(plan, decisions, decisions.Where(d => d.Funded).Sum(d => d.Requested), line, tied);
    }

    /// <summary>Amounts are money: a remainder below a millionth of the budget is rounding, not a shortfall.</summary>
    private static double Slack(double budget) => Math.Abs(budget) * 1e-9;
}
