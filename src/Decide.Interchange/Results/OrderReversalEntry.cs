namespace Decide.Interchange.Results;

/// <summary>Two alternatives whose order changed.</summary>
/// <param name="WasAhead">Ahead in the full ranking.</param>
/// <param name="NowAhead">Ahead after the change.</param>
public sealed record OrderReversalEntry(string WasAhead, string NowAhead);
