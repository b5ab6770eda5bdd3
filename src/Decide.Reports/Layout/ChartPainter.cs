using Decide.Core.Robustness;
using Decide.Core.Scales;
using PdfSharp.Drawing;

namespace Decide.Reports.Layout;

/// <summary>The record's charts, drawn directly with XGraphics: term triangles, horizontal bars, weight sweeps.</summary>
internal static class ChartPainter
{
    /// <summary>Each term of a scale as its triangle on the scale's range, labelled at its peak.</summary>
    public static void TermTriangles(XGraphics gfx, XRect area, LinguisticScale scale, ReportStyle style)
    {
        var plot = new XRect(area.X + 24, area.Y + 14, area.Width - 34, area.Height - 30);
        Axes(gfx, plot, style, scale.Minimum, scale.Maximum, 0, 1, xTicks: 5, yTicks: 1, yLabel: "μ");
        double X(double v) => plot.X + ((v - scale.Minimum) / (scale.Maximum - scale.Minimum) * plot.Width);
        for (var i = 0; i < scale.Count; i++)
        {
            var term = scale[i];
            var color = ReportStyle.Series[i % ReportStyle.Series.Length];
            var pen = new XPen(color, 1.2);
            XPoint[] points =
            [
                new(X(term.Value.Lower), plot.Bottom),
                new(X(term.Value.Middle), plot.Top),
                new(X(term.Value.Upper), plot.Bottom),
            ];
            gfx.DrawLines(pen, points);
            var label = term.Code;
            var w = TextPainter.Width(gfx, label, style.Small);
            var lx = Math.Clamp(X(term.Value.Middle) - (w / 2), plot.X - 10, plot.Right - w + 10);
            gfx.DrawString(label, style.Small, new XSolidBrush(color), lx, plot.Top - 10 - ((i % 2) * 0), XStringFormats.TopLeft);
        }
    }

    /// <summary>Horizontal bars from 0, one per item, with the value printed at the bar's end.</summary>
    public static void Bars(XGraphics gfx, XRect area, IReadOnlyList<(string Label, double Value, string Text)> items, double maximum, ReportStyle style)
    {
        if (items.Count == 0)
        {
            return;
        }

        var labelWidth = Math.Min(area.Width * 0.35, items.Max(i => TextPainter.Width(gfx, i.Label, style.Cell)) + 8);
        var plotX = area.X + labelWidth;
        var plotWidth = area.Width - labelWidth - 50;
        var barHeight = Math.Min(16, area.Height / items.Count * 0.7);
        var step = area.Height / items.Count;
        var gridPen = new XPen(ReportStyle.Rule, 0.3) { DashStyle = XDashStyle.Dot };
        for (var t = 0; t <= 4; t++)
        {
            var x = plotX + (plotWidth * t / 4);
            gfx.DrawLine(gridPen, x, area.Y, x, area.Bottom);
        }

        for (var i = 0; i < items.Count; i++)
        {
            var (label, value, text) = items[i];
            var y = area.Y + (i * step) + ((step - barHeight) / 2);
            var lines = TextPainter.Wrap(gfx, label, style.Cell, labelWidth - 6);
            TextPainter.Draw(gfx, lines[0], style.Cell, style.InkBrush, area.X, y + ((barHeight - style.Cell.GetHeight()) / 2));
            var w = Math.Max(0.5, plotWidth * Math.Clamp(value / maximum, 0, 1));
            gfx.DrawRectangle(new XSolidBrush(i == 0 ? ReportStyle.Accent : ReportStyle.Series[5]), plotX, y, w, barHeight);
            gfx.DrawString(text, style.Cell, style.InkBrush, plotX + w + 4, y + ((barHeight - style.Cell.GetHeight()) / 2), XStringFormats.TopLeft);
        }
    }

