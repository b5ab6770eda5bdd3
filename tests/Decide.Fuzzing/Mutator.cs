using System.Text;

namespace Decide.Fuzzing;

/// <summary>Applies <see cref="TreeMutation"/>s to a document tree, saying what each did.</summary>
public static class Mutator
{
    private static readonly Func<TreeNode, TreeNode>[] OtherTypes =
    [
        _ => TreeRaw.Of("null"), _ => TreeRaw.Of("true"), _ => TreeRaw.Of("false"), _ => TreeRaw.Of("0"), _ => TreeRaw.Of("-1"),
        _ => new TreeString(""), _ => new TreeString("text"), _ => new TreeArray([]), _ => new TreeObject([]),
        n => new TreeArray([n.Clone()]), n => new TreeObject([new("x", n.Clone())]),
    ];

    /// <summary>Applies <paramref name="mutation"/> to <paramref name="root"/>; returns the new root and what was done.</summary>
    public static (TreeNode Root, string Description) Apply(TreeNode root, TreeMutation mutation)
    {
        if (mutation.Kind == TreeMutationKind.Widen)
        {
            return (root, Widen(root, Pick(HostileValues.Widths, mutation.Choice)));
        }

        var all = JsonTree.Places(root);
        var places = mutation.Target % 3 == 0 ? [.. all.Where(p => p.Depth <= 2)] : all;

        var place = places[mutation.Target % places.Count];
        var path = place.Path;
        var c = mutation.Choice;
        TreeNode? replacement = null;
        string what;
        switch (mutation.Kind)
        {
            case TreeMutationKind.Remove:
                what = Remove(place) ? "removed" : "kept (the root)";
                break;
            case TreeMutationKind.Duplicate:
                what = Duplicate(place, c);
                break;
            case TreeMutationKind.Retype:
                replacement = Pick(OtherTypes, c)(place.Node);
                what = "retyped to " + Describe(replacement);
                break;
            case TreeMutationKind.Number:
                replacement = TreeRaw.Of(Pick(HostileValues.Numbers, c));
                what = "number " + Describe(replacement);
                break;
            case TreeMutationKind.Nest:
                replacement = Nest(place.Node, Pick(HostileValues.Depths, c), objects: c / HostileValues.Depths.Length % 2 == 1);
                what = $"nested {Pick(HostileValues.Depths, c)} deep";
                break;
            case TreeMutationKind.LongString:
                var filler = Pick(HostileValues.Fillers, c / HostileValues.Lengths.Length);
                var length = Pick(HostileValues.Lengths, c);
                replacement = new TreeString(new StringBuilder(length * filler.Length).Insert(0, filler, length).ToString());
                what = $"string of {length} × {Escape(filler)}";
                break;
            case TreeMutationKind.Text:
                replacement = new TreeString(Pick(HostileValues.Texts, c));
                what = "text " + Describe(replacement);
                break;
            case TreeMutationKind.RawText:
                var raw = Pick(HostileValues.RawStrings, c);
                replacement = new TreeRaw([(byte)'"', (byte)'a', .. raw, (byte)'b', (byte)'"']);
                what = $"raw string bytes {Convert.ToHexString(raw)}";
                break;
            case TreeMutationKind.Rename:
                what = Rename(place, c);
                break;
            case TreeMutationKind.Empty:
                what = Empty(place.Node) ? "emptied" : "not a container";
                break;
            case TreeMutationKind.Multiply:
                // No more copies than fit in the size budget.
                var copies = (int)Math.Min(Pick(HostileValues.Copies, c), HostileValues.MaxDocumentBytes / Math.Max(1, JsonTree.Size(place.Node)) + 1);
                what = Multiply(place.Node, copies);
                break;
            case TreeMutationKind.SwapReference:
                var strings = all.Select(p => p.Node).OfType<TreeString>().ToList();
                replacement = strings.Count == 0 ? new TreeString("") : strings[c % strings.Count];
                what = "swapped for " + Describe(replacement);
                break;
            default:
                throw new ArgumentOutOfRangeException(nameof(mutation), mutation.Kind, "unknown mutation");
        }

        if (replacement is not null && !place.Replace(replacement))
        {
            root = replacement;
        }

        return (root, $"{path}: {what}");
    }

    private static bool Remove(TreePlace place)
    {
        switch (place.Parent)
        {
            case TreeObject o:
                o.Members.RemoveAt(place.Index);
                return true;
            case TreeArray a:
                a.Items.RemoveAt(place.Index);
                return true;
            default:
                return false;
        }
    }

    private static string Duplicate(TreePlace place, int choice)
    {
        var value = choice % 2 == 0 ? place.Node.Clone() : Pick(OtherTypes, choice / 2)(place.Node);
        switch (place.Parent)
        {
            case TreeObject o:
                o.Members.Insert(place.Index + 1, new(o.Members[place.Index].Key, value));
                return "name given twice, second value " + Describe(value);
            case TreeArray a:
                a.Items.Insert(place.Index + 1, value);
                return "element repeated as " + Describe(value);
            default:
                return "kept (the root)";
        }
    }

