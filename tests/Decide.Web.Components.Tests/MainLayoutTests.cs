using System.Security.Claims;
using Decide.Web.Components.Layout;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Tests;

public sealed class MainLayoutTests : MudComponentTest
{
    public MainLayoutTests()
    {
        AddAuthorization().SetAuthorized("facilitator@kestrel-vale.example")
            .SetClaims(new Claim(CurrentUser.DisplayNameClaim, "Ione Castellane"));
    }

    protected override bool NeedsPopoverProvider => false;

    [Fact]
    public void Every_screen_carries_the_caution_beneath_its_content()
    {
        var cut = Render<MainLayout>(p => p.Add(x => x.Body, Screen));

        // The wording is the product's standing caution, as the issue states it.
        var caution = cut.Find("footer[data-testid=caution]");
        Assert.Equal(
            "Decide supports, and does not replace, the panel's documented judgement. Follow the procurement law and your organisation's rules.",
            caution.TextContent.Trim());
        Assert.NotNull(cut.Find("main #screen"));
        Assert.Null(caution.Closest("main"));
    }

    [Fact]
    public void The_app_bar_names_the_product_and_the_signed_in_person_and_offers_sign_out()
    {
        var cut = Render<MainLayout>(p => p.Add(x => x.Body, Screen));

        Assert.Contains("Decide", cut.Find(".decide-brand").TextContent, StringComparison.Ordinal);
        Assert.Equal("Ione Castellane", cut.Find(".decide-person-name").TextContent.Trim());
        var signOut = cut.Find("form[action='account/signout']");
        Assert.Equal("post", signOut.GetAttribute("method"));
        Assert.Equal("Sign out", signOut.QuerySelector("button")!.TextContent.Trim());
    }

    private static RenderFragment Screen => b => b.AddMarkupContent(0, "<h1 id=\"screen\">A screen</h1>");
}
