namespace Decide.Fuzzing;

/// <summary>
/// A string, written with JSON escapes where needed; a surrogate without its partner is written as a <c>\uD800</c>
/// escape (valid JSON syntax whose meaning is not valid Unicode).
/// </summary>
public sealed class TreeString(string value) : TreeNode
{
    public string Value { get; } = value;

    public override TreeNode Clone() => this; // immutable
}
