namespace Decide.Fuzzing;

/// <summary>What a <see cref="TreeMutation"/> does to the node it targets.</summary>
public enum TreeMutationKind
{
    /// <summary>Drops the member or element.</summary>
    Remove,

    /// <summary>Repeats the member under the same name (a duplicate key) or the element, possibly with another value.</summary>
    Duplicate,

    /// <summary>Replaces the value with one of another JSON type.</summary>
    Retype,

    /// <summary>Replaces the value with a hostile number or would-be number.</summary>
    Number,

    /// <summary>Wraps the value in nested arrays or objects.</summary>
    Nest,

    /// <summary>Replaces the value with a very long string.</summary>
    LongString,

    /// <summary>Replaces the value with hostile text (markup, formula prefixes, control characters, unpaired surrogates).</summary>
    Text,

    /// <summary>Replaces the value with a string that is not valid JSON or not valid UTF-8.</summary>
    RawText,

    /// <summary>Renames the member: hostile text, a near-miss of the name, or a sibling's name.</summary>
    Rename,

    /// <summary>Empties an array or object.</summary>
    Empty,

    /// <summary>Grows an array or object to many copies of its content (ids made unique).</summary>
    Multiply,

    /// <summary>Replaces the value with another string of the same document (an id where a term belongs, a clash).</summary>
    SwapReference,

    /// <summary>Adds many criteria with an importance and a rating for each, keeping the evaluation valid.</summary>
    Widen,
}
