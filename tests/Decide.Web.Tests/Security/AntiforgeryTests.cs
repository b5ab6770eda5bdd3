using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Security;

/// <summary>
/// Every form post needs the antiforgery token of the page it came from: without it, or with another browser's, the
/// post is refused with 400 and a sentence saying what to do (a page for a browser, a problem document otherwise),
/// and nothing happens.
/// </summary>
public sealed class AntiforgeryTests(SecuredWebFactory factory) : IClassFixture<SecuredWebFactory>
{
    private const string WhatToDo = "Open the page again and send the form from there";

    [Fact]
    public async Task A_sign_in_form_without_its_token_is_refused_with_a_page_that_says_what_to_do()
    {
        using var browser = factory.Browser("198.51.100.50");
        browser.DefaultRequestHeaders.Accept.Add(new MediaTypeWithQualityHeaderValue("text/html"));
        await browser.GetAsync("/signin");
        var response = await browser.PostAsync("/account/signin", Form(DecideWebFactory.Facilitator, DemoSeeder.DemoPassword, token: null));

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("text/html", response.Content.Headers.ContentType!.MediaType);
        var page = await response.Content.ReadAsStringAsync();
        Assert.Contains("Form not accepted", page, StringComparison.Ordinal);
        Assert.Contains(WhatToDo, page, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.Unauthorized, (await browser.GetAsync("/api/accounts/me")).StatusCode);
    }

    [Fact]
    public async Task A_sign_in_form_with_another_browsers_token_is_refused_with_a_problem_document()
    {
        using var other = factory.Browser("198.51.100.51");
        var othersToken = SignInFormClient.TokenIn(await other.GetStringAsync("/signin"));

        using var script = factory.Browser("198.51.100.52");
        await script.GetAsync("/signin");
        var response = await script.PostAsync("/account/signin", Form(DecideWebFactory.Facilitator, DemoSeeder.DemoPassword, othersToken));

        var problem = await ApiAssert.ProblemAsync(response, HttpStatusCode.BadRequest, "anti-forgery token is missing, wrong or expired");
        Assert.Equal("Form not verified", problem.GetProperty("title").GetString());
        Assert.Equal(HttpStatusCode.Unauthorized, (await script.GetAsync("/api/accounts/me")).StatusCode);
    }

    [Fact]
    public async Task Signing_out_needs_the_token_of_a_signed_in_page_too()
    {
        using var browser = factory.Browser("198.51.100.53");
        var signedIn = await SignInFormClient.PostAsync(browser, DecideWebFactory.Observer, DemoSeeder.DemoPassword);
        Assert.Equal(HttpStatusCode.Redirect, signedIn.StatusCode);

        // Without a token (as from a page on another site): refused, still signed in.
        var forged = await browser.PostAsync("/account/signout", new FormUrlEncodedContent([]));
        await ApiAssert.ProblemAsync(forged, HttpStatusCode.BadRequest, WhatToDo);
        Assert.Equal(HttpStatusCode.OK, (await browser.GetAsync("/api/accounts/me")).StatusCode);

        // With the token of the screen's own sign-out button: signed out.
        browser.DefaultRequestHeaders.Accept.Add(new MediaTypeWithQualityHeaderValue("text/html"));
        var screen = await browser.GetStringAsync("/evaluations");
        using var form = new FormUrlEncodedContent(new Dictionary<string, string> { ["__RequestVerificationToken"] = SignInFormClient.TokenIn(screen) });
        var signedOut = await browser.PostAsync("/account/signout", form);
        Assert.Equal(HttpStatusCode.Redirect, signedOut.StatusCode);
        Assert.Equal("/signin?signedOut=true", signedOut.Headers.Location!.OriginalString);
        Assert.Equal(HttpStatusCode.Unauthorized, (await browser.GetAsync("/api/accounts/me")).StatusCode);
    }

    [Fact]
    public async Task The_json_api_needs_no_antiforgery_token()
    {
        using var script = factory.Browser("198.51.100.54");
        var response = await script.PostAsJsonAsync("/api/auth/login", new { email = DecideWebFactory.Observer, password = DemoSeeder.DemoPassword });
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
    }

    private static FormUrlEncodedContent Form(string email, string password, string? token)
    {
        var fields = new Dictionary<string, string> { ["Email"] = email, ["Password"] = password, ["ReturnUrl"] = "/" };
        if (token is not null)
        {
            fields["__RequestVerificationToken"] = token;
        }

        return new FormUrlEncodedContent(fields);
    }
}
