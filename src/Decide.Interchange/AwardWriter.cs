using System.Text.Json;
using Decide.Core.Award;

namespace Decide.Interchange;

/// <summary>
/// Writes the members of a published points award — <c>publishedWeights</c>, <c>award</c>, <c>lowPriceReviews</c> —
/// for the evaluation writer and the plan writer, in the shape <c>Reading/AwardReader</c> reads.
/// </summary>
internal static class AwardWriter
{
    /// <summary>The <c>publishedWeights</c> member.</summary>
    public static void WritePoints(Utf8JsonWriter w, PublishedWeights points)
    {
        w.WriteStartObject("publishedWeights");
        w.WriteNumber("total", points.Total);
        if (points.Groups.Count > 0)
        {
            w.WriteStartObject("groups");
            foreach (var (id, value) in points.Groups)
            {
                w.WriteNumber(id, value);
            }

            w.WriteEndObject();
        }

        w.WriteStartObject("criteria");
        foreach (var c in points.Criteria)
        {
            w.WriteNumber(c.Id, c.Points);
        }

        w.WriteEndObject();
        w.WriteEndObject();
    }

    /// <summary>The <c>award</c> member; optional parts are written only when set.</summary>
    public static void WriteMethod(Utf8JsonWriter w, AwardMethod award)
    {
        w.WriteStartObject("award");
        w.WriteString("binding", FormatWords.Of(award.Binding));
        w.WriteString("panelScore", FormatWords.Of(award.PanelScore));
        w.WriteStartObject("price");
        w.WriteString("criterion", award.PriceCriterion);
        w.WriteString("formula", FormatWords.Of(award.Formula));
        Optional(w, "budget", award.Budget);
        Optional(w, "floor", award.Floor);
        Optional(w, "valuePerQualityPoint", award.ValuePerQualityPoint);
        w.WriteEndObject();
        if (award.MinimumQualityShare is not null || award.MinimumTerms is { Count: > 0 })
        {
            w.WriteStartObject("thresholds");
            Optional(w, "qualityShare", award.MinimumQualityShare);
            if (award.MinimumTerms is { Count: > 0 } terms)
            {
                w.WriteStartObject("minimumTerms");
                foreach (var (criterion, term) in terms)
                {
                    w.WriteString(criterion, term);
                }

                w.WriteEndObject();
            }

            w.WriteEndObject();
        }

        if (award.TieBreaks is { Count: > 0 } rules)
        {
            w.WriteStartArray("tieBreaks");
            foreach (var rule in rules)
            {
                w.WriteStringValue(FormatWords.Of(rule));
            }

            w.WriteEndArray();
        }

        if (award.AbnormallyLow is { } low)
        {
            w.WriteStartObject("abnormallyLow");
            Optional(w, "belowMeanOfOthersPercent", low.BelowMeanOfOthersPercent);
            Optional(w, "estimate", low.Estimate);
            Optional(w, "belowEstimatePercent", low.BelowEstimatePercent);
            w.WriteEndObject();
        }

        w.WriteBoolean("twoStage", award.TwoStage);
        w.WriteEndObject();
    }

    /// <summary>The <c>lowPriceReviews</c> member, when there is any record.</summary>
    public static void WriteReviews(Utf8JsonWriter w, IReadOnlyList<LowPriceReview> reviews)
    {
        if (reviews.Count == 0)
        {
            return;
        }

        w.WriteStartObject("lowPriceReviews");
        foreach (var review in reviews)
        {
            w.WriteStartObject(review.Alternative);
            w.WriteString("asked", review.Asked);
            if (review.Answer is { } answer)
            {
                w.WriteString("answer", answer);
            }

            if (review.Decision is { } decision)
            {
                w.WriteString("decision", FormatWords.Of(decision));
            }

            if (review.Reasons is { } reasons)
            {
                w.WriteString("reasons", reasons);
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void Optional(Utf8JsonWriter w, string name, double? value)
    {
        if (value is { } v)
        {
            w.WriteNumber(name, v);
        }
    }
}
