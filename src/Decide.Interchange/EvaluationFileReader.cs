using System.Text.Json;
using System.Text.RegularExpressions;
using Decide.Core;
using Decide.Interchange.Reading;

namespace Decide.Interchange;

/// <summary>
/// Reads a portable evaluation file (<c>decide-evaluation/1</c>, docs/evaluation-format.md) into the engine's
/// model and its metadata, and checks it with the engine's validator.
/// </summary>
/// <remarks>
/// Every problem is reported, not just the first, each as an <see cref="EvaluationError"/> whose path points into
/// the file (<c>$.ratings.E1.S2.quality</c>): malformed JSON (with line and column), text that is not UTF-8 or holds
/// half a surrogate pair (reported alone, before anything else is checked), a value of the wrong JSON type,
/// an unknown member name, a name given twice in one object, a scale that breaks a rule, and everything the
/// engine's <see cref="Decide.Core.Analysis.EvaluationValidator"/> finds (unknown ids and terms, missing ratings,
/// inconsistent plans). A file that reads without error can be analysed.
/// </remarks>
public static partial class EvaluationFileReader
{
    private static readonly JsonDocumentOptions Options = new()
    {
        AllowTrailingCommas = false,
        CommentHandling = JsonCommentHandling.Disallow,
        MaxDepth = 64,
    };

    /// <summary>Reads an evaluation from JSON text.</summary>
    /// <exception cref="InvalidEvaluationException">The text is not a valid evaluation; every problem is listed.</exception>
    public static EvaluationFile Read(string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        using var document = Parse(() => JsonDocument.Parse(json, Options));
        return EvaluationParser.Parse(document.RootElement);
    }

    /// <summary>
    /// Reads a plan: an evaluation document whose panel, alternatives and inputs may be absent (they are read if
    /// present but not checked). Used while an evaluation is set up, before anyone rates.
    /// </summary>
    /// <exception cref="InvalidEvaluationException">The plan has problems; every one is listed.</exception>
    public static EvaluationFile ReadPlan(string json)
    {
        ArgumentNullException.ThrowIfNull(json);
        using var document = Parse(() => JsonDocument.Parse(json, Options));
        return EvaluationParser.ParsePlan(document.RootElement);
    }

    /// <summary>Reads a plan (see <see cref="ReadPlan(string)"/>) from UTF-8 bytes (a leading byte-order mark is allowed).</summary>
    /// <exception cref="InvalidEvaluationException">The plan has problems; every one is listed.</exception>
    public static EvaluationFile ReadPlan(ReadOnlyMemory<byte> utf8Json)
    {
        using var document = Parse(() => JsonDocument.Parse(WithoutMark(utf8Json), Options));
        return EvaluationParser.ParsePlan(document.RootElement);
    }

    /// <summary>
    /// Reads one scale as it stands in a plan's <paramref name="member"/> (<c>ratingScale</c>, <c>importanceScale</c>
    /// or <c>pairwiseScale</c>): a built-in scale's name or a scale object, with that member's default range.
    /// </summary>
    /// <exception cref="InvalidEvaluationException">The scale breaks a rule; every problem is listed, at <c>$.member…</c>.</exception>
    public static Decide.Core.Scales.LinguisticScale ReadScale(JsonElement value, string member)
    {
        var (range, fallback) = member switch
        {
            "ratingScale" => (EvaluationFormat.DefaultRatingRange, Decide.Core.Scales.BuiltInScales.ChenRating7),
            "importanceScale" => (EvaluationFormat.DefaultImportanceRange, Decide.Core.Scales.BuiltInScales.ChenImportance7),
            "pairwiseScale" => (EvaluationFormat.DefaultPairwiseRange, Decide.Core.Scales.BuiltInScales.Pairwise9),
            _ => throw new ArgumentOutOfRangeException(nameof(member), member, "not a scale member of the plan"),
        };
        var context = new ReadContext();
        var scale = ScaleReader.Read(context, value, $"$.{member}", range, fallback, out var usable);
        if (!usable)
        {
            throw new InvalidEvaluationException(context.Errors.ToArray());
        }

        return scale;
    }

    /// <summary>Reads an evaluation from UTF-8 bytes (a leading byte-order mark is allowed).</summary>
    /// <exception cref="InvalidEvaluationException">The bytes are not a valid evaluation; every problem is listed.</exception>
    public static EvaluationFile Read(ReadOnlyMemory<byte> utf8Json)
    {
        using var document = Parse(() => JsonDocument.Parse(WithoutMark(utf8Json), Options));
        return EvaluationParser.Parse(document.RootElement);
    }

    /// <summary>Reads an evaluation from a stream of UTF-8 JSON, to its end.</summary>
    /// <exception cref="InvalidEvaluationException">The content is not a valid evaluation; every problem is listed.</exception>
    /// <exception cref="IOException">The stream cannot be read.</exception>
    public static EvaluationFile Read(Stream stream)
    {
        ArgumentNullException.ThrowIfNull(stream);
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        return Read(new ReadOnlyMemory<byte>(buffer.GetBuffer(), 0, (int)buffer.Length));
    }

    /// <summary>Reads an evaluation file.</summary>
    /// <exception cref="InvalidEvaluationException">The file is not a valid evaluation; every problem is listed.</exception>
    /// <exception cref="IOException">The file cannot be read (for example <see cref="FileNotFoundException"/>).</exception>
    /// <exception cref="UnauthorizedAccessException">The file may not be read, or the path is a folder.</exception>
    public static EvaluationFile ReadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return Read(File.ReadAllBytes(path));
    }

    private static ReadOnlyMemory<byte> WithoutMark(ReadOnlyMemory<byte> utf8Json) =>
        utf8Json.Span.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]) ? utf8Json[3..] : utf8Json;

    /// <summary>The parsed document, whose every string and name can be read as text (<see cref="TextCheck"/>).</summary>
    private static JsonDocument Parse(Func<JsonDocument> parse)
    {
        JsonDocument document;
        try
        {
            document = parse();
        }
        catch (JsonException ex)
        {
            var line = (ex.LineNumber ?? 0) + 1;
            var column = (ex.BytePositionInLine ?? 0) + 1;
            var reason = ReadContext.Sentence(PositionSuffix().Replace(ex.Message, "").Replace(" Change the reader options.", "", StringComparison.Ordinal));
            throw new InvalidEvaluationException(JsonPath.Root, $"not valid JSON at line {line}, column {column}: {reason}");
        }

        try
        {
            TextCheck.Require(document.RootElement);
            return document;
        }
        catch
        {
            document.Dispose();
            throw;
        }
    }

    [GeneratedRegex(@"\s*(Path: \S*\s*\|\s*)?LineNumber: \d+ \| BytePositionInLine: \d+\.?\s*$")]
    private static partial Regex PositionSuffix();
}
