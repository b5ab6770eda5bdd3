using System.Text.Json;
using Json.Schema;

namespace Decide.Interchange.Tests;

/// <summary>
/// The published JSON Schemas, loaded once for the whole test run (a schema registers its <c>$id</c> globally, so
/// loading it twice fails).
/// </summary>
internal static class Schemas
{
    private static readonly Lazy<JsonSchema> EvaluationSchema =
        new(() => JsonSchema.FromFile(RepositoryFiles.PathOf("docs", "schema", "decide-evaluation-1.schema.json")));

    private static readonly Lazy<JsonSchema> ResultsSchema =
        new(() => JsonSchema.FromFile(RepositoryFiles.PathOf("docs", "schema", "decide-results-1.schema.json")));

    public static JsonSchema Evaluation => EvaluationSchema.Value;

    public static JsonSchema Results => ResultsSchema.Value;

    public static bool IsValid(JsonSchema schema, string json)
    {
        using var document = JsonDocument.Parse(json);
        return schema.Evaluate(document.RootElement).IsValid;
    }

    /// <summary>Fails with every schema problem listed when <paramref name="json"/> does not match.</summary>
    public static void AssertValid(JsonSchema schema, string json)
    {
        using var document = JsonDocument.Parse(json);
        var result = schema.Evaluate(document.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
        if (!result.IsValid)
        {
            var problems = (result.Details ?? [])
                .Where(d => d.Errors is { Count: > 0 })
                .Select(d => $"{d.InstanceLocation}: {string.Join("; ", d.Errors!.Values)}");
            Assert.Fail("Schema validation failed:\n" + string.Join("\n", problems));
        }
    }
}
