namespace Decide.Web.Components.Shared;

/// <summary>One line of a <see cref="LineChart"/>: its name, colour and a y value for each x of the chart.</summary>
public sealed record ChartSeries(string Name, string Colour, IReadOnlyList<double> Values);
