using static System.FormattableString;

namespace Decide.Core.Award;

/// <summary>What breaks a tie in the award, in the order the plan lists the rules.</summary>
public enum TieBreak
{
    /// <summary>More quality points wins.</summary>
    HigherQuality,

    /// <summary>The lower price wins.</summary>
    LowerPrice,

    /// <summary>The bid submitted first wins (the order the bids are given in).</summary>
    EarlierSubmission,
}

/// <summary>When a price is flagged as abnormally low; either test, or both, may be set.</summary>
/// <param name="BelowMeanOfOthersPercent">Flag a price more than this many per cent below the mean of the other admissible prices.</param>
/// <param name="Estimate">The buyer's estimate of the contract's value.</param>
/// <param name="BelowEstimatePercent">Flag a price more than this many per cent below <paramref name="Estimate"/>.</param>
public sealed record AbnormallyLowRule(double? BelowMeanOfOthersPercent, double? Estimate = null, double? BelowEstimatePercent = null);

/// <summary>A points award published with the tender: the quality criteria's points, the scale, the price rule, thresholds and tie-breaks.</summary>
/// <param name="CriterionPoints">The points of each quality criterion, in criterion order.</param>
/// <param name="ScaleMaximum">The highest score of the scoring scale (5 for a 0–5 scale).</param>
/// <param name="Price">The price rule.</param>
/// <param name="MinimumQualityShare">The least share of all quality points a bid needs (0.6 for 60 %), or null.</param>
/// <param name="MinimumScores">The least panel score per criterion (on the scale), or null for none; null or one entry per criterion.</param>
/// <param name="TieBreaks">The tie-break rules in the order they apply.</param>
/// <param name="AbnormallyLow">When a price is flagged as abnormally low, or null.</param>
/// <param name="CriterionNames">The criteria's names, in criterion order, for the reasons a bid is excluded; null to number them.</param>
public sealed record AwardPlan(
    IReadOnlyList<double> CriterionPoints,
    double ScaleMaximum,
    PriceRule Price,
    double? MinimumQualityShare = null,
    IReadOnlyList<double?>? MinimumScores = null,
    IReadOnlyList<TieBreak>? TieBreaks = null,
    AbnormallyLowRule? AbnormallyLow = null,
    IReadOnlyList<string>? CriterionNames = null)
{
    /// <summary>All quality points.</summary>
    public double QualityPoints => CriterionPoints.Sum();

    /// <summary>The name of criterion <paramref name="index"/> as a reason prints it.</summary>
    public string CriterionName(int index) =>
        CriterionNames is { } names && index < names.Count ? $"\"{names[index]}\"" : Invariant($"criterion {index + 1}");
}

/// <summary>One bid as the award sees it.</summary>
/// <param name="Id">The bid's code.</param>
/// <param name="Scores">The panel's score per quality criterion, on the scale (the mean of the assessors' points or the moderated value).</param>
/// <param name="Price">The bid's price (positive), or null while prices are sealed (the quality stage of a two-stage award).</param>
/// <param name="RejectedAsAbnormallyLow">True when the facilitator recorded the decision to reject the price as abnormally low.</param>
/// <param name="FailedGate">The pass/fail gate the bid failed, in words, or null when it passed every gate.</param>
public sealed record AwardBid(string Id, IReadOnlyList<double> Scores, double? Price, bool RejectedAsAbnormallyLow = false, string? FailedGate = null);

/// <summary>Why a bid takes no part in the award.</summary>
public enum AwardExclusion
{
    /// <summary>Below the overall quality threshold.</summary>
    BelowQualityThreshold,

    /// <summary>Below a criterion's minimum score.</summary>
    BelowCriterionMinimum,

    /// <summary>Rejected as abnormally low after its explanation was considered.</summary>
    AbnormallyLow,

    /// <summary>Above the budget of a budget-based price rule.</summary>
    OverBudget,

