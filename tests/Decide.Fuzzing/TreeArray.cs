namespace Decide.Fuzzing;

/// <summary>An array.</summary>
public sealed class TreeArray(List<TreeNode> items) : TreeNode
{
    public List<TreeNode> Items { get; } = items;

    public override TreeNode Clone() => new TreeArray([.. Items.Select(i => i.Clone())]);
}
