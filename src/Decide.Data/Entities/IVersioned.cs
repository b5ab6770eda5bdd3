namespace Decide.Data.Entities;

/// <summary>
/// A row clients change by version: they send the version they read, and a save on top of another version is refused.
/// The version moves in one place, <see cref="DecideDbContext"/>'s save: every changed row gets the next version
/// (<see cref="DecideDbContext.MarkChanged"/> for a row whose children changed); a new row starts at the version it
/// is created with.
/// </summary>
public interface IVersioned
{
    /// <summary>Increases by one with every saved change; a concurrency token.</summary>
    long Version { get; set; }
}
