using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Interchange.Plans;

/// <summary>
/// Writes a <see cref="PlanDocument"/> as a plan document (<c>decide-evaluation/1</c> without panel, bids or inputs),
/// trimming text and leaving out what is empty: blank optional members, a description without words, descriptors of
/// other kinds of criteria. Descriptors are written in the order of the rating scale's terms.
/// </summary>
public static class PlanDocumentWriter
{
    private static readonly JsonWriterOptions WriterOptions = new() { Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>The plan as compact JSON text.</summary>
    public static string ToJson(PlanDocument plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, WriterOptions))
        {
            Write(w, plan);
        }

        return Encoding.UTF8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length);
    }

    private static void Write(Utf8JsonWriter w, PlanDocument plan)
    {
        w.WriteStartObject();
        w.WriteString("format", EvaluationFormat.Evaluation);
        w.WriteString("title", plan.Title.Trim());
        Optional(w, "reference", plan.Reference);
        Optional(w, "organisation", plan.Organisation);
        Optional(w, "description", plan.Description);
        Optional(w, "noun", plan.Noun?.Trim().ToLowerInvariant());
        Scale(w, "ratingScale", plan.RatingScale);
        Scale(w, "importanceScale", plan.ImportanceScale);
        if (plan.Weighting == WeightingMethod.Pairwise || plan.PairwiseScale.Custom is not null)
        {
            Scale(w, "pairwiseScale", plan.PairwiseScale);
        }

        if (plan.Groups.Count > 0)
        {
            w.WriteStartArray("groups");
            foreach (var g in plan.Groups)
            {
                w.WriteStartObject();
                w.WriteString("id", g.Id.Trim());
                w.WriteString("name", g.Name.Trim());
                w.WriteEndObject();
            }

            w.WriteEndArray();
        }

        var terms = (plan.RatingScale.Resolve("ratingScale") ?? BuiltInScales.ChenRating7).Terms.Select(t => t.Code).ToArray();
        w.WriteStartArray("criteria");
        foreach (var c in plan.Criteria)
        {
            Criterion(w, c, terms);
        }

        w.WriteEndArray();
        w.WriteString("weighting", FormatWords.Of(plan.Weighting));
        if (plan.Points is { } points)
        {
            AwardWriter.WritePoints(w, points);
        }

        if (plan.Award is { } award)
        {
            AwardWriter.WriteMethod(w, award);
        }

        EvaluationFileWriter.WriteRound(w, plan.Reviews is { } reviews ? reviews with { Assigned = [] } : null, plan.Funding);
        EvaluationFileWriter.WriteOptions(w, plan.Options);
        w.WriteEndObject();
    }

    private static void Criterion(Utf8JsonWriter w, PlanCriterion c, string[] terms)
    {
        w.WriteStartObject();
        w.WriteString("id", c.Id.Trim());
        w.WriteString("name", c.Name.Trim());
        w.WriteString("kind", FormatWords.Of(c.Kind));
        if (c.Kind != CriterionKind.Gate)
        {
            w.WriteString("direction", FormatWords.Of(c.Direction));
            Optional(w, "group", c.Group);
        }

        if (c.Kind == CriterionKind.Numeric)
        {
            Optional(w, "unit", c.Unit);
        }

        Optional(w, "description", c.Description);
        var descriptors = c.Descriptors ?? new Dictionary<string, string>();
        var said = terms.Where(t => descriptors.TryGetValue(t, out var text) && !string.IsNullOrWhiteSpace(text)).ToArray();
        if (c.Kind == CriterionKind.Linguistic && said.Length > 0)
        {
            w.WriteStartObject("descriptors");
            foreach (var t in said)
            {
                w.WriteString(t, descriptors[t].Trim());
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void Scale(Utf8JsonWriter w, string member, PlanScale scale)
    {
        w.WritePropertyName(member);
        if (scale.Custom is { } custom)
        {
            custom.WriteTo(w);
        }
        else
        {
            w.WriteStringValue(scale.Name);
        }
    }

    private static void Optional(Utf8JsonWriter w, string name, string? value)
    {
        if (!string.IsNullOrWhiteSpace(value))
        {
            w.WriteString(name, value.Trim());
        }
    }
}
