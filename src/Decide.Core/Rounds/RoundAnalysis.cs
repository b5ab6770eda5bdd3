using Decide.Core.Analysis;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Core.Rounds;

/// <summary>An application whose funding decision changes under a robustness check.</summary>
/// <param name="Alternative">Its id.</param>
/// <param name="FundedNow">Whether the ranking as it stands funds it.</param>
/// <param name="Because">Each check under which the decision is the other one, in words.</param>
public sealed record FundingFlip(string Alternative, bool FundedNow, IReadOnlyList<string> Because);

/// <summary>What leaving one reviewer out does to the applications they read.</summary>
/// <param name="Assessor">The reviewer.</param>
/// <param name="Read">How many applications in the running they rated.</param>
/// <param name="LargestMove">Of those applications, the one whose rank moves most without them, or null.</param>
/// <param name="From">Its rank with the whole panel.</param>
/// <param name="To">Its rank without the reviewer.</param>
/// <param name="Problem">Why no ranking exists without them, else null.</param>
public sealed record ReviewerEffect(string Assessor, int Read, string? LargestMove, int From, int To, string? Problem);

/// <summary>One place of a round's ranking with what every output prints beside it.</summary>
/// <param name="Place">1 = best.</param>
/// <param name="Alternative">The application's id.</param>
/// <param name="Band">Its band, or null until robustness is run.</param>
/// <param name="Interval">Its 95% rank interval, or null until robustness is run.</param>
/// <param name="Funding">Its place against the funding line, or null when there is none.</param>
/// <param name="LastFunded">True for the last application of the unbroken funded run from the top (where the line is drawn).</param>
public sealed record RoundRow(int Place, string Alternative, int? Band, RankInterval? Interval, FundingDecision? Funding, bool LastFunded);

/// <summary>The sentences every output of a round prints, so the screens, the record and the command line agree.</summary>
public static class RoundText
{
    /// <summary>How the budget is spent, as a clause ("spent down the ranking …").</summary>
    public static string FundingRule(FundingRule rule) => rule == Model.FundingRule.StopAtFirstUnaffordable
        ? "spent down the ranking until the first application the rest of the budget cannot pay in full"
        : "spent down the ranking, passing over any application the rest of the budget cannot pay in full";

    /// <summary>An application's funding decision in one or two words.</summary>
    public static string Decision(FundingDecision decision) =>
        decision.Funded ? "funded" : decision.PassedOver ? "passed over" : "not funded";

    /// <summary>A rank interval as people read it ("3 to 6", or "12" when it is one place).</summary>
    public static string Places(RankInterval interval) =>
        interval.Best == interval.Worst ? $"{interval.Best}" : $"{interval.Best} to {interval.Worst}";
}

/// <summary>The figures a round adds to the analysis.</summary>
/// <param name="Order">The ranking the round follows (the points award when it binds, else closeness), ids best first.</param>
/// <param name="Funding">The funding line, or null when the plan sets no budget.</param>
/// <param name="Intervals">95% rank intervals (empty until robustness is run).</param>
/// <param name="Bands">Bands the draws cannot put in order (empty until robustness is run).</param>
/// <param name="Flips">Applications whose funding decision a robustness check changes (empty without a funding line or robustness).</param>
/// <param name="Reviewers">Leave-one-reviewer-out on the applications each reviewer read (empty without an incomplete design or robustness).</param>
/// <param name="Calibrated">The ranking with reviewers' terms standardised, shown beside the raw one, when the plan asks for it; else null.</param>
public sealed record RoundReport(
    IReadOnlyList<string> Order,
    FundingResult? Funding,
    IReadOnlyList<RankInterval> Intervals,
    IReadOnlyList<ScoreBand> Bands,
    IReadOnlyList<FundingFlip> Flips,
    IReadOnlyList<ReviewerEffect> Reviewers,
    CalibratedRanking? Calibrated = null)
{
    /// <summary>Each place of <see cref="Order"/> with its band, interval and funding decision, best first.</summary>
    public IReadOnlyList<RoundRow> Rows()
    {
        var bands = Bands.SelectMany(b => b.Alternatives.Select(id => (id, b.Number))).ToDictionary(x => x.id, x => x.Number, StringComparer.Ordinal);
        var intervals = Intervals.ToDictionary(i => i.Alternative, StringComparer.Ordinal);
        var decisions = Funding?.Decisions.ToDictionary(d => d.Alternative, StringComparer.Ordinal);
        var line = Funding?.Line ?? 0;
        return Order.Select((id, i) => new RoundRow(i + 1, id, bands.TryGetValue(id, out var b) ? b : null,
            intervals.GetValueOrDefault(id), decisions?.GetValueOrDefault(id), i + 1 == line)).ToArray();
    }
}

