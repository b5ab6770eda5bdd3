using System.Globalization;
using System.Text;
using System.Text.Json;

namespace Decide.Fuzzing;

/// <summary>Reads well-formed JSON into a <see cref="TreeNode"/> and writes a tree back to bytes.</summary>
public static class JsonTree
{
    /// <summary>The tree of a well-formed JSON text (numbers and literals keep their text).</summary>
    public static TreeNode Parse(ReadOnlyMemory<byte> utf8)
    {
        using var document = JsonDocument.Parse(utf8, new JsonDocumentOptions { MaxDepth = 256 });
        return From(document.RootElement);
    }

    private static TreeNode From(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.Object => new TreeObject([.. e.EnumerateObject().Select(p => new KeyValuePair<string, TreeNode>(p.Name, From(p.Value)))]),
        JsonValueKind.Array => new TreeArray([.. e.EnumerateArray().Select(From)]),
        JsonValueKind.String => new TreeString(e.GetString()!),
        _ => TreeRaw.Of(e.GetRawText()),
    };

    /// <summary>The tree as bytes (compact).</summary>
    public static byte[] Write(TreeNode node)
    {
        using var output = new MemoryStream();
        Write(node, output);
        return output.ToArray();
    }

    private static void Write(TreeNode node, MemoryStream output)
    {
        switch (node)
        {
            case TreeObject o:
                output.WriteByte((byte)'{');
                for (var i = 0; i < o.Members.Count; i++)
                {
                    if (i > 0)
                    {
                        output.WriteByte((byte)',');
                    }

                    WriteString(o.Members[i].Key, output);
                    output.WriteByte((byte)':');
                    Write(o.Members[i].Value, output);
                }

                output.WriteByte((byte)'}');
                break;
            case TreeArray a:
                output.WriteByte((byte)'[');
                for (var i = 0; i < a.Items.Count; i++)
                {
                    if (i > 0)
                    {
                        output.WriteByte((byte)',');
                    }

                    Write(a.Items[i], output);
                }

                output.WriteByte((byte)']');
                break;
            case TreeString s:
                WriteString(s.Value, output);
                break;
            case TreeRaw r:
                output.Write(r.Bytes);
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(node), node.GetType().Name, "unknown node type");
        }
    }

    /// <summary>The number of bytes <see cref="Write(TreeNode)"/> would give, without writing them.</summary>
    public static long Size(TreeNode node)
    {
        long size = 0;
        var stack = new Stack<TreeNode>();
        stack.Push(node);
        while (stack.Count > 0)
        {
            switch (stack.Pop())
            {
                case TreeObject o:
                    size += 2 + Math.Max(0, o.Members.Count - 1);
                    foreach (var m in o.Members)
                    {
                        size += StringSize(m.Key) + 1;
                        stack.Push(m.Value);
                    }

                    break;
                case TreeArray a:
                    size += 2 + Math.Max(0, a.Items.Count - 1);
                    a.Items.ForEach(stack.Push);
                    break;
                case TreeString s:
                    size += StringSize(s.Value);
                    break;
                case TreeRaw r:
                    size += r.Bytes.Length;
                    break;
            }
        }

        return size;
    }

    /// <summary>Bytes of a string as <see cref="WriteString"/> writes it, quotes included.</summary>
    private static long StringSize(string value)
    {
        long size = 2;
        for (var i = 0; i < value.Length; i++)
        {
            var c = value[i];
            if (char.IsHighSurrogate(c) && i + 1 < value.Length && char.IsLowSurrogate(value[i + 1]))
            {
                size += 4;
                i++;
            }
            else
            {
                size += c switch
                {
                    '"' or '\\' => 2,
                    < (char)0x20 => 6,
                    < (char)0x80 => 1,
                    < (char)0x800 => 2,
                    _ when char.IsSurrogate(c) => 6,
                    _ => 3,
                };
            }
        }

        return size;
    }

    /// <summary>A JSON string; an unpaired surrogate becomes its \u escape, so the bytes stay valid UTF-8.</summary>
    private static void WriteString(string value, MemoryStream output)
    {
        var text = new StringBuilder(value.Length + 2).Append('"');
        for (var i = 0; i < value.Length; i++)
        {
            var c = value[i];
            if (c == '"' || c == '\\')
            {
                text.Append('\\').Append(c);
            }
            else if (c < 0x20)
            {
                text.Append("\\u").Append(((int)c).ToString("x4", CultureInfo.InvariantCulture));
            }
            else if (char.IsHighSurrogate(c) && i + 1 < value.Length && char.IsLowSurrogate(value[i + 1]))
            {
                text.Append(c).Append(value[++i]);
            }
            else if (char.IsSurrogate(c))
            {
                text.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
            }
            else
            {
                text.Append(c);
            }
        }

        output.Write(Encoding.UTF8.GetBytes(text.Append('"').ToString()));
    }

    /// <summary>Every node with its parent and its position in the parent, depth first (the root first, without a parent).</summary>
    public static List<TreePlace> Places(TreeNode root)
    {
        var places = new List<TreePlace>();
        var stack = new Stack<TreePlace>();
        stack.Push(new TreePlace(root, null, -1, null, 0));
        while (stack.Count > 0)
        {
            var place = stack.Pop();
            places.Add(place);
            switch (place.Node)
            {
                case TreeObject o:
                    for (var i = o.Members.Count - 1; i >= 0; i--)
                    {
                        stack.Push(new TreePlace(o.Members[i].Value, o, i, place, place.Depth + 1));
                    }

                    break;
                case TreeArray a:
                    for (var i = a.Items.Count - 1; i >= 0; i--)
                    {
                        stack.Push(new TreePlace(a.Items[i], a, i, place, place.Depth + 1));
                    }

                    break;
            }
        }

        return places;
    }
}
