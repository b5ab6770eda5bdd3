namespace Decide.Web.Components.Shared;

/// <summary>One row of a <see cref="StackedBarChart"/>: its label and the share of each segment (adding up to at most 1).</summary>
public sealed record StackedRow(string Label, IReadOnlyList<double> Shares);
