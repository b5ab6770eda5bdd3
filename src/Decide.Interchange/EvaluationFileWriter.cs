using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Interchange;

/// <summary>
/// Writes an evaluation and its metadata as a portable evaluation file (<c>decide-evaluation/1</c>): indented
/// UTF-8 JSON that <see cref="EvaluationFileReader"/> reads back to the same content.
/// </summary>
/// <remarks>
/// The writer does not validate: a draft that cannot be analysed yet is written as it is, and the reader reports
/// its problems. Built-in scales are written by name; a pairwise judgement keeps its scale code when the code still
/// stands for the judgement's value. Ratings, importance ratings, judgements, moderated values, values and gate
/// results are grouped by assessor (or alternative) in the order they first appear. Extension members (<c>x-…</c>) of a file that was
/// read are not kept.
/// </remarks>
public static class EvaluationFileWriter
{
    private static readonly JsonWriterOptions WriterOptions = new()
    {
        Indented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    /// <summary>The file as a JSON string.</summary>
    public static string ToJson(EvaluationFile file)
    {
        using var buffer = new MemoryStream();
        Write(file, buffer);
        return Encoding.UTF8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length);
    }

    /// <summary>An evaluation (with optional metadata) as a JSON string.</summary>
    public static string ToJson(Evaluation evaluation, EvaluationMetadata? metadata = null) =>
        ToJson(new EvaluationFile(evaluation, metadata ?? EvaluationMetadata.None));

