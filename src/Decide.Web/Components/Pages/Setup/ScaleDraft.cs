using System.Text.Json;
using Decide.Core;
using Decide.Core.Fuzzy;
using Decide.Core.Scales;
using Decide.Interchange.Plans;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>
/// A rating scale of the evaluation's own as the facilitator edits it: each term's code, words, triangle, points and
/// general descriptor. It becomes the plan's custom scale only once the scale's own rules accept it
/// (<see cref="LinguisticScale.Create"/>), so a half-edited scale never reaches the plan.
/// </summary>
public sealed class ScaleDraft
{
    public string Name { get; set; } = "";

    public double Minimum { get; set; }

    public double Maximum { get; set; } = 10;

    public List<TermDraft> Terms { get; } = [];

    /// <summary>A copy of <paramref name="scale"/> to edit, named as the evaluation's own.</summary>
    public static ScaleDraft From(LinguisticScale scale)
    {
        var draft = new ScaleDraft
        {
            Name = scale.Name.EndsWith("-own", StringComparison.Ordinal) ? scale.Name : scale.Name + "-own",
            Minimum = scale.Minimum,
            Maximum = scale.Maximum,
        };
        draft.Terms.AddRange(scale.Terms.Select(t => new TermDraft
        {
            Code = t.Code, Label = t.Label, Lower = t.Value.Lower, Middle = t.Value.Middle, Upper = t.Value.Upper, Points = t.Points, Descriptor = t.Descriptor,
        }));
        return draft;
    }

    /// <summary>The scale, or the scale's own reasons why not (each naming the term by its place).</summary>
    public (LinguisticScale? Scale, IReadOnlyList<string> Problems) Check()
    {
        try
        {
            var terms = Terms.Select(t => new LinguisticTerm(t.Code.Trim(), t.Label.Trim(), new Tfn(t.Lower, t.Middle, t.Upper),
                string.IsNullOrWhiteSpace(t.Descriptor) ? null : t.Descriptor.Trim(), t.Points)).ToList();
            return (LinguisticScale.Create(Name.Trim(), Minimum, Maximum, terms, "term"), []);
        }
        catch (InvalidEvaluationException e)
        {
            return (null, e.Errors.Select(x => $"{Place(x.Path)}: {x.Reason}").ToArray());
        }
        catch (ArgumentException e)
        {
            return (null, [e.Message]);
        }
    }

    /// <summary>The plan's custom scale for this draft (call after <see cref="Check"/> accepted it).</summary>
    public PlanScale ToPlanScale()
    {
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer))
        {
            w.WriteStartObject();
            w.WriteString("name", Name.Trim());
            w.WriteStartArray("range");
            w.WriteNumberValue(Minimum);
            w.WriteNumberValue(Maximum);
            w.WriteEndArray();
            w.WriteStartArray("terms");
            foreach (var t in Terms)
            {
                w.WriteStartObject();
                w.WriteString("code", t.Code.Trim());
                w.WriteString("label", t.Label.Trim());
                w.WriteStartArray("tfn");
                w.WriteNumberValue(t.Lower);
                w.WriteNumberValue(t.Middle);
                w.WriteNumberValue(t.Upper);
                w.WriteEndArray();
                if (!string.IsNullOrWhiteSpace(t.Descriptor))
                {
                    w.WriteString("descriptor", t.Descriptor.Trim());
                }

                if (t.Points is { } points)
                {
                    w.WriteNumber("points", points);
                }

                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        using var document = JsonDocument.Parse(buffer.ToArray());
        return new PlanScale(Name.Trim(), document.RootElement.Clone());
    }

    /// <summary>"term.terms[2].points" → "term 3, points": the place in the editor's words.</summary>
    private static string Place(string path)
    {
        var match = System.Text.RegularExpressions.Regex.Match(path, @"terms\[(\d+)\](?:\.(\w+))?");
        return match.Success
            ? $"term {int.Parse(match.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture) + 1}{(match.Groups[2].Success ? $", {match.Groups[2].Value}" : "")}"
            : path.Replace("term.", "", StringComparison.Ordinal);
    }
}

/// <summary>One term of a <see cref="ScaleDraft"/>.</summary>
public sealed class TermDraft
{
    public string Code { get; set; } = "";

    public string Label { get; set; } = "";

    public double Lower { get; set; }

    public double Middle { get; set; }

    public double Upper { get; set; }

    public double? Points { get; set; }

    public string? Descriptor { get; set; }
}