    /// <summary>
    /// One weight sweep: closeness of every alternative as the criterion's share runs from 0 to 1, the current share
    /// as a dashed line and each reversal point as a ring on the crossing.
    /// </summary>
    public static void Sweep(XGraphics gfx, XRect area, WeightSweepResult sweep, string title, IReadOnlyDictionary<string, int> colourIndex, ReportStyle style)
    {
        TextPainter.Draw(gfx, TextPainter.Wrap(gfx, title, style.CellBold, area.Width)[0], style.CellBold, style.InkBrush, area.X, area.Y);
        var plot = new XRect(area.X + 26, area.Y + 16, area.Width - 34, area.Height - 36);
        var all = sweep.Series.SelectMany(s => s.Closeness).ToArray();
        var low = all.Length == 0 ? 0 : Math.Floor(all.Min() * 10) / 10;
        var high = all.Length == 0 ? 1 : Math.Ceiling(all.Max() * 10) / 10;
        if (high - low < 0.1)
        {
            high = low + 0.1;
        }

        Axes(gfx, plot, style, 0, 1, low, high, xTicks: 4, yTicks: 2, yLabel: null, xPercent: true);
        double X(double v) => plot.X + (v * plot.Width);
        double Y(double v) => plot.Bottom - ((v - low) / (high - low) * plot.Height);
        foreach (var series in sweep.Series)
        {
            var color = ReportStyle.Series[colourIndex.GetValueOrDefault(series.Alternative) % ReportStyle.Series.Length];
            var points = sweep.Samples.Select((s, i) => new XPoint(X(s), Y(series.Closeness[i]))).ToArray();
            if (points.Length > 1)
            {
                gfx.DrawLines(new XPen(color, 1), points);
            }
        }

        var current = new XPen(ReportStyle.Ink, 0.7) { DashStyle = XDashStyle.Dash };
        gfx.DrawLine(current, X(sweep.Current), plot.Top, X(sweep.Current), plot.Bottom);
        foreach (var reversal in sweep.Reversals)
        {
            var series = sweep.Series.FirstOrDefault(s => s.Alternative == reversal.Above);
            if (series is null)
            {
                continue;
            }

            var y = Interpolate(sweep.Samples, series.Closeness, reversal.Weight);
            var ring = new XPen(reversal.Confirmed ? ReportStyle.Ink : ReportStyle.Muted, 0.9);
            gfx.DrawEllipse(ring, X(reversal.Weight) - 3, Y(y) - 3, 6, 6);
        }

        if (sweep.Note is { } note)
        {
            TextPainter.Draw(gfx, TextPainter.Wrap(gfx, note, style.Small, plot.Width)[0], style.Small, style.MutedBrush, plot.X + 4, plot.Top + 2);
        }
    }

    /// <summary>A legend: a colour swatch and the name of each alternative, flowing across the width.</summary>
    public static double Legend(XGraphics gfx, XRect area, IReadOnlyList<(string Name, int Colour)> entries, ReportStyle style)
    {
        var x = area.X;
        var y = area.Y;
        var lineHeight = style.Cell.GetHeight() + 4;
        foreach (var (name, colour) in entries)
        {
            var width = TextPainter.Width(gfx, name, style.Cell) + 22;
            if (x + width > area.Right && x > area.X)
            {
                x = area.X;
                y += lineHeight;
            }

            gfx.DrawRectangle(new XSolidBrush(ReportStyle.Series[colour % ReportStyle.Series.Length]), x, y + 2, 10, 6);
            TextPainter.Draw(gfx, name, style.Cell, style.InkBrush, x + 13, y);
            x += width;
        }

        return y + lineHeight - area.Y;
    }

    private static double Interpolate(IReadOnlyList<double> xs, IReadOnlyList<double> ys, double x)
    {
        for (var i = 1; i < xs.Count; i++)
        {
            if (x <= xs[i])
            {
                var t = xs[i] == xs[i - 1] ? 0 : (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
                return ys[i - 1] + (t * (ys[i] - ys[i - 1]));
            }
        }

        return ys[^1];
    }

    private static void Axes(XGraphics gfx, XRect plot, ReportStyle style, double x0, double x1, double y0, double y1, int xTicks, int yTicks, string? yLabel, bool xPercent = false)
    {
        var axis = new XPen(ReportStyle.Muted, 0.6);
        var grid = new XPen(ReportStyle.Rule, 0.3) { DashStyle = XDashStyle.Dot };
        gfx.DrawLine(axis, plot.Left, plot.Bottom, plot.Right, plot.Bottom);
        gfx.DrawLine(axis, plot.Left, plot.Top, plot.Left, plot.Bottom);
        for (var t = 0; t <= xTicks; t++)
        {
            var v = x0 + ((x1 - x0) * t / xTicks);
            var x = plot.Left + (plot.Width * t / xTicks);
            gfx.DrawLine(axis, x, plot.Bottom, x, plot.Bottom + 2);
            var text = xPercent ? RecordText.Number(v * 100, 0) + "%" : RecordText.Number(v, x1 - x0 <= 2 ? 1 : 0);
            var w = TextPainter.Width(gfx, text, style.Small);
            gfx.DrawString(text, style.Small, style.MutedBrush, x - (w / 2), plot.Bottom + 3, XStringFormats.TopLeft);
        }

        for (var t = 0; t <= yTicks; t++)
        {
            var v = y0 + ((y1 - y0) * t / yTicks);
            var y = plot.Bottom - (plot.Height * t / yTicks);
            if (t > 0)
            {
                gfx.DrawLine(grid, plot.Left, y, plot.Right, y);
            }

            var text = RecordText.Number(v, 2);
            var w = TextPainter.Width(gfx, text, style.Small);
            gfx.DrawString(text, style.Small, style.MutedBrush, plot.Left - w - 2, y - (style.Small.GetHeight() / 2), XStringFormats.TopLeft);
        }

        if (yLabel is not null)
        {
            gfx.DrawString(yLabel, style.Small, style.MutedBrush, plot.Left - 20, plot.Top - 10, XStringFormats.TopLeft);
        }
    }
}
