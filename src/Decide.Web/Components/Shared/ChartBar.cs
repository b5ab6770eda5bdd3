namespace Decide.Web.Components.Shared;

/// <summary>One bar of a <see cref="BarChart"/>.</summary>
/// <param name="Label">What the bar stands for (a bid's or criterion's name).</param>
/// <param name="Value">Its length, in the chart's units; negative values extend left of zero on a diverging chart.</param>
/// <param name="Text">The value as printed beside the bar.</param>
/// <param name="Colour">The bar's colour; the chart's colour when null.</param>
public sealed record ChartBar(string Label, double Value, string Text, string? Colour = null);