    /// <summary>Failed a pass/fail gate of the plan.</summary>
    FailedGate,
}

/// <summary>One bid's award: every part a bidder needs to recompute its total with a calculator.</summary>
/// <param name="Id">The bid's code.</param>
/// <param name="CriterionPoints">Quality points per criterion: score ÷ scale maximum × the criterion's points.</param>
/// <param name="QualityPoints">Their sum.</param>
/// <param name="QualityShare">Quality points ÷ all quality points.</param>
/// <param name="Price">The bid's price, or null while prices are sealed.</param>
/// <param name="PricePoints">Price points, when the formula gives points and the bid reached price scoring.</param>
/// <param name="Figure">The ranking figure (lowest first) of a formula that gives no points.</param>
/// <param name="Total">Quality points + price points, for a formula that gives points.</param>
/// <param name="Rank">1 for the award; null for an excluded bid. Bids still tied after every tie-break share a rank.</param>
/// <param name="Excluded">Why the bid takes no part, or null.</param>
/// <param name="ExclusionDetail">The threshold or criterion that excluded it, in words.</param>
/// <param name="AbnormallyLowFlag">Why its price is flagged as abnormally low, or null.</param>
/// <param name="DecidedBy">The tie-break that placed this bid above the next one, when the main figure was equal.</param>
public sealed record AwardedBid(
    string Id, IReadOnlyList<double> CriterionPoints, double QualityPoints, double QualityShare, double? Price,
    double? PricePoints, double? Figure, double? Total, int? Rank, AwardExclusion? Excluded, string? ExclusionDetail,
    string? AbnormallyLowFlag, TieBreak? DecidedBy);

/// <summary>The award: every bid in the order given, and whether a tie remained after every tie-break.</summary>
/// <param name="Bids">Every bid, in the order given.</param>
/// <param name="UnresolvedTie">True when bids were still tied after every tie-break.</param>
/// <param name="PricesSealed">
/// True while a bid that passed quality has no price yet (sealed, or opened and not all entered): quality points and
/// thresholds are final, the prices entered so far are shown, and nothing is ranked, scored on price or flagged.
/// </param>
public sealed record AwardResult(IReadOnlyList<AwardedBid> Bids, bool UnresolvedTie, bool PricesSealed = false)
{
    /// <summary>The bids in the running, best first.</summary>
    public IEnumerable<AwardedBid> Ranking => Bids.Where(b => b.Rank is not null).OrderBy(b => b.Rank);
}

/// <summary>
/// The points award a tender can publish: absolute quality points per criterion, thresholds applied before price,
/// abnormally low prices flagged among the bids that passed, the price rule on the bids still in the running, then
/// the total (or the figure) and the tie-breaks. A bid's quality points never depend on the other bids.
/// </summary>
public static class PointsAward
{
    private const double Tolerance = 1e-9;