/// <summary>
/// Shortlists, bands and the funding line of a round (issue "lots and large rounds", item 4), from the analysis and,
/// when it has been run, the robustness checks. Reports only: the panel decides, with the ranking as its evidence.
/// </summary>
public static class RoundAnalysis
{
    /// <summary>The round's report, or null when the evaluation has neither a review design nor a funding line.</summary>
    public static RoundReport? Of(PreparedEvaluation prepared, AnalysisResult analysis, AwardReport? award, RobustnessResult? robustness)
    {
        ArgumentNullException.ThrowIfNull(prepared);
        ArgumentNullException.ThrowIfNull(analysis);
        var source = prepared.Source;
        if (source.Reviews is null && source.Funding is null)
        {
            return null;
        }

        var order = Order(analysis, award);
        var requested = source.Alternatives.ToDictionary(a => a.Id, a => a.Requested ?? 0, StringComparer.Ordinal);
        var funding = source.Funding is { } plan ? FundingLine.Draw(order, id => requested[id], plan) : null;
        var ids = order.Select(o => o.Id).ToArray();
        var calibrated = source.Reviews is { Calibration: ReviewerCalibration.Standardise } ? Calibration.Rank(prepared, analysis, funding) : null;
        if (robustness is null)
        {
            return new RoundReport(ids, funding, [], [], [], [], calibrated);
        }

        var intervals = ScoreBands.Intervals(robustness.Sensitivity.Acceptability);
        var bands = ScoreBands.Of(ids, intervals);
        var flips = funding is null ? [] : Flips(source, funding, intervals, robustness.Sensitivity.LeaveOneOut, id => requested[id]);
        var reviewers = source.Reviews is null ? [] : Reviewers(prepared, ids, robustness.Sensitivity.LeaveOneOut);
        return new RoundReport(ids, funding, intervals, bands, flips, reviewers, calibrated);
    }

    private static (string Id, double Score)[] Order(AnalysisResult analysis, AwardReport? award) =>
        award is { Method.Binding: BindingResult.Points, Result.PricesSealed: false }
            ? award.Result.Ranking.Select(b => (b.Id, b.Total ?? 0)).ToArray()
            : analysis.Ranking.Select(r => (r.Alternative, r.Closeness)).ToArray();

    private static FundingFlip[] Flips(
        Evaluation source, FundingResult funding, IReadOnlyList<RankInterval> intervals, IReadOnlyList<LeaveOneOutResult> leaveOneOut, Func<string, double> requested)
    {
        var funded = funding.Funded.ToHashSet(StringComparer.Ordinal);
        var reasons = funding.Decisions.ToDictionary(d => d.Alternative, _ => new List<string>(), StringComparer.Ordinal);
        foreach (var interval in intervals)
        {
            if (!reasons.TryGetValue(interval.Alternative, out var why) || funding.Line == 0)
            {
                continue;
            }

            var isFunded = funded.Contains(interval.Alternative);
            if (isFunded ? interval.Worst > funding.Line : interval.Best <= funding.Line)
            {
                why.Add($"its 95% rank interval ({interval.Best}–{interval.Worst}) crosses the funding line after rank {funding.Line}");
            }
        }

        foreach (var without in leaveOneOut.Where(l => l.Problem is null && l.Ranking.Count > 0))
        {
            var redrawn = FundingLine.Draw(without.Ranking.Select((id, i) => (id, -(double)i)).ToArray(), requested, funding.Plan)
                .Funded.ToHashSet(StringComparer.Ordinal);
            var name = source.Assessors.FirstOrDefault(a => a.Id == without.Assessor)?.Name ?? without.Assessor;
            foreach (var (id, why) in reasons)
            {
                if (without.Ranking.Contains(id) && redrawn.Contains(id) != funded.Contains(id))
                {
                    why.Add($"without {name}'s ratings it would {(funded.Contains(id) ? "not be funded" : "be funded")}");
                }
            }
        }

        return funding.Decisions
            .Where(d => reasons[d.Alternative].Count > 0)
            .Select(d => new FundingFlip(d.Alternative, d.Funded, reasons[d.Alternative]))
            .ToArray();
    }

    private static ReviewerEffect[] Reviewers(PreparedEvaluation prepared, string[] order, IReadOnlyList<LeaveOneOutResult> leaveOneOut)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count;
        var rankNow = order.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i + 1, StringComparer.Ordinal);
        var effects = new List<ReviewerEffect>();
        for (var a = 0; a < prepared.Assessors.Count; a++)
        {
            var assessor = prepared.Assessors[a].Id;
            var read = new List<string>();
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < m; j++)
                {
                    if (prepared.Steps[(a * n * m) + (i * m) + j] >= 0)
                    {
                        read.Add(prepared.Alternatives[i].Id);
                        break;
                    }
                }
            }

            var without = leaveOneOut.FirstOrDefault(l => l.Assessor == assessor);
            if (without is null || without.Problem is not null)
            {
                effects.Add(new ReviewerEffect(assessor, read.Count, null, 0, 0, without?.Problem));
                continue;
            }

            var rankWithout = without.Ranking.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i + 1, StringComparer.Ordinal);
            var moved = read.Where(rankNow.ContainsKey).Where(rankWithout.ContainsKey)
                .Select(id => (id, from: rankNow[id], to: rankWithout[id]))
                .OrderByDescending(x => Math.Abs(x.to - x.from)).ThenBy(x => x.from)
                .FirstOrDefault();
            effects.Add(moved.id is null
                ? new ReviewerEffect(assessor, read.Count, null, 0, 0, null)
                : new ReviewerEffect(assessor, read.Count, moved.id, moved.from, moved.to, null));
        }

        return effects.ToArray();
    }
}
