using System.Globalization;
using Decide.Core.Fuzzy;
using Decide.Core.Scales;
using Decide.Web.Components.Shared;
using Decide.Web.Components.Tests.Support;

namespace Decide.Web.Components.Tests;

public sealed class TrianglePlotTests : MudComponentTest
{
    public static TheoryData<string> BuiltIn => [.. BuiltInScales.ByName.Keys];

    [Theory]
    [MemberData(nameof(BuiltIn))]
    public void Each_term_of_a_built_in_scale_is_drawn_as_one_triangle_in_scale_order(string name)
    {
        var scale = BuiltInScales.ByName[name];

        var cut = Render<TrianglePlot>(p => p.Add(x => x.Scale, scale));

        var polygons = cut.FindAll("polygon");
        Assert.Equal(scale.Terms.Select(t => t.Code), polygons.Select(p => p.GetAttribute("data-term")));
        foreach (var polygon in polygons)
        {
            Assert.Equal(3, Vertices(polygon.GetAttribute("points")!).Length);
        }
    }

    [Fact]
    public void A_triangle_rises_from_its_lower_to_its_middle_value_and_falls_to_its_upper_value()
    {
        // An invented three-term scale on [0, 4]: the drawn x positions must keep the values' proportions.
        var scale = LinguisticScale.Create("three", 0, 4,
        [
            new LinguisticTerm("low", "Low", new Tfn(0, 0, 2)),
            new LinguisticTerm("mid", "Middle", new Tfn(1, 2, 3)),
            new LinguisticTerm("high", "High", new Tfn(2, 4, 4)),
        ]);

        var cut = Render<TrianglePlot>(p => p.Add(x => x.Scale, scale));

        var mid = Vertices(cut.Find("polygon[data-term=mid]").GetAttribute("points")!);
        var (left, peak, right) = (mid[0], mid[1], mid[2]);
        Assert.Equal(left.Y, right.Y, 6);
        Assert.True(peak.Y < left.Y, "the peak (membership 1) is drawn above the base (membership 0)");
        Assert.Equal(peak.X - left.X, right.X - peak.X, 6);

        var high = Vertices(cut.Find("polygon[data-term=high]").GetAttribute("points")!);
        Assert.Equal(high[1].X, high[2].X, 6); // middle = upper = 4: a right shoulder
        Assert.Equal((peak.X - left.X) * 2, high[1].X - high[0].X, 6); // 4 − 2 is twice 2 − 1
    }

    private static (double X, double Y)[] Vertices(string points) => points
        .Split(' ', StringSplitOptions.RemoveEmptyEntries)
        .Select(p => p.Split(','))
        .Select(xy => (double.Parse(xy[0], CultureInfo.InvariantCulture), double.Parse(xy[1], CultureInfo.InvariantCulture)))
        .ToArray();
}
