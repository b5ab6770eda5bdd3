namespace Decide.Fuzzing;

/// <summary>
/// A node of a JSON document as the mutators see it. Unlike System.Text.Json's nodes it may hold what JSON readers
/// must refuse or handle with care: an object may repeat a name, and a <see cref="TreeRaw"/> node is written out
/// byte for byte (numbers too large to hold, NaN, raw control characters, invalid UTF-8, deep nesting).
/// </summary>
public abstract class TreeNode
{
    /// <summary>A deep copy.</summary>
    public abstract TreeNode Clone();
}
