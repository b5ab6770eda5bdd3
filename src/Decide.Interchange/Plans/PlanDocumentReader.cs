using System.Text.Json;
using Decide.Core.Award;
using Decide.Core.Model;

namespace Decide.Interchange.Plans;

/// <summary>
/// Reads a stored plan leniently into a <see cref="PlanDocument"/>: a member it does not recognise, or of the wrong
/// type, is left at its default, so a plan in the making always opens for editing. The strict reader
/// (<see cref="EvaluationFileReader.ReadPlan(string)"/>) says what is wrong with it.
/// </summary>
public static class PlanDocumentReader
{
    /// <summary>Reads <paramref name="plan"/>, a plan document's root object.</summary>
    public static PlanDocument Read(JsonElement plan)
    {
        var defaults = new PlanDocument();
        var criteria = Items(plan, "criteria").Select(Criterion).ToArray();
        var (points, award) = Award(plan, criteria);
        var (reviews, funding) = Round(plan);
        var options = plan.ValueKind == JsonValueKind.Object && plan.TryGetProperty("options", out var o) && o.ValueKind == JsonValueKind.Object ? o : default;
        return new PlanDocument
        {
            Title = Text(plan, "title") ?? "",
            Reference = Text(plan, "reference"),
            Organisation = Text(plan, "organisation"),
            Description = Text(plan, "description"),
            Noun = Text(plan, "noun"),
            RatingScale = Scale(plan, "ratingScale", defaults.RatingScale),
            ImportanceScale = Scale(plan, "importanceScale", defaults.ImportanceScale),
            PairwiseScale = Scale(plan, "pairwiseScale", defaults.PairwiseScale),
            Groups = Items(plan, "groups").Select(g => new CriterionGroup(Text(g, "id") ?? "", Text(g, "name") ?? "")).ToArray(),
            Criteria = criteria,
            Weighting = FormatWords.Parse(FormatWords.Weightings, Text(plan, "weighting"), defaults.Weighting),
            Points = points,
            Award = award,
            Reviews = reviews,
            Funding = funding,
            Options = new AnalysisOptions(
                FormatWords.Parse(FormatWords.Aggregations, Text(options, "aggregation"), defaults.Options.Aggregation),
                FormatWords.Parse(FormatWords.Ideals, Text(options, "ideal"), defaults.Options.Ideal),
                options.ValueKind == JsonValueKind.Object && options.TryGetProperty("divergenceTolerance", out var t) && t.ValueKind == JsonValueKind.Number && t.TryGetInt32(out var steps)
                    ? steps
                    : defaults.Options.DivergenceTolerance,
                FormatWords.Parse(FormatWords.AcceptabilityWeightings, Text(options, "acceptabilityWeights"), defaults.Options.AcceptabilityWeights)),
        };
    }

    /// <summary>
    /// The published points and the award method, read by the file's own reader with its complaints set aside: a
    /// value it cannot read is left out, and the strict reader reports it when the plan is checked.
    /// </summary>
    private static (PublishedWeights?, AwardMethod?) Award(JsonElement plan, IReadOnlyList<PlanCriterion> criteria)
    {
        if (plan.ValueKind != JsonValueKind.Object)
        {
            return (null, null);
        }

        var context = new Reading.ReadContext();
        var top = context.Fields(plan, Decide.Core.JsonPath.Root, ["publishedWeights", "award"], plan.EnumerateObject().Select(p => p.Name).ToArray());
        if (top is null)
        {
            return (null, null);
        }

        var reader = new Reading.AwardReader(context);
        var model = criteria.Select(c => new Criterion(c.Id, c.Name, c.Kind, c.Direction, c.Group)).ToArray();
        return (reader.Points(top, model), reader.Method(top));
    }

    private static (ReviewDesign?, FundingPlan?) Round(JsonElement plan)
    {
        if (plan.ValueKind != JsonValueKind.Object)
        {
            return (null, null);
        }

        var context = new Reading.ReadContext();
        var top = context.Fields(plan, Decide.Core.JsonPath.Root, ["reviews", "funding"], plan.EnumerateObject().Select(p => p.Name).ToArray());
        if (top is null)
        {
            return (null, null);
        }

        var reader = new Reading.RoundReader(context, new Reading.PathTranslator());
        var reviews = reader.Reviews(top);
        return (reviews is null ? null : reviews with { Assigned = [] }, reader.Funding(top));
    }

    private static PlanCriterion Criterion(JsonElement c)
    {
        var descriptors = new Dictionary<string, string>(StringComparer.Ordinal);
        if (c.TryGetProperty("descriptors", out var said) && said.ValueKind == JsonValueKind.Object)
        {
            foreach (var p in said.EnumerateObject().Where(p => p.Value.ValueKind == JsonValueKind.String))
            {
                descriptors[p.Name] = p.Value.GetString()!;
            }
        }

        return new PlanCriterion(
            Text(c, "id") ?? "",
            Text(c, "name") ?? "",
            FormatWords.Parse(FormatWords.Kinds, Text(c, "kind"), CriterionKind.Linguistic),
            FormatWords.Parse(FormatWords.Directions, Text(c, "direction"), Direction.Benefit),
            Text(c, "group"),
            Text(c, "unit"),
            Text(c, "description"),
            descriptors);
    }

    private static PlanScale Scale(JsonElement plan, string member, PlanScale fallback)
    {
        if (plan.ValueKind != JsonValueKind.Object || !plan.TryGetProperty(member, out var value))
        {
            return fallback;
        }

        return value.ValueKind switch
        {
            JsonValueKind.String => PlanScale.Named(value.GetString()!),
            JsonValueKind.Object => new PlanScale(Text(value, "name") ?? "custom", value.Clone()),
            _ => fallback,
        };
    }

    private static string? Text(JsonElement e, string name) =>
        e.ValueKind == JsonValueKind.Object && e.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.String ? value.GetString() : null;

    private static IEnumerable<JsonElement> Items(JsonElement e, string name) =>
        e.ValueKind == JsonValueKind.Object && e.TryGetProperty(name, out var list) && list.ValueKind == JsonValueKind.Array
            ? list.EnumerateArray().Where(x => x.ValueKind == JsonValueKind.Object)
            : [];
}
