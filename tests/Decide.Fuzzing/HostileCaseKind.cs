namespace Decide.Fuzzing;

/// <summary>How a <see cref="HostileCase"/> makes its bytes.</summary>
public enum HostileCaseKind
{
    /// <summary>A valid document changed by tree mutations, then perhaps by one change to its bytes.</summary>
    Mutated,

    /// <summary>Random bytes.</summary>
    RandomBytes,

    /// <summary>Random JSON tokens (brackets, names of the format, numbers) in random order.</summary>
    TokenSoup,
}
