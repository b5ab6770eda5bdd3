using System.Text;

namespace Decide.Core;

/// <summary>
/// Builds the JSON paths that error messages use (<c>$.ratings.D1.S2.C3</c>, <c>$.criteria[4].id</c>), quoting a
/// key in brackets when it is not a plain identifier (<c>$.values['S 1'].price</c>).
/// </summary>
public static class JsonPath
{
    /// <summary>The document root, <c>$</c>.</summary>
    public const string Root = "$";

    /// <summary>The path of a member <paramref name="key"/> of the object at <paramref name="parent"/>.</summary>
    public static string Key(string parent, string key) =>
        IsPlain(key) ? $"{parent}.{key}" : $"{parent}['{Escape(key)}']";

    /// <summary>The path of element <paramref name="index"/> of the array at <paramref name="parent"/>.</summary>
    public static string Index(string parent, int index) => $"{parent}[{index}]";

    /// <summary>Shorthand for nested keys: <c>Keys("$.ratings", "D1", "S2", "C3")</c>.</summary>
    public static string Keys(string parent, params ReadOnlySpan<string> keys)
    {
        var path = parent;
        foreach (var key in keys)
        {
            path = Key(path, key);
        }

        return path;
    }

    private static bool IsPlain(string key)
    {
        if (key.Length == 0 || !(char.IsAsciiLetter(key[0]) || key[0] == '_'))
        {
            return false;
        }

        foreach (var c in key)
        {
            if (!(char.IsAsciiLetterOrDigit(c) || c == '_'))
            {
                return false;
            }
        }

        return true;
    }

    private static string Escape(string key)
    {
        var builder = new StringBuilder(key.Length + 4);
        foreach (var c in key)
        {
            if (c is '\'' or '\\')
            {
                builder.Append('\\');
            }

            builder.Append(c);
        }

        return builder.ToString();
    }
}
