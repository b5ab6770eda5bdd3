namespace Decide.Reports.Content;

/// <summary>A labelled date on the cover ("Plan locked", 2026-03-02).</summary>
public sealed record RecordDate(string Label, DateTimeOffset When);