    private static string Rename(TreePlace place, int choice)
    {
        if (place.Parent is not TreeObject o)
        {
            return "not a member";
        }

        var key = o.Members[place.Index].Key;
        var renamed = (choice % 6) switch
        {
            0 => key + "x",
            1 => key.ToUpperInvariant(),
            2 => "x-" + key,
            3 => o.Members[choice / 6 % o.Members.Count].Key,
            4 => "",
            _ => Pick(HostileValues.Texts, choice / 6),
        };
        o.Members[place.Index] = new(renamed, o.Members[place.Index].Value);
        return $"renamed to {Escape(renamed)}";
    }

    private static bool Empty(TreeNode node)
    {
        switch (node)
        {
            case TreeObject o:
                o.Members.Clear();
                return true;
            case TreeArray a:
                a.Items.Clear();
                return true;
            default:
                return false;
        }
    }

    private static string Multiply(TreeNode node, int copies)
    {
        switch (node)
        {
            case TreeArray { Items.Count: > 0 } a:
                var items = a.Items.ToList();
                for (var i = items.Count; i < copies; i++)
                {
                    var copy = items[i % items.Count].Clone();
                    Suffix(copy, i);
                    a.Items.Add(copy);
                }

                return $"grown to {a.Items.Count} elements";
            case TreeObject { Members.Count: > 0 } o:
                var members = o.Members.ToList();
                for (var i = members.Count; i < copies; i++)
                {
                    var m = members[i % members.Count];
                    o.Members.Add(new($"{m.Key}-{i}", m.Value.Clone()));
                }

                return $"grown to {o.Members.Count} members";
            default:
                return "nothing to grow";
        }
    }

    /// <summary>Makes a copied element's id unique, so that the copies are new entries rather than clashes.</summary>
    private static void Suffix(TreeNode copy, int i)
    {
        if (copy is TreeObject o)
        {
            var at = o.Members.FindIndex(m => m.Key == "id" && m.Value is TreeString);
            if (at >= 0)
            {
                o.Members[at] = new("id", new TreeString($"{((TreeString)o.Members[at].Value).Value}-{i}"));
            }
        }
    }

    private static TreeNode Nest(TreeNode inner, int depth, bool objects)
    {
        var (open, close) = objects ? ("{\"a\":", "}") : ("[", "]");
        return new TreeRaw([.. Encoding.UTF8.GetBytes(string.Concat(Enumerable.Repeat(open, depth))), .. JsonTree.Write(inner),
            .. Encoding.UTF8.GetBytes(string.Concat(Enumerable.Repeat(close, depth)))]);
    }

    /// <summary>
    /// Adds <paramref name="count"/> copies of the first criterion with new ids, and for each an importance judgement
    /// and a rating wherever the first criterion has one, so that the evaluation stays valid but grows wide.
    /// </summary>
    private static string Widen(TreeNode root, int count)
    {
        if (root is not TreeObject top || top["criteria"] is not TreeArray { Items.Count: > 0 } criteria
            || criteria.Items[0] is not TreeObject first || first["id"] is not TreeString { Value: var id })
        {
            return "$: not widened (no first criterion)";
        }

        var ids = Enumerable.Range(1, count).Select(i => $"{(id.Length <= 24 ? id : id[..24])}-w{i}").ToArray();
        foreach (var (newId, i) in ids.Select((x, i) => (x, i)))
        {
            var copy = (TreeObject)first.Clone();
            copy.Members.RemoveAll(m => m.Key is "id" or "name");
            copy.Members.InsertRange(0, [new("id", new TreeString(newId)), new("name", new TreeString($"Widened criterion {i + 1}"))]);
            criteria.Items.Add(copy);
        }

        foreach (var assessor in (top["importance"] as TreeObject)?.Members ?? [])
        {
            AddBeside(assessor.Value, id, ids);
        }

        foreach (var assessor in (top["ratings"] as TreeObject)?.Members ?? [])
        {
            foreach (var alternative in (assessor.Value as TreeObject)?.Members ?? [])
            {
                AddBeside(alternative.Value, id, ids);
            }
        }

        foreach (var assessor in (top["assessors"] as TreeArray)?.Items.OfType<TreeObject>() ?? [])
        {
            if (assessor["criteria"] is TreeArray assigned && assigned.Items.OfType<TreeString>().Any(s => s.Value == id))
            {
                assigned.Items.AddRange(ids.Select(x => new TreeString(x)));
            }
        }

        return $"$: widened by {count} criteria";
    }

    private static void AddBeside(TreeNode node, string id, string[] ids)
    {
        if (node is TreeObject o && o[id] is { } value)
        {
            o.Members.AddRange(ids.Select(x => new KeyValuePair<string, TreeNode>(x, value.Clone())));
        }
    }

    private static T Pick<T>(IReadOnlyList<T> list, int choice) => list[choice % list.Count];

    private static string Describe(TreeNode node)
    {
        var text = Encoding.UTF8.GetString(JsonTree.Write(node));
        return Escape(text.Length <= 60 ? text : text[..57] + "...");
    }

    /// <summary>Control characters and unpaired surrogates made visible, so a failure message can be read and copied.</summary>
    public static string Escape(string text)
    {
        var b = new StringBuilder();
        foreach (var c in text)
        {
            b.Append(c < 0x20 || char.IsSurrogate(c) || c is '\u2028' or '\u2029' or '\u202E' or '\uFEFF' or '\u200B' ? $"\\u{(int)c:X4}" : c.ToString());
        }

        return b.ToString();
    }
}
