namespace Decide.Fuzzing;

/// <summary>What a <see cref="ByteMutation"/> does to the written bytes.</summary>
public enum ByteMutationKind
{
    /// <summary>Cuts the file at a position.</summary>
    Truncate,

    /// <summary>Inserts stray bytes (invalid UTF-8, a NUL, a second byte-order mark, a bracket).</summary>
    Insert,

    /// <summary>Flips one bit of one byte.</summary>
    FlipBit,

    /// <summary>Appends bytes after the document (a second value, garbage).</summary>
    Append,

    /// <summary>Re-encodes the whole file as UTF-16 with a byte-order mark.</summary>
    Utf16,

    /// <summary>Puts two UTF-8 byte-order marks in front.</summary>
    DoubleBom,
}
