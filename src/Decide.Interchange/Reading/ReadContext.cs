using System.Globalization;
using System.Text.Json;
using Decide.Core;
using Decide.Core.Fuzzy;

namespace Decide.Interchange.Reading;

/// <summary>
/// Reads JSON values by hand and collects every problem with its path instead of stopping at the first. Each
/// problem's path is also remembered as covered: later checks of the same place (the engine's validator) would only
/// repeat it in other words, so the reader leaves them out.
/// </summary>
internal sealed class ReadContext
{
    private readonly List<EvaluationError> _errors = [];
    private readonly HashSet<string> _covered = new(StringComparer.Ordinal);

    public IReadOnlyList<EvaluationError> Errors => _errors;

    public int ErrorCount => _errors.Count;

    public void Error(string path, string reason)
    {
        _errors.Add(new EvaluationError(path, reason));
        _covered.Add(path);
    }

    /// <summary>Marks a place whose later problems are consequences of one already reported.</summary>
    public void Cover(string path) => _covered.Add(path);

    /// <summary>True when <paramref name="path"/> is a reported place or lies inside one.</summary>
    public bool Covers(string path)
    {
        if (_covered.Contains(path))
        {
            return true;
        }

        for (var i = path.Length - 1; i > 0; i--)
        {
            if ((path[i] == '.' || path[i] == '[') && _covered.Contains(path[..i]))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Describes a value for "expected …, got …" messages.</summary>
    public static string Describe(JsonElement value) => value.ValueKind switch
    {
        JsonValueKind.String => $"a string (\"{Shorten(value.GetString() ?? "")}\")",
        JsonValueKind.Number => $"a number ({Shorten(value.GetRawText())})",
        JsonValueKind.Array => "an array",
        JsonValueKind.Object => "an object",
        JsonValueKind.True => "true",
        JsonValueKind.False => "false",
        JsonValueKind.Null => "null",
        _ => "nothing",
    };

    public void WrongType(JsonElement value, string path, string expected) =>
        Error(path, $"expected {expected}, got {Describe(value)}");

    /// <summary>The members of an object, first occurrence of each name, in order; a repeated name is reported.</summary>
    public List<JsonMember>? Members(JsonElement value, string path, string expected = "an object")
    {
        if (value.ValueKind != JsonValueKind.Object)
        {
            WrongType(value, path, expected);
            return null;
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        var members = new List<JsonMember>();
        foreach (var property in value.EnumerateObject())
        {
            var at = JsonPath.Key(path, property.Name);
            if (!seen.Add(property.Name))
            {
                Error(at, $"\"{property.Name}\" is given twice in the same object; give it once (the second would be ignored)");
                continue;
            }

            members.Add(new JsonMember(property.Name, property.Value, at));
        }

        return members;
    }

    /// <summary>
    /// An object with a fixed set of member names. A name outside <paramref name="allowed"/> is reported (a typo must
    /// not be silently ignored) unless it is an extension (<c>x-…</c>) or listed in <paramref name="ignored"/>.
    /// </summary>
    public JsonFields? Fields(
        JsonElement value, string path, IReadOnlyCollection<string> allowed, IReadOnlyCollection<string>? ignored = null,
        string expected = "an object")
    {
        var members = Members(value, path, expected);
        if (members is null)
        {
            return null;
        }

        var known = new Dictionary<string, JsonMember>(StringComparer.Ordinal);
        foreach (var member in members)
        {
            if (allowed.Contains(member.Name))
            {
                known[member.Name] = member;
            }
            else if (!member.Name.StartsWith(EvaluationFormat.ExtensionPrefix, StringComparison.Ordinal)
                     && ignored?.Contains(member.Name) != true)
            {
                Error(member.Path, $"unknown member \"{member.Name}\"; expected one of {string.Join(", ", allowed)} (or an extension named \"x-…\")");
            }
        }

        return new JsonFields(this, path, known);
    }

    /// <summary>The elements of an array with their paths, or nothing if the value is not an array.</summary>
    public IEnumerable<(int Index, JsonElement Item, string Path)> Items(JsonElement value, string path)
    {
        if (value.ValueKind != JsonValueKind.Array)
        {
            WrongType(value, path, "an array");
            yield break;
        }

        var i = 0;
        foreach (var item in value.EnumerateArray())
        {
            yield return (i, item, JsonPath.Index(path, i));
            i++;
        }
    }

    public string? String(JsonElement value, string path)
    {
        if (value.ValueKind == JsonValueKind.String)
        {
            return value.GetString();
        }

        WrongType(value, path, "a string");
        return null;
    }

    public double? Number(JsonElement value, string path)
    {
        if (value.ValueKind != JsonValueKind.Number)
        {
            WrongType(value, path, "a number");
            return null;
        }

        if (!value.TryGetDouble(out var number) || !double.IsFinite(number))
        {
            Error(path, $"{Shorten(value.GetRawText())} is not a finite number (it is too large to hold)");
            return null;
        }

        return number;
    }

    public bool? Boolean(JsonElement value, string path)
    {
        if (value.ValueKind is JsonValueKind.True or JsonValueKind.False)
        {
            return value.GetBoolean();
        }

        WrongType(value, path, "true or false");
        return null;
    }

    /// <summary>A triangular fuzzy number written as [lower, middle, upper].</summary>
    public Tfn? Tfn(JsonElement value, string path)
    {
        if (value.ValueKind != JsonValueKind.Array)
        {
            WrongType(value, path, "a triangular fuzzy number [lower, middle, upper]");
            return null;
        }

        var numbers = Numbers(value, path);
        if (numbers is null)
        {
            return null;
        }

        if (numbers.Length != 3)
        {
            Error(path, $"a triangular fuzzy number is three numbers [lower, middle, upper]; got {numbers.Length}");
            return null;
        }

        try
        {
            return new Tfn(numbers[0], numbers[1], numbers[2]);
        }
        catch (ArgumentException ex)
        {
            Error(path, Sentence(ex.Message));
            return null;
        }
    }

    /// <summary>An array of finite numbers, or null (with the problems reported) if any element is not one.</summary>
    public double[]? Numbers(JsonElement value, string path)
    {
        var numbers = new List<double>();
        var ok = value.ValueKind == JsonValueKind.Array;
        foreach (var (_, item, at) in Items(value, path))
        {
            if (Number(item, at) is { } number)
            {
                numbers.Add(number);
            }
            else
            {
                ok = false;
            }
        }

        return ok ? numbers.ToArray() : null;
    }

    /// <summary>One of a fixed set of lower-case names.</summary>
    public bool TryChoice<T>(JsonElement value, string path, IReadOnlyList<(string Name, T Value)> choices, out T chosen)
    {
        chosen = default!;
        if (String(value, path) is not { } text)
        {
            return false;
        }

        foreach (var (name, option) in choices)
        {
            if (name == text)
            {
                chosen = option;
                return true;
            }
        }

        Error(path, $"expected one of {string.Join(", ", choices.Select(c => $"\"{c.Name}\""))}; got \"{Shorten(text)}\"");
        return false;
    }

    /// <summary>Turns an exception message into a reason: no trailing full stop, lower-case start.</summary>
    public static string Sentence(string message)
    {
        var text = message.TrimEnd('.', ' ');
        return text.Length > 1 && char.IsUpper(text[0]) && !char.IsUpper(text[1])
            ? char.ToLower(text[0], CultureInfo.InvariantCulture) + text[1..]
            : text;
    }

    private static string Shorten(string text) => text.Length <= 40 ? text : text[..37] + "...";
}
