namespace Decide.Fuzzing;

/// <summary>
/// Bytes written out exactly as given: numbers and literals as they were in the file, and deliberately malformed
/// content (NaN, 1e400, a raw control character inside quotes, invalid UTF-8, thousands of nested brackets).
/// </summary>
public sealed class TreeRaw(byte[] bytes) : TreeNode
{
    public byte[] Bytes { get; } = bytes;

    public static TreeRaw Of(string text) => new(System.Text.Encoding.UTF8.GetBytes(text));

    public override TreeNode Clone() => this; // immutable
}
