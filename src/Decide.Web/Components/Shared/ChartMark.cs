namespace Decide.Web.Components.Shared;

/// <summary>A point marked on a <see cref="LineChart"/> (for example where two lines cross).</summary>
/// <param name="X">Position on the x axis.</param>
/// <param name="Y">Position on the y axis.</param>
/// <param name="Text">What happens there, for the tooltip and screen readers.</param>
/// <param name="Solid">Filled when confirmed; hollow when only approximate.</param>
public sealed record ChartMark(double X, double Y, string Text, bool Solid = true);