    /// <summary>Writes the file to a stream as UTF-8 JSON (no byte-order mark).</summary>
    public static void Write(EvaluationFile file, Stream stream)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(stream);
        using var writer = new Utf8JsonWriter(stream, WriterOptions);
        Write(writer, file.Evaluation, file.Metadata);
        writer.Flush();
        stream.WriteByte((byte)'\n');
    }

    /// <summary>Writes the file to <paramref name="path"/>, replacing what is there.</summary>
    public static void WriteFile(EvaluationFile file, string path)
    {
        using var stream = File.Create(path);
        Write(file, stream);
    }

    private static void Write(Utf8JsonWriter w, Evaluation e, EvaluationMetadata m)
    {
        w.WriteStartObject();
        w.WriteString("format", EvaluationFormat.Evaluation);
        w.WriteString("title", e.Title);
        WriteOptional(w, "reference", m.Reference);
        WriteOptional(w, "organisation", m.Organisation);
        WriteOptional(w, "description", m.Description);
        WriteOptional(w, "noun", m.Noun);

        WriteScale(w, "ratingScale", e.RatingScale);
        WriteScale(w, "importanceScale", e.ImportanceScale);
        if (e.Weighting == WeightingMethod.Pairwise || !EvaluationFormat.SameContent(e.PairwiseScale, BuiltInScales.Pairwise9))
        {
            WriteScale(w, "pairwiseScale", e.PairwiseScale);
        }

        if (e.Groups.Count > 0)
        {
            w.WriteStartArray("groups");
            foreach (var group in e.Groups)
            {
                w.WriteStartObject();
                w.WriteString("id", group.Id);
                w.WriteString("name", group.Name);
                w.WriteEndObject();
            }

            w.WriteEndArray();
        }

        w.WriteStartArray("criteria");
        foreach (var criterion in e.Criteria)
        {
            WriteCriterion(w, criterion, m.DescriptionOf(criterion.Id));
        }

        w.WriteEndArray();

        w.WriteStartArray("alternatives");
        foreach (var alternative in e.Alternatives)
        {
            w.WriteStartObject();
            w.WriteString("id", alternative.Id);
            w.WriteString("name", alternative.Name);
            if (alternative.Requested is { } requested)
            {
                w.WriteNumber("requested", requested);
            }

            WriteOptional(w, "topic", alternative.Topic);
            w.WriteEndObject();
        }

        w.WriteEndArray();

        w.WriteStartArray("assessors");
        foreach (var assessor in e.Assessors)
        {
            WriteAssessor(w, assessor);
        }

        w.WriteEndArray();

        w.WriteString("weighting", FormatWords.Of(e.Weighting));
        if (e.Points is { } points)
        {
            AwardWriter.WritePoints(w, points);
        }

        if (e.Award is { } award)
        {
            AwardWriter.WriteMethod(w, award);
        }

        WriteImportance(w, e.Importance);
        WritePairwise(w, e.Pairwise, e.PairwiseScale);
        WriteRatings(w, e.Ratings);
        WriteModeration(w, e.Moderated);
        WriteValues(w, e.Values);
        WriteGates(w, e.Gates);
        AwardWriter.WriteReviews(w, e.LowPriceReviews);
        WriteRound(w, e.Reviews, e.Funding);

        WriteOptions(w, e.Options);
        w.WriteEndObject();
    }

    /// <summary>The <c>reviews</c> and <c>funding</c> members of a round, when it has them.</summary>
    internal static void WriteRound(Utf8JsonWriter w, ReviewDesign? reviews, FundingPlan? funding)
    {
        if (reviews is not null)
        {
            w.WriteStartObject("reviews");
            w.WriteNumber("reviewersPerApplication", reviews.ReviewersPerApplication);
            w.WriteNumber("maxLoad", reviews.MaxLoad);
            if (reviews.Calibration != ReviewerCalibration.None)
            {
                w.WriteString("calibration", FormatWords.Of(reviews.Calibration));
            }

            w.WriteStartObject("assigned");
            foreach (var reviewer in reviews.Assigned)
            {
                w.WriteStartArray(reviewer.Assessor);
                foreach (var id in reviewer.Alternatives)
                {
                    w.WriteStringValue(id);
                }

                w.WriteEndArray();
            }

            w.WriteEndObject();
            w.WriteEndObject();
        }

        if (funding is not null)
        {
            w.WriteStartObject("funding");
            w.WriteNumber("budget", funding.Budget);
            w.WriteString("rule", FormatWords.Of(funding.Rule));
            WriteOptional(w, "currency", funding.Currency);
            w.WriteEndObject();
        }
    }

    /// <summary>The <c>options</c> member, written in full; the plan writer uses it too.</summary>
    internal static void WriteOptions(Utf8JsonWriter w, AnalysisOptions options)
    {
        w.WriteStartObject("options");
        w.WriteString("aggregation", FormatWords.Of(options.Aggregation));
        w.WriteString("ideal", FormatWords.Of(options.Ideal));
        w.WriteNumber("divergenceTolerance", options.DivergenceTolerance);
        w.WriteString("acceptabilityWeights", FormatWords.Of(options.AcceptabilityWeights));
        w.WriteEndObject();
    }

    private static void WriteOptional(Utf8JsonWriter w, string name, string? value)
    {
        if (value is not null)
        {
            w.WriteString(name, value);
        }
    }

    private static void WriteScale(Utf8JsonWriter w, string name, LinguisticScale scale)
    {
        if (EvaluationFormat.IsBuiltIn(scale))
        {
            w.WriteString(name, scale.Name);
            return;
        }

        w.WriteStartObject(name);
        w.WriteString("name", scale.Name);
        w.WriteStartArray("range");
        w.WriteNumberValue(scale.Minimum);
        w.WriteNumberValue(scale.Maximum);
        w.WriteEndArray();
        w.WriteStartArray("terms");
        foreach (var term in scale.Terms)
        {
            w.WriteStartObject();
            w.WriteString("code", term.Code);
            w.WriteString("label", term.Label);
            WriteTfn(w, "tfn", term.Value);
            WriteOptional(w, "descriptor", term.Descriptor);
            if (term.Points is { } points)
            {
                w.WriteNumber("points", points);
            }

            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void WriteTfn(Utf8JsonWriter w, string name, Tfn value)
    {
        w.WriteStartArray(name);
        w.WriteNumberValue(value.Lower);
        w.WriteNumberValue(value.Middle);
        w.WriteNumberValue(value.Upper);
        w.WriteEndArray();
    }

    private static void WriteCriterion(Utf8JsonWriter w, Criterion c, string? description)
    {
        w.WriteStartObject();
        w.WriteString("id", c.Id);
        w.WriteString("name", c.Name);
        w.WriteString("kind", FormatWords.Of(c.Kind));
        if (c.Kind != CriterionKind.Gate || c.Direction != Direction.Benefit)
        {
            w.WriteString("direction", FormatWords.Of(c.Direction));
        }

        WriteOptional(w, "group", c.Group);
        WriteOptional(w, "unit", c.Unit);
        WriteOptional(w, "description", description);
        if (c.Descriptors is { Count: > 0 } descriptors)
        {
            w.WriteStartObject("descriptors");
            foreach (var (code, text) in descriptors)
            {
                w.WriteString(code, text);
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void WriteAssessor(Utf8JsonWriter w, Assessor a)
    {
        w.WriteStartObject();
        w.WriteString("id", a.Id);
        w.WriteString("name", a.Name);
        if (a.Weight != 1)
        {
            w.WriteNumber("weight", a.Weight);
        }

        if (a.Criteria is { } assigned)
        {
            w.WriteStartArray("criteria");
            foreach (var id in assigned)
            {
                w.WriteStringValue(id);
            }

            w.WriteEndArray();
        }

        if (a.Topics is { Count: > 0 } topics)
        {
            w.WriteStartArray("topics");
            foreach (var topic in topics)
            {
                w.WriteStringValue(topic);
            }

            w.WriteEndArray();
        }

        w.WriteEndObject();
    }

    /// <summary>
    /// Writes <c>"name": { outerKey: { ... } }</c>: the items grouped by <paramref name="key"/> in first-seen order,
    /// each group's members written by <paramref name="writeItem"/>. Nothing is written for no items.
    /// </summary>
    private static void WriteKeyed<T>(Utf8JsonWriter w, string name, IReadOnlyList<T> items, Func<T, string> key, Action<Utf8JsonWriter, T> writeItem)
    {
        if (items.Count == 0)
        {
            return;
        }

        w.WriteStartObject(name);
        foreach (var group in items.GroupBy(key, StringComparer.Ordinal))
        {
            w.WriteStartObject(group.Key);
            foreach (var item in group)
            {
                writeItem(w, item);
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void WriteImportance(Utf8JsonWriter w, IReadOnlyList<ImportanceRating> importance) =>
        WriteKeyed(w, "importance", importance, r => r.Assessor, (w, r) => w.WriteString(r.Node, r.Term));


    private static void WritePairwise(Utf8JsonWriter w, IReadOnlyList<PairwiseJudgement> pairwise, LinguisticScale scale)
    {
        if (pairwise.Count == 0)
        {
            return;
        }

        w.WriteStartObject("pairwise");
        foreach (var byAssessor in pairwise.GroupBy(j => j.Assessor, StringComparer.Ordinal))
        {
            w.WriteStartArray(byAssessor.Key);
            foreach (var judgement in byAssessor)
            {
                w.WriteStartObject();
                w.WriteString("row", judgement.Row);
                w.WriteString("col", judgement.Col);
                if (judgement.Term is { } code && scale.TryFind(code, out var step) && scale[step].Value == judgement.Value)
                {
                    w.WriteString("term", code);
                }
                else
                {
                    WriteTfn(w, "tfn", judgement.Value);
                }

                w.WriteEndObject();
            }

            w.WriteEndArray();
        }

        w.WriteEndObject();
    }

    private static void WriteRatings(Utf8JsonWriter w, IReadOnlyList<Rating> ratings)
    {
        if (ratings.Count == 0)
        {
            return;
        }

        w.WriteStartObject("ratings");
        foreach (var byAssessor in ratings.GroupBy(r => r.Assessor, StringComparer.Ordinal))
        {
            w.WriteStartObject(byAssessor.Key);
            foreach (var byAlternative in byAssessor.GroupBy(r => r.Alternative, StringComparer.Ordinal))
            {
                w.WriteStartObject(byAlternative.Key);
                foreach (var rating in byAlternative)
                {
                    if (rating is { Term: { } term, Rationale: null, Declined: null })
                    {
                        w.WriteString(rating.Criterion, term);
                        continue;
                    }

                    w.WriteStartObject(rating.Criterion);
                    WriteOptional(w, "term", rating.Term);
                    WriteOptional(w, "declined", rating.Declined);
                    WriteOptional(w, "rationale", rating.Rationale);
                    w.WriteEndObject();
                }

                w.WriteEndObject();
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void WriteModeration(Utf8JsonWriter w, IReadOnlyList<ModeratedRating> moderated)
    {
        if (moderated.Count == 0)
        {
            return;
        }

        w.WriteStartObject("moderation");
        foreach (var byAlternative in moderated.GroupBy(m => m.Alternative, StringComparer.Ordinal))
        {
            w.WriteStartObject(byAlternative.Key);
            foreach (var cell in byAlternative)
            {
                w.WriteStartObject(cell.Criterion);
                w.WriteString("term", cell.Term);
                w.WriteString("reason", cell.Reason);
                if (cell.AgreedBy is { } agreedBy)
                {
                    w.WriteStartArray("agreedBy");
                    foreach (var assessor in agreedBy)
                    {
                        w.WriteStringValue(assessor);
                    }

                    w.WriteEndArray();
                }

                w.WriteEndObject();
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void WriteValues(Utf8JsonWriter w, IReadOnlyList<NumericValue> values) =>
        WriteKeyed(w, "values", values, v => v.Alternative, (w, v) => w.WriteNumber(v.Criterion, v.Value));

    private static void WriteGates(Utf8JsonWriter w, IReadOnlyList<GateResult> gates) =>
        WriteKeyed(w, "gates", gates, g => g.Alternative, static (w, gate) =>
        {
            if (gate.Note is null)
            {
                w.WriteBoolean(gate.Criterion, gate.Passed);
                return;
            }

            w.WriteStartObject(gate.Criterion);
            w.WriteBoolean("passed", gate.Passed);
            w.WriteString("note", gate.Note);
            w.WriteEndObject();
        });
}
