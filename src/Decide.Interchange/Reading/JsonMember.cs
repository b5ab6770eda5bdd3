using System.Text.Json;

namespace Decide.Interchange.Reading;

/// <summary>A member of a JSON object with the path it sits at.</summary>
internal readonly record struct JsonMember(string Name, JsonElement Value, string Path);
