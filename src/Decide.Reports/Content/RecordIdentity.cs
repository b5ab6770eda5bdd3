namespace Decide.Reports.Content;

/// <summary>What the cover says about the procurement.</summary>
/// <param name="Title">Subject of the evaluation.</param>
/// <param name="Reference">The buyer's reference (printed in every footer).</param>
/// <param name="Organisation">The contracting body.</param>
/// <param name="Status">Where the evaluation stands ("Approved", "Awaiting approval", "Draft").</param>
/// <param name="Dates">Key dates in order (plan locked, bids opened, scoring closed, …).</param>
public sealed record RecordIdentity(
    string Title, string Reference, string Organisation, string Status, IReadOnlyList<RecordDate> Dates);
