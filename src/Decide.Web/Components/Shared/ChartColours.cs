using System.Globalization;

namespace Decide.Web.Components.Shared;

/// <summary>Colours for charts: distinct series colours that stay apart for colour-blind readers, and a ramp for ordered terms.</summary>
public static class ChartColours
{
    /// <summary>Series colours (Okabe and Ito's set without yellow, then darker shades), in order of use.</summary>
    private static readonly string[] Series =
        ["#0072B2", "#D55E00", "#009E73", "#CC79A7", "#56B4E9", "#E69F00", "#1C2A30", "#7A5C99", "#8C6D31", "#5B8C85"];

    public static string ForSeries(int index) => Series[((index % Series.Length) + Series.Length) % Series.Length];

    /// <summary>A colour for position <paramref name="index"/> of <paramref name="count"/> ordered items, from ochre (least favourable) to lake blue (most).</summary>
    public static string Ramp(int index, int count)
    {
        var t = count <= 1 ? 1.0 : (double)index / (count - 1);
        (double R, double G, double B) low = (0xB0, 0x5F, 0x1A), mid = (0x8E, 0x8B, 0x78), high = (0x1F, 0x5A, 0x6E);
        var (a, b, u) = t < 0.5 ? (low, mid, t * 2) : (mid, high, (t - 0.5) * 2);
        return string.Create(CultureInfo.InvariantCulture,
            $"#{(int)Math.Round(a.R + ((b.R - a.R) * u)):X2}{(int)Math.Round(a.G + ((b.G - a.G) * u)):X2}{(int)Math.Round(a.B + ((b.B - a.B) * u)):X2}");
    }

    /// <summary>A coordinate for SVG markup, with a dot for decimals whatever the culture.</summary>
    public static string At(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);
}
