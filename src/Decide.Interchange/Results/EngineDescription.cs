namespace Decide.Interchange.Results;

/// <summary>The program that computed a results document.</summary>
/// <param name="Name">Always "Decide".</param>
/// <param name="Version">The informational version of the engine assembly (Decide.Core).</param>
public sealed record EngineDescription(string Name, string Version);
