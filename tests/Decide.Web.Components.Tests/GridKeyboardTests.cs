using Decide.Core.Scales;
using Decide.Web.Components.Pages.Inputs;

namespace Decide.Web.Components.Tests;

/// <summary>Typing a term's code on the rating grid, on the points scales whose codes are numbers ("0" … "10").</summary>
public sealed class GridKeyboardTests
{
    [Fact]
    public void On_the_0_to_10_scale_one_then_zero_gives_ten_and_a_single_digit_gives_its_own_points()
    {
        var codes = BuiltInScales.Points10.Terms.Select(t => t.Code).ToArray();
        var keyboard = new GridKeyboard(1, 1, codes, _ => true);

        Assert.Equal(GridCommand.SetTerm("1"), keyboard.Press("1"));
        Assert.Equal(GridCommand.SetTerm("10"), keyboard.Press("0"));
        Assert.Equal(GridCommand.SetTerm("7"), keyboard.Press("7"));
        Assert.Equal(GridCommand.SetTerm("0"), keyboard.Press("0"));
    }
}
