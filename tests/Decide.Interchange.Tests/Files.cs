using System.Text.Json.Nodes;
using Decide.Core;

namespace Decide.Interchange.Tests;

/// <summary>Evaluation files for tests: the documented minimal example, a pairwise one, and helpers to break them.</summary>
internal static class Files
{
    public static string MinimalText => File.ReadAllText(RepositoryFiles.MinimalExample);

    public static JsonObject Minimal() => JsonNode.Parse(MinimalText)!.AsObject();

    /// <summary>
    /// An invented evaluation weighted by pairwise comparison: a criterion group, custom scales, assessor weights and
    /// assignments, judgements by code and by TFN, metadata and non-default options. Each part is valid.
    /// </summary>
    public const string PairwiseText = """
        {
          "format": "decide-evaluation/1",
          "title": "Fleet telematics — supplier selection",
          "reference": "T-17",
          "organisation": "Example Transport Authority",
          "description": "Invented for tests.",
          "noun": "suppliers",
          "ratingScale": {
            "name": "house-rating-4",
            "range": [1, 10],
            "terms": [
              { "code": "W", "label": "Weak", "tfn": [1, 1, 4], "descriptor": "Falls short of the requirement." },
              { "code": "A", "label": "Adequate", "tfn": [1, 4, 7] },
              { "code": "S", "label": "Strong", "tfn": [4, 7, 10] },
              { "code": "E", "label": "Excellent", "tfn": [7, 10, 10] }
            ]
          },
          "importanceScale": "importance-5",
          "pairwiseScale": "pairwise-9",
          "groups": [ { "id": "tech", "name": "Technical merit" } ],
          "criteria": [
            { "id": "coverage", "name": "Network coverage", "group": "tech", "description": "Share of routes covered." },
            { "id": "security", "name": "Data security", "group": "tech", "descriptors": { "E": "Certified and independently tested." } },
            { "id": "service", "name": "Service level", "kind": "linguistic", "direction": "benefit" },
            { "id": "risk", "name": "Delivery risk", "direction": "cost" },
            { "id": "cost", "name": "Five-year cost", "kind": "numeric", "direction": "cost", "unit": "EUR" },
            { "id": "licence", "name": "Operating licence", "kind": "gate" }
          ],
          "alternatives": [
            { "id": "S1", "name": "Supplier one" },
            { "id": "S2", "name": "Supplier two" },
            { "id": "S3", "name": "Supplier three" }
          ],
          "assessors": [
            { "id": "E1", "name": "Evaluator one", "weight": 2 },
            { "id": "E2", "name": "Evaluator two", "criteria": ["coverage", "security", "risk"] }
          ],
          "weighting": "pairwise",
          "pairwise": {
            "E1": [
              { "row": "tech", "col": "service", "term": "3" },
              { "row": "tech", "col": "risk", "term": "5" },
              { "row": "tech", "col": "cost", "tfn": [1, 2, 3] },
              { "row": "service", "col": "risk", "term": "2" },
              { "row": "service", "col": "cost", "term": "1/2" },
              { "row": "risk", "col": "cost", "term": "1/3" },
              { "row": "coverage", "col": "security", "term": "1/2" }
            ],
            "E2": [
              { "row": "tech", "col": "service", "tfn": [2, 3, 4] },
              { "row": "risk", "col": "tech", "term": "1/4" },
              { "row": "tech", "col": "cost", "term": "1" },
              { "row": "service", "col": "risk", "term": "3" },
              { "row": "cost", "col": "service", "term": "3" },
              { "row": "risk", "col": "cost", "term": "5" },
              { "row": "coverage", "col": "security", "term": "1" }
            ]
          },
          "ratings": {
            "E1": {
              "S1": { "coverage": "S", "security": "E", "service": "A", "risk": "S" },
              "S2": { "coverage": { "term": "E", "rationale": "Covers every route listed." }, "security": "S", "service": "S", "risk": "A" },
              "S3": { "coverage": "A", "security": "W", "service": "E", "risk": "W" }
            },
            "E2": {
              "S1": { "coverage": "E", "security": "S", "risk": "S" },
              "S2": { "coverage": "S", "security": { "declined": "Outside my expertise." }, "risk": "A" },
              "S3": { "coverage": "A", "security": "A", "risk": "W" }
            }
          },
          "values": {
            "S1": { "cost": 412000 },
            "S2": { "cost": 398500.5 },
            "S3": { "cost": 455000 }
          },
          "gates": {
            "S1": { "licence": true },
            "S2": { "licence": { "passed": true, "note": "Licence renewed last month." } },
            "S3": { "licence": true }
          },
          "options": { "aggregation": "geometric", "ideal": "extreme" }
        }
        """;

    public static JsonObject Pairwise() => JsonNode.Parse(PairwiseText)!.AsObject();

    /// <summary>The errors reading <paramref name="json"/> gives; fails if it reads without error.</summary>
    public static IReadOnlyList<EvaluationError> ErrorsOf(string json) =>
        Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.Read(json)).Errors;

    public static IReadOnlyList<EvaluationError> ErrorsOf(JsonNode node) => ErrorsOf(node.ToJsonString());

    /// <summary>The single error at <paramref name="path"/>, with every error listed if there is none or several.</summary>
    public static EvaluationError At(this IReadOnlyList<EvaluationError> errors, string path)
    {
        var found = errors.Where(e => e.Path == path).ToArray();
        if (found.Length != 1)
        {
            Assert.Fail($"expected one error at {path}, found {found.Length}; all errors:\n{string.Join("\n", errors)}");
        }

        return found[0];
    }

    /// <summary>Sets a value at a slash-separated path ("ratings/E1/B9"), creating objects on the way.</summary>
    public static JsonObject Set(this JsonObject root, string path, string json)
    {
        var parts = path.Split('/');
        JsonNode node = root;
        foreach (var part in parts[..^1])
        {
            node = int.TryParse(part, out var index) ? node[index]! : (node[part] ??= new JsonObject());
        }

        var value = JsonNode.Parse(json);
        if (int.TryParse(parts[^1], out var last))
        {
            node[last] = value;
        }
        else
        {
            node[parts[^1]] = value;
        }

        return root;
    }
}
