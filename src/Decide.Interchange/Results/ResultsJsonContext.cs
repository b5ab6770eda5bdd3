using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>Source-generated serialisation of the results document: camelCase, indented, nulls left out.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.CamelCase,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull,
    WriteIndented = true)]
[JsonSerializable(typeof(ResultsDocument))]
internal sealed partial class ResultsJsonContext : JsonSerializerContext;
