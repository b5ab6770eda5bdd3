namespace Decide.Core.Tests.Support;

/// <summary>
/// A seed for <see cref="Random"/> drawn from the whole non-negative int range (FsCheck's own ints stay near 0 at
/// small sizes, which would repeat the same few cases).
/// </summary>
public readonly record struct Seed(int Value)
{
    /// <summary>A generator seeded with this value.</summary>
    public Random Random() => new(Value);

    /// <inheritdoc />
    public override string ToString() => $"seed {Value}";
}
