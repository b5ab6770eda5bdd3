using System.Text.Json;
using Decide.Core;
using Decide.Core.Fuzzy;
using Decide.Core.Scales;

namespace Decide.Interchange.Reading;

/// <summary>
/// Reads a scale member: a built-in scale's name, or an object listing the terms. Every problem is reported with
/// the term's path; a scale that cannot be built is replaced by the role's default so reading can go on.
/// </summary>
internal static class ScaleReader
{
    private static readonly string[] ScaleMembers = ["name", "range", "terms"];
    private static readonly string[] TermMembers = ["code", "label", "tfn", "descriptor", "points"];

    /// <summary>The scale at <paramref name="path"/>; <paramref name="usable"/> is false when it had problems.</summary>
    public static LinguisticScale Read(
        ReadContext context, JsonElement value, string path, (double Minimum, double Maximum) defaultRange,
        LinguisticScale fallback, out bool usable)
    {
        var before = context.ErrorCount;
        var scale = value.ValueKind == JsonValueKind.String ? ByName(context, value, path) : Custom(context, value, path, defaultRange);
        usable = scale is not null && context.ErrorCount == before;
        return usable ? scale! : fallback;
    }

    private static LinguisticScale? ByName(ReadContext context, JsonElement value, string path)
    {
        var name = value.GetString()!;
        if (BuiltInScales.ByName.TryGetValue(name, out var scale))
        {
            return scale;
        }

        context.Error(path, $"unknown scale \"{name}\"; the built-in scales are {string.Join(", ", BuiltInScales.ByName.Keys)}, or describe the scale as an object with its terms");
        return null;
    }

    private static LinguisticScale? Custom(ReadContext context, JsonElement value, string path, (double Minimum, double Maximum) defaultRange)
    {
        var fields = context.Fields(value, path, ScaleMembers, expected: "a built-in scale name or a scale object {\"name\", \"range\", \"terms\"}");
        if (fields is null)
        {
            return null;
        }

        var name = fields.String("name") ?? "custom";
        var (minimum, maximum) = defaultRange;
        var rangeKnown = true;
        if (fields.TryGet("range", out var range))
        {
            var numbers = context.Numbers(range.Value, range.Path);
            if (numbers is { Length: 2 })
            {
                (minimum, maximum) = (numbers[0], numbers[1]);
            }
            else
            {
                if (numbers is not null)
                {
                    context.Error(range.Path, $"a range is two numbers [minimum, maximum]; got {numbers.Length}");
                }

                // Unknown range: check the terms against nothing rather than against a range the file did not give.
                (minimum, maximum, rangeKnown) = (double.MinValue, double.MaxValue, false);
            }
        }

        var terms = new List<LinguisticTerm>();
        var fileIndex = new List<int>();
        var termCount = 0;
        if (fields.Require("terms", "list the scale's terms, least favourable first"))
        {
            fields.TryGet("terms", out var list);
            foreach (var (i, item, at) in context.Items(list.Value, list.Path))
            {
                termCount++;
                var term = context.Fields(item, at, TermMembers);
                if (term is null)
                {
                    continue;
                }

                var code = term.String("code", "a short code such as \"G\"") ?? "";
                var label = term.String("label", "the words shown to people, such as \"Good\"") ?? "";
                var descriptor = term.String("descriptor");
                var points = term.Number("points");
                Tfn? tfn = term.Has("tfn") ? term.Tfn("tfn") : null;
                if (!term.Has("tfn"))
                {
                    term.Require("tfn", "the term's triangular fuzzy number [lower, middle, upper]");
                }

                if (tfn is { } v)
                {
                    terms.Add(new LinguisticTerm(code, label, v, descriptor, points));
                    fileIndex.Add(i);
                }
            }
        }

        try
        {
            var scale = LinguisticScale.Create(name, minimum, maximum, terms, path);
            if (BuiltInScales.ByName.TryGetValue(name, out var builtIn) && !EvaluationFormat.SameContent(scale, builtIn))
            {
                context.Error(fields.MemberPath("name"),
                    $"\"{name}\" is the name of a built-in scale, and these terms differ from it; give this scale another name, or write \"{name}\" alone to use the built-in one");
                return null;
            }

            return scale;
        }
        catch (InvalidEvaluationException ex)
        {
            var translator = new PathTranslator();
            translator.Map(JsonPath.Key(path, "terms"), fileIndex);
            foreach (var error in ex.Errors)
            {
                var at = translator.ToFile(error.Path);
                var termsDropped = terms.Count != termCount && at == JsonPath.Key(path, "terms");
                var rangeUnknown = !rangeKnown && at == JsonPath.Key(path, "range");
                if (!context.Covers(at) && !termsDropped && !rangeUnknown)
                {
                    context.Error(at, error.Reason);
                }
            }

            return null;
        }
    }
}
