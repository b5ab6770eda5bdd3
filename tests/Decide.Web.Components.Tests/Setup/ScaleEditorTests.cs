using Decide.Core.Scales;
using Decide.Interchange.Plans;
using Decide.Web.Components.Pages.Setup;
using Decide.Web.Components.Tests.Support;

namespace Decide.Web.Components.Tests.Setup;

/// <summary>A rating scale of the evaluation's own, with points, made in the setup screen from a built-in one.</summary>
public sealed class ScaleEditorTests : MudComponentTest
{
    [Fact]
    public void An_edited_copy_is_refused_while_its_points_decrease_and_taken_once_the_scales_rules_accept_it()
    {
        PlanScale? used = null;
        var cut = Render<ScaleEditor>(p => p.Add(x => x.From, BuiltInScales.Points5).Add(x => x.Use, (PlanScale s) => used = s));
        cut.Find("[data-testid=edit-scale]").Click();

        Field(cut, "Points of term 3").Input("0.5"); // below term 2's 1 point
        Assert.Contains("points", cut.Find("[data-testid=scale-problems]").TextContent, StringComparison.Ordinal);
        Assert.True(cut.FindAll("button").Single(b => b.TextContent.Contains("Use this scale", StringComparison.Ordinal)).HasAttribute("disabled"));

        Field(cut, "Points of term 3").Input("2");
        Field(cut, "Words of term 6").Input("Outstanding");
        cut.FindAll("button").Single(b => b.TextContent.Contains("Use this scale", StringComparison.Ordinal)).Click();

        var scale = used!.Resolve("ratingScale")!;
        Assert.Equal("points-0-5-own", scale.Name);
        Assert.Equal("Outstanding", scale.Terms[^1].Label);
        Assert.Equal([0.0, 1, 2, 3, 4, 5], scale.Terms.Select(t => t.Points!.Value));
        Assert.Equal(BuiltInScales.Points5.Terms.Select(t => t.Value), scale.Terms.Select(t => t.Value));
    }

    private static AngleSharp.Dom.IElement Field(Bunit.IRenderedComponent<ScaleEditor> cut, string label) =>
        cut.FindAll("input").Single(i => i.Closest(".mud-input-control")?.QuerySelector("label")?.TextContent.Trim() == label);
}