    /// <summary>Computes the award.</summary>
    /// <exception cref="ArgumentException">A bid's scores do not match the plan's criteria, or a price is not positive.</exception>
    public static AwardResult Compute(AwardPlan plan, IReadOnlyList<AwardBid> bids)
    {
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(bids);
        var m = plan.CriterionPoints.Count;
        var total = plan.QualityPoints;
        var info = PriceFormulas.Describe(plan.Price.Formula);

        // 1. Quality, absolute: each bid on its own.
        var rows = new Row[bids.Count];
        for (var b = 0; b < bids.Count; b++)
        {
            var bid = bids[b];
            if (bid.Scores.Count != m)
            {
                throw new ArgumentException($"Bid {bid.Id} has {bid.Scores.Count} scores for {m} criteria.", nameof(bids));
            }

            if (bid.Price is { } price && !(price > 0 && double.IsFinite(price)))
            {
                throw new ArgumentException($"Bid {bid.Id} has no positive price.", nameof(bids));
            }

            var points = new double[m];
            for (var j = 0; j < m; j++)
            {
                points[j] = bid.Scores[j] / plan.ScaleMaximum * plan.CriterionPoints[j];
            }

            var quality = points.Sum();
            rows[b] = new Row(b, bid, points, quality, total > 0 ? quality / total : 0);
        }

        // 2. Gates and thresholds, before price.
        foreach (var row in rows)
        {
            if (row.Bid.FailedGate is { } gate)
            {
                row.Exclude(AwardExclusion.FailedGate, Invariant($"failed the pass/fail gate {gate}"));
                continue;
            }

            if (plan.MinimumScores is { } minimum)
            {
                for (var j = 0; j < m; j++)
                {
                    if (minimum[j] is { } least && row.Bid.Scores[j] < least - Tolerance)
                    {
                        row.Exclude(AwardExclusion.BelowCriterionMinimum, Invariant($"{plan.CriterionName(j)} scored {row.Bid.Scores[j]:0.##}, below the minimum of {least:0.##}"));
                        break;
                    }
                }
            }

            if (row.Excluded is null && plan.MinimumQualityShare is { } share && row.Share < share - Tolerance)
            {
                row.Exclude(AwardExclusion.BelowQualityThreshold, Invariant($"{row.Share:P1} of the quality points, below the threshold of {share:P0}"));
            }
        }

        // 3. Abnormally low prices, among the bids that passed quality; nothing more while prices are sealed.
        var passed = rows.Where(r => r.Excluded is null).ToArray();
        if (passed.Any(r => r.Bid.Price is null))
        {
            return new AwardResult(rows.Select(r => new AwardedBid(
                r.Bid.Id, r.Points, r.Quality, r.Share, r.Bid.Price, null, null, null, null, r.Excluded, r.Detail, null, null)).ToArray(),
                UnresolvedTie: false, PricesSealed: true);
        }

        if (plan.AbnormallyLow is { } low)
        {
            foreach (var row in passed)
            {
                row.LowFlag = LowFlag(low, row, passed);
            }
        }

        foreach (var row in passed.Where(r => r.Bid.RejectedAsAbnormallyLow))
        {
            row.Exclude(AwardExclusion.AbnormallyLow, "price rejected as abnormally low after its explanation was considered");
        }

        // 4. Price, on the bids still in the running (a budget rule first takes out the bids over budget).
        var running = rows.Where(r => r.Excluded is null).ToList();
        if (plan.Price.Formula == PriceFormula.BudgetBased)
        {
            foreach (var row in running.Where(r => r.OpenPrice > plan.Price.Budget))
            {
                row.Exclude(AwardExclusion.OverBudget, Invariant($"price {row.OpenPrice:#,0.##} above the budget of {plan.Price.Budget:#,0.##}"));
            }

            running.RemoveAll(r => r.Excluded is not null);
        }

        var scores = PriceScoring.Score(plan.Price, running.Select(r => r.OpenPrice).ToArray(), running.Select(r => r.Quality).ToArray());
        for (var i = 0; i < running.Count; i++)
        {
            running[i].Price = scores[i];
        }

        // 5. Order: by total (highest first) or by figure (lowest first), then the tie-breaks.
        var rules = plan.TieBreaks ?? [];
        double Main(Row r) => info.GivesPoints ? -(r.Quality + r.Price.Points!.Value) : r.Price.Figure!.Value;
        var order = running.ToList();
        order.Sort((x, y) => Compare(x, y, Main, rules));
        var unresolved = false;
        for (var i = 0; i < order.Count; i++)
        {
            if (i == 0)
            {
                order[i].Rank = 1;
                continue;
            }

            var (above, here) = (order[i - 1], order[i]);
            if (Math.Abs(Main(above) - Main(here)) > Tolerance)
            {
                here.Rank = i + 1;
                continue;
            }

            var decider = Decider(above, here, rules);
            if (decider is null)
            {
                here.Rank = above.Rank;
                unresolved = true;
            }
            else
            {
                above.DecidedBy ??= decider;
                here.Rank = i + 1;
            }
        }

        return new AwardResult(rows.Select(r => new AwardedBid(
            r.Bid.Id, r.Points, r.Quality, r.Share, r.Bid.Price,
            r.Excluded is null && info.GivesPoints ? r.Price.Points : null,
            r.Excluded is null && !info.GivesPoints ? r.Price.Figure : null,
            r.Excluded is null && info.GivesPoints ? r.Quality + r.Price.Points : null,
            r.Rank, r.Excluded, r.Detail, r.LowFlag, r.DecidedBy)).ToArray(), unresolved);
    }

