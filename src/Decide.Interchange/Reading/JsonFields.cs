using Decide.Core;
using Decide.Core.Fuzzy;

namespace Decide.Interchange.Reading;

/// <summary>The known members of an object with a fixed set of names, read with errors reported to a <see cref="ReadContext"/>.</summary>
internal sealed class JsonFields(ReadContext context, string path, IReadOnlyDictionary<string, JsonMember> members)
{
    public string Path { get; } = path;

    public bool Has(string name) => members.ContainsKey(name);

    public bool TryGet(string name, out JsonMember member) => members.TryGetValue(name, out member);

    public string MemberPath(string name) => JsonPath.Key(Path, name);

    /// <summary>Reports a required member that is absent; returns whether it is present.</summary>
    public bool Require(string name, string what)
    {
        if (members.ContainsKey(name))
        {
            return true;
        }

        context.Error(MemberPath(name), $"required: {what}");
        return false;
    }

    public string? String(string name, string? requiredWhat = null)
    {
        if (members.TryGetValue(name, out var member))
        {
            return context.String(member.Value, member.Path);
        }

        if (requiredWhat is not null)
        {
            Require(name, requiredWhat);
        }

        return null;
    }

    public double? Number(string name) =>
        members.TryGetValue(name, out var member) ? context.Number(member.Value, member.Path) : null;

    public bool? Boolean(string name, string? requiredWhat = null)
    {
        if (members.TryGetValue(name, out var member))
        {
            return context.Boolean(member.Value, member.Path);
        }

        if (requiredWhat is not null)
        {
            Require(name, requiredWhat);
        }

        return null;
    }

    public Tfn? Tfn(string name) =>
        members.TryGetValue(name, out var member) ? context.Tfn(member.Value, member.Path) : null;

    /// <summary>An optional choice; <paramref name="fallback"/> when absent. <paramref name="readable"/> is false when present but invalid.</summary>
    public T Choice<T>(string name, IReadOnlyList<(string Name, T Value)> choices, T fallback, out bool readable)
    {
        readable = true;
        if (!members.TryGetValue(name, out var member))
        {
            return fallback;
        }

        if (context.TryChoice(member.Value, member.Path, choices, out var chosen))
        {
            return chosen;
        }

        readable = false;
        return fallback;
    }

    /// <summary>An optional object whose members are all strings (for example term code → descriptor).</summary>
    public Dictionary<string, string>? StringMap(string name)
    {
        if (!members.TryGetValue(name, out var member))
        {
            return null;
        }

        var map = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var entry in context.Members(member.Value, member.Path) ?? [])
        {
            if (context.String(entry.Value, entry.Path) is { } text)
            {
                map[entry.Name] = text;
            }
        }

        return map;
    }
}
