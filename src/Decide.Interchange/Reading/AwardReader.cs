using Decide.Core;
using Decide.Core.Award;
using Decide.Core.Model;

namespace Decide.Interchange.Reading;

/// <summary>
/// Reads the members of a published points award: <c>publishedWeights</c>, <c>award</c> and
/// <c>lowPriceReviews</c>. What the values mean together (sums, the price criterion, the scale's points) is the
/// engine validator's to check; this reads shapes and words, each problem by its place.
/// </summary>
internal sealed class AwardReader(ReadContext context)
{
    private static readonly string[] WeightMembers = ["total", "groups", "criteria"];
    private static readonly string[] AwardMembers = ["binding", "panelScore", "price", "thresholds", "tieBreaks", "abnormallyLow", "twoStage"];
    private static readonly string[] PriceMembers = ["criterion", "formula", "budget", "floor", "valuePerQualityPoint"];
    private static readonly string[] ThresholdMembers = ["qualityShare", "minimumTerms"];
    private static readonly string[] LowMembers = ["belowMeanOfOthersPercent", "estimate", "belowEstimatePercent"];
    private static readonly string[] ReviewMembers = ["asked", "answer", "decision", "reasons"];

    /// <summary>The published points; each criterion takes its group from the plan's criteria.</summary>
    public PublishedWeights? Points(JsonFields top, IReadOnlyList<Criterion> criteria)
    {
        if (!top.TryGet("publishedWeights", out var member)
            || context.Fields(member.Value, member.Path, WeightMembers, expected: "an object {\"total\", \"groups\", \"criteria\"}") is not { } f)
        {
            return null;
        }

        var total = f.Has("total") ? f.Number("total") ?? 0 : 100;
        var groups = Numbers(f, "groups", "an object {groupId: points}");
        var given = Numbers(f, "criteria", "an object {criterionId: points}");
        if (!f.Has("criteria"))
        {
            f.Require("criteria", "the points of each scored criterion, as {criterionId: points}");
        }

        var groupOf = criteria.GroupBy(c => c.Id, StringComparer.Ordinal).ToDictionary(g => g.Key, g => g.First().Group, StringComparer.Ordinal);
        var ordered = criteria.Select(c => c.Id).Distinct(StringComparer.Ordinal).Where(given.ContainsKey)
            .Concat(given.Keys.Where(id => !groupOf.ContainsKey(id)));
        return new PublishedWeights(total, groups, ordered.Select(id => new PublishedCriterion(id, given[id], groupOf.GetValueOrDefault(id))).ToArray());
    }

    /// <summary>The award method, or null when the plan states none.</summary>
    public AwardMethod? Method(JsonFields top)
    {
        if (!top.TryGet("award", out var member)
            || context.Fields(member.Value, member.Path, AwardMembers, expected: "an object (the award method)") is not { } f)
        {
            return null;
        }

        string criterion = "";
        var formula = PriceFormula.LowestPriceRatio;
        double? budget = null, floor = null, value = null;
        if (f.Require("price", "the price rule {\"criterion\", \"formula\"}") && f.TryGet("price", out var priceMember)
            && context.Fields(priceMember.Value, priceMember.Path, PriceMembers) is { } price)
        {
            criterion = price.String("criterion", "the id of the measured criterion that holds each bid's price") ?? "";
            if (price.Require("formula", $"the price formula, one of {Words(FormatWords.PriceFormulas)}"))
            {
                formula = price.Choice("formula", FormatWords.PriceFormulas, formula, out _);
            }

            (budget, floor, value) = (price.Number("budget"), price.Number("floor"), price.Number("valuePerQualityPoint"));
        }

        double? share = null;
        Dictionary<string, string>? minimum = null;
        if (f.TryGet("thresholds", out var thresholdMember)
            && context.Fields(thresholdMember.Value, thresholdMember.Path, ThresholdMembers) is { } thresholds)
        {
            share = thresholds.Number("qualityShare");
            minimum = thresholds.StringMap("minimumTerms");
        }

        List<TieBreak>? tieBreaks = null;
        if (f.TryGet("tieBreaks", out var rules))
        {
            tieBreaks = [];
            foreach (var (_, item, at) in context.Items(rules.Value, rules.Path))
            {
                if (context.TryChoice(item, at, FormatWords.TieBreaks, out var rule))
                {
                    tieBreaks.Add(rule);
                }
            }
        }

        AbnormallyLowRule? low = null;
        if (f.TryGet("abnormallyLow", out var lowMember) && context.Fields(lowMember.Value, lowMember.Path, LowMembers) is { } l)
        {
            low = new AbnormallyLowRule(l.Number("belowMeanOfOthersPercent"), l.Number("estimate"), l.Number("belowEstimatePercent"));
        }

        return new AwardMethod(
            criterion,
            formula,
            f.Choice("binding", FormatWords.Bindings, BindingResult.Points, out _),
            f.Choice("panelScore", FormatWords.PanelScores, PanelScoreRule.Mean, out _),
            budget,
            floor,
            value,
            share,
            minimum,
            tieBreaks,
            low,
            f.Boolean("twoStage") ?? false);
    }

    /// <summary>The records of prices flagged as abnormally low, by bid.</summary>
    public List<LowPriceReview> Reviews(JsonFields top)
    {
        var result = new List<LowPriceReview>();
        if (!top.TryGet("lowPriceReviews", out var member))
        {
            return result;
        }

        foreach (var bid in context.Members(member.Value, member.Path, "an object {alternativeId: {\"asked\", \"answer\", \"decision\", \"reasons\"}}") ?? [])
        {
            if (context.Fields(bid.Value, bid.Path, ReviewMembers) is not { } f)
            {
                continue;
            }

            var asked = f.String("asked", "the explanation asked of the bidder, as it was sent") ?? "";
            LowPriceDecision? decision = f.Has("decision") && f.Choice("decision", FormatWords.LowPriceDecisions, LowPriceDecision.Accepted, out var readable) is var d && readable ? d : null;
            result.Add(new LowPriceReview(bid.Name, asked, f.String("answer"), decision, f.String("reasons")));
        }

        return result;
    }

    private Dictionary<string, double> Numbers(JsonFields f, string name, string expected)
    {
        var result = new Dictionary<string, double>(StringComparer.Ordinal);
        if (!f.TryGet(name, out var member))
        {
            return result;
        }

        foreach (var entry in context.Members(member.Value, member.Path, expected) ?? [])
        {
            if (context.Number(entry.Value, entry.Path) is { } number)
            {
                result[entry.Name] = number;
            }
            else
            {
                context.Cover(JsonPath.Keys(PublishedWeights.Path, name, entry.Name));
            }
        }

        return result;
    }

    private static string Words<T>(IReadOnlyList<(string Name, T Value)> table) => string.Join(", ", table.Select(t => $"\"{t.Name}\""));
}
