using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Interchange;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>
/// The plan while the facilitator edits it: read from the stored <c>decide-evaluation/1</c> plan (leniently, since a
/// plan in the making may not be complete), changed by the setup steps, and written back as a plan document with
/// the settings that live beside it. The panel and the bids are not part of it.
/// </summary>
public sealed class PlanDraft
{
    /// <summary>Rating scales to choose from (built in).</summary>
    public static readonly IReadOnlyList<string> RatingScales = ["chen-rating-7", "rating-5"];

    /// <summary>Importance scales to choose from (built in).</summary>
    public static readonly IReadOnlyList<string> ImportanceScales = ["chen-importance-7", "importance-5"];

    /// <summary>Nouns for what is chosen, offered as suggestions; any other plural noun is fine.</summary>
    public static readonly IReadOnlyList<string> Nouns = ["bids", "suppliers", "tenders", "candidates", "options"];

    private static readonly JsonWriterOptions WriterOptions = new() { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public string Title { get; set; } = "";

    public string? Reference { get; set; }

    public string? Organisation { get; set; }

    /// <summary>The purpose of the evaluation (the plan's <c>description</c>).</summary>
    public string? Description { get; set; }

    /// <summary>What is chosen, plural ("bids"); the plan's <c>noun</c>.</summary>
    public string? Noun { get; set; }

    public ScaleSetting RatingScale { get; set; } = new("chen-rating-7");

    public ScaleSetting ImportanceScale { get; set; } = new("chen-importance-7");

    public ScaleSetting PairwiseScale { get; set; } = new("pairwise-9");

    public List<GroupDraft> Groups { get; } = [];

    public List<CriterionDraft> Criteria { get; } = [];

    public WeightingMethod Weighting { get; set; } = WeightingMethod.Importance;

    public AggregationRule Aggregation { get; set; } = AggregationRule.Mean;

    public IdealPoints Ideal { get; set; } = IdealPoints.Unit;

    /// <summary>The largest spread of one cell's terms, in rating-scale steps, that needs no discussion.</summary>
    public int DivergenceTolerance { get; set; } = 2;

    public AcceptabilityWeights AcceptabilityWeights { get; set; } = AcceptabilityWeights.Fuzzy;

    public int MinRationaleLength { get; set; }

    public bool PricesVisibleToAssessors { get; set; }

    public int RequiredApprovals { get; set; } = 1;

    /// <summary>The rating scale's terms, or Chen's seven when a custom scale cannot be read.</summary>
    public LinguisticScale RatingTerms => RatingScale.Resolve("ratingScale") ?? BuiltInScales.ChenRating7;

    /// <summary>The settings kept beside the plan.</summary>
    public EvaluationSettings Settings => new(MinRationaleLength, PricesVisibleToAssessors, RequiredApprovals);

    /// <summary>Reads a stored plan; members it does not recognise are left at their defaults.</summary>
    public static PlanDraft From(JsonElement plan, EvaluationSettings settings)
    {
        var d = new PlanDraft
        {
            Title = Text(plan, "title") ?? "",
            Reference = Text(plan, "reference"),
            Organisation = Text(plan, "organisation"),
            Description = Text(plan, "description"),
            Noun = Text(plan, "noun"),
            RatingScale = ScaleSetting.From(plan, "ratingScale", "chen-rating-7"),
            ImportanceScale = ScaleSetting.From(plan, "importanceScale", "chen-importance-7"),
            PairwiseScale = ScaleSetting.From(plan, "pairwiseScale", "pairwise-9"),
            Weighting = Text(plan, "weighting") == "pairwise" ? WeightingMethod.Pairwise : WeightingMethod.Importance,
            MinRationaleLength = settings.MinRationaleLength,
            PricesVisibleToAssessors = settings.PricesVisibleToAssessors,
            RequiredApprovals = settings.RequiredApprovals,
        };

        foreach (var g in Items(plan, "groups"))
        {
            d.Groups.Add(new GroupDraft { Id = Text(g, "id") ?? "", Name = Text(g, "name") ?? "", Stored = true });
        }

        foreach (var c in Items(plan, "criteria"))
        {
            var criterion = new CriterionDraft
            {
                Id = Text(c, "id") ?? "",
                Name = Text(c, "name") ?? "",
                Kind = Text(c, "kind") switch { "numeric" => CriterionKind.Numeric, "gate" => CriterionKind.Gate, _ => CriterionKind.Linguistic },
                Direction = Text(c, "direction") == "cost" ? Direction.Cost : Direction.Benefit,
                Group = Text(c, "group"),
                Unit = Text(c, "unit"),
                Description = Text(c, "description"),
                Stored = true,
            };
            if (c.TryGetProperty("descriptors", out var descriptors) && descriptors.ValueKind == JsonValueKind.Object)
            {
                foreach (var p in descriptors.EnumerateObject().Where(p => p.Value.ValueKind == JsonValueKind.String))
                {
                    criterion.Descriptors[p.Name] = p.Value.GetString()!;
                }
            }

            d.Criteria.Add(criterion);
        }

        if (plan.TryGetProperty("options", out var options) && options.ValueKind == JsonValueKind.Object)
        {
            d.Aggregation = Text(options, "aggregation") == "geometric" ? AggregationRule.Geometric : AggregationRule.Mean;
            d.Ideal = Text(options, "ideal") == "extreme" ? IdealPoints.Extreme : IdealPoints.Unit;
            d.AcceptabilityWeights = Text(options, "acceptabilityWeights") == "uniform" ? AcceptabilityWeights.Uniform : AcceptabilityWeights.Fuzzy;
            if (options.TryGetProperty("divergenceTolerance", out var tolerance) && tolerance.TryGetInt32(out var steps))
            {
                d.DivergenceTolerance = steps;
            }
        }

        return d;
    }

    /// <summary>Adds a criterion (at the end) and returns it.</summary>
    public CriterionDraft AddCriterion()
    {
        var criterion = new CriterionDraft();
        Criteria.Add(criterion);
        return criterion;
    }

    /// <summary>Adds a group and returns it.</summary>
    public GroupDraft AddGroup()
    {
        var group = new GroupDraft();
        Groups.Add(group);
        return group;
    }

    /// <summary>Removes a group; its criteria stay, outside any group.</summary>
    public void RemoveGroup(GroupDraft group)
    {
        Groups.Remove(group);
        foreach (var c in Criteria.Where(c => c.Group is not null && c.Group == group.Id))
        {
            c.Group = null;
        }
    }

    /// <summary>Names a group; a group not stored yet takes its id from the name, and its criteria follow.</summary>
    public void NameGroup(GroupDraft group, string name)
    {
        group.Name = name;
        if (!group.Stored)
        {
            var oldId = group.Id;
            group.Id = Unique(Slug(name, "group"), TakenExcept(group.Id));
            foreach (var c in Criteria.Where(c => c.Group == oldId))
            {
                c.Group = group.Id;
            }
        }
    }

    /// <summary>Names a criterion; a criterion not stored yet takes its id from the name.</summary>
    public void NameCriterion(CriterionDraft criterion, string name)
    {
        criterion.Name = name;
        if (!criterion.Stored)
        {
            criterion.Id = Unique(Slug(name, "criterion"), TakenExcept(criterion.Id));
        }
    }

    /// <summary>After a save: every id is now part of the stored plan and stays as it is.</summary>
    public void MarkStored()
    {
        Groups.ForEach(g => g.Stored = true);
        Criteria.ForEach(c => c.Stored = true);
    }

    /// <summary>
    /// Gives every criterion and group without an id one made from its name (lower case, letters, digits and
    /// <c>_</c>), unique among both and never <c>panel</c>. Ids already given are kept.
    /// </summary>
    public void AssignIds()
    {
        var taken = new HashSet<string>(Groups.Select(g => g.Id).Concat(Criteria.Select(c => c.Id)).Where(id => id.Length > 0), StringComparer.Ordinal);
        foreach (var g in Groups.Where(g => g.Id.Trim().Length == 0))
        {
            var oldId = g.Id;
            g.Id = Unique(Slug(g.Name, "group"), taken);
            foreach (var c in Criteria.Where(c => c.Group == oldId))
            {
                c.Group = g.Id;
            }
        }

        foreach (var c in Criteria.Where(c => c.Id.Trim().Length == 0))
        {
            c.Id = Unique(Slug(c.Name, "criterion"), taken);
        }
    }

    /// <summary>The plan document (<c>decide-evaluation/1</c>, without panel, bids or inputs).</summary>
    public string ToJson()
    {
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, WriterOptions))
        {
            Write(w);
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    /// <summary>The plan document as a JSON element, for <see cref="UpdatePlanRequest"/>.</summary>
    public JsonElement ToElement()
    {
        using var document = JsonDocument.Parse(ToJson());
        return document.RootElement.Clone();
    }

    /// <summary>A request to store this plan and its settings on top of <paramref name="version"/>.</summary>
    public UpdatePlanRequest ToRequest(long version) => new(ToElement(), Settings, version);

    private void Write(Utf8JsonWriter w)
    {
        w.WriteStartObject();
        w.WriteString("format", EvaluationFormat.Evaluation);
        w.WriteString("title", Title);
        Optional(w, "reference", Reference);
        Optional(w, "organisation", Organisation);
        Optional(w, "description", Description);
        Optional(w, "noun", Noun?.Trim().ToLowerInvariant());
        RatingScale.Write(w, "ratingScale");
        ImportanceScale.Write(w, "importanceScale");
        if (Weighting == WeightingMethod.Pairwise || PairwiseScale.Custom is not null)
        {
            PairwiseScale.Write(w, "pairwiseScale");
        }

        if (Groups.Count > 0)
        {
            w.WriteStartArray("groups");
            foreach (var g in Groups)
            {
                w.WriteStartObject();
                w.WriteString("id", g.Id.Trim());
                w.WriteString("name", g.Name.Trim());
                w.WriteEndObject();
            }

            w.WriteEndArray();
        }

        var terms = RatingTerms.Terms.Select(t => t.Code).ToArray();
        w.WriteStartArray("criteria");
        foreach (var c in Criteria)
        {
            w.WriteStartObject();
            w.WriteString("id", c.Id.Trim());
            w.WriteString("name", c.Name.Trim());
            w.WriteString("kind", c.Kind switch { CriterionKind.Numeric => "numeric", CriterionKind.Gate => "gate", _ => "linguistic" });
            if (c.Kind != CriterionKind.Gate)
            {
                w.WriteString("direction", c.Direction == Direction.Cost ? "cost" : "benefit");
                Optional(w, "group", c.Group);
            }

            if (c.Kind == CriterionKind.Numeric)
            {
                Optional(w, "unit", c.Unit);
            }

            Optional(w, "description", c.Description);
            var said = terms.Where(t => c.Descriptors.TryGetValue(t, out var text) && !string.IsNullOrWhiteSpace(text)).ToArray();
            if (c.Kind == CriterionKind.Linguistic && said.Length > 0)
            {
                w.WriteStartObject("descriptors");
                foreach (var t in said)
                {
                    w.WriteString(t, c.Descriptors[t].Trim());
                }

                w.WriteEndObject();
            }

            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteString("weighting", Weighting == WeightingMethod.Pairwise ? "pairwise" : "importance");
        w.WriteStartObject("options");
        w.WriteString("aggregation", Aggregation == AggregationRule.Geometric ? "geometric" : "mean");
        w.WriteString("ideal", Ideal == IdealPoints.Extreme ? "extreme" : "unit");
        w.WriteNumber("divergenceTolerance", DivergenceTolerance);
        w.WriteString("acceptabilityWeights", AcceptabilityWeights == AcceptabilityWeights.Uniform ? "uniform" : "fuzzy");
        w.WriteEndObject();
        w.WriteEndObject();
    }

    private static void Optional(Utf8JsonWriter w, string name, string? value)
    {
        if (!string.IsNullOrWhiteSpace(value))
        {
            w.WriteString(name, value.Trim());
        }
    }

    private static string? Text(JsonElement e, string name) =>
        e.ValueKind == JsonValueKind.Object && e.TryGetProperty(name, out var value) && value.ValueKind == JsonValueKind.String ? value.GetString() : null;

    private static IEnumerable<JsonElement> Items(JsonElement e, string name) =>
        e.TryGetProperty(name, out var list) && list.ValueKind == JsonValueKind.Array
            ? list.EnumerateArray().Where(x => x.ValueKind == JsonValueKind.Object)
            : [];

    private static string Slug(string name, string fallback)
    {
        var sb = new StringBuilder();
        foreach (var ch in name.Trim().ToLowerInvariant())
        {
            if (char.IsAsciiLetterOrDigit(ch))
            {
                sb.Append(ch);
            }
            else if (sb.Length > 0 && sb[^1] != '_')
            {
                sb.Append('_');
            }

            if (sb.Length >= 24)
            {
                break;
            }
        }

        var slug = sb.ToString().Trim('_');
        return slug.Length == 0 || slug == "panel" ? fallback : slug;
    }

    private HashSet<string> TakenExcept(string own)
    {
        var taken = new HashSet<string>(Groups.Select(g => g.Id).Concat(Criteria.Select(c => c.Id)).Where(id => id.Length > 0), StringComparer.Ordinal);
        taken.Remove(own);
        return taken;
    }

    private static string Unique(string id, HashSet<string> taken)
    {
        var candidate = id;
        for (var n = 2; !taken.Add(candidate); n++)
        {
            candidate = $"{id}_{n}";
        }

        return candidate;
    }
}
