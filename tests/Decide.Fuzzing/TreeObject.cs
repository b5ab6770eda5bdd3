namespace Decide.Fuzzing;

/// <summary>An object: its members in order; a name may appear more than once.</summary>
public sealed class TreeObject(List<KeyValuePair<string, TreeNode>> members) : TreeNode
{
    public List<KeyValuePair<string, TreeNode>> Members { get; } = members;

    /// <summary>The value of the first member called <paramref name="name"/>, if any.</summary>
    public TreeNode? this[string name] => Members.FirstOrDefault(m => m.Key == name).Value;

    public override TreeNode Clone() => new TreeObject([.. Members.Select(m => new KeyValuePair<string, TreeNode>(m.Key, m.Value.Clone()))]);
}
