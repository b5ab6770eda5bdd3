using System.Text.Json;
using Decide.Core;
using Decide.Core.Scales;
using Decide.Interchange;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>
/// A scale as the plan names it: a built-in scale by <paramref name="Name"/>, or a scale of the evaluation's own
/// (<paramref name="Custom"/>, kept exactly as the plan has it; such scales come in with an imported file).
/// </summary>
public sealed record ScaleSetting(string Name, JsonElement? Custom = null)
{
    /// <summary>The scale's terms, or null when a custom scale cannot be read.</summary>
    /// <param name="member">The plan member it stands in: ratingScale, importanceScale or pairwiseScale.</param>
    public LinguisticScale? Resolve(string member)
    {
        if (Custom is null)
        {
            return BuiltInScales.ByName.GetValueOrDefault(Name);
        }

        // The reader knows every rule of a scale object: let it read the scale inside a minimal plan.
        var probe = $$"""{"format":"{{EvaluationFormat.Evaluation}}","title":"probe","{{member}}":{{Custom.Value.GetRawText()}},"criteria":[{"id":"c","name":"c"}]}""";
        try
        {
            var plan = EvaluationFileReader.ReadPlan(probe).Evaluation;
            return member switch
            {
                "ratingScale" => plan.RatingScale,
                "importanceScale" => plan.ImportanceScale,
                _ => plan.PairwiseScale,
            };
        }
        catch (InvalidEvaluationException)
        {
            return null;
        }
    }

    /// <summary>Reads the plan's member: a name, an object, or absent (the default).</summary>
    public static ScaleSetting From(JsonElement plan, string member, string fallback)
    {
        if (!plan.TryGetProperty(member, out var value))
        {
            return new ScaleSetting(fallback);
        }

        return value.ValueKind switch
        {
            JsonValueKind.String => new ScaleSetting(value.GetString()!),
            JsonValueKind.Object => new ScaleSetting(
                value.TryGetProperty("name", out var name) && name.ValueKind == JsonValueKind.String ? name.GetString()! : "custom",
                value.Clone()),
            _ => new ScaleSetting(fallback),
        };
    }

    /// <summary>Writes the member: the name, or the custom scale as it was.</summary>
    public void Write(Utf8JsonWriter w, string member)
    {
        w.WritePropertyName(member);
        if (Custom is { } custom)
        {
            custom.WriteTo(w);
        }
        else
        {
            w.WriteStringValue(Name);
        }
    }
}
