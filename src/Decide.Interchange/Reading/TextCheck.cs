using System.Runtime.InteropServices;
using System.Text.Json;
using System.Text.Unicode;
using Decide.Core;

namespace Decide.Interchange.Reading;

/// <summary>
/// Finds every string and member name that cannot be read as text: bytes that are not UTF-8 inside quotes (the JSON
/// parser checks the structure but leaves a string's bytes to be decoded when it is read), and escapes that leave a
/// surrogate without its partner (<c>\uD800</c>), which no text can hold. RFC 8259 section 8.1 requires UTF-8;
/// RFC 7493 (I-JSON) section 2.1 forbids such escapes. Checked before anything else is read, so that the rest of the
/// reader only meets text it can decode.
/// </summary>
internal static class TextCheck
{
    private const string NotUtf8 = "holds bytes that are not UTF-8; save the file as UTF-8";
    private const string HalfPair = "holds an escape of half a surrogate pair (such as \\uD800) that no text can hold; remove it or give the whole pair";

    /// <exception cref="InvalidEvaluationException">Every place holding such text.</exception>
    public static void Require(JsonElement root)
    {
        var errors = new List<EvaluationError>();
        Visit(root, JsonPath.Root, errors);
        if (errors.Count > 0)
        {
            throw new InvalidEvaluationException(errors);
        }
    }

    private static void Visit(JsonElement value, string path, List<EvaluationError> errors)
    {
        switch (value.ValueKind)
        {
            case JsonValueKind.Object:
                var position = 0;
                foreach (var property in value.EnumerateObject())
                {
                    position++;
                    if (Decode(() => property.Name) is { } name)
                    {
                        Visit(property.Value, JsonPath.Key(path, name), errors);
                    }
                    else
                    {
                        var why = Utf8.IsValid(JsonMarshal.GetRawUtf8PropertyName(property)) ? HalfPair : NotUtf8;
                        errors.Add(new EvaluationError(path, $"the name of member {position} of this object {why}"));
                    }
                }

                break;
            case JsonValueKind.Array:
                var index = 0;
                foreach (var item in value.EnumerateArray())
                {
                    Visit(item, JsonPath.Index(path, index++), errors);
                }

                break;
            case JsonValueKind.String when Decode(value.GetString) is null:
                errors.Add(new EvaluationError(path, "the text " + (Utf8.IsValid(JsonMarshal.GetRawUtf8Value(value)) ? HalfPair : NotUtf8)));
                break;
        }
    }

    private static string? Decode(Func<string?> read)
    {
        try
        {
            return read() ?? "";
        }
        catch (InvalidOperationException)
        {
            return null;
        }
    }
}