    private static string? LowFlag(AbnormallyLowRule rule, Row row, IReadOnlyList<Row> passed)
    {
        if (rule.BelowMeanOfOthersPercent is { } percent && passed.Count > 1)
        {
            var mean = passed.Where(r => !ReferenceEquals(r, row)).Average(r => r.OpenPrice);
            if (row.OpenPrice < mean * (1 - (percent / 100)) - Tolerance)
            {
                return Invariant($"{1 - (row.OpenPrice / mean):P1} below the mean of the other admissible prices ({mean:#,0.##}); the rule flags more than {percent / 100:P0}");
            }
        }

        if (rule is { Estimate: { } estimate, BelowEstimatePercent: { } belowEstimate } && row.OpenPrice < estimate * (1 - (belowEstimate / 100)) - Tolerance)
        {
            return Invariant($"{1 - (row.OpenPrice / estimate):P1} below the estimate ({estimate:#,0.##}); the rule flags more than {belowEstimate / 100:P0}");
        }

        return null;
    }

    private static int Compare(Row x, Row y, Func<Row, double> main, IReadOnlyList<TieBreak> rules)
    {
        var (mx, my) = (main(x), main(y));
        if (Math.Abs(mx - my) > Tolerance)
        {
            return mx.CompareTo(my);
        }

        return Decider(x, y, rules) is { } rule ? Prefer(rule, x, y) : 0;
    }

    private static TieBreak? Decider(Row above, Row here, IReadOnlyList<TieBreak> rules)
    {
        foreach (var rule in rules)
        {
            if (Prefer(rule, above, here) != 0)
            {
                return rule;
            }
        }

        return null;
    }

    /// <summary>Negative when <paramref name="x"/> goes first by <paramref name="rule"/>, positive when <paramref name="y"/> does.</summary>
    private static int Prefer(TieBreak rule, Row x, Row y) => rule switch
    {
        TieBreak.HigherQuality => Math.Abs(x.Quality - y.Quality) <= Tolerance ? 0 : y.Quality.CompareTo(x.Quality),
        TieBreak.LowerPrice => Math.Abs(x.OpenPrice - y.OpenPrice) <= Tolerance ? 0 : x.OpenPrice.CompareTo(y.OpenPrice),
        TieBreak.EarlierSubmission => x.Index.CompareTo(y.Index),
        _ => 0,
    };

    private sealed class Row(int index, AwardBid bid, double[] points, double quality, double share)
    {
        /// <summary>The bid's place in the order given (its submission order).</summary>
        public int Index { get; } = index;

        public AwardBid Bid { get; } = bid;

        /// <summary>The price, once prices are open (the award reads it only after checking none is sealed).</summary>
        public double OpenPrice => Bid.Price ?? double.NaN;

        public double[] Points { get; } = points;

        public double Quality { get; } = quality;

        public double Share { get; } = share;

        public AwardExclusion? Excluded { get; private set; }

        public string? Detail { get; private set; }

        public string? LowFlag { get; set; }

        public PriceScore Price { get; set; }

        public int? Rank { get; set; }

        public TieBreak? DecidedBy { get; set; }

        public void Exclude(AwardExclusion why, string detail) => (Excluded, Detail) = (why, detail);
    }
}
