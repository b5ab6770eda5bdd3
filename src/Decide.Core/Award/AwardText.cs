using System.Globalization;
using Decide.Core.Model;
using static System.FormattableString;

namespace Decide.Core.Award;

/// <summary>
/// The sentences that state an award method, in one place for the command line, the screens, the methodology
/// document and the record, so that what is published and what is applied read the same.
/// </summary>
public static class AwardText
{
    /// <summary>Which result binds, and what the other one is.</summary>
    public static string Binding(BindingResult binding) => binding == BindingResult.Points
        ? "The award follows the points total; the fuzzy closeness ranking (Chen 2000) is shown beside it as supporting analysis."
        : "The award follows the fuzzy closeness ranking (Chen 2000); the points total is shown beside it as supporting analysis.";

    /// <summary>How the panel's terms become one score per criterion.</summary>
    public static string PanelScore(PanelScoreRule rule) => rule == PanelScoreRule.Moderated
        ? "Each bid's score on a criterion is the points of the term the panel agreed in moderation; where the panel did not moderate a cell, the mean of the assessors' points."
        : "Each bid's score on a criterion is the mean of the assessors' points (weighted by the assessors' weights in the plan).";

    /// <summary>How quality points are computed.</summary>
    public static string QualityPoints(double scaleMaximum) => Invariant(
        $"Quality points per criterion = the panel's score ÷ {scaleMaximum:0.##} (the scale's maximum) × the criterion's points. A bid's quality points depend only on its own scores, never on the other bids.");

    /// <summary>The thresholds, or a sentence saying there are none.</summary>
    public static string Thresholds(AwardMethod award, Evaluation evaluation)
    {
        var parts = new List<string>();
        if (award.MinimumQualityShare is { } share)
        {
            parts.Add(Invariant($"at least {share * 100:0.##} % of all quality points"));
        }

        foreach (var (id, term) in award.MinimumTerms ?? new Dictionary<string, string>())
        {
            var name = evaluation.Criteria.FirstOrDefault(c => c.Id == id)?.Name ?? id;
            var label = evaluation.RatingScale.TryFind(term, out var step) ? evaluation.RatingScale[step].Label : term;
            parts.Add($"a panel score of at least \"{term}\" ({label}) on \"{name}\"");
        }

        return parts.Count == 0
            ? "No minimum quality threshold."
            : $"A bid needs {string.Join(" and ", parts)}; a bid below is excluded with the threshold it missed, before prices are scored, and takes no part in any price base.";
    }

    /// <summary>The tie-breaks in the order they apply.</summary>
    public static string TieBreaks(IReadOnlyList<TieBreak> rules) =>
        "Equal totals are separated by " + string.Join(", then ", rules.Select(Name)) + ".";

    /// <summary>A tie-break rule in words.</summary>
    public static string Name(TieBreak rule) => rule switch
    {
        TieBreak.HigherQuality => "the higher quality points",
        TieBreak.LowerPrice => "the lower price",
        TieBreak.EarlierSubmission => "the earlier submission",
        _ => rule.ToString(),
    };

    /// <summary>The abnormally low rule, or a sentence saying there is none.</summary>
    public static string AbnormallyLow(AbnormallyLowRule? rule)
    {
        if (rule is null)
        {
            return "No rule for abnormally low prices is stated.";
        }

        var tests = new List<string>();
        if (rule.BelowMeanOfOthersPercent is { } mean)
        {
            tests.Add(Invariant($"more than {mean:0.##} % below the mean of the other admissible prices"));
        }

        if (rule is { Estimate: { } estimate, BelowEstimatePercent: { } below })
        {
            tests.Add(Invariant($"more than {below:0.##} % below the estimate of {estimate.ToString("#,0.##", CultureInfo.InvariantCulture)}"));
        }

        return $"A price {string.Join(" or ", tests)} is flagged as abnormally low. The bidder is asked to explain it; the answer and the decision are recorded with reasons, and only a recorded rejection excludes the bid.";
    }

    /// <summary>The order of the stages.</summary>
    public static string Stages(bool twoStage) => twoStage
        ? "Two stages: prices stay sealed until quality is scored and moderated and the thresholds are applied; then prices are opened for the bids that remain."
        : "One stage: quality and price are evaluated together.";

    /// <summary>Why a relative price formula needs the "without each bid" check.</summary>
    public const string RelativeWarning =
        "The price formula is relative: a bid's price points depend on the other bids' prices, so removing or adding a bid can change the order of the others. The check \"without each bid\" shows whether it does here.";

    /// <summary>Why a bid takes no part, in a few words.</summary>
    public static string Exclusion(AwardExclusion why) => why switch
    {
        AwardExclusion.BelowQualityThreshold => "below the quality threshold",
        AwardExclusion.BelowCriterionMinimum => "below a criterion's minimum",
        AwardExclusion.AbnormallyLow => "rejected as abnormally low",
        AwardExclusion.OverBudget => "over the budget",
        AwardExclusion.FailedGate => "failed a pass/fail gate",
        _ => why.ToString(),
    };
}
