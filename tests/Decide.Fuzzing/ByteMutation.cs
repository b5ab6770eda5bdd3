namespace Decide.Fuzzing;

/// <summary>A change to the bytes after the document is written: <see cref="Kind"/> at <see cref="Position"/> (modulo the length).</summary>
public sealed record ByteMutation(ByteMutationKind Kind, int Position, int Choice)
{
    public override string ToString() => $"{Kind}(at {Position}, choice {Choice})";
}
