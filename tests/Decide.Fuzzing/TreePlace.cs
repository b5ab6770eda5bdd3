namespace Decide.Fuzzing;

/// <summary>
/// Where a node sits: its parent (null for the root), its index there, the parent's place (for the path, worked out
/// only when asked: documents grow to millions of nodes) and its depth.
/// </summary>
public sealed record TreePlace(TreeNode Node, TreeNode? Parent, int Index, TreePlace? Above, int Depth)
{
    /// <summary>A readable path such as <c>$.criteria[2].id</c>.</summary>
    public string Path => Parent switch
    {
        TreeObject o => $"{Above!.Path}.{Shorten(o.Members[Index].Key)}",
        TreeArray => $"{Above!.Path}[{Index}]",
        _ => "$",
    };

    /// <summary>Puts <paramref name="replacement"/> where the node was; false for the root (the caller replaces it).</summary>
    public bool Replace(TreeNode replacement)
    {
        switch (Parent)
        {
            case TreeObject o:
                o.Members[Index] = new KeyValuePair<string, TreeNode>(o.Members[Index].Key, replacement);
                return true;
            case TreeArray a:
                a.Items[Index] = replacement;
                return true;
            default:
                return false;
        }
    }

    private static string Shorten(string key) => Mutator.Escape(key.Length <= 24 ? key : key[..21] + "...");
}
